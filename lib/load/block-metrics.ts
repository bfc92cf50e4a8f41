import { metresAtOrAbove } from "./sprint-model";
import {
  DEFAULT_STEP_LENGTH,
  DEFAULT_TAU,
  DEFAULT_VMAX,
  type AthleteProfile,
  type BlockInput,
  type BlockKind,
  type ContactsByIntensity,
  type PlyoLevel,
  type TeamLoadSettings,
} from "./types";

export interface BlockMetrics {
  /** All running metres, run-in included. */
  runM: number;
  hsrM: number;
  nearMaxM: number;
  /** Running metres of sprint blocks (acceleration, max_velocity, speed_endurance); tempo excluded. */
  sprintM: number;
  /** Estimate: sprintM ÷ step length (steps in the acceleration are shorter, so this undercounts a little). */
  sprintSteps: number;
  contacts: ContactsByIntensity;
}

/** Profile with defaults filled in and the two speed thresholds precomputed (m/s). */
export interface ResolvedProfile {
  vmax: number;
  tau: number;
  stepLengthM: number;
  plyoLevel: PlyoLevel;
  hsrSpeed: number;
  nearMaxSpeed: number;
}

function positive(value: number | null | undefined, fallback: number): number {
  return typeof value === "number" && value > 0 && Number.isFinite(value) ? value : fallback;
}

/** Non-negative finite number, else 0: stored data should be validated, but maths never sees NaN. */
export function nonNeg(value: number | null | undefined): number {
  return typeof value === "number" && value > 0 && value < Number.POSITIVE_INFINITY ? value : 0;
}

export function resolveProfile(profile: AthleteProfile, settings: TeamLoadSettings): ResolvedProfile {
  const vmax = positive(profile.vmax, DEFAULT_VMAX);
  return {
    vmax,
    tau: positive(profile.tau, DEFAULT_TAU),
    stepLengthM: positive(profile.stepLengthM, DEFAULT_STEP_LENGTH),
    plyoLevel: profile.plyoLevel,
    hsrSpeed: nonNeg(settings.hsrSpeedMs),
    nearMaxSpeed: (nonNeg(settings.nearMaxPct) / 100) * vmax,
  };
}

// Accumulator slots: the series builder sums blocks into one reusable Float64Array instead of allocating.
export const SLOT_RUN = 0;
export const SLOT_HSR = 1;
export const SLOT_NEAR_MAX = 2;
export const SLOT_SPRINT = 3;
export const SLOT_STEPS = 4;
export const SLOT_LOW = 5;
export const SLOT_MODERATE = 6;
export const SLOT_HIGH = 7;
export const SLOT_SRPE = 8;
/** Highest intensityPct among running blocks actually run. */
export const SLOT_MAX_PCT = 9;
/** 1 when a max_velocity block or high-intensity contacts were done. */
export const SLOT_HIGH_INTENSITY = 10;
export const ACC_SIZE = 11;

function isRunningKind(kind: BlockKind): boolean {
  return kind === "acceleration" || kind === "max_velocity" || kind === "speed_endurance" || kind === "tempo";
}

/** Reps a block prescribes: sets×reps for running, total reps across drills for plyometrics. */
export function prescribedReps(block: BlockInput): number {
  if (isRunningKind(block.kind)) {
    const r = block.running;
    return r ? nonNeg(r.sets) * nonNeg(r.reps) : 0;
  }
  if (block.kind === "plyometric" && block.drills) {
    let total = 0;
    for (const d of block.drills) total += nonNeg(d.sets) * nonNeg(d.reps);
    return total;
  }
  return 0;
}

/**
 * Adds `scale` × the block's prescription into `acc`. Running data counts only on running kinds and drills
 * only on plyometric blocks, so form state left over from a kind change never leaks into the numbers.
 */
export function addBlockInto(acc: Float64Array, block: BlockInput, rp: ResolvedProfile, scale: number): void {
  if (!(scale > 0)) return;
  const kind = block.kind;
  if (isRunningKind(kind)) {
    const r = block.running;
    if (!r) return;
    const reps = nonNeg(r.sets) * nonNeg(r.reps) * scale;
    if (reps === 0) return;
    const pct = nonNeg(r.intensityPct);
    // Each rep is run from rest over run-in + distance, approaching pct% of vmax (a flying rep counts its run-in).
    const rep = { targetSpeed: (pct / 100) * rp.vmax, tau: rp.tau, totalDistance: nonNeg(r.runInM) + nonNeg(r.distanceM) };
    const run = rep.totalDistance * reps;
    acc[SLOT_RUN] += run;
    acc[SLOT_HSR] += metresAtOrAbove(rp.hsrSpeed, rep) * reps;
    acc[SLOT_NEAR_MAX] += metresAtOrAbove(rp.nearMaxSpeed, rep) * reps;
    if (kind !== "tempo") {
      acc[SLOT_SPRINT] += run;
      acc[SLOT_STEPS] += run / rp.stepLengthM;
    }
    if (pct > acc[SLOT_MAX_PCT]) acc[SLOT_MAX_PCT] = pct;
    if (kind === "max_velocity" && run > 0) acc[SLOT_HIGH_INTENSITY] = 1;
    return;
  }
  if (kind !== "plyometric" || !block.drills) return;
  for (const d of block.drills) {
    // NSCA (Potach & Chu): one contact per landing of one foot or both feet together.
    const contacts = nonNeg(d.sets) * nonNeg(d.reps) * nonNeg(d.contactsPerRep) * scale;
    if (contacts === 0) continue;
    if (d.intensity === "high") {
      acc[SLOT_HIGH] += contacts;
      acc[SLOT_HIGH_INTENSITY] = 1;
    } else if (d.intensity === "moderate") acc[SLOT_MODERATE] += contacts;
    else acc[SLOT_LOW] += contacts;
  }
}

export function contactsFromAcc(acc: Float64Array): ContactsByIntensity {
  const low = acc[SLOT_LOW], moderate = acc[SLOT_MODERATE], high = acc[SLOT_HIGH];
  return { low, moderate, high, total: low + moderate + high };
}

/** Whole-block metrics (all sets × reps) as prescribed. */
export function blockMetrics(block: BlockInput, profile: AthleteProfile, settings: TeamLoadSettings): BlockMetrics {
  const acc = new Float64Array(ACC_SIZE);
  addBlockInto(acc, block, resolveProfile(profile, settings), 1);
  return {
    runM: acc[SLOT_RUN],
    hsrM: acc[SLOT_HSR],
    nearMaxM: acc[SLOT_NEAR_MAX],
    sprintM: acc[SLOT_SPRINT],
    sprintSteps: acc[SLOT_STEPS],
    contacts: contactsFromAcc(acc),
  };
}
