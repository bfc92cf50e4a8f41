import { describe, expect, it } from "vitest";
import { ACC_SIZE, addAccToColumns } from "@/lib/load/accumulate";
import { blockMetrics } from "@/lib/load/block-metrics";
import { actualSessionMetrics, metricsFromAcc, sessionMetrics, srpe } from "@/lib/load/session-metrics";
import { METRICS } from "@/lib/load/types";
import { PROFILE, SETTINGS, drill, log, plyoBlock, runBlock, session } from "./fixtures";

describe("sRPE (Foster et al. 2001, JSCR 15:109; lib/load/README.md §3 S1 [C])", () => {
  it("S1: RPE 7 × 60 min = 420 AU; RPE 5 × 45 min = 225 AU", () => {
    expect(srpe(7, 60)).toBe(420);
    expect(srpe(5, 45)).toBe(225);
  });
});

const blocks = [
  runBlock("acceleration", { sets: 2, reps: 4, distanceM: 20, intensityPct: 95 }, "b-acc"),
  runBlock("max_velocity", { reps: 4, distanceM: 30, runInM: 20, start: "flying", intensityPct: 98 }, "b-mv"),
  plyoBlock([drill(3, 10, 1, "moderate"), drill(2, 5, 2, "high")], "b-plyo"),
];

describe("sessionMetrics (as planned)", () => {
  it("sums the blocks and sets sRPE = planned RPE × duration", () => {
    const s = session("2026-03-10", { plannedRpe: 7, durationMin: 60, blocks });
    const m = sessionMetrics(s, PROFILE, SETTINGS);
    const byBlock = blocks.map((b) => blockMetrics(b, PROFILE, SETTINGS));
    expect(m.metrics.hsrM).toBeCloseTo(byBlock[0].hsrM + byBlock[1].hsrM, 12);
    // Acceleration 2 × 4 × 20 = 160 m; flying 4 × 30 m timed = 120 m (the 20 m run-ins are a build-up, not sprinting).
    expect(m.metrics.sprintM).toBe(160 + 120);
    expect(m.metrics.contacts).toBe(50);
    expect(m.contactsByIntensity).toEqual({ low: 0, moderate: 30, high: 20, total: 50, weighted: 2 * 30 + 3 * 20 });
    expect(m.metrics.srpe).toBe(420);
    expect(m.highIntensity).toBe(true);
    expect(m.maxIntensityPct).toBe(98);
  });

  it("is high-intensity with max velocity, maximal accelerations (≥ 95%), speed endurance or high plyometrics, as the team chose", () => {
    const acc = session("2026-03-10", { blocks: [blocks[0]] });
    expect(sessionMetrics(acc, PROFILE, SETTINGS).highIntensity).toBe(true);
    const noAccel = { ...SETTINGS, recoveryWork: SETTINGS.recoveryWork.filter((w) => w !== "max_acceleration") };
    expect(sessionMetrics(acc, PROFILE, noAccel).highIntensity).toBe(false);
    const sub = session("2026-03-10", { blocks: [runBlock("acceleration", { intensityPct: 94.5 })] });
    expect(sessionMetrics(sub, PROFILE, SETTINGS).highIntensity).toBe(false);
    const se = session("2026-03-10", { blocks: [runBlock("speed_endurance", { distanceM: 150, intensityPct: 90 })] });
    expect(sessionMetrics(se, PROFILE, SETTINGS).highIntensity).toBe(true);
    expect(sessionMetrics(se, PROFILE, { ...SETTINGS, recoveryWork: ["max_velocity"] }).highIntensity).toBe(false);
    const tempo = session("2026-03-10", { blocks: [runBlock("tempo", { distanceM: 100, intensityPct: 70 })] });
    expect(sessionMetrics(tempo, PROFILE, SETTINGS).highIntensity).toBe(false);
    const hiPlyo = session("2026-03-10", { blocks: [plyoBlock([drill(1, 5, 1, "high")])] });
    expect(sessionMetrics(hiPlyo, PROFILE, SETTINGS).highIntensity).toBe(true);
  });

  it("addAccToColumns writes the columns in METRICS order", () => {
    const acc = new Float64Array(ACC_SIZE).map((_, i) => i + 1);
    const rec = metricsFromAcc(acc);
    const cols = new Float64Array(2 * METRICS.length);
    addAccToColumns(acc, cols, 2, 1);
    METRICS.forEach((m, k) => {
      expect(cols[2 * k + 1]).toBe(rec[m]);
      expect(cols[2 * k]).toBe(0);
    });
  });
});

describe("actualSessionMetrics (as logged)", () => {
  const s = session("2026-03-10", { plannedRpe: 6, durationMin: 50, blocks });
  const planned = sessionMetrics(s, PROFILE, SETTINGS);

  it("completion yes / partly / no scale the prescription by 1 / 0.5 / 0", () => {
    const yes = actualSessionMetrics(s, log(s.id, { completion: "yes" }), PROFILE, SETTINGS);
    const partly = actualSessionMetrics(s, log(s.id, { completion: "partly" }), PROFILE, SETTINGS);
    const no = actualSessionMetrics(s, log(s.id, { completion: "no", rpe: 3, minutes: 20 }), PROFILE, SETTINGS);
    expect(yes.metrics).toEqual(planned.metrics);
    expect(partly.metrics.hsrM).toBeCloseTo(planned.metrics.hsrM / 2, 12);
    expect(partly.metrics.contacts).toBe(25);
    expect(Object.values(no.metrics).every((v) => v === 0)).toBe(true);
    expect(no.highIntensity).toBe(false);
  });

  it("sRPE = logged RPE × logged minutes; nulls fall back to planned RPE and planned minutes × completion", () => {
    expect(actualSessionMetrics(s, log(s.id, { rpe: 8, minutes: 55 }), PROFILE, SETTINGS).metrics.srpe).toBe(440);
    expect(actualSessionMetrics(s, log(s.id, { completion: "partly" }), PROFILE, SETTINGS).metrics.srpe).toBe(6 * 25);
    expect(actualSessionMetrics(s, log(s.id, { rpe: 9 }), PROFILE, SETTINGS).metrics.srpe).toBe(9 * 50);
    expect(actualSessionMetrics(s, log(s.id, { minutes: 30 }), PROFILE, SETTINGS).metrics.srpe).toBe(6 * 30);
  });

  it("completedReps scale each listed block by done ÷ prescribed; unlisted blocks use the completion factor", () => {
    const a = actualSessionMetrics(
      s,
      log(s.id, { completion: "partly", completedReps: { "b-acc": 4, "b-plyo": 20 } }),
      PROFILE,
      SETTINGS,
    );
    const acc = blockMetrics(blocks[0], PROFILE, SETTINGS);
    const mv = blockMetrics(blocks[1], PROFILE, SETTINGS);
    // b-acc: 4 of 8 reps; b-mv: not listed → partly 0.5; b-plyo: 20 of 40 total reps → half the contacts.
    expect(a.metrics.sprintM).toBeCloseTo(acc.sprintM * 0.5 + mv.sprintM * 0.5, 12);
    expect(a.metrics.contacts).toBe(25);
    const all = actualSessionMetrics(s, log(s.id, { completedReps: { "b-mv": 2 } }), PROFILE, SETTINGS);
    expect(all.metrics.sprintM).toBeCloseTo(acc.sprintM + mv.sprintM / 2, 12);
  });
});

describe("a partial session logged block by block (the athlete's log sheet)", () => {
  it("counts only the blocks done: two of three blocks at their planned reps, the third at 0; sRPE 7 × 60", () => {
    const s = session("2026-03-10", { plannedRpe: 6, durationMin: 50, blocks });
    const done = actualSessionMetrics(
      s,
      log(s.id, { completion: "partly", rpe: 7, minutes: 60, completedReps: { "b-acc": 8, "b-mv": 4, "b-plyo": 0 } }),
      PROFILE,
      SETTINGS,
    );
    const twoBlocks = sessionMetrics(session("2026-03-10", { blocks: blocks.slice(0, 2) }), PROFILE, SETTINGS);
    expect(done.metrics.hsrM).toBeCloseTo(twoBlocks.metrics.hsrM, 12);
    expect(done.metrics.sprintM).toBe(160 + 120);
    expect(done.metrics.contacts).toBe(0);
    // Foster et al. 2001: session RPE × minutes.
    expect(done.metrics.srpe).toBe(420);
  });
});
