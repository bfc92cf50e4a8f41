import "server-only";
import { addDays, dayIndex, shiftWeek, startOfWeek } from "@/lib/dates/plain-date";
import { teamToday, type TeamClock } from "@/lib/dates/zoned";
import { planVersusActual, sumPlanActual, type PlanActualWeek } from "@/lib/load/plan-vs-actual";
import { ensureLedgerFresh, readLedgerRows } from "./ledger";
import { getLoadSeriesInputs, getTeamClock } from "./load";
import type { SquadWeekDto } from "./load-views";

type PlanActualAthleteDto = {
  id: number;
  name: string;
  groupName: string | null;
  /** One entry per week of `weeks`, oldest first. */
  weeks: PlanActualWeek[];
};

/** The chosen week (the last of `weeks`) framed as the squad week frames its own. */
export type PlanActualDto = Pick<
  SquadWeekDto,
  "weekStart" | "weekEnd" | "previousWeek" | "nextWeek" | "today" | "weekStartDay"
> & {
  /** First day of each week shown, oldest first. */
  weeks: string[];
  athletes: PlanActualAthleteDto[];
  /** The squad's figures of each week: every athlete added up. */
  squad: PlanActualWeek[];
};

/**
 * Plan versus actual of the squad (or some athletes) for `weeks` weeks ending with the week holding `week`
 * (lib/load/README.md §13): the ledger's planned and logged day values of those weeks, and the weeks' sessions
 * and logs for the session counts. The cost follows the weeks shown, not the history.
 */
export async function getPlanVersusActual({
  teamId,
  week,
  weeks,
  athleteIds,
  today,
  clock,
}: {
  teamId: number;
  week?: string;
  weeks: number;
  athleteIds?: readonly number[];
  today?: string;
  clock?: Omit<TeamClock, "teamId">;
}): Promise<PlanActualDto> {
  const probe = clock ?? (await getTeamClock({ teamId }));
  const now = today ?? teamToday({ timeZone: probe.timeZone, now: new Date() });
  const weekStart = startOfWeek(week ?? now, probe.weekStartDay);
  const weekStarts = Array.from({ length: weeks }, (_, i) => shiftWeek(weekStart, i - weeks + 1));
  const first = weekStarts[0];
  const last = addDays(weekStart, 6);
  await ensureLedgerFresh({ athleteIds });
  const inputs = await getLoadSeriesInputs({ teamId, athleteIds, from: first, through: last });
  const ids = inputs.athletes.map((a) => a.id);
  const rows = await readLedgerRows({ athleteIds: ids, from: dayIndex(first), to: dayIndex(last) });
  const todayDay = dayIndex(now);
  const athletes = inputs.athletes.map((a) => ({
    id: a.id,
    name: a.name,
    groupName: a.groupName,
    weeks: planVersusActual({ rows: rows.get(a.id) ?? [], sessions: a.sessions, logs: a.logs, weekStarts, todayDay }),
  }));
  return {
    weekStart,
    weekEnd: last,
    previousWeek: addDays(weekStart, -7),
    nextWeek: addDays(weekStart, 7),
    today: now,
    weekStartDay: probe.weekStartDay,
    weeks: weekStarts,
    athletes,
    squad: weekStarts.map((ws, i) => ({
      weekStart: ws,
      weekEnd: addDays(ws, 6),
      ...sumPlanActual(athletes.map((a) => a.weeks[i])),
    })),
  };
}
