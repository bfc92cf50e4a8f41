import { DEFAULT_STEP_LENGTH, DEFAULT_TAU, DEFAULT_VMAX, type AthleteProfile, type PlyoLevel } from "@/lib/load/types";

function median(values: number[]): number | null {
  if (values.length === 0) return null;
  const s = [...values].sort((a, b) => a - b);
  const mid = Math.floor(s.length / 2);
  return s.length % 2 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
}

function mode(levels: PlyoLevel[]): PlyoLevel {
  const counts = new Map<PlyoLevel, number>();
  for (const l of levels) counts.set(l, (counts.get(l) ?? 0) + 1);
  let best: PlyoLevel = "intermediate";
  let n = 0;
  for (const [l, c] of counts) if (c > n) [best, n] = [l, c];
  return best;
}

/**
 * The squad's "typical athlete" for the template preview: the median tested vmax, τ and step length (the
 * engine's documented defaults when nobody is tested) and the most common plyometric level.
 */
export function typicalProfile(profiles: readonly AthleteProfile[]): AthleteProfile & { tested: boolean } {
  const pick = (f: (p: AthleteProfile) => number | null) =>
    median(profiles.map(f).filter((v): v is number => typeof v === "number" && v > 0));
  const vmax = pick((p) => p.vmax);
  return {
    vmax: vmax ?? DEFAULT_VMAX,
    tau: pick((p) => p.tau) ?? DEFAULT_TAU,
    stepLengthM: pick((p) => p.stepLengthM) ?? DEFAULT_STEP_LENGTH,
    plyoLevel: mode(profiles.map((p) => p.plyoLevel)),
    tested: vmax !== null,
  };
}
