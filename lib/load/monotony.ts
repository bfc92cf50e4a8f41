// Monotony = daily mean ÷ SD over a week; strain = weekly load × monotony (Foster 1998, MSSE 30:1164).
// Foster does not say which SD [from memory]; the app uses the population SD (numpy's ddof=0) by default.

export type SdType = "population" | "sample";
export const DEFAULT_SD_TYPE: SdType = "population";

/** SD this small relative to the mean is treated as 0: identical days must not divide by rounding noise. */
const RELATIVE_ZERO = 1e-12;

/** Value at i, with days outside the column counting as 0 (no data there). */
function at(col: ArrayLike<number>, i: number): number {
  return i >= 0 && i < col.length ? col[i] : 0;
}

/**
 * Monotony of the `days` values col[from … from + days − 1]; null when the SD is 0 (identical days,
 * e.g. a week of rest) or there are too few days for the SD type. Days with skip[i] = 1 are left out (a missing
 * log under settings.missingLogs "exclude", lib/load/README.md §11.3): the mean and SD are over the days kept.
 */
export function monotonyOfWindow(
  col: ArrayLike<number>,
  from: number,
  days: number,
  sd: SdType = DEFAULT_SD_TYPE,
  skip?: ArrayLike<number>,
): number | null {
  const kept = (i: number) => !skip || !(from + i >= 0 && from + i < skip.length && skip[from + i]);
  let count = 0;
  for (let i = 0; i < days; i++) if (kept(i)) count++;
  const dof = sd === "sample" ? count - 1 : count;
  if (count <= 0 || dof <= 0) return null;
  let sum = 0;
  for (let i = 0; i < days; i++) if (kept(i)) sum += at(col, from + i);
  const mean = sum / count;
  let ss = 0;
  for (let i = 0; i < days; i++) {
    if (!kept(i)) continue;
    const d = at(col, from + i) - mean;
    ss += d * d;
  }
  const s = Math.sqrt(ss / dof);
  return s > RELATIVE_ZERO * Math.max(1, Math.abs(mean)) ? mean / s : null;
}

export function monotony(week: ArrayLike<number>, sd: SdType = DEFAULT_SD_TYPE): number | null {
  return monotonyOfWindow(week, 0, week.length, sd);
}

export function strain(week: ArrayLike<number>, sd: SdType = DEFAULT_SD_TYPE): number | null {
  const m = monotony(week, sd);
  if (m === null) return null;
  let sum = 0;
  for (let i = 0; i < week.length; i++) sum += week[i];
  return sum * m;
}
