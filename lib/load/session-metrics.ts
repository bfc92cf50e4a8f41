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
  evaluateSessionInto,
  resolveProfile,
} from "./accumulate";
import { bandsFromAcc, contactsFromAcc } from "./block-metrics";
import type {
  AthleteProfile,
  ContactsByIntensity,
  LogInput,
  MetricValues,
  SessionInput,
  SpeedBands,
  TeamLoadSettings,
} from "./types";

export { srpe } from "./accumulate";

export interface SessionMetrics {
  metrics: MetricValues;
  contactsByIntensity: ContactsByIntensity;
  /** Has work the team counts as high-intensity (settings.recoveryWork; the recovery-window rule applies). */
  highIntensity: boolean;
  /** Highest intensityPct among running blocks (0 when none). */
  maxIntensityPct: number;
  /** All running metres, tempo and run-ins included. */
  runM: number;
  /** Metres in every speed band, absolute and relative. */
  bands: SpeedBands;
}

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

export function toSessionMetrics(acc: Float64Array): SessionMetrics {
  return {
    metrics: metricsFromAcc(acc),
    contactsByIntensity: contactsFromAcc(acc),
    highIntensity: acc[SLOT_HIGH_INTENSITY] > 0,
    maxIntensityPct: acc[SLOT_MAX_PCT],
    runM: acc[SLOT_RUN],
    bands: bandsFromAcc(acc),
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

/** A session as the athlete logged it; the rules are on evaluateSessionInto (accumulate.ts). */
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
