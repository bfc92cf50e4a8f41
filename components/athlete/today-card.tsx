import { Badge } from "@/components/ui/badge";
import { Card } from "@/components/ui/card";
import { formatDayShort } from "@/lib/format/dates";
import { LogBadge, LogSummary } from "./log-summary";
import type { MySession } from "./my-session";
import { SessionDetails } from "./session-details";
import { SessionSheet } from "./session-sheet";

/** Today's session (or the next one) in full at the top of "My training", with the way to log it. */
export function TodayCard({ session, today }: { session: MySession; today: string }) {
  const isToday = session.date === today;
  return (
    <Card className="p-4 sm:p-5" data-testid="today-session" data-session-id={session.sessionId}>
      <div className="flex items-start justify-between gap-2">
        <div>
          <p className="text-xs font-semibold tracking-wider text-ink-500 uppercase">
            {isToday ? "Today" : `Next · ${formatDayShort(session.date)}`}
          </p>
          <h2 className="mt-0.5 text-xl font-semibold text-ink-950">{session.title}</h2>
        </div>
        <div className="flex gap-1">
          {isToday ? <Badge tone="lane">Today</Badge> : null}
          <LogBadge session={session} />
        </div>
      </div>
      <div className="mt-3 space-y-3">
        <SessionDetails session={session} />
        <LogSummary session={session} />
        {session.logState === "open" ? (
          <div className="space-y-1">
            <SessionSheet session={session} startWithLog />
            {session.lockLabel ? <p className="text-xs text-ink-500">{session.lockLabel}</p> : null}
          </div>
        ) : session.logState === "locked" ? (
          <p className="text-sm text-ink-700">{session.lockLabel}</p>
        ) : null}
      </div>
    </Card>
  );
}

/** The other sessions of a week as short rows; each opens the session in a sheet. */
export function WeekList({
  title,
  sessions,
  today,
  testId,
}: {
  title: string;
  sessions: MySession[];
  today: string;
  testId: string;
}) {
  return (
    <section data-testid={testId} aria-label={title}>
      <h2 className="mb-2 text-sm font-semibold tracking-wider text-ink-500 uppercase">{title}</h2>
      {sessions.length === 0 ? (
        <p className="text-sm text-ink-600">Nothing else published yet.</p>
      ) : (
        <ul className="divide-y divide-ink-100 overflow-hidden rounded-card bg-paper-raised ring-1 ring-ink-200">
          {sessions.map((s) => (
            <li key={s.sessionId} data-testid="my-session" data-session-id={s.sessionId}>
              <SessionSheet
                session={s}
                trigger={
                  <span className="flex min-h-14 items-center gap-3 px-3 py-2 hover:bg-ink-50">
                    <span className="w-20 shrink-0 text-xs font-semibold text-ink-600">
                      {s.date === today ? "Today" : formatDayShort(s.date)}
                      <span className="block font-normal">{s.startTime}</span>
                    </span>
                    <span
                      className={`min-w-0 flex-1 truncate text-sm font-medium text-ink-900 ${
                        s.status === "cancelled" ? "line-through" : ""
                      }`}
                    >
                      {s.title}
                    </span>
                    {s.medicalChanges.length > 0 ? (
                      <Badge tone="spike" className="shrink-0">
                        Medical change
                      </Badge>
                    ) : null}
                    <LogBadge session={s} />
                  </span>
                }
              />
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
