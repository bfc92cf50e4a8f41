import "server-only";
import { addDays, dayIndex, startOfWeek } from "@/lib/dates/plain-date";
import { teamToday, type TeamClock } from "@/lib/dates/zoned";
import { toWireRows, type ProgressionBase } from "@/lib/season/forecast-preview";
import { ensureLedgerFresh, readLedgerRows } from "./ledger";
import { getLoadSeriesInputs, getTeamClock } from "./load";
import { MAX_LOOK_BACK_DAYS } from "./load-ledger";
import { loadSessionsBetween } from "./plan-rows";

/**
 * What the season screen previews a progression from (lib/season/forecast-preview.ts): the source week's sessions,
 * and for each athlete in it the stored ledger rows the first generated week's window needs and the sessions from
 * its recovery look-back to `through`. A few dozen rows per athlete, whatever the history.
 */
export async function getProgressionBase({
  teamId,
  sourceWeek,
  firstWeek,
  through,
  clock,
}: {
  teamId: number;
  sourceWeek: string;
  firstWeek: string;
  through: string;
  clock?: Omit<TeamClock, "teamId">;
}): Promise<ProgressionBase> {
  const probe = clock ?? (await getTeamClock({ teamId }));
  const today = teamToday({ timeZone: probe.timeZone, now: new Date() });
  const sourceWeekStart = startOfWeek(sourceWeek, probe.weekStartDay);
  const firstWeekStart = startOfWeek(firstWeek, probe.weekStartDay);
  const last = through < firstWeekStart ? addDays(firstWeekStart, 6) : through;
  await ensureLedgerFresh({});
  const source = (await loadSessionsBetween({ teamId, from: sourceWeekStart, to: addDays(sourceWeekStart, 6) })).map(
    (l) => l.dto,
  );
  const athleteIds = [...new Set(source.filter((s) => s.status !== "cancelled").map((s) => s.athleteId))];
  const firstDay = dayIndex(firstWeekStart);
  const [inputs, rows] = await Promise.all([
    getLoadSeriesInputs({
      teamId,
      athleteIds,
      from: addDays(firstWeekStart, -MAX_LOOK_BACK_DAYS),
      through: last,
    }),
    // The window of the first week reads stored states from 28 days before the earlier of its week before and today.
    readLedgerRows({ athleteIds, from: Math.min(firstDay - 7, dayIndex(today)), to: firstDay - 1 }),
  ]);
  return {
    today,
    sourceWeekStart,
    firstWeekStart,
    through: last,
    settings: inputs.settings,
    source,
    athletes: inputs.athletes.map((a) => ({
      id: a.id,
      profile: a.profile,
      rows: toWireRows(rows.get(a.id) ?? [], firstDay, dayIndex(today)),
      sessions: a.sessions,
      logs: a.logs,
    })),
  };
}
