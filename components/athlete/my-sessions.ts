import "server-only";
import { listAthleteSessions } from "@/lib/data/calendar-tokens";
import { painReportsBySession } from "@/lib/data/pain-reports";
import { listRestrictions } from "@/lib/data/restrictions";
import { medicalChangesFor } from "@/lib/data/session-conflicts";
import { zonedLabel } from "@/lib/dates/zoned";
import { formatDayLong } from "@/lib/format/dates";
import { describeRestriction, isActiveOn, restrictionHits } from "@/lib/restrictions/rules";
import { sessionLogLock } from "@/lib/services/session-logs";
import type { MySession } from "./my-session";

/** The athlete's published and cancelled sessions between two days, with their logs, pain, lock and limits. */
export async function listMySessions({
  teamId,
  athleteId,
  from,
  to,
  today,
  timeZone,
  now,
}: {
  teamId: number;
  athleteId: number;
  from: string;
  to: string;
  today: string;
  timeZone: string;
  now: Date;
}): Promise<MySession[]> {
  const sessions = await listAthleteSessions({ teamId, athleteId, from, to });
  const [pain, restrictions, changed] = await Promise.all([
    painReportsBySession({ sessionIds: sessions.map((s) => s.sessionId) }),
    listRestrictions({ teamId, athleteIds: [athleteId], from }),
    medicalChangesFor({ teamId, athleteId, from }),
  ]);
  return Promise.all(
    sessions.map(async (s): Promise<MySession> => {
      const report = pain.get(s.sessionId);
      let logState: MySession["logState"] = s.status === "cancelled" ? "cancelled" : s.date > today ? "ahead" : "open";
      let lockLabel: string | null = null;
      if (logState === "open") {
        const lock = await sessionLogLock({ target: { ...s, id: s.sessionId }, clock: { now, timeZone } });
        const at = zonedLabel({ instant: lock.locksAt, timeZone });
        const when = `${formatDayLong(at.date)} at ${at.time}`;
        if (lock.locked) {
          logState = "locked";
          lockLabel = `This log closed on ${when}, 48 hours after the session. Ask your coach to reopen it.`;
        } else lockLabel = `You can change this log until ${when}.`;
      }
      return {
        sessionId: s.sessionId,
        date: s.date,
        startTime: s.startTime,
        durationMin: s.durationMin,
        title: s.title,
        plannedRpe: s.plannedRpe,
        status: s.status,
        notes: s.notes ?? null,
        blocks: s.blocks,
        log: s.log,
        pain: report
          ? { region: report.region, severity: report.severity, stoppedSession: report.stoppedSession }
          : null,
        logState,
        lockLabel,
        restrictions: restrictions.filter((r) => isActiveOn(r, s.date)).map(describeRestriction),
        breaches: restrictionHits(restrictions, { athleteId, date: s.date, status: s.status, blocks: s.blocks }).map(
          (h) => h.detail,
        ),
        medicalChanges: changed.get(s.sessionId) ?? [],
      };
    }),
  );
}
