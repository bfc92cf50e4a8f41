import "server-only";
import { addDays, dayIndex, isoWeekOf, shiftWeek, startOfWeek } from "@/lib/dates/plain-date";
import { teamToday, type TeamClock } from "@/lib/dates/zoned";
import { ledgerMethod, ledgerReadRange, ledgerWindow } from "@/lib/load/ledger";
import { weekFromLedger } from "@/lib/load/ledger-week";
import type { TeamLoadSettings } from "@/lib/load/types";
import { seasonRow, type GridMeet, type LedgerWeekFigures, type SeasonRow } from "@/lib/season/season-grid";
import { ensureLedgerFresh, readLedgerRows } from "./ledger";
import { getLoadSeriesInputs, getTeamClock } from "./load";
import { listMeets, listPhases, type SeasonMeet, type SeasonPhase } from "./season";

export type SeasonViewDto = {
  from: string;
  today: string;
  currentWeekStart: string;
  weekStartDay: number;
  weeks: { weekStart: string; isoWeek: number }[];
  settings: Pick<TeamLoadSettings, "acwrMetric" | "acwrMethod" | "weeklyChangeLimitPct">;
  phases: SeasonPhase[];
  meets: SeasonMeet[];
  groups: { id: number; name: string }[];
  athletes: ({ id: number; name: string; groupId: number | null; groupName: string | null } & SeasonRow)[];
};

/**
 * The season view: weeks across, athletes down. Each week is the ledger's week in the projected view (logs up to
 * today, the plan from today on, drafts included), exactly what the week grid shows for it (lib/season/README.md).
 */
export async function getSeasonView({
  teamId,
  from,
  weeks,
  clock,
}: {
  teamId: number;
  from?: string;
  weeks: number;
  clock?: Omit<TeamClock, "teamId">;
}): Promise<SeasonViewDto> {
  const probe = clock ?? (await getTeamClock({ teamId }));
  const today = teamToday({ timeZone: probe.timeZone, now: new Date() });
  const currentWeekStart = startOfWeek(today, probe.weekStartDay);
  const first = startOfWeek(from ?? shiftWeek(currentWeekStart, -4), probe.weekStartDay);
  const starts = Array.from({ length: weeks }, (_, i) => shiftWeek(first, i));
  const last = addDays(starts[starts.length - 1], 6);
  const [phases, meets] = await Promise.all([
    listPhases({ teamId, from: first, to: last }),
    listMeets({ teamId, from: first, to: last }),
  ]);
  const { settings, athletes: inputs } = await ledgerWeeks({ teamId, starts, today });
  const groups = new Map<number, string>();
  const athletes = inputs.map(({ athlete: a, weeks: figures }) => {
    if (a.groupId !== null && a.groupName) groups.set(a.groupId, a.groupName);
    const row = seasonRow({
      athlete: a,
      weeks: figures,
      phases,
      meets: meets as GridMeet[],
      acwrMetric: settings.acwrMetric,
      weeklyChangeLimitPct: settings.weeklyChangeLimitPct,
      currentWeekStart,
    });
    return { id: a.id, name: a.name, groupId: a.groupId, groupName: a.groupName, ...row };
  });
  return {
    from: first,
    today,
    currentWeekStart,
    weekStartDay: probe.weekStartDay,
    weeks: starts.map((weekStart) => ({ weekStart, isoWeek: isoWeekOf(weekStart).week })),
    settings: {
      acwrMetric: settings.acwrMetric,
      acwrMethod: settings.acwrMethod,
      weeklyChangeLimitPct: settings.weeklyChangeLimitPct,
    },
    phases,
    meets,
    groups: [...groups].map(([id, name]) => ({ id, name })),
    athletes,
  };
}

/** The most days before a week the recovery rule can look back (recoveryHours is at most 120 h). */
const MAX_LOOK_BACK_DAYS = 6;

/**
 * Every athlete's weeks from one read of the ledger and the sessions of the whole span (lib/load/README.md §12):
 * each week is weekFromLedger over one window, in the projected view, as getLedgerWeek answers it week by week.
 */
async function ledgerWeeks({ teamId, starts, today }: { teamId: number; starts: string[]; today: string }) {
  const first = starts[0];
  const last = addDays(starts[starts.length - 1], 6);
  await ensureLedgerFresh({});
  const inputs = await getLoadSeriesInputs({ teamId, from: addDays(first, -MAX_LOOK_BACK_DAYS - 7), through: last });
  const todayDay = dayIndex(today);
  const fromDay = dayIndex(first) - 7;
  const toDay = dayIndex(last);
  const ids = inputs.athletes.map((a) => a.id);
  const rows = await readLedgerRows({ athleteIds: ids, ...ledgerReadRange(fromDay, toDay, todayDay) });
  const method = ledgerMethod(inputs.settings);
  return {
    settings: inputs.settings,
    athletes: inputs.athletes.map((a) => {
      const window = ledgerWindow({ rows: rows.get(a.id) ?? [], fromDay, toDay, todayDay, view: "projected", method });
      const weeks = starts.map((weekStart): LedgerWeekFigures => {
        const { week, flags, topLevel } = weekFromLedger({
          window,
          sessions: a.sessions,
          logs: a.logs,
          profile: a.profile,
          settings: inputs.settings,
          view: "projected",
          todayDay,
          weekStartDay: dayIndex(weekStart),
        });
        return { ...week, flags, topLevel };
      });
      return { athlete: a, weeks };
    }),
  };
}
