import type { TimingTrialAnalysis } from "./timing-trial";

// What an accepted test puts into the athlete's speed profile (lib/speed/README.md §4). A value the test did not
// measure stays as it was in force on the test's date.

export type SpeedProfileValues = {
  vmaxMs: number | null;
  tauS: number | null;
  stepLengthM: number | null;
  f0N: number | null;
  pmaxW: number | null;
  stepFrequencyHz: number | null;
  contactTimeS: number | null;
  stanceForceBw: number | null;
};

export const PROFILE_VALUE_KEYS = [
  "vmaxMs",
  "tauS",
  "stepLengthM",
  "f0N",
  "pmaxW",
  "stepFrequencyHz",
  "contactTimeS",
  "stanceForceBw",
] as const satisfies readonly (keyof SpeedProfileValues)[];

/** The profile values a timing trial measured; null when it has no fit (nothing to accept). */
export function timingProfileValues(result: TimingTrialAnalysis): Partial<SpeedProfileValues> | null {
  if (!result.fit) return null;
  return {
    vmaxMs: result.fit.vmax,
    tauS: result.fit.tau,
    ...(result.profile ? { f0N: result.profile.f0N, pmaxW: result.profile.pmaxW } : {}),
  };
}

/** `measured` over `inForce`: each value the test measured replaces the one in force. */
export function mergeProfile(inForce: SpeedProfileValues, measured: Partial<SpeedProfileValues>): SpeedProfileValues {
  const out = { ...inForce };
  for (const k of PROFILE_VALUE_KEYS) {
    const v = measured[k];
    if (typeof v === "number" && Number.isFinite(v)) out[k] = v;
  }
  return out;
}

/** The entry in force on `date`: the latest whose first day is on or before it (lib/speed/README.md §4). */
export function entryInForce<E extends { effectiveFrom: string }>(entries: readonly E[], date: string): E | null {
  let found: E | null = null;
  for (const e of entries) if (e.effectiveFrom <= date && (!found || e.effectiveFrom > found.effectiveFrom)) found = e;
  return found;
}
