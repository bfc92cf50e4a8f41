import "server-only";
import { Badge } from "@/components/ui/badge";
import { Card } from "@/components/ui/card";
import { recentAthleteLogs } from "@/lib/data/athlete-medical";
import { zonedLabel } from "@/lib/dates/zoned";
import { BODY_REGION_LABEL } from "@/lib/domain/wellbeing";
import { formatDayLong, formatDayShort } from "@/lib/format/dates";
import { formatMinutes } from "@/lib/format/duration";
import { sessionLogLock } from "@/lib/services/session-logs";
import { ReopenLogButton } from "./reopen-log-button";

const DONE = { yes: "Done", partly: "Partly done", no: "Not done" } as const;

/**
 * The athlete's logs of the last three weeks on the coach's athlete page: what was done, and whether the log is
 * still open to the athlete (it closes 48 hours after the session); a coach may reopen a closed one.
 */
export async function AthleteLogs({
  teamId,
  athleteId,
  today,
  timeZone,
  canReopen,
}: {
  teamId: number;
  athleteId: number;
  today: string;
  timeZone: string;
  canReopen: boolean;
}) {
  const now = new Date();
  const logs = await recentAthleteLogs({ teamId, athleteId, today });
  const rows = await Promise.all(
    logs.map(async (l) => {
      const lock = await sessionLogLock({
        target: { id: l.sessionId, date: l.date, startTime: l.startTime, durationMin: l.durationMin },
        clock: { now, timeZone },
      });
      const at = zonedLabel({ instant: lock.locksAt, timeZone });
      return { ...l, locked: lock.locked, until: `${formatDayLong(at.date)} at ${at.time}` };
    }),
  );
  return (
    <Card className="p-4 sm:p-5" data-testid="athlete-logs">
      <h2 className="mb-1 font-semibold text-ink-950">Logged sessions</h2>
      <p className="mb-3 text-sm text-ink-600">
        The last three weeks. A log closes to the athlete 48 hours after the session.
      </p>
      {rows.length === 0 ? <p className="text-sm text-ink-500">No logs in the last three weeks.</p> : null}
      <ul className="divide-y divide-ink-100">
        {rows.map((l) => (
          <li
            key={l.sessionId}
            className="flex flex-wrap items-start justify-between gap-2 py-3"
            data-testid="athlete-log"
            data-session-id={l.sessionId}
          >
            <div className="min-w-0 space-y-0.5">
              <p className="text-sm font-medium text-ink-900">
                {formatDayShort(l.date)} · {l.title}
              </p>
              <p className="text-sm text-ink-700">
                {[
                  DONE[l.completion],
                  l.rpe !== null ? `RPE ${l.rpe}` : null,
                  l.minutes !== null ? formatMinutes(l.minutes) : null,
                  l.pain ? `${BODY_REGION_LABEL[l.pain.region].toLowerCase()} pain ${l.pain.severity}/10` : null,
                ]
                  .filter(Boolean)
                  .join(" · ")}
              </p>
              {l.note ? <p className="text-sm text-ink-600">“{l.note}”</p> : null}
              <p className="text-xs text-ink-500" data-testid="athlete-log-lock">
                {l.locked ? `Closed to the athlete since ${l.until}.` : `Open to the athlete until ${l.until}.`}
              </p>
            </div>
            {l.locked ? (
              canReopen ? (
                <ReopenLogButton sessionId={l.sessionId} title={l.title} />
              ) : (
                <Badge>Closed</Badge>
              )
            ) : null}
          </li>
        ))}
      </ul>
    </Card>
  );
}
