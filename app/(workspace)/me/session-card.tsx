import { Badge } from "@/components/ui/badge";
import { Card } from "@/components/ui/card";
import type { AthleteSession } from "@/lib/data/calendar-tokens";
import { blockDescription } from "@/lib/format/block-summary";
import { formatDayShort } from "@/lib/format/dates";
import { formatMinutes } from "@/lib/format/duration";
import { sessionHeadline } from "@/lib/format/session-line";
import { SessionLogForm } from "./session-log-form";

const DONE: Record<"yes" | "partly" | "no", string> = { yes: "Done", partly: "Partly done", no: "Not done" };

/** One session in plain words, with its log (or the form to write it). */
export function SessionCard({ session, today }: { session: AthleteSession; today: string }) {
  const cancelled = session.status === "cancelled";
  const isToday = session.date === today;
  const canLog = !cancelled && session.date <= today;
  return (
    <Card
      id={`session-${session.id}`}
      className={`p-4 sm:p-5 ${cancelled ? "opacity-60" : ""}`}
      data-testid="my-session"
      data-session-id={session.id}
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <p className="text-xs font-semibold tracking-wider text-ink-500 uppercase">
            {formatDayShort(session.date)} · {session.startTime} · {formatMinutes(session.durationMin)}
          </p>
          <h3 className={`mt-0.5 text-lg font-semibold text-ink-950 ${cancelled ? "line-through" : ""}`}>
            {sessionHeadline(session)}
          </h3>
        </div>
        <div className="flex gap-1">
          {isToday ? <Badge tone="lane">Today</Badge> : null}
          {cancelled ? <Badge tone="spike">Cancelled</Badge> : null}
          {session.log ? <Badge tone="steady">{DONE[session.log.completion]}</Badge> : null}
        </div>
      </div>
      <ul className="mt-3 space-y-2 text-sm text-ink-700">
        {session.blocks.map((b, i) => (
          <li key={b.id ?? i} className="space-y-0.5">
            {blockDescription(b).map((line, j) => (
              <p key={j} className={j === 0 ? "font-medium text-ink-800" : "pl-3"}>
                {line}
              </p>
            ))}
          </li>
        ))}
      </ul>
      {session.notes?.trim() ? (
        <p className="mt-3 rounded-lg bg-paper-sunk px-3 py-2 text-sm text-ink-700">
          Coach&apos;s notes: {session.notes}
        </p>
      ) : null}
      <p className="mt-2 text-xs text-ink-500">Planned effort: RPE {session.plannedRpe} of 10</p>
      {session.log ? (
        <p className="mt-3 text-sm text-ink-700" data-testid="my-log-summary">
          You logged: {DONE[session.log.completion].toLowerCase()}
          {session.log.rpe !== null ? `, RPE ${session.log.rpe}` : ""}
          {session.log.minutes !== null ? `, ${formatMinutes(session.log.minutes)}` : ""}.
        </p>
      ) : null}
      {canLog ? (
        <SessionLogForm
          sessionId={session.sessionId}
          plannedMinutes={session.durationMin}
          blocks={session.blocks}
          log={session.log}
        />
      ) : !cancelled ? (
        <p className="mt-3 text-xs text-ink-500">You can log this session from {formatDayShort(session.date)}.</p>
      ) : null}
    </Card>
  );
}
