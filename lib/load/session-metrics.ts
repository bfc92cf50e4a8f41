import {
  ACC_SIZE,
  SLOT_HIGH,
  SLOT_HIGH_INTENSITY,
  SLOT_HSR,
  SLOT_LOW,
  SLOT_MAX_PCT,
  SLOT_MODERATE,
  SLOT_NEAR_MAX,
  SLOT_RUN,
  SLOT_SPRINT,
  SLOT_SRPE,
  SLOT_STEPS,
  addBlockInto,
  contactsFromAcc,
  nonNeg,
  prescribedReps,
  resolveProfile,
  type ResolvedProfile,
} from "./block-metrics";
import type {
  AthleteProfile,
  BlockInput,
  Completion,
  ContactsByIntensity,
  LogInput,
  MetricValues,
  SessionInput,
  TeamLoadSettings,
} from "./types";

export interface SessionMetrics {
  metrics: MetricValues;
  contactsByIntensity: ContactsByIntensity;
  /** Has a max_velocity block or high-intensity plyometric contacts (the recovery-window rule applies). */
  highIntensity: boolean;
  /** Highest intensityPct among running blocks (0 when none). */
  maxIntensityPct: number;
  /** All running metres, tempo and run-ins included. */
  runM: number;
}

/** Session load in AU = session RPE (CR-10) × duration in minutes (Foster et al. 2001, JSCR 15:109). */
export function srpe(rpe: number, minutes: number): number {
  return nonNeg(rpe) * nonNeg(minutes);
}

/** Share of the prescription a log without per-block reps stands for. */
export const COMPLETION_FACTOR: Record<Completion, number> = { yes: 1, partly: 0.5, no: 0 };

function blockScale(block: BlockInput, log: LogInput, factor: number): number {
  const done = log.completedReps;
  if (done && block.id !== undefined && Object.prototype.hasOwnProperty.call(done, block.id)) {
    const prescribed = prescribedReps(block);
    return prescribed > 0 ? nonNeg(done[block.id]) / prescribed : 0;
  }
  return factor;
}

/**
 * Fills `acc` (length ACC_SIZE, zeroed here) with one session's numbers: as planned when `log` is undefined,
 * else as logged. Logged rules:
 * - completion "no" counts the whole session as 0 (a logged rest, never "missing");
 * - a block listed in completedReps scales by done ÷ prescribed reps (not capped: extra reps were run);
 *   other blocks scale by the completion factor (yes 1, partly 0.5);
 * - sRPE = log.rpe × log.minutes; a null rpe falls back to the planned RPE and null minutes to
 *   planned duration × completion factor.
 */
export function evaluateSessionInto(
  acc: Float64Array,
  session: SessionInput,
  log: LogInput | undefined,
  rp: ResolvedProfile,
): void {
  acc.fill(0);
  const factor = log ? COMPLETION_FACTOR[log.completion] ?? 0 : 1;
  if (factor === 0 && log) return;
  for (const block of session.blocks) addBlockInto(acc, block, rp, log ? blockScale(block, log, factor) : 1);
  if (!log) {
    acc[SLOT_SRPE] = srpe(session.plannedRpe, session.durationMin);
    return;
  }
  const rpe = log.rpe ?? session.plannedRpe;
  const minutes = log.minutes ?? nonNeg(session.durationMin) * factor;
  acc[SLOT_SRPE] = srpe(rpe, minutes);
}

/** Metric record from an accumulator, in METRICS order semantics. */
export function metricsFromAcc(acc: Float64Array): MetricValues {
  return {
    hsrM: acc[SLOT_HSR],
    nearMaxM: acc[SLOT_NEAR_MAX],
    sprintM: acc[SLOT_SPRINT],
    sprintSteps: acc[SLOT_STEPS],
    contacts: acc[SLOT_LOW] + acc[SLOT_MODERATE] + acc[SLOT_HIGH],
    srpe: acc[SLOT_SRPE],
  };
}

/** Value of METRICS[k] from an accumulator (hot path of the series builder). */
export function metricValueFromAcc(acc: Float64Array, k: number): number {
  switch (k) {
    case 0:
      return acc[SLOT_HSR];
    case 1:
      return acc[SLOT_NEAR_MAX];
    case 2:
      return acc[SLOT_SPRINT];
    case 3:
      return acc[SLOT_STEPS];
    case 4:
      return acc[SLOT_LOW] + acc[SLOT_MODERATE] + acc[SLOT_HIGH];
    default:
      return acc[SLOT_SRPE];
  }
}

export function toSessionMetrics(acc: Float64Array): SessionMetrics {
  return {
    metrics: metricsFromAcc(acc),
    contactsByIntensity: contactsFromAcc(acc),
    highIntensity: acc[SLOT_HIGH_INTENSITY] > 0,
    maxIntensityPct: acc[SLOT_MAX_PCT],
    runM: acc[SLOT_RUN],
  };
}

/** A session as planned (status is not consulted; callers decide whether cancelled sessions count). */
export function sessionMetrics(
  session: SessionInput,
  profile: AthleteProfile,
  settings: TeamLoadSettings,
): SessionMetrics {
  const acc = new Float64Array(ACC_SIZE);
  evaluateSessionInto(acc, session, undefined, resolveProfile(profile, settings));
  return toSessionMetrics(acc);
}

/** A session as the athlete logged it; see evaluateSessionInto for the rules. */
export function actualSessionMetrics(
  session: SessionInput,
  log: LogInput,
  profile: AthleteProfile,
  settings: TeamLoadSettings,
): SessionMetrics {
  const acc = new Float64Array(ACC_SIZE);
  evaluateSessionInto(acc, session, log, resolveProfile(profile, settings));
  return toSessionMetrics(acc);
}
