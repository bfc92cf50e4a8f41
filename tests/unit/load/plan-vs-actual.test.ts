import { describe, expect, it } from "vitest";
import { dayIndex } from "@/lib/dates/plain-date";
import { ledgerDayValues } from "@/lib/load/ledger";
import { planVersusActual, sumPlanActual } from "@/lib/load/plan-vs-actual";
import type { LogInput, SessionInput } from "@/lib/load/types";
import { PROFILE, SETTINGS, drill, plyoBlock, runBlock } from "./fixtures";

// Hand-computed weeks (lib/load/README.md §13). The week starts Monday 2025-01-06. Figures per session:
// - 2 × 3 × 30 m acceleration at 95 % from a crouch, vmax 10, τ 1: HSR 163.695146 m, near-max 66.166978 m
//   (README §1 B1 [C]); 60 min at RPE 7 = 420 AU (README §3 S1, Foster et al. 2001).
// - plyometrics 2×10 + 3×8 + 4×6 single contacts = 68 contacts (README §2 P1 [C]); 45 min at RPE 5 = 225 AU.
// - strength 30 min at RPE 4 = 120 AU, nothing else.
const accel = runBlock("acceleration", { sets: 2, reps: 3, distanceM: 30, intensityPct: 95 }, "b1");
const plyo = plyoBlock([drill(2, 10, 1, "low"), drill(3, 8, 1, "moderate"), drill(4, 6, 1, "moderate")], "b2");
const strength = { id: "b3", kind: "strength" as const, title: "Strength" };

function session(id: string, date: string, status: SessionInput["status"], min: number, rpe: number, blocks = [accel]) {
  return { id, date, startTime: "16:00", durationMin: min, plannedRpe: rpe, status, blocks };
}

const SESSIONS: SessionInput[] = [
  session("s1", "2025-01-06", "published", 60, 7), // Monday: logged in full, RPE 8 × 60 = 480 AU
  session("s2", "2025-01-08", "published", 45, 5, [plyo]), // Wednesday: logged "partly", RPE 6 × 30 = 180 AU
  session("s3", "2025-01-10", "published", 60, 7), // Friday
  session("s4", "2025-01-11", "draft", 30, 4, [strength]), // Saturday, still a draft: in the plan
  session("s5", "2025-01-12", "cancelled", 60, 7), // Sunday, cancelled: in nothing
];
const LOGS: LogInput[] = [
  { sessionId: "s1", completion: "yes", rpe: 8, minutes: 60 },
  // "partly" without per-block reps scales the prescription by 0.5 (README §4): 34 contacts.
  { sessionId: "s2", completion: "partly", rpe: 6, minutes: 30 },
];

const WEEK = "2025-01-06";

function figures(today: string, logs: readonly LogInput[] = LOGS, weekStarts = [WEEK]) {
  const rows = ledgerDayValues(
    { sessions: SESSIONS, logs, profile: PROFILE, settings: SETTINGS },
    dayIndex("2025-01-06"),
    dayIndex("2025-01-12"),
  );
  return planVersusActual({ rows, sessions: SESSIONS, logs, weekStarts, todayDay: dayIndex(today) });
}

describe("plan versus actual", () => {
  it("mid-week: the done work is set against the plan of the days already due", () => {
    const [w] = figures("2025-01-10"); // Friday, not logged yet: Monday to Thursday are due
    expect(w.weekStart).toBe(WEEK);
    expect(w.weekEnd).toBe("2025-01-12");
    // The whole plan: s1 + s3 + the draft s4 (cancelled s5 left out).
    expect(w.prescribed.hsrM).toBeCloseTo(2 * 163.695146, 5);
    expect(w.prescribed.nearMaxM).toBeCloseTo(2 * 66.166978, 5);
    expect(w.prescribed.contacts).toBe(68);
    expect(w.prescribed.srpe).toBe(420 + 225 + 420 + 120);
    // Due so far: s1 and s2; 420 + 225 = 645 AU (README §3 S1).
    expect(w.prescribedToDate.hsrM).toBeCloseTo(163.695146, 5);
    expect(w.prescribedToDate.contacts).toBe(68);
    expect(w.prescribedToDate.srpe).toBe(645);
    expect(w.done.hsrM).toBeCloseTo(163.695146, 5);
    expect(w.done.nearMaxM).toBeCloseTo(66.166978, 5);
    expect(w.done.contacts).toBe(34);
    expect(w.done.srpe).toBe(480 + 180);
    expect(w.difference.hsrM).toBeCloseTo(0, 9);
    expect(w.difference.contacts).toBe(-34);
    expect(w.differencePct.contacts).toBe(-50);
    expect(w.difference.srpe).toBe(15);
    expect(w.differencePct.srpe).toBeCloseTo((15 / 645) * 100, 9); // 2.325581 %
    expect(w.sessions).toEqual({ planned: 4, due: 2, full: 1, partly: 1, skipped: 0, unlogged: 0 });
    expect(w.completionPct).toBe(100);
  });

  it("after the week: an unlogged session is a shortfall, never an estimate, whatever the missing-log rule", () => {
    const [w] = figures("2025-01-13");
    expect(SETTINGS.missingLogs).toBe("estimate");
    expect(w.prescribedToDate).toEqual(w.prescribed);
    expect(w.done.hsrM).toBeCloseTo(163.695146, 5);
    expect(w.difference.hsrM).toBeCloseTo(-163.695146, 5);
    expect(w.differencePct.hsrM).toBeCloseTo(-50, 9);
    expect(w.difference.srpe).toBe(660 - 1185);
    // s3 (published) and the draft s4 are due and unlogged: 2 of 4 done.
    expect(w.sessions).toEqual({ planned: 4, due: 4, full: 1, partly: 1, skipped: 0, unlogged: 2 });
    expect(w.completionPct).toBe(50);
  });

  it("today counts as due once it holds a log; a session logged as not done is a logged 0", () => {
    const logs: LogInput[] = [...LOGS, { sessionId: "s3", completion: "no", rpe: null, minutes: null }];
    const [w] = figures("2025-01-10", logs);
    expect(w.prescribedToDate.hsrM).toBeCloseTo(2 * 163.695146, 5);
    expect(w.done.hsrM).toBeCloseTo(163.695146, 5);
    expect(w.sessions).toEqual({ planned: 4, due: 3, full: 1, partly: 1, skipped: 1, unlogged: 0 });
    expect(w.completionPct).toBeCloseTo((2 / 3) * 100, 9);
  });

  it("per-block reps count only what was done (README §4: done ÷ prescribed reps)", () => {
    // 3 of the 6 reps of s1's block: half the HSR metres; the session's sRPE is the logged 8 × 60.
    const logs: LogInput[] = [{ ...LOGS[0], completedReps: { b1: 3 } }, LOGS[1]];
    const [w] = figures("2025-01-10", logs);
    expect(w.done.hsrM).toBeCloseTo(163.695146 / 2, 5);
    expect(w.differencePct.hsrM).toBeCloseTo(-50, 9);
  });

  it("a week without sessions has zeros and no percentages", () => {
    const [, next] = figures("2025-01-10", LOGS, [WEEK, "2025-01-13"]);
    expect(next.weekStart).toBe("2025-01-13");
    expect(next.prescribed.srpe).toBe(0);
    expect(next.done.srpe).toBe(0);
    expect(next.differencePct.srpe).toBeNull();
    expect(next.completionPct).toBeNull();
  });

  it("the squad's line adds the athletes up before working out the percentages", () => {
    const [a] = figures("2025-01-10");
    const [b] = figures("2025-01-13");
    const squad = sumPlanActual([a, b]);
    expect(squad.prescribedToDate.srpe).toBe(645 + 1185);
    expect(squad.done.srpe).toBe(660 + 660);
    expect(squad.difference.srpe).toBe(1320 - 1830);
    expect(squad.differencePct.srpe).toBeCloseTo((-510 / 1830) * 100, 9);
    expect(squad.sessions).toEqual({ planned: 8, due: 6, full: 2, partly: 2, skipped: 0, unlogged: 2 });
    expect(squad.completionPct).toBeCloseTo((4 / 6) * 100, 9);
    expect(sumPlanActual([]).completionPct).toBeNull();
  });
});
