// An athlete's sessions as columns of numbers: the form the data layer hands the engine for whole-history
// work (the squad table, an athlete's two years). The daily series then runs over typed arrays instead of
// walking tens of thousands of session and block objects, which is what made it slow (cache misses, not
// arithmetic). The numbers are the prescription and the log as stored; all the load maths stays in the
// engine (sumPackedSession), with the same operations in the same order as evaluateSessionInto, so both
// paths give identical numbers (tests/unit/load/packed.test.ts checks it on an invented squad).
import { blockKindRules } from "./block-kinds";
import {
  BAND_NEAR,
  buildUpReach,
  memoOf,
  nonNeg,
  profileOn,
  reachCell,
  srpe,
  type ResolvedProfile,
} from "./accumulate";
import { dayIndex } from "@/lib/dates/plain-date";
import { alignLogs, type AlignedLogs } from "./align-logs";
import type { BlockInput, LogInput, SessionInput } from "./types";

const STATUS = { draft: 0, published: 1, cancelled: 2 } as const;
/** Status code → status, indexed by the codes above. */
export const PACKED_STATUS: readonly SessionInput["status"][] = ["draft", "published", "cancelled"];

/** Block kinds as the daily sums see them, coded from BLOCK_KIND_RULES (block-kinds.ts) when packing. */
const K_NONE = 0;
const K_SPRINT = 1; // running with sprint metres and steps (acceleration, max velocity, speed endurance)
const K_TEMPO = 2; // running metres but not sprint metres (tempo)
const K_PLYO = 3; // ground contacts from drills (plyometric)

/** Log completion: 0 = no log; else the share of the prescription (yes 1, partly 0.5, no 0) in logFactor. */
export interface PackedSessions {
  /** The sessions and their aligned logs, as given (flags and per-session views still read these). */
  sessions: readonly SessionInput[];
  logFor: AlignedLogs;
  day: Int32Array;
  status: Uint8Array;
  plannedRpe: Float64Array;
  durationMin: Float64Array;
  hasLog: Uint8Array;
  logFactor: Float64Array;
  /** Log RPE and minutes; used only where hasLogRpe / hasLogMinutes is 1 (null falls back to the plan). */
  logRpe: Float64Array;
  hasLogRpe: Uint8Array;
  logMinutes: Float64Array;
  hasLogMinutes: Uint8Array;
  /** Blocks of session k: [blockStart[k], blockStart[k + 1]). */
  blockStart: Int32Array;
  kind: Uint8Array;
  /** Running: sets × reps, run-in (flying only) and distance (m), intensity (% vmax), start class (1 = blocks). */
  runReps: Float64Array;
  runIn: Float64Array;
  runDistance: Float64Array;
  runPct: Float64Array;
  runClass: Uint8Array;
  /** Reps the block prescribes (for completed-reps logs) and the reps logged (NaN = not listed). */
  prescribed: Float64Array;
  doneReps: Float64Array;
  /** Drills of block b: [drillStart[b], drillStart[b + 1]): contacts (sets × reps × contacts per rep) and intensity. */
  drillStart: Int32Array;
  drillContacts: Float64Array;
  /** 0 low, 1 moderate, 2 high. */
  drillLevel: Uint8Array;
}

function kindCode(b: BlockInput): number {
  const rules = blockKindRules(b.kind);
  if (rules?.carries === "running") return b.running ? (rules.sprintMetres ? K_SPRINT : K_TEMPO) : K_NONE;
  if (rules?.carries === "drills") return b.drills ? K_PLYO : K_NONE;
  return K_NONE;
}

/** Packs sessions (and their logs) into columns; `logs` may come in any order (alignLogs pairs them). */
export function packSessions(sessions: readonly SessionInput[], logs: readonly LogInput[]): PackedSessions {
  const n = sessions.length;
  const logFor = alignLogs(sessions, logs);
  let nb = 0;
  let nd = 0;
  for (const s of sessions) {
    nb += s.blocks.length;
    for (const b of s.blocks) if (kindCode(b) === K_PLYO && b.drills) nd += b.drills.length;
  }
  const p: PackedSessions = {
    sessions,
    logFor,
    day: new Int32Array(n),
    status: new Uint8Array(n),
    plannedRpe: new Float64Array(n),
    durationMin: new Float64Array(n),
    hasLog: new Uint8Array(n),
    logFactor: new Float64Array(n),
    logRpe: new Float64Array(n),
    hasLogRpe: new Uint8Array(n),
    logMinutes: new Float64Array(n),
    hasLogMinutes: new Uint8Array(n),
    blockStart: new Int32Array(n + 1),
    kind: new Uint8Array(nb),
    runReps: new Float64Array(nb),
    runIn: new Float64Array(nb),
    runDistance: new Float64Array(nb),
    runPct: new Float64Array(nb),
    runClass: new Uint8Array(nb),
    prescribed: new Float64Array(nb),
    doneReps: new Float64Array(nb).fill(Number.NaN),
    drillStart: new Int32Array(nb + 1),
    drillContacts: new Float64Array(nd),
    drillLevel: new Uint8Array(nd),
  };
  let b = 0;
  let d = 0;
  for (let k = 0; k < n; k++) {
    const s = sessions[k];
    const log = logFor[k];
    p.day[k] = dayIndex(s.date);
    p.status[k] = STATUS[s.status] ?? STATUS.draft;
    p.plannedRpe[k] = s.plannedRpe;
    p.durationMin[k] = s.durationMin;
    p.blockStart[k] = b;
    if (log) {
      p.hasLog[k] = 1;
      p.logFactor[k] = log.completion === "yes" ? 1 : log.completion === "partly" ? 0.5 : 0;
      if (log.rpe !== null && log.rpe !== undefined) {
        p.hasLogRpe[k] = 1;
        p.logRpe[k] = log.rpe;
      }
      if (log.minutes !== null && log.minutes !== undefined) {
        p.hasLogMinutes[k] = 1;
        p.logMinutes[k] = log.minutes;
      }
    }
    const done = log ? log.completedReps : null;
    for (const block of s.blocks) {
      const code = kindCode(block);
      p.kind[b] = code;
      p.drillStart[b] = d;
      const r = block.running;
      if ((code === K_SPRINT || code === K_TEMPO) && r) {
        p.runReps[b] = nonNeg(r.sets) * nonNeg(r.reps);
        p.runIn[b] = r.start === "flying" ? nonNeg(r.runInM) : 0;
        p.runDistance[b] = nonNeg(r.distanceM);
        p.runPct[b] = nonNeg(r.intensityPct);
        p.runClass[b] = r.start === "blocks" ? 1 : 0;
        p.prescribed[b] = p.runReps[b];
      } else if (code === K_PLYO && block.drills) {
        let reps = 0;
        for (const dr of block.drills) {
          reps += nonNeg(dr.sets) * nonNeg(dr.reps);
          p.drillContacts[d] = nonNeg(dr.sets) * nonNeg(dr.reps) * nonNeg(dr.contactsPerRep);
          p.drillLevel[d] = dr.intensity === "high" ? 2 : dr.intensity === "moderate" ? 1 : 0;
          d++;
        }
        p.prescribed[b] = reps;
      }
      if (done && block.id !== undefined && Object.prototype.hasOwnProperty.call(done, block.id))
        p.doneReps[b] = nonNeg(done[block.id]);
      b++;
    }
  }
  p.blockStart[n] = b;
  p.drillStart[nb] = d;
  return p;
}

const S_HSR = 0,
  S_NEAR = 1,
  S_SPRINT = 2,
  S_STEPS = 3,
  S_LOW = 4,
  S_MOD = 5,
  S_HIGH = 6,
  S_SRPE = 7;
export const PACKED_ACC_SIZE = 8;

/**
 * Sums session k into `acc` (HSR, near-max, sprint metres, steps, low/moderate/high contacts, sRPE) as
 * planned (`logged` false) or as logged. The rules, and the order of every operation, are those of
 * evaluateSessionInto and addScaledBlock in accumulate.ts.
 */
export function sumPackedSession(
  acc: Float64Array,
  p: PackedSessions,
  k: number,
  logged: boolean,
  rp: ResolvedProfile,
): void {
  if (rp.earlier !== null) rp = profileOn(rp, p.day[k]);
  // Eight stores beat TypedArray#fill's call for so short an array.
  acc[0] = 0;
  acc[1] = 0;
  acc[2] = 0;
  acc[3] = 0;
  acc[4] = 0;
  acc[5] = 0;
  acc[6] = 0;
  acc[7] = 0;
  const factor = logged ? p.logFactor[k] : 1;
  if (logged && factor === 0) return;
  const memo = memoOf(rp);
  const end = p.blockStart[k + 1];
  for (let b = p.blockStart[k]; b < end; b++) {
    let scale = factor;
    const done = p.doneReps[b];
    if (logged && done === done) {
      const prescribed = p.prescribed[b];
      scale = prescribed > 0 ? done / prescribed : 0;
    }
    if (!(scale > 0)) continue;
    const kind = p.kind[b];
    if (kind === K_SPRINT || kind === K_TEMPO) {
      const reps = p.runReps[b] * scale;
      const runIn = p.runIn[b];
      const distance = p.runDistance[b];
      const total = runIn + distance;
      if (reps === 0 || total === 0) continue;
      const pct = p.runPct[b];
      if (pct > 0) {
        const base = reachCell(rp, memo, pct, p.runClass[b]);
        let hsr = memo[base + rp.hsrBand];
        let near = memo[base + BAND_NEAR];
        if (runIn > 0) {
          const target = (pct / 100) * rp.vmax;
          hsr = buildUpReach(hsr, runIn, rp.hsrSpeed, target);
          near = buildUpReach(near, runIn, rp.nearMaxSpeed, target);
        }
        if (hsr < total) acc[S_HSR] += (total - hsr) * reps;
        if (near < total) acc[S_NEAR] += (total - near) * reps;
      }
      if (kind === K_SPRINT) {
        acc[S_SPRINT] += distance * reps;
        acc[S_STEPS] += (distance * reps) / rp.stepLengthM;
      }
    } else if (kind === K_PLYO) {
      const dEnd = p.drillStart[b + 1];
      for (let d = p.drillStart[b]; d < dEnd; d++) {
        const contacts = p.drillContacts[d] * scale;
        if (contacts === 0) continue;
        acc[S_LOW + p.drillLevel[d]] += contacts;
      }
    }
  }
  if (!logged) {
    acc[S_SRPE] = srpe(p.plannedRpe[k], p.durationMin[k]);
    return;
  }
  const rpe = p.hasLogRpe[k] ? p.logRpe[k] : p.plannedRpe[k];
  const minutes = p.hasLogMinutes[k] ? p.logMinutes[k] : nonNeg(p.durationMin[k]) * factor;
  acc[S_SRPE] = srpe(rpe, minutes);
}

/** Adds a summed session into day i of the metric columns (METRICS order), like addAccToColumns. */
export function addPackedToColumns(acc: Float64Array, cols: Float64Array, n: number, i: number): void {
  cols[i] += acc[S_HSR];
  cols[n + i] += acc[S_NEAR];
  cols[2 * n + i] += acc[S_SPRINT];
  cols[3 * n + i] += acc[S_STEPS];
  cols[4 * n + i] += acc[S_LOW] + acc[S_MOD] + acc[S_HIGH];
  cols[5 * n + i] += acc[S_SRPE];
}
