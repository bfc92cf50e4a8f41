// Monotony = daily mean ÷ SD over a week; strain = weekly load × monotony (Foster 1998, MSSE 30:1164).
// Foster does not say which SD [from memory]; the app uses the population SD (numpy's ddof=0) by default.

export type SdType = "population" | "sample";
export const DEFAULT_SD_TYPE: SdType = "population";

/** SD this small relative to the mean is treated as 0: identical days must not divide by rounding noise. */
const RELATIVE_ZERO = 1e-12;

function meanAndSd(week: ArrayLike<number>, sd: SdType): { sum: number; mean: number; sd: number } | null {
  const n = week.length;
  const dof = sd === "sample" ? n - 1 : n;
  if (n === 0 || dof <= 0) return null;
  let sum = 0;
  for (let i = 0; i < n; i++) sum += week[i];
  const mean = sum / n;
  let ss = 0;
  for (let i = 0; i < n; i++) {
    const d = week[i] - mean;
    ss += d * d;
  }
  return { sum, mean, sd: Math.sqrt(ss / dof) };
}

/** null when the SD is 0 (identical days, e.g. a week of rest) or the week is too short. */
export function monotony(week: ArrayLike<number>, sd: SdType = DEFAULT_SD_TYPE): number | null {
  const s = meanAndSd(week, sd);
  if (!s || !(s.sd > RELATIVE_ZERO * Math.max(1, Math.abs(s.mean)))) return null;
  return s.mean / s.sd;
}

export function strain(week: ArrayLike<number>, sd: SdType = DEFAULT_SD_TYPE): number | null {
  const m = monotony(week, sd);
  if (m === null) return null;
  let sum = 0;
  for (let i = 0; i < week.length; i++) sum += week[i];
  return sum * m;
}
