"use client";

import { useState } from "react";
import { Button, buttonClass } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { inputClass } from "@/components/ui/field";
import { noticeApi } from "@/lib/client/api";
import type { CalendarFeedStatus } from "@/lib/data/calendar-tokens";
import { SubscribeHelp } from "./subscribe-help";

async function copyText(text: string, fallback: HTMLInputElement | null): Promise<boolean> {
  try {
    await navigator.clipboard.writeText(text);
    return true;
  } catch {
    // Older browsers or no permission: select the text so a long-press / Ctrl+C copies it.
    fallback?.select();
    return document.execCommand?.("copy") ?? false;
  }
}

/** The athlete's calendar subscription: the link with a copy button, a webcal:// link, make new / turn off. */
export function FeedCard({ athleteId, initial }: { athleteId: number; initial: CalendarFeedStatus }) {
  const [feed, setFeed] = useState(initial);
  const [message, setMessage] = useState<string | null>(null);
  const [confirm, setConfirm] = useState<"rotate" | "revoke" | null>(null);
  const [busy, setBusy] = useState(false);
  const [input, setInput] = useState<HTMLInputElement | null>(null);

  async function run(kind: "rotate" | "revoke") {
    setBusy(true);
    try {
      const next = await (kind === "rotate" ? noticeApi.newCalendarLink : noticeApi.stopCalendarLink)(athleteId);
      setFeed(next);
      setMessage(
        kind === "rotate"
          ? "New link made. The old one no longer works: subscribe again with this one."
          : "Calendar link turned off. Calendars that used it stop updating.",
      );
    } catch (err) {
      setMessage((err as Error).message);
    } finally {
      setBusy(false);
      setConfirm(null);
    }
  }

  return (
    <Card className="p-4 sm:p-5" id="calendar" data-testid="feed-card">
      <h2 className="font-semibold text-ink-950">Your sessions in your phone&apos;s calendar</h2>
      <p className="mt-1 text-sm text-ink-500">
        Subscribe once; published sessions appear by themselves and follow every change your coach makes.
      </p>

      {feed.active && feed.url ? (
        <>
          <div className="mt-4 flex flex-col gap-2 sm:flex-row">
            <input
              ref={setInput}
              readOnly
              value={feed.url}
              aria-label="Calendar link"
              className={`${inputClass} font-mono text-xs`}
              data-testid="feed-url"
              onFocus={(e) => e.currentTarget.select()}
            />
            <Button
              variant="secondary"
              className="shrink-0"
              data-testid="feed-copy"
              onClick={async () =>
                setMessage((await copyText(feed.url!, input)) ? "Link copied." : "Select the link and copy it.")
              }
            >
              Copy link
            </Button>
          </div>
          <a
            href={feed.webcalUrl ?? feed.url}
            className={buttonClass({ variant: "accent", className: "mt-3 w-full sm:w-auto" })}
            data-testid="feed-webcal"
          >
            Add to my calendar
          </a>
          <SubscribeHelp />
        </>
      ) : (
        <p className="mt-4 rounded-lg bg-paper-sunk px-3 py-2 text-sm text-ink-700" data-testid="feed-off">
          {feed.active
            ? "This link can no longer be shown. Make a new one to subscribe."
            : "Your calendar link is turned off."}
        </p>
      )}

      <p aria-live="polite" className="mt-3 min-h-5 text-sm text-lane-700" data-testid="feed-message">
        {message}
      </p>

      <div className="mt-2 flex flex-wrap gap-2 border-t border-ink-100 pt-3">
        {confirm ? (
          <>
            <span className="self-center text-sm text-ink-700">
              {confirm === "rotate"
                ? "Make a new link? Calendars using the old one stop updating."
                : "Turn the link off? Calendars using it stop updating."}
            </span>
            <Button
              size="sm"
              variant={confirm === "revoke" ? "danger" : "primary"}
              disabled={busy}
              onClick={() => void run(confirm)}
              data-testid="feed-confirm"
            >
              {confirm === "rotate" ? "Make new link" : "Turn off"}
            </Button>
            <Button size="sm" variant="ghost" onClick={() => setConfirm(null)}>
              Keep it
            </Button>
          </>
        ) : (
          <>
            <Button
              size="sm"
              variant="secondary"
              onClick={() => (feed.active ? setConfirm("rotate") : void run("rotate"))}
              data-testid="feed-rotate"
            >
              {feed.active ? "Make a new link" : "Make a link"}
            </Button>
            {feed.active ? (
              <Button size="sm" variant="ghost" onClick={() => setConfirm("revoke")} data-testid="feed-revoke">
                Turn off
              </Button>
            ) : null}
          </>
        )}
      </div>
    </Card>
  );
}
