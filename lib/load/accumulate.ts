// The engine's hot path: one session's numbers summed into a reusable Float64Array, with no allocation
// per block or session. Everything the loop touches lives in this one module on purpose (cross-module
// constants and calls cost extra under CommonJS transpilation, e.g. tsx in scripts and tests).
import { dayIndex } from "@/lib/dates/plain-date";
import { BLOCK_KIND_RULES, type BlockKindRules } from "./block-kinds";
import { distanceToReach } from "./sprint-model";
import {
  DEFAULT_STEP_LENGTH,
  DEFAULT_TAU,
  DEFAULT_TEAM_LOAD_SETTINGS as DEFAULTS,
  DEFAULT_VMAX,
  type AthleteProfile,
  type BlockInput,
  type LogInput,
  type PlyoLevel,
  type SessionInput,
  type TeamLoadSettings,
} from "./types";

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
/** Speed bands, metres at or above: absolute HSR and sprint lines, relative HSR, near-max and maximal lines. */
export const SLOT_ABS_HSR = 11;
export const SLOT_ABS_SPRINT = 12;
export const SLOT_REL_HSR = 13;
export const SLOT_REL_NEAR = 14;
export const SLOT_REL_MAX = 15;
/** Input, not output: the share of the prescription being added (passed in the array so it stays unboxed). */
const SLOT_SCALE = 16;
export const ACC_SIZE = 17;

/** intensityPct on a 0.5% grid (0–100%) has its distance-to-threshold memoised per athlete. */
const GRID = 201;
/** Thresholds per memo cell, in this order: absolute HSR, absolute sprint, relative HSR, near-max, maximal. */
const BANDS = 5;
const BAND_ABS_HSR = 0;
const BAND_NEAR = 3;
/** Memo cells per start class: GRID grid cells and one scratch cell, BANDS thresholds each. */
const CLASS_CELLS = (GRID + 1) * BANDS;

/**
 * τ multiplier per start (lib/load/README.md §11.2): blocks 0.95 (a trained sprinter leaves
 * blocks with more horizontal push: common practice, from memory); crouch and standing 1.0, the start τ is
 * fitted from (Salo & Bezodis 2004, Sports Biomech 3:43, found no speed difference between them by 10 m).
 * Start class 1 = blocks, 0 = everything else.
 */
const BLOCKS_TAU_FACTOR = 0.95;

/** Profile with defaults filled in and the speed thresholds precomputed (m/s). */
export interface ResolvedProfile {
  vmax: number;
  tau: number;
  stepLengthM: number;
  plyoLevel: PlyoLevel;
  /** The HSR line that drives hsrM (absolute or relative, per team): its band index. */
  hsrBand: number;
  hsrSpeed: number;
  nearMaxSpeed: number;
  /** Band thresholds in BANDS order, m/s. */
  bandSpeeds: Float64Array;
  /** Recovery rule: which work makes a session high-intensity; maximal acceleration from maximalPct. */
  hiMaxVelocity: boolean;
  hiMaxAcceleration: boolean;
  hiSpeedEndurance: boolean;
  hiPlyo: boolean;
  maximalPct: number;
  /** Missing logs: true = the plan stands in as an estimate (default); false = the day is left out. */
  estimateMissing: boolean;
  /** Lazily built memo: per start class, [cell · BANDS + band]; NaN = not computed yet. */
  reach: Float64Array | null;
  /** Profiles in force before accepted speed tests, ascending (AthleteProfile.earlier); null without any. */
  earlier: { untilDay: number; rp: ResolvedProfile }[] | null;
}

/** Non-negative finite number, else 0: stored data should be validated, but the maths never sees NaN. */
function nonNeg(value: number | null | undefined): number {
  const v = value ?? 0;
  return v > 0 && v < Number.POSITIVE_INFINITY ? v : 0;
}

function positive(value: number | null | undefined, fallback: number): number {
  return typeof value === "number" && value > 0 && Number.isFinite(value) ? value : fallback;
}

export function resolveProfile(profile: AthleteProfile, settings: TeamLoadSettings): ResolvedProfile {
  const vmax = positive(profile.vmax, DEFAULT_VMAX);
  const share = (pct: number | undefined, fallback: number) => (nonNeg(pct ?? fallback) / 100) * vmax;
  const nearMaxSpeed = share(settings.nearMaxPct, DEFAULTS.nearMaxPct);
  const bandSpeeds = new Float64Array(BANDS);
  bandSpeeds[0] = nonNeg(settings.hsrSpeedMs);
  bandSpeeds[1] = nonNeg(settings.sprintSpeedMs ?? DEFAULTS.sprintSpeedMs);
  bandSpeeds[2] = share(settings.hsrPct, DEFAULTS.hsrPct);
  bandSpeeds[3] = nearMaxSpeed;
  bandSpeeds[4] = share(settings.maximalPct, DEFAULTS.maximalPct);
  const hsrBand = settings.speedZones === "relative" ? 2 : BAND_ABS_HSR;
  const work: readonly string[] = settings.recoveryWork ?? DEFAULTS.recoveryWork;
  return {
    vmax,
    tau: positive(profile.tau, DEFAULT_TAU),
    stepLengthM: positive(profile.stepLengthM, DEFAULT_STEP_LENGTH),
    plyoLevel: profile.plyoLevel,
    hsrBand,
    hsrSpeed: bandSpeeds[hsrBand],
    nearMaxSpeed,
    bandSpeeds,
    hiMaxVelocity: work.includes("max_velocity"),
    hiMaxAcceleration: work.includes("max_acceleration"),
    hiSpeedEndurance: work.includes("speed_endurance"),
    hiPlyo: work.includes("high_plyo"),
    maximalPct: nonNeg(settings.maximalPct ?? DEFAULTS.maximalPct),
    estimateMissing: settings.missingLogs !== "exclude",
    reach: null,
    earlier: profile.earlier?.length
      ? [...profile.earlier]
          .map((e) => ({
            untilDay: dayIndex(e.until),
            rp: resolveProfile({ ...e, plyoLevel: profile.plyoLevel }, settings),
          }))
          .sort((a, b) => a.untilDay - b.untilDay)
      : null,
  };
}

/** The profile in force on `day` (lib/speed/README.md §4): the first earlier one it falls before, else the current. */
function profileOn(rp: ResolvedProfile, day: number): ResolvedProfile {
  const earlier = rp.earlier;
  if (earlier === null) return rp;
  for (let i = 0; i < earlier.length; i++) if (day < earlier[i].untilDay) return earlier[i].rp;
  return rp;
}

function memoOf(rp: ResolvedProfile): Float64Array {
  if (rp.reach === null) rp.reach = new Float64Array(2 * CLASS_CELLS).fill(Number.NaN);
  return rp.reach;
}

/**
 * Metres from rest to reach each band threshold for a rep at pct% of vmax from a start of class `cls`,
 * memoised per athlete for pct on a 0.5% grid (other pcts use the class's scratch cell). Returns the cell's
 * base; band j is at base + j. Callers read the cells back from the Float64Array so they stay unboxed
 * doubles (merging a call's result with an array load would box a number on every block).
 */
function reachCell(rp: ResolvedProfile, memo: Float64Array, pct: number, cls: number): number {
  const grid = pct * 2;
  const g = grid | 0;
  const onGrid = g === grid && g < GRID;
  const base = cls * CLASS_CELLS + (onGrid ? g : GRID) * BANDS;
  if (!onGrid || memo[base] !== memo[base]) {
    const target = (pct / 100) * rp.vmax;
    const tau = cls === 1 ? rp.tau * BLOCKS_TAU_FACTOR : rp.tau;
    for (let j = 0; j < BANDS; j++) memo[base + j] = distanceToReach(rp.bandSpeeds[j], target, tau);
  }
  return base;
}

/**
 * Where a flying rep reaches `speed`: the run-in is a build-up that would reach the target at the end of the
 * run-in at constant acceleration (v² = 2·a·x, so x = runIn·(speed/target)²), but never faster than the
 * athlete's all-out acceleration allows (`allOut`, from rest): the later of the two.
 */
function buildUpReach(allOut: number, runIn: number, speed: number, target: number): number {
  const ratio = speed / target;
  const gentle = runIn * ratio * ratio;
  return gentle > allOut ? gentle : allOut;
}

// A module-local binding of the one rule table: reading it through the import would go through the module's
// export getter on every block under CommonJS transpilation.
const RULES: Readonly<Record<string, BlockKindRules | undefined>> = BLOCK_KIND_RULES;

/** Reps a block prescribes: sets×reps for running, total reps across drills for plyometrics. */
export function prescribedReps(block: BlockInput): number {
  const rules = RULES[block.kind];
  if (rules === undefined) return 0;
  if (rules.carries === "running") {
    const r = block.running;
    return r ? nonNeg(r.sets) * nonNeg(r.reps) : 0;
  }
  if (rules.carries === "drills" && block.drills) {
    let total = 0;
    for (const d of block.drills) total += nonNeg(d.sets) * nonNeg(d.reps);
    return total;
  }
  return 0;
}

/**
 * Adds `scale` × the block's prescription into `acc`. Each rep is run from rest approaching pct% of vmax
 * (τ by start type, BLOCKS_TAU_FACTOR); a flying rep's run-in is a build-up (buildUpReach) counted in running
 * and band metres but not in sprint metres; metres at or above a threshold are the metres after reaching it
 * (sprint-model.ts). What each kind counts as (running, sprint metres, contacts, the recovery work that makes a
 * session high-intensity, each as the team chose in recoveryWork) is BLOCK_KIND_RULES (block-kinds.ts). Running
 * data counts only on running kinds and drills only on drill kinds, so form state left over from a kind change
 * never leaks into the numbers.
 */
export function addBlockInto(acc: Float64Array, block: BlockInput, rp: ResolvedProfile, scale: number): void {
  acc[SLOT_SCALE] = scale;
  addScaledBlock(acc, block, rp);
}

/** addBlockInto with the scale read from acc[SLOT_SCALE]: a double argument to a call that is not inlined is boxed. */
function addScaledBlock(acc: Float64Array, block: BlockInput, rp: ResolvedProfile): void {
  const scale = acc[SLOT_SCALE];
  if (!(scale > 0)) return;
  const rules = RULES[block.kind];
  if (rules === undefined) return;
  if (rules.carries === "running") {
    const r = block.running;
    if (!r) return;
    const reps = nonNeg(r.sets) * nonNeg(r.reps) * scale;
    const flying = r.start === "flying";
    // Only a flying rep has a run-in (the plan validation enforces it; a stray value elsewhere is ignored).
    const runIn = flying ? nonNeg(r.runInM) : 0;
    const distance = nonNeg(r.distanceM);
    const total = runIn + distance;
    if (reps === 0 || total === 0) return;
    const pct = nonNeg(r.intensityPct);
    acc[SLOT_RUN] += total * reps;
    if (pct > 0) {
      const memo = memoOf(rp);
      const base = reachCell(rp, memo, pct, r.start === "blocks" ? 1 : 0);
      const target = (pct / 100) * rp.vmax;
      for (let j = 0; j < 5; j++) {
        let reach = memo[base + j];
        if (flying && runIn > 0) reach = buildUpReach(reach, runIn, rp.bandSpeeds[j], target);
        if (reach < total) acc[SLOT_ABS_HSR + j] += (total - reach) * reps;
      }
      // hsrM and near-max are the team's driving bands (the same sums).
      acc[SLOT_HSR] = acc[SLOT_ABS_HSR + rp.hsrBand];
      acc[SLOT_NEAR_MAX] = acc[SLOT_ABS_HSR + BAND_NEAR];
    }
    if (rules.sprintMetres) {
      // The run-in is a build-up, not sprinting: sprint metres and steps count the timed distance.
      acc[SLOT_SPRINT] += distance * reps;
      acc[SLOT_STEPS] += (distance * reps) / rp.stepLengthM;
    }
    if (pct > acc[SLOT_MAX_PCT]) acc[SLOT_MAX_PCT] = pct;
    const work = rules.recoveryWork;
    if (
      (work === "max_velocity" && rp.hiMaxVelocity) ||
      (work === "max_acceleration" && rp.hiMaxAcceleration && pct >= rp.maximalPct - 1e-9) ||
      (work === "speed_endurance" && rp.hiSpeedEndurance)
    )
      acc[SLOT_HIGH_INTENSITY] = 1;
    return;
  }
  if (rules.carries !== "drills" || !block.drills) return;
  for (const d of block.drills) {
    // NSCA (Potach & Chu): one contact per landing of one foot or both feet together.
    const contacts = nonNeg(d.sets) * nonNeg(d.reps) * nonNeg(d.contactsPerRep) * scale;
    if (contacts === 0) continue;
    if (d.intensity === "high") {
      acc[SLOT_HIGH] += contacts;
      if (rules.recoveryWork === "high_plyo" && rp.hiPlyo) acc[SLOT_HIGH_INTENSITY] = 1;
    } else if (d.intensity === "moderate") acc[SLOT_MODERATE] += contacts;
    else acc[SLOT_LOW] += contacts;
  }
}

/** Session load in AU = session RPE (CR-10) × duration in minutes (Foster et al. 2001, JSCR 15:109). */
export function srpe(rpe: number, minutes: number): number {
  return nonNeg(rpe) * nonNeg(minutes);
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
  if (rp.earlier !== null) rp = profileOn(rp, dayIndex(session.date));
  for (let k = 0; k < SLOT_SCALE; k++) acc[k] = 0;
  let factor = 1;
  if (log) {
    const c = log.completion;
    factor = c === "yes" ? 1 : c === "partly" ? 0.5 : 0; // the share of the prescription a log without per-block reps stands for
    if (factor === 0) return;
  }
  const done = log ? log.completedReps : null;
  const blocks = session.blocks;
  for (let b = 0; b < blocks.length; b++) {
    const block = blocks[b];
    acc[SLOT_SCALE] = factor;
    if (done && block.id !== undefined && Object.prototype.hasOwnProperty.call(done, block.id)) {
      const prescribed = prescribedReps(block);
      acc[SLOT_SCALE] = prescribed > 0 ? nonNeg(done[block.id]) / prescribed : 0;
    }
    addScaledBlock(acc, block, rp);
  }
  if (!log) {
    acc[SLOT_SRPE] = srpe(session.plannedRpe, session.durationMin);
    return;
  }
  const rpe = log.rpe ?? session.plannedRpe;
  const minutes = log.minutes ?? nonNeg(session.durationMin) * factor;
  acc[SLOT_SRPE] = srpe(rpe, minutes);
}

/**
 * Adds one evaluated session into day i of the metric columns, in METRICS order
 * (hsrM, nearMaxM, sprintM, sprintSteps, contacts, srpe); `cols` is the shared buffer, `n` the column length.
 */
export function addAccToColumns(acc: Float64Array, cols: Float64Array, n: number, i: number): void {
  cols[i] += acc[SLOT_HSR];
  cols[n + i] += acc[SLOT_NEAR_MAX];
  cols[2 * n + i] += acc[SLOT_SPRINT];
  cols[3 * n + i] += acc[SLOT_STEPS];
  cols[4 * n + i] += acc[SLOT_LOW] + acc[SLOT_MODERATE] + acc[SLOT_HIGH];
  cols[5 * n + i] += acc[SLOT_SRPE];
}
