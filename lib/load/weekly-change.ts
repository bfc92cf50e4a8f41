/** Tolerance for threshold comparisons, so a value that prints as exactly the threshold is judged as equal. */
const THRESHOLD_EPSILON = 1e-9;

/** Δ% = (W_t − W_{t−1}) / W_{t−1} × 100; null when last week was 0 (undefined). Multiplying first keeps 15 exact. */
export function weeklyChangePct(prev: number, cur: number): number | null {
  if (prev === 0 || !Number.isFinite(prev) || !Number.isFinite(cur)) return null;
  return ((cur - prev) * 100) / prev;
}

/** Strictly greater than the limit (Harrison & Johnston 2017 spike band starts at 15%; exactly 15% passes). */
export function exceedsWeeklyLimit(changePct: number | null, limitPct: number): boolean {
  return changePct !== null && changePct - limitPct > THRESHOLD_EPSILON;
}

export function atOrAbove(value: number, threshold: number): boolean {
  return value - threshold >= -THRESHOLD_EPSILON;
}
