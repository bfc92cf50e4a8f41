import "server-only";
import { addDays, isoWeekOf, shiftWeek, startOfWeek } from "@/lib/dates/plain-date";
import { teamToday, type TeamClock } from "@/lib/dates/zoned";
import type { TeamLoadSettings } from "@/lib/load/types";
import { seasonRow, type GridMeet, type LedgerWeekFigures, type SeasonRow } from "@/lib/season/season-grid";
import { getTeamClock } from "./load";
import { getLedgerWeeks } from "./load-ledger";
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

/** Every athlete's weeks from one read of the ledger and the sessions of the whole span, in the projected view. */
async function ledgerWeeks({ teamId, starts, today }: { teamId: number; starts: string[]; today: string }) {
  const { settings, athletes } = await getLedgerWeeks({ teamId, starts, today, view: "projected" });
  return {
    settings,
    athletes: athletes.map(({ weeks, ...athlete }) => ({
      athlete,
      weeks: starts.map((weekStart): LedgerWeekFigures => {
        const { week, flags, topLevel } = weeks.get(weekStart)!;
        return { ...week, flags, topLevel };
      }),
    })),
  };
}
