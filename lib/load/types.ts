import type { PlyoLevel } from "@/lib/domain/athletes";
import type { Completion, SessionStatus } from "@/lib/domain/sessions";

export type { Completion, PlyoLevel, SessionStatus };

// Plain-data types shared by the load engine, route handlers and the week grid.
// Everything here is serialisable JSON: no classes, no Dates (dates are local "YYYY-MM-DD" strings).

export type BlockKind =
  "acceleration" | "max_velocity" | "plyometric" | "speed_endurance" | "tempo" | "strength" | "recovery";

export const BLOCK_KINDS: readonly BlockKind[] = [
  "acceleration",
  "max_velocity",
  "plyometric",
  "speed_endurance",
  "tempo",
  "strength",
  "recovery",
];

// What each kind counts as (running, sprint metres, contacts, recovery): lib/load/block-kinds.ts.

type StartType = "standing" | "crouch" | "blocks" | "flying";
type PlyoIntensity = "low" | "moderate" | "high";

export interface RunningPrescription {
  sets: number;
  reps: number;
  distanceM: number;
  /** % of the athlete's vmax, e.g. 95. */
  intensityPct: number;
  start: StartType;
  /** Run-in before the timed distance; 0 unless flying. */
  runInM: number;
  restSec: number;
}

export interface PlyoDrill {
  name: string;
  sets: number;
  reps: number;
  /** Ground contacts per rep: one per landing of one foot or both feet together (NSCA). */
  contactsPerRep: number;
  intensity: PlyoIntensity;
}

export interface BlockInput {
  id?: string;
  kind: BlockKind;
  title: string;
  running?: RunningPrescription | null;
  drills?: PlyoDrill[] | null;
  notes?: string;
}

export interface AthleteProfile {
  /** Tested maximal velocity, m/s; null until tested. */
  vmax: number | null;
  /** Mono-exponential time constant, s; null until fitted. */
  tau: number | null;
  /** Step length at max velocity, m; null until measured. */
  stepLengthM: number | null;
  plyoLevel: PlyoLevel;
  /**
   * Speed profiles in force before accepted speed tests, ascending by `until` (lib/speed/README.md §4): a session
   * dated before an entry's `until` (and on or after the previous one's) uses that entry's values; from the
   * last `until` on, the fields above apply. Absent: the fields above apply on every day.
   */
  earlier?: readonly EarlierProfile[];
}

/** A speed profile as it stood until a later accepted test (plyo level is not part of it). */
export interface EarlierProfile {
  /** "YYYY-MM-DD": the first day it no longer applied (the next test's date). */
  until: string;
  vmax: number | null;
  tau: number | null;
  stepLengthM: number | null;
}

// Defaults used while an athlete is untested. They only shape estimates; the UI should say "estimated".
/** 9.0 m/s (32.4 km/h): a trained, non-elite sprinter; trained sprinters span about 9–11 m/s [from memory]. */
export const DEFAULT_VMAX = 9.0;
/** 1.2 s: mid-range for the Furusawa/Hill model in trained sprinters, about 1.0–1.4 s [from memory]; lib/load/README.md §1. */
export const DEFAULT_TAU = 1.2;
/**
 * 2.1 m: low end of max-velocity step length 2.0–2.6 m [from memory], because sprint metres include the
 * acceleration, where steps are shorter.
 */
export const DEFAULT_STEP_LENGTH = 2.1;

export type AcwrMethod = "ewma" | "rolling_coupled" | "rolling_uncoupled";
export const ACWR_METHODS: readonly AcwrMethod[] = ["ewma", "rolling_coupled", "rolling_uncoupled"];

export type Metric = "hsrM" | "nearMaxM" | "sprintM" | "sprintSteps" | "contacts" | "srpe";

/** Fixed order: the engine stores metrics in typed arrays indexed by this order. */
export const METRICS: readonly Metric[] = ["hsrM", "nearMaxM", "sprintM", "sprintSteps", "contacts", "srpe"];

export interface MetricInfo {
  label: string;
  short: string;
  unit: string;
  /** Decimals to show. */
  decimals: number;
  description: string;
}

export const METRIC_INFO: Record<Metric, MetricInfo> = {
  hsrM: {
    label: "HSR metres",
    short: "HSR",
    unit: "m",
    decimals: 0,
    description: "Estimated metres run at or above the team's high-speed running threshold.",
  },
  nearMaxM: {
    label: "Near-max metres",
    short: "Near-max",
    unit: "m",
    decimals: 0,
    description: "Estimated metres run at or above the team's near-max share of the athlete's vmax.",
  },
  sprintM: {
    label: "Sprint metres",
    short: "Sprint",
    unit: "m",
    decimals: 0,
    description: "Running metres in acceleration, max-velocity and speed-endurance blocks (tempo excluded).",
  },
  sprintSteps: {
    label: "Sprint steps",
    short: "Steps",
    unit: "steps",
    decimals: 0,
    description: "Estimated steps in sprint blocks: sprint metres divided by the athlete's step length.",
  },
  contacts: {
    label: "Ground contacts",
    short: "Contacts",
    unit: "contacts",
    decimals: 0,
    description: "Plyometric ground contacts (one per landing of one foot or both feet together).",
  },
  srpe: {
    label: "sRPE load",
    short: "sRPE",
    unit: "AU",
    decimals: 0,
    description: "Session RPE (CR-10) times duration in minutes.",
  },
};

/** "absolute": HSR from a fixed speed (m/s); "relative": from a share of each athlete's own tested vmax. */
export type SpeedZones = "absolute" | "relative";
export const SPEED_ZONES: readonly SpeedZones[] = ["absolute", "relative"];

/** Work that makes a session high-intensity for the recovery rule. */
export type RecoveryWork = "max_velocity" | "max_acceleration" | "speed_endurance" | "high_plyo";
export const RECOVERY_WORK: readonly RecoveryWork[] = [
  "max_velocity",
  "max_acceleration",
  "speed_endurance",
  "high_plyo",
];

/** How a published past session without a log enters the series: the plan as an estimate, or left out. */
export type MissingLogs = "estimate" | "exclude";
export const MISSING_LOGS: readonly MissingLogs[] = ["estimate", "exclude"];

export interface TeamLoadSettings {
  /** Absolute HSR line, m/s; 5.5 m/s = 19.8 km/h (Bradley et al. 2009). Drives hsrM when speedZones is "absolute". */
  hsrSpeedMs: number;
  /** Near-max threshold as % of the athlete's vmax. */
  nearMaxPct: number;
  /** Which HSR line drives hsrM and so the flags (lib/load/README.md §11.1). */
  speedZones: SpeedZones;
  /** Relative HSR line, % of the athlete's vmax; drives hsrM when speedZones is "relative". */
  hsrPct: number;
  /** Absolute sprint line, m/s; 7.0 m/s = 25.2 km/h (Bradley et al. 2009). Shown, never a flag by itself. */
  sprintSpeedMs: number;
  /** Maximal-speed line, % of vmax (Malone et al. 2017: > 95 %): maximal accelerations for the recovery rule. */
  maximalPct: number;
  acwrMethod: AcwrMethod;
  /** ACWR at or above this is a spike (Gabbett 2016: ≥1.5 "danger zone"). */
  spikeRatio: number;
  /** ACWR at or above this (and below spike) is climbing (top of Gabbett's 0.8–1.3 sweet spot). */
  risingRatio: number;
  /** ACWR below this is underloaded (bottom of the sweet spot). */
  lowRatio: number;
  /** A weekly change strictly greater than this % is flagged. */
  weeklyChangeLimitPct: number;
  /** Minimum hours between high-intensity sessions; exactly this many hours passes. */
  recoveryHours: number;
  /** What makes a session high-intensity for the recovery rule. */
  recoveryWork: RecoveryWork[];
  /** How a published past session without a log counts. */
  missingLogs: MissingLogs;
  /** Foster 1998: weekly sRPE monotony strictly above this is flagged (with the week's strain). */
  monotonyLimit: number;
  /** Metric the ACWR zones are judged on. */
  acwrMetric: Metric;
  /** Metrics checked for a weekly jump; defaults to DEFAULT_JUMP_METRICS. */
  jumpMetrics?: readonly Metric[];
}

/** sprintSteps is left out because it moves in lock-step with sprintM (same % change). */
export const DEFAULT_JUMP_METRICS: readonly Metric[] = ["srpe", "hsrM", "nearMaxM", "contacts"];

export const DEFAULT_TEAM_LOAD_SETTINGS: TeamLoadSettings = {
  hsrSpeedMs: 5.5,
  nearMaxPct: 90,
  speedZones: "absolute",
  hsrPct: 75,
  sprintSpeedMs: 7,
  maximalPct: 95,
  acwrMethod: "ewma",
  spikeRatio: 1.5,
  risingRatio: 1.3,
  lowRatio: 0.8,
  weeklyChangeLimitPct: 15,
  recoveryHours: 48,
  recoveryWork: [...RECOVERY_WORK],
  missingLogs: "estimate",
  monotonyLimit: 2,
  acwrMetric: "srpe",
};

export interface SessionInput {
  id: string;
  date: string;
  /** "HH:MM", local wall-clock time. */
  startTime: string;
  durationMin: number;
  plannedRpe: number;
  status: SessionStatus;
  blocks: BlockInput[];
}

export interface LogInput {
  sessionId: string;
  completion: Completion;
  rpe: number | null;
  minutes: number | null;
  /** Block id → reps done (out of sets×reps; for plyometric blocks out of total reps across drills). */
  completedReps?: Record<string, number> | null;
}

export type LoadView = "actual" | "projected";

export type MetricValues = Record<Metric, number>;

export interface ContactsByIntensity {
  low: number;
  moderate: number;
  high: number;
  total: number;
  /** Contacts weighted by intensity (PLYO_INTENSITY_WEIGHT, plyo.ts). */
  weighted: number;
}

/** Metres of running at or above each speed band (lib/load/README.md §11.1). */
export interface SpeedBands {
  /** ≥ hsrSpeedMs (5.5 m/s) and ≥ sprintSpeedMs (7.0 m/s). */
  absHsrM: number;
  absSprintM: number;
  /** ≥ hsrPct (75 %), ≥ nearMaxPct (90 %) and ≥ maximalPct (95 %) of the athlete's own vmax. */
  relHsrM: number;
  relNearMaxM: number;
  relMaximalM: number;
}
