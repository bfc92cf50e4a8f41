// One athlete's row of the season view: each week's figures against its phase's targets, and the forecast
// warnings over the weeks shown. Pure; the figures are the ledger's weeks, the same the week grid shows.
import { addDays } from "@/lib/dates/plain-date";
import type { Flag, FlagLevel } from "@/lib/load/flags";
import type { Metric, MetricValues } from "@/lib/load/types";
import type { MeetPriority, SeasonPhaseKind, TargetMetric } from "@/lib/domain/season";
import { forecastWarnings, type ForecastWarning, type Meet } from "./forecast-warnings";
import { checkTargets, type TargetCheck, type WeekTargets } from "./targets";

/** A week whose load falls by at least this share on the week before counts as an unload (common practice). */
const UNLOAD_DROP_PCT = 20;

export type GridPhase = {
  id: number;
  groupId: number | null;
  kind: SeasonPhaseKind;
  name: string;
  startsOn: string;
  endsOn: string;
  targets: WeekTargets;
};
export type GridMeet = Meet & { id: number; groupId: number | null; athleteId: number | null; priority: MeetPriority };

/** The ledger's week of one athlete, as getLedgerWeek answers it. */
export type LedgerWeekFigures = {
  weekStart: string;
  totals: MetricValues;
  changePct: Record<Metric, number | null>;
  peakRatio: number | null;
  ratioProvisional: boolean;
  flags: Flag[];
  topLevel: FlagLevel | null;
};

export type SeasonCell = {
  weekStart: string;
  /** The week lies before today's week: its figures are what was logged. */
  past: boolean;
  phaseId: number | null;
  totals: Record<TargetMetric, number>;
  ratio: number | null;
  ratioProvisional: boolean;
  /** Change of the ratio metric on the week before, %. */
  changePct: number | null;
  topLevel: FlagLevel | null;
  flagKinds: Flag["kind"][];
  targets: TargetCheck[];
  /** The figures are a preview of weeks not written yet. */
  preview?: boolean;
};

export type SeasonRow = { cells: SeasonCell[]; warnings: ForecastWarning[] };

/** The phase in force on a week's first day: the athlete's group's own phase first, then a team-wide one. */
export function phaseOfWeek(phases: readonly GridPhase[], groupId: number | null, weekStart: string): GridPhase | null {
  const covering = phases.filter((p) => p.startsOn <= weekStart && p.endsOn >= weekStart);
  return (
    covering.find((p) => groupId !== null && p.groupId === groupId) ?? covering.find((p) => p.groupId === null) ?? null
  );
}

/** Meets that concern the athlete: the team's, the athlete's group's and the athlete's own. */
function meetsOf(meets: readonly GridMeet[], athlete: { id: number; groupId: number | null }): GridMeet[] {
  return meets.filter(
    (m) =>
      (m.groupId === null && m.athleteId === null) ||
      m.athleteId === athlete.id ||
      (m.groupId !== null && m.groupId === athlete.groupId),
  );
}

type RowContext = {
  athlete: { id: number; groupId: number | null };
  phases: readonly GridPhase[];
  meets: readonly GridMeet[];
  acwrMetric: Metric;
  weeklyChangeLimitPct: number;
  /** First day of today's week. */
  currentWeekStart: string;
};

/** One week's cell: the ledger's figures against the phase in force. */
export function seasonCell(w: LedgerWeekFigures, ctx: Omit<RowContext, "meets" | "weeklyChangeLimitPct">): SeasonCell {
  const phase = phaseOfWeek(ctx.phases, ctx.athlete.groupId, w.weekStart);
  const totals = {
    hsrM: w.totals.hsrM,
    nearMaxM: w.totals.nearMaxM,
    contacts: w.totals.contacts,
    srpe: w.totals.srpe,
  };
  return {
    weekStart: w.weekStart,
    past: addDays(w.weekStart, 6) < ctx.currentWeekStart,
    phaseId: phase?.id ?? null,
    totals,
    ratio: w.peakRatio,
    ratioProvisional: w.ratioProvisional,
    changePct: w.changePct[ctx.acwrMetric],
    topLevel: w.topLevel,
    flagKinds: [...new Set(w.flags.map((f) => f.kind))],
    targets: phase ? checkTargets(totals, phase.targets) : [],
  };
}

/** The forecast warnings over a row's cells (only future weeks are warned). */
export function rowWarnings(cells: readonly SeasonCell[], ctx: RowContext): ForecastWarning[] {
  const forecast = cells.map((c) => {
    const phase = ctx.phases.find((p) => p.id === c.phaseId);
    return {
      weekStart: c.weekStart,
      acwr: c.ratio,
      weeklyChangePct: c.changePct,
      unload: c.changePct !== null && c.changePct <= -UNLOAD_DROP_PCT,
      taper: phase?.kind === "taper",
    };
  });
  // Warnings look back a week (the week before a taper or after an unload) but only future weeks are warned.
  return forecastWarnings(forecast, meetsOf(ctx.meets, ctx.athlete), ctx.weeklyChangeLimitPct).filter(
    (w) => w.weekStart >= ctx.currentWeekStart,
  );
}

export function seasonRow(input: RowContext & { weeks: readonly LedgerWeekFigures[] }): SeasonRow {
  const cells = input.weeks.map((w) => seasonCell(w, input));
  return { cells, warnings: rowWarnings(cells, input) };
}
