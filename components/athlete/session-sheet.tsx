"use client";

import { useState, type ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { formatDayShort } from "@/lib/format/dates";
import { LogForm } from "./log-form";
import { LogSummary } from "./log-summary";
import type { MySession } from "./my-session";
import { SessionDetails } from "./session-details";

/** Opens one session in a sheet: its details and, once it is due and still open, the log form. */
export function SessionSheet({
  session,
  trigger,
  startWithLog = false,
}: {
  session: MySession;
  /** The button's content; without it, a "Log this session" button. */
  trigger?: ReactNode;
  startWithLog?: boolean;
}) {
  const [open, setOpen] = useState(false);
  const [logging, setLogging] = useState(startWithLog);
  const close = () => {
    setOpen(false);
    setLogging(startWithLog);
  };
  const title = `${formatDayShort(session.date)} · ${session.title}`;
  return (
    <>
      {trigger ? (
        <button
          type="button"
          onClick={() => setOpen(true)}
          className="block w-full text-left"
          data-testid="open-session"
          data-session-id={session.sessionId}
        >
          {trigger}
        </button>
      ) : (
        <Button
          variant="accent"
          size="lg"
          className="w-full"
          onClick={() => setOpen(true)}
          data-testid="open-log"
          data-session-id={session.sessionId}
        >
          {session.log ? "Change my log" : "Log this session"}
        </Button>
      )}
      <Dialog sheet open={open} onClose={close} title={logging ? `Log: ${title}` : title} testId="session-sheet">
        {logging && session.logState === "open" ? (
          <LogForm
            sessionId={session.sessionId}
            plannedMinutes={session.durationMin}
            blocks={session.blocks}
            log={session.log}
            pain={session.pain}
            onSaved={close}
          />
        ) : (
          <div className="space-y-4">
            <SessionDetails session={session} />
            <LogSummary session={session} />
            <LogAccess session={session} onLog={() => setLogging(true)} />
          </div>
        )}
      </Dialog>
    </>
  );
}

function LogAccess({ session, onLog }: { session: MySession; onLog: () => void }) {
  if (session.logState === "open")
    return (
      <div className="space-y-1">
        <Button variant="accent" size="lg" className="w-full" onClick={onLog} data-testid="start-log">
          {session.log ? "Change my log" : "Log this session"}
        </Button>
        {session.lockLabel ? <p className="text-xs text-ink-500">{session.lockLabel}</p> : null}
      </div>
    );
  if (session.logState === "locked")
    return (
      <p className="text-sm text-ink-700" data-testid="log-locked">
        {session.lockLabel}
      </p>
    );
  if (session.logState === "ahead")
    return <p className="text-xs text-ink-500">You can log this session from {formatDayShort(session.date)}.</p>;
  return null;
}
