import type { AcwrMethod } from "./types";

export const ACUTE_DAYS = 7;
export const CHRONIC_DAYS = 28;
/** Ratios from fewer days on record than this are provisional (a design choice; no published rule, lib/load/README.md §6). */
export const ACWR_MIN_HISTORY_DAYS = 28;

/** λ = 2 / (N + 1), Williams et al. 2017, BJSM 51:209. */
export function ewmaLambda(n: number): number {
  return 2 / (n + 1);
}

/**
 * EWMA_t = λ·load_t + (1 − λ)·EWMA_{t−1} (Williams et al. 2017), seeded with the first value: the one seed the
 * app uses (lib/load/README.md §6), the same as pandas `ewm(span=N, adjust=False)`.
 */
function ewmaInto(values: ArrayLike<number>, n: number, out: Float64Array): Float64Array {
  const len = values.length;
  if (len === 0) return out;
  const lambda = ewmaLambda(n);
  const keep = 1 - lambda;
  let e = values[0];
  out[0] = e;
  for (let i = 1; i < len; i++) {
    e = lambda * values[i] + keep * e;
    out[i] = e;
  }
  return out;
}

export function ewma(values: ArrayLike<number>, n: number): Float64Array {
  return ewmaInto(values, n, new Float64Array(values.length));
}

export interface AcwrColumns {
  acute: Float64Array;
  chronic: Float64Array;
  /** NaN where there is no ratio (chronic 0 or an empty window). */
  ratio: Float64Array;
}

export function allocAcwrColumns(length: number): AcwrColumns {
  return { acute: new Float64Array(length), chronic: new Float64Array(length), ratio: new Float64Array(length) };
}

/**
 * Hot path. Rolling windows use prefix sums, so a window of rest days is exactly 0 (a running sum with
 * subtraction would leave rounding residue and invent ratios). Early days average the days available
 * (SQLite's AVG over a short frame does the same); the uncoupled chronic window is empty (0) before day 8.
 */
function acwrInto(
  values: ArrayLike<number>,
  method: AcwrMethod,
  out: AcwrColumns,
  prefix?: Float64Array,
  skip?: ArrayLike<number>,
): void {
  const n = values.length;
  const { acute, chronic, ratio } = out;
  if (n === 0) return;
  if (skip) {
    acwrSkipping(values, method, out, skip);
    return;
  }
  if (method === "ewma") {
    // Both recurrences (Williams et al. 2017) and the ratio in one pass; the same arithmetic as ewmaInto.
    const la = ewmaLambda(ACUTE_DAYS);
    const lc = ewmaLambda(CHRONIC_DAYS);
    // Seeded with the first day's load (lib/load/README.md §6).
    let a = values[0];
    let c = values[0];
    for (let i = 0; i < n; i++) {
      if (i > 0) {
        const x = values[i];
        a = la * x + (1 - la) * a;
        c = lc * x + (1 - lc) * c;
      }
      acute[i] = a;
      chronic[i] = c;
      ratio[i] = c > 0 ? a / c : Number.NaN;
    }
    return;
  }
  const s = prefix && prefix.length >= n + 1 ? prefix : new Float64Array(n + 1);
  s[0] = 0;
  for (let i = 0; i < n; i++) s[i + 1] = s[i] + values[i];
  const coupled = method === "rolling_coupled";
  for (let i = 0; i < n; i++) {
    const a0 = i + 1 > ACUTE_DAYS ? i + 1 - ACUTE_DAYS : 0;
    const a = (s[i + 1] - s[a0]) / (i + 1 - a0);
    const c0 = i + 1 > CHRONIC_DAYS ? i + 1 - CHRONIC_DAYS : 0;
    let c: number;
    if (coupled) {
      // Hulin et al. 2016: chronic = mean of the last 28 days, this week included.
      c = (s[i + 1] - s[c0]) / (i + 1 - c0);
    } else {
      // Lolli 2019 / Gabbett 2019: chronic = mean of days t−27 … t−7 (the three weeks before the acute week).
      const end = i - ACUTE_DAYS + 1; // exclusive index
      c = end > c0 ? (s[end] - s[c0]) / (end - c0) : 0;
    }
    acute[i] = a;
    chronic[i] = c;
    ratio[i] = c > 0 ? a / c : Number.NaN;
  }
}

/**
 * acwrInto with days left out (skip[i] = 1: a missing log under settings.missingLogs "exclude", lib/load/README.md
 * §11.3): the EWMA carries over a left-out day unchanged (and is seeded on the first day kept); rolling means
 * average the kept days of each window only. A window with no kept day has no ratio.
 */
function acwrSkipping(values: ArrayLike<number>, method: AcwrMethod, out: AcwrColumns, skip: ArrayLike<number>): void {
  const n = values.length;
  const { acute, chronic, ratio } = out;
  if (method === "ewma") {
    const la = ewmaLambda(ACUTE_DAYS);
    const lc = ewmaLambda(CHRONIC_DAYS);
    let a = 0;
    let c = 0;
    let seeded = false;
    for (let i = 0; i < n; i++) {
      const x = values[i];
      if (!skip[i]) {
        if (!seeded) {
          a = x;
          c = x;
          seeded = true;
        } else {
          a = la * x + (1 - la) * a;
          c = lc * x + (1 - lc) * c;
        }
      }
      acute[i] = a;
      chronic[i] = c;
      ratio[i] = seeded && c > 0 ? a / c : Number.NaN;
    }
    return;
  }
  const s = new Float64Array(n + 1);
  const k = new Float64Array(n + 1);
  for (let i = 0; i < n; i++) {
    const kept = skip[i] ? 0 : 1;
    s[i + 1] = s[i] + kept * values[i];
    k[i + 1] = k[i] + kept;
  }
  const mean = (from: number, to: number) => (k[to] - k[from] > 0 ? (s[to] - s[from]) / (k[to] - k[from]) : Number.NaN);
  const coupled = method === "rolling_coupled";
  for (let i = 0; i < n; i++) {
    const a = mean(i + 1 > ACUTE_DAYS ? i + 1 - ACUTE_DAYS : 0, i + 1);
    const c0 = i + 1 > CHRONIC_DAYS ? i + 1 - CHRONIC_DAYS : 0;
    const end = i - ACUTE_DAYS + 1;
    const c = coupled ? mean(c0, i + 1) : end > c0 ? mean(c0, end) : 0;
    acute[i] = Number.isFinite(a) ? a : 0;
    chronic[i] = Number.isFinite(c) ? c : 0;
    ratio[i] = Number.isFinite(a) && c > 0 ? a / c : Number.NaN;
  }
}

/**
 * The ACWR of a series that starts on the athlete's first day on record (`first`, an index into values):
 * days before it have no ratio (acute and chronic 0), and the EWMA is seeded with day `first`'s load
 * (lib/load/README.md §5–§6). null = nothing on record, so no ratio anywhere. Every caller goes through here,
 * so a day's ratio never depends on how far back the caller's columns reach.
 */
export function acwrFromFirstDay(
  values: Float64Array,
  method: AcwrMethod,
  out: AcwrColumns,
  first: number | null,
  prefix?: Float64Array,
  skip?: Uint8Array,
): void {
  const n = values.length;
  const from = first === null ? n : Math.max(0, Math.min(n, first));
  out.acute.fill(0, 0, from);
  out.chronic.fill(0, 0, from);
  out.ratio.fill(Number.NaN, 0, from);
  if (from === n) return;
  acwrInto(
    values.subarray(from),
    method,
    { acute: out.acute.subarray(from), chronic: out.chronic.subarray(from), ratio: out.ratio.subarray(from) },
    prefix,
    skip ? skip.subarray(from) : undefined,
  );
}

export interface AcwrOptions {
  /**
   * Index of the first day with data on record; history counts from here (default 0). May be negative when
   * the data began before the series; null when there is no data at all (everything provisional).
   */
  firstDataIndex?: number | null;
  minHistoryDays?: number;
}

export interface AcwrSeries {
  acute: Float64Array;
  chronic: Float64Array;
  /** null when chronic is 0 (never Infinity or NaN). */
  ratio: (number | null)[];
  /** true while fewer than 28 days of history stand behind the ratio. */
  provisional: boolean[];
}

/** Fewer than minHistoryDays of history behind day i; firstDataIndex null = no data on record. */
function isProvisional(i: number, firstDataIndex: number | null, minHistoryDays = ACWR_MIN_HISTORY_DAYS): boolean {
  return firstDataIndex === null || i - firstDataIndex + 1 < minHistoryDays;
}

/** Fills out[i] with 1 where day i's ratio is provisional. */
export function markProvisional(
  out: Uint8Array,
  firstDataIndex: number | null,
  minHistoryDays = ACWR_MIN_HISTORY_DAYS,
): void {
  for (let i = 0; i < out.length; i++) out[i] = isProvisional(i, firstDataIndex, minHistoryDays) ? 1 : 0;
}

export function acwrSeries(values: ArrayLike<number>, method: AcwrMethod, options: AcwrOptions = {}): AcwrSeries {
  const n = values.length;
  const cols = allocAcwrColumns(n);
  acwrInto(values, method, cols);
  const first = options.firstDataIndex === undefined ? 0 : options.firstDataIndex;
  const minDays = options.minHistoryDays ?? ACWR_MIN_HISTORY_DAYS;
  const ratio: (number | null)[] = new Array(n);
  const provisional: boolean[] = new Array(n);
  for (let i = 0; i < n; i++) {
    const r = cols.ratio[i];
    ratio[i] = Number.isFinite(r) ? r : null;
    provisional[i] = isProvisional(i, first, minDays);
  }
  return { acute: cols.acute, chronic: cols.chronic, ratio, provisional };
}

function safeRatio(num: number, den: number): number | null {
  const r = num / den;
  return den > 0 && Number.isFinite(r) ? r : null;
}

/** Weekly form, coupled: C = A / ((A + W1 + W2 + W3) / 4) (Hulin et al. 2016; written out in Lolli et al. 2019). */
export function coupledRatio(acute: number, w1: number, w2: number, w3: number): number | null {
  return safeRatio(acute, (acute + w1 + w2 + w3) / 4);
}

/** Weekly form, uncoupled: U = A / ((W1 + W2 + W3) / 3) (Lolli et al. 2019; Gabbett et al. 2019). */
export function uncoupledRatio(acute: number, w1: number, w2: number, w3: number): number | null {
  return safeRatio(acute, (w1 + w2 + w3) / 3);
}

/** Exact link between the two weekly forms: U = 3C / (4 − C) (derived, lib/load/README.md §6). */
export function uncoupledFromCoupled(c: number): number | null {
  return c < 4 ? (3 * c) / (4 - c) : null;
}

export function coupledFromUncoupled(u: number): number {
  return (4 * u) / (3 + u);
}
