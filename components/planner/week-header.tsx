"use client";

import { clsx } from "clsx";
import { useState } from "react";
import type { PlanWeek } from "@/lib/plan/types";
import { shiftWeek, weekRangeLabel } from "@/lib/dates/plain-date";
import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/field";
import type { UndoEntry } from "@/lib/plan/undo";
import { useConfirm, type ConfirmRequest } from "./confirm";

type Tool = "copy-to-next" | "clear" | "publish";

type Props = {
  week: PlanWeek | undefined;
  weekStart: string;
  onGo: (date: string) => void;
  onToday: () => void;
  undo: UndoEntry | null;
  onUndo: () => void;
  onTool: (tool: Tool) => void;
  busy: boolean;
};

const QUESTION: Record<Tool, (w: PlanWeek) => ConfirmRequest> = {
  "copy-to-next": () => ({
    title: "Copy this week to next week?",
    body: "Every session that is not cancelled is copied to the same day next week, as a draft.",
    confirmLabel: "Copy week",
  }),
  clear: () => ({
    title: "Clear this week?",
    body:
      "Drafts are removed. Published sessions are cancelled, and athletes see them cancelled in their calendars. " +
      "Sessions an athlete has logged stay.",
    confirmLabel: "Clear week",
    danger: true,
  }),
  publish: (w) => ({
    title: `Publish ${draftCount(w)} draft session${draftCount(w) === 1 ? "" : "s"}?`,
    body: "Athletes get them in their calendars. Later changes to a published session reach them as updates.",
    confirmLabel: "Publish",
  }),
};

function draftCount(w: PlanWeek) {
  return w.athletes.reduce((n, a) => n + a.sessions.filter((s) => s.status === "draft").length, 0);
}

/** Week navigation (previous, next, this week, pick a date), the ISO week number, undo and the week tools. */
export function WeekHeader({ week, weekStart, onGo, onToday, undo, onUndo, onTool, busy }: Props) {
  const [picked, setPicked] = useState("");
  const confirm = useConfirm();
  const ask = async (tool: Tool) => {
    if (week && (await confirm(QUESTION[tool](week)))) onTool(tool);
  };
  const iso = week ? `Week ${week.isoWeek}` : "Week";
  const drafts = week ? draftCount(week) : 0;
  return (
    <header className="mb-4 space-y-3">
      <div className="flex flex-col gap-3 xl:flex-row xl:items-end xl:justify-between">
        <div>
          <p className="text-xs font-medium tracking-wider text-clay-700 uppercase" data-testid="iso-week">
            {iso}
            {week ? <span className="text-ink-500"> · {week.isoYear}</span> : null}
          </p>
          <h1 className="text-2xl font-semibold text-ink-950" data-testid="week-range">
            {weekRangeLabel(weekStart)}
          </h1>
        </div>
        <nav
          aria-label="Weeks"
          className={clsx(
            "flex flex-wrap items-center gap-1 self-start rounded-lg bg-paper-raised",
            "p-1 whitespace-nowrap ring-1 ring-ink-100 xl:self-auto",
          )}
        >
          <Button variant="ghost" size="sm" onClick={() => onGo(shiftWeek(weekStart, -1))} data-testid="prev-week">
            ‹ Previous<span className="sr-only"> week</span>
          </Button>
          <Button variant="ghost" size="sm" onClick={onToday} data-testid="this-week">
            This week
          </Button>
          <Button variant="ghost" size="sm" onClick={() => onGo(shiftWeek(weekStart, 1))} data-testid="next-week">
            Next<span className="sr-only"> week</span> ›
          </Button>
          <form
            className="flex items-center gap-1 border-l border-ink-100 pl-1"
            onSubmit={(e) => {
              e.preventDefault();
              if (picked) onGo(picked);
            }}
          >
            <Input
              type="date"
              aria-label="Go to the week of a date"
              value={picked}
              onChange={(e) => setPicked(e.target.value)}
              className="h-8 w-36 py-1"
              data-testid="pick-date"
            />
            <Button type="submit" variant="ghost" size="sm" disabled={!picked}>
              Go
            </Button>
          </form>
        </nav>
      </div>
      <div className="flex flex-wrap items-center justify-between gap-2 border-y border-ink-100 py-2">
        {week?.canEdit ? (
          <div className="flex flex-wrap items-center gap-1.5" role="toolbar" aria-label="Week tools">
            <Button
              variant="secondary"
              size="sm"
              onClick={onUndo}
              disabled={!undo || busy}
              data-testid="undo"
              title="Ctrl+Z"
            >
              ↶ {undo ? `Undo ${undo.label}` : "Undo"}
            </Button>
            <span aria-hidden className="mx-1 h-5 w-px bg-ink-100" />
            <Button
              variant="ghost"
              size="sm"
              disabled={busy}
              onClick={() => void ask("copy-to-next")}
              data-testid="copy-week"
            >
              Copy to next week
            </Button>
            <Button
              variant="ghost"
              size="sm"
              disabled={busy}
              onClick={() => void ask("clear")}
              data-testid="clear-week"
            >
              Clear week
            </Button>
            <Button
              variant="accent"
              size="sm"
              disabled={busy || drafts === 0}
              onClick={() => void ask("publish")}
              data-testid="publish-week"
            >
              Publish week{drafts > 0 ? ` · ${drafts} draft${drafts === 1 ? "" : "s"}` : ""}
            </Button>
          </div>
        ) : (
          <span />
        )}
        <p className="flex items-center gap-3 text-2xs text-ink-500">
          <span className="inline-flex items-center gap-1">
            <span aria-hidden className="h-1.5 w-1.5 rounded-full bg-state-published" /> published
          </span>
          <span className="inline-flex items-center gap-1">
            <span aria-hidden className="h-1.5 w-1.5 rounded-full ring-1 ring-state-draft ring-inset" /> draft
          </span>
          {week ? <span>Days in {week.timeZone.replace(/_/g, " ")} time</span> : null}
        </p>
      </div>
    </header>
  );
}
