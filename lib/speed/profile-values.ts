import type { SpeedTestKind } from "@/lib/domain/speed";
import type { ContactRowsAnalysis, ForceTraceAnalysis } from "./contact-analysis";
import type { SpeedTraceAnalysis } from "./speed-trace";
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
function timingProfileValues(result: TimingTrialAnalysis): Partial<SpeedProfileValues> | null {
  if (!result.fit) return null;
  return {
    vmaxMs: result.fit.vmax,
    tauS: result.fit.tau,
    ...(result.profile ? { f0N: result.profile.f0N, pmaxW: result.profile.pmaxW } : {}),
  };
}

/**
 * The profile values any kind of test measured (lib/speed/README.md §4, §9); null when it has nothing to accept.
 * A speed trace gives its smoothed vmax and fitted τ; contact files and running force traces the step
 * frequency, contact time and mean stance force (and a mat's step length); a jump gives none of these.
 */
export function measuredProfileValues(kind: SpeedTestKind, result: unknown): Partial<SpeedProfileValues> | null {
  if (kind === "timing") return timingProfileValues(result as TimingTrialAnalysis);
  if (kind === "trace") {
    const r = result as SpeedTraceAnalysis;
    return r.fit ? { vmaxMs: r.vmaxMs, tauS: r.fit.tau } : null;
  }
  if (kind === "contacts") {
    const r = result as ContactRowsAnalysis | null;
    if (!r) return null;
    return {
      stepFrequencyHz: r.means.stepFrequencyHz,
      contactTimeS: r.means.contactTimeS,
      stanceForceBw: r.means.stanceForceBw,
      ...(r.means.stepLengthM ? { stepLengthM: r.means.stepLengthM } : {}),
    };
  }
  const r = result as ForceTraceAnalysis;
  if (r.mode !== "contacts" || r.means.contactTimeS === null) return null;
  return {
    contactTimeS: r.means.contactTimeS,
    ...(r.means.stepFrequencyHz ? { stepFrequencyHz: r.means.stepFrequencyHz } : {}),
    ...(r.means.meanBw ? { stanceForceBw: r.means.meanBw } : {}),
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
