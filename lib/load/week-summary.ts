import { dateFromDayIndex, dayIndex } from "./dates";
import { DEFAULT_SD_TYPE, monotonyOfWindow, type SdType } from "./monotony";
import { metricRecord } from "./metric-record";
import type { AcwrMethod, Metric, MetricValues, TeamLoadSettings } from "./types";
import { weeklyChangePct } from "./weekly-change";

export interface WeekSummary {
  weekStart: string;
  weekEnd: string;
  totals: MetricValues;
  previousTotals: MetricValues;
  changePct: Record<Metric, number | null>;
  /** Foster 1998 monotony of the week's 7 daily values, population SD by default; null when SD = 0. */
  monotony: Record<Metric, number | null>;
  strain: Record<Metric, number | null>;
  sdType: SdType;
  acwrMetric: Metric;
  acwrMethod: AcwrMethod;
  /** Highest ACWR of acwrMetric in the week; null when no day has a ratio. */
  peakRatio: number | null;
  peakRatioDate: string | null;
  ratioProvisional: boolean;
  /** Days of the week with a published session before today and no log. */
  missingDays: number;
}

/** Sum of col[from..to) with indices outside the array counting as 0 (no data there). */
export function sumWindow(col: ArrayLike<number>, from: number, to: number): number {
  let s = 0;
  const a = Math.max(0, from);
  const b = Math.min(col.length, to);
  for (let i = a; i < b; i++) s += col[i];
  return s;
}

export function ratioAt(ratio: ArrayLike<number | null>, i: number): number | null {
  const r = ratio[i];
  return typeof r === "number" && Number.isFinite(r) ? r : null;
}

/** Day of the highest ratio in [from, to); null when none of those days has a ratio. */
export function peakRatioIn(
  ratio: ArrayLike<number | null>,
  from: number,
  to: number,
): { index: number; value: number } | null {
  let best: { index: number; value: number } | null = null;
  for (let i = Math.max(0, from); i < Math.min(ratio.length, to); i++) {
    const r = ratioAt(ratio, i);
    if (r !== null && (best === null || r > best.value)) best = { index: i, value: r };
  }
  return best;
}

export interface WeekSummaryInput {
  /** Date of index 0 of every array below. */
  firstDate: string;
  values: Record<Metric, ArrayLike<number>>;
  /** ACWR of settings.acwrMetric; NaN or null = no ratio. */
  ratio: ArrayLike<number | null>;
  provisional: ArrayLike<number | boolean>;
  missing?: ArrayLike<number>;
  settings: TeamLoadSettings;
  weekStart: string;
  sdType?: SdType;
}

export function summariseWeek(input: WeekSummaryInput): WeekSummary {
  const { values, ratio, provisional, missing, settings } = input;
  const sdType = input.sdType ?? DEFAULT_SD_TYPE;
  const w = dayIndex(input.weekStart) - dayIndex(input.firstDate);
  const totals = metricRecord((m) => sumWindow(values[m], w, w + 7));
  const previousTotals = metricRecord((m) => sumWindow(values[m], w - 7, w));
  const mono = metricRecord((m) => monotonyOfWindow(values[m], w, 7, sdType));
  const peak = peakRatioIn(ratio, w, w + 7);
  return {
    weekStart: input.weekStart,
    weekEnd: dateFromDayIndex(dayIndex(input.weekStart) + 6),
    totals,
    previousTotals,
    changePct: metricRecord((m) => weeklyChangePct(previousTotals[m], totals[m])),
    monotony: mono,
    // Strain = weekly load × monotony (Foster 1998).
    strain: metricRecord((m) => {
      const mo = mono[m];
      return mo === null ? null : totals[m] * mo;
    }),
    sdType,
    acwrMetric: settings.acwrMetric,
    acwrMethod: settings.acwrMethod,
    peakRatio: peak ? peak.value : null,
    peakRatioDate: peak ? dateFromDayIndex(dayIndex(input.firstDate) + peak.index) : null,
    ratioProvisional: peak ? Boolean(provisional[peak.index]) : true,
    missingDays: missing ? sumWindow(missing, w, w + 7) : 0,
  };
}
