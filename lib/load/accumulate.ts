// The engine's hot path: one session's numbers summed into a reusable Float64Array, with no allocation
// per block or session. Everything the loop touches lives in this one module on purpose (cross-module
// constants and calls cost extra under CommonJS transpilation, e.g. tsx in scripts and tests).
import { distanceToReach } from "./sprint-model";
import {
  DEFAULT_STEP_LENGTH,
  DEFAULT_TAU,
  DEFAULT_VMAX,
  type AthleteProfile,
  type BlockInput,
  type Completion,
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
/** Input, not output: the share of the prescription being added (passed in the array so it stays unboxed). */
const SLOT_SCALE = 11;
export const ACC_SIZE = 12;

/** intensityPct on a 0.5% grid (0–100%) has its distance-to-threshold memoised per athlete. */
const GRID = 201;

/** Profile with defaults filled in and the two speed thresholds precomputed (m/s). */
export interface ResolvedProfile {
  vmax: number;
  tau: number;
  stepLengthM: number;
  plyoLevel: PlyoLevel;
  hsrSpeed: number;
  nearMaxSpeed: number;
  /** Lazily built memo: [0, GRID) HSR, [GRID, 2·GRID) near-max, then two scratch cells; NaN = not computed yet. */
  reach: Float64Array | null;
}

/** Non-negative finite number, else 0: stored data should be validated, but the maths never sees NaN. */
export function nonNeg(value: number | null | undefined): number {
  const v = value ?? 0;
  return v > 0 && v < Number.POSITIVE_INFINITY ? v : 0;
}

function positive(value: number | null | undefined, fallback: number): number {
  return typeof value === "number" && value > 0 && Number.isFinite(value) ? value : fallback;
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
    reach: null,
  };
}

export function memoOf(rp: ResolvedProfile): Float64Array {
  if (rp.reach === null) rp.reach = new Float64Array(2 * GRID + 2).fill(Number.NaN);
  return rp.reach;
}

/**
 * Metres from rest to reach each threshold for a rep at pct% of vmax, memoised per athlete for pct on a 0.5%
 * grid (other pcts use the memo's two scratch cells). Returns the HSR cell; the near-max one is nearCell(at).
 * Callers read both back from the Float64Array so they stay unboxed doubles (merging a call's result with
 * an array load would box a number on every block).
 */
export function reachCell(rp: ResolvedProfile, memo: Float64Array, pct: number): number {
  const grid = pct * 2;
  const g = grid | 0;
  const onGrid = g === grid && g < GRID;
  const hsrAt = onGrid ? g : 2 * GRID;
  if (!onGrid || memo[hsrAt] !== memo[hsrAt]) {
    const target = (pct / 100) * rp.vmax;
    memo[hsrAt] = distanceToReach(rp.hsrSpeed, target, rp.tau);
    memo[nearCell(hsrAt)] = distanceToReach(rp.nearMaxSpeed, target, rp.tau);
  }
  return hsrAt;
}

export function nearCell(hsrAt: number): number {
  return hsrAt === 2 * GRID ? 2 * GRID + 1 : GRID + hsrAt;
}

function isRunningKind(kind: BlockInput["kind"]): boolean {
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
 * Adds `scale` × the block's prescription into `acc`. Each rep is run from rest over run-in + distance,
 * approaching pct% of vmax (a flying rep counts its run-in); metres at or above a threshold are the metres
 * after reaching it (sprint-model.ts). Running data counts only on running kinds and drills only on
 * plyometric blocks, so form state left over from a kind change never leaks into the numbers.
 */
export function addBlockInto(acc: Float64Array, block: BlockInput, rp: ResolvedProfile, scale: number): void {
  acc[SLOT_SCALE] = scale;
  addScaledBlock(acc, block, rp);
}

/** addBlockInto with the scale read from acc[SLOT_SCALE]: a double argument to a call that is not inlined is boxed. */
function addScaledBlock(acc: Float64Array, block: BlockInput, rp: ResolvedProfile): void {
  const scale = acc[SLOT_SCALE];
  if (!(scale > 0)) return;
  const kind = block.kind;
  if (isRunningKind(kind)) {
    const r = block.running;
    if (!r) return;
    const reps = nonNeg(r.sets) * nonNeg(r.reps) * scale;
    const total = nonNeg(r.runInM) + nonNeg(r.distanceM);
    if (reps === 0 || total === 0) return;
    const pct = nonNeg(r.intensityPct);
    const run = total * reps;
    acc[SLOT_RUN] += run;
    if (pct > 0) {
      const memo = memoOf(rp);
      const hsrAt = reachCell(rp, memo, pct);
      const hsr = memo[hsrAt];
      const near = memo[nearCell(hsrAt)];
      if (hsr < total) acc[SLOT_HSR] += (total - hsr) * reps;
      if (near < total) acc[SLOT_NEAR_MAX] += (total - near) * reps;
    }
    if (kind !== "tempo") {
      acc[SLOT_SPRINT] += run;
      acc[SLOT_STEPS] += run / rp.stepLengthM;
    }
    if (pct > acc[SLOT_MAX_PCT]) acc[SLOT_MAX_PCT] = pct;
    if (kind === "max_velocity") acc[SLOT_HIGH_INTENSITY] = 1;
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

/** Share of the prescription a log without per-block reps stands for. */
export const COMPLETION_FACTOR: Record<Completion, number> = { yes: 1, partly: 0.5, no: 0 };

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
  for (let k = 0; k < SLOT_SCALE; k++) acc[k] = 0;
  let factor = 1;
  if (log) {
    const c = log.completion;
    factor = c === "yes" ? 1 : c === "partly" ? 0.5 : 0; // COMPLETION_FACTOR, spelt out for the hot path
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
