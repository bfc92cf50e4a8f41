import {
  ACC_SIZE,
  SLOT_ABS_HSR,
  SLOT_ABS_SPRINT,
  SLOT_REL_HSR,
  SLOT_REL_MAX,
  SLOT_REL_NEAR,
  SLOT_HIGH,
  SLOT_HSR,
  SLOT_LOW,
  SLOT_MODERATE,
  SLOT_NEAR_MAX,
  SLOT_RUN,
  SLOT_SPRINT,
  SLOT_STEPS,
  addBlockInto,
  resolveProfile,
} from "./accumulate";
import { weightedContacts } from "./plyo";
import type { AthleteProfile, BlockInput, ContactsByIntensity, SpeedBands, TeamLoadSettings } from "./types";

export { prescribedReps, resolveProfile } from "./accumulate";

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
  bands: SpeedBands;
}

/**
 * Numeric fields start as a fractional placeholder so the literal's hidden class holds doubles from the
 * start: widening it from small integers on the first fractional (partly logged) count deoptimised callers.
 */
export function contactsFromAcc(acc: Float64Array): ContactsByIntensity {
  const out = { low: 0.5, moderate: 0.5, high: 0.5, total: 0.5, weighted: 0.5 };
  out.low = acc[SLOT_LOW];
  out.moderate = acc[SLOT_MODERATE];
  out.high = acc[SLOT_HIGH];
  out.total = out.low + out.moderate + out.high;
  out.weighted = weightedContacts(out.low, out.moderate, out.high);
  return out;
}

export function bandsFromAcc(acc: Float64Array): SpeedBands {
  return {
    absHsrM: acc[SLOT_ABS_HSR],
    absSprintM: acc[SLOT_ABS_SPRINT],
    relHsrM: acc[SLOT_REL_HSR],
    relNearMaxM: acc[SLOT_REL_NEAR],
    relMaximalM: acc[SLOT_REL_MAX],
  };
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
    bands: bandsFromAcc(acc),
  };
}
