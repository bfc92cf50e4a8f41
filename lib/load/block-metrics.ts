import {
  ACC_SIZE,
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
import type { AthleteProfile, BlockInput, ContactsByIntensity, TeamLoadSettings } from "./types";

export { nonNeg, prescribedReps, resolveProfile, type ResolvedProfile } from "./accumulate";

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
