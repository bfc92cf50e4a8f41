import { dateFromDayIndex, dayIndex } from "@/lib/dates/plain-date";
import { DEFAULT_SD_TYPE, monotonyOfWindow, type SdType } from "./monotony";
import { metricRecord } from "./metric-record";
import type { AcwrMethod, ContactsByIntensity, Metric, MetricValues, SpeedBands, TeamLoadSettings } from "./types";
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
  /** The week's judged ACWR of acwrMetric (judgedPeak: non-provisional days first); null when no day has a ratio. */
  peakRatio: number | null;
  peakRatioDate: string | null;
  ratioProvisional: boolean;
  /** The ACWR of acwrMetric on each day of the week (null = none) and whether it is provisional. */
  dailyRatio: (number | null)[];
  dailyProvisional: boolean[];
  /** Days of the week with a published session before today and no log. */
  missingDays: number;
  /** Speed bands and contacts by intensity of the week's sessions (week-extras.ts), where the caller sums them. */
  bands?: SpeedBands;
  contactsByIntensity?: ContactsByIntensity;
}

/** Sum of col[from..to) with indices outside the array counting as 0 (no data there). */
export function sumWindow(col: ArrayLike<number>, from: number, to: number): number {
  let s = 0;
  const a = Math.max(0, from);
  const b = Math.min(col.length, to);
  for (let i = a; i < b; i++) s += col[i];
  return s;
}

function ratioAt(ratio: ArrayLike<number | null>, i: number): number | null {
  const r = ratio[i];
  return typeof r === "number" && Number.isFinite(r) ? r : null;
}

/**
 * Day of the highest ratio in [from, to); null when none of those days has a ratio. With `provisional` and
 * `early`, only days whose provisional mark equals `early` are looked at.
 */
export function peakRatioIn(
  ratio: ArrayLike<number | null>,
  from: number,
  to: number,
  provisional?: ArrayLike<number | boolean>,
  early?: boolean,
): { index: number; value: number } | null {
  let best: { index: number; value: number } | null = null;
  for (let i = Math.max(0, from); i < Math.min(ratio.length, to); i++) {
    if (provisional && Boolean(provisional[i]) !== early) continue;
    const r = ratioAt(ratio, i);
    if (r !== null && (best === null || r > best.value)) best = { index: i, value: r };
  }
  return best;
}

/**
 * The week's ratio as judged (lib/load/README.md §7): the highest on the days with a full history behind
 * them; only when the week has none of those, the highest early (provisional) one.
 */
export function judgedPeak(
  ratio: ArrayLike<number | null>,
  provisional: ArrayLike<number | boolean>,
  from: number,
  to: number,
): { index: number; value: number; provisional: boolean } | null {
  const settled = peakRatioIn(ratio, from, to, provisional, false);
  if (settled) return { ...settled, provisional: false };
  const early = peakRatioIn(ratio, from, to, provisional, true);
  return early ? { ...early, provisional: true } : null;
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
  // Missing logs left out (settings.missingLogs "exclude") are left out of the monotony too (README §11.3).
  const skip = settings.missingLogs === "exclude" ? missing : undefined;
  const mono = metricRecord((m) => monotonyOfWindow(values[m], w, 7, sdType, skip));
  const peak = judgedPeak(ratio, provisional, w, w + 7);
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
    ratioProvisional: peak ? peak.provisional : true,
    dailyRatio: Array.from({ length: 7 }, (_, i) => (w + i >= 0 ? ratioAt(ratio, w + i) : null)),
    dailyProvisional: Array.from({ length: 7 }, (_, i) =>
      w + i >= 0 && w + i < provisional.length ? Boolean(provisional[w + i]) : true,
    ),
    missingDays: missing ? sumWindow(missing, w, w + 7) : 0,
  };
}
