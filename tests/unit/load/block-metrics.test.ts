import { describe, expect, it } from "vitest";
import { blockMetrics, resolveProfile } from "@/lib/load/block-metrics";
import { metresAtOrAbove } from "@/lib/load/sprint-model";
import { DEFAULT_STEP_LENGTH, DEFAULT_TAU, DEFAULT_VMAX } from "@/lib/load/types";
import { PROFILE, SETTINGS, drill, plyoBlock, runBlock } from "./fixtures";

describe("running blocks", () => {
  it("scales one rep by sets × reps, with HSR ≥ 5.5 m/s and near-max ≥ 90% vmax from the model", () => {
    const m = blockMetrics(runBlock("acceleration", { sets: 2, reps: 3, distanceM: 30, intensityPct: 95 }), PROFILE, SETTINGS);
    const rep = { targetSpeed: 9.5, tau: 1, totalDistance: 30 };
    expect(m.runM).toBe(180);
    expect(m.sprintM).toBe(180);
    expect(m.hsrM).toBeCloseTo(6 * metresAtOrAbove(5.5, rep), 12);
    expect(m.nearMaxM).toBeCloseTo(6 * metresAtOrAbove(9, rep), 12);
    expect(m.nearMaxM).toBeLessThan(m.hsrM);
    expect(m.contacts.total).toBe(0);
  });

  it("a flying rep is run from rest over run-in + distance, so the run-in counts", () => {
    const flying = blockMetrics(
      runBlock("max_velocity", { start: "flying", runInM: 20, distanceM: 30, intensityPct: 97, reps: 4 }),
      PROFILE,
      SETTINGS,
    );
    const rep = { targetSpeed: 9.7, tau: 1, totalDistance: 50 };
    expect(flying.runM).toBe(200);
    expect(flying.hsrM).toBeCloseTo(4 * metresAtOrAbove(5.5, rep), 12);
    expect(flying.nearMaxM).toBeCloseTo(4 * metresAtOrAbove(9, rep), 12);
  });

  it("H2 boundary: a rep at 93.75% earns near-max metres at a 90% threshold but none at 95% (lib/load/README.md §1 B3 [C])", () => {
    const block = runBlock("max_velocity", { start: "flying", runInM: 30, distanceM: 30, intensityPct: 93.75 });
    expect(blockMetrics(block, PROFILE, SETTINGS).nearMaxM).toBeGreaterThan(0);
    expect(blockMetrics(block, PROFILE, { ...SETTINGS, nearMaxPct: 95 }).nearMaxM).toBe(0);
  });

  it("H3 boundary: 94.92% of vmax 9.8 stays under a 95% threshold (lib/load/README.md §1 B3 [C])", () => {
    const block = runBlock("max_velocity", { start: "flying", runInM: 30, distanceM: 20, intensityPct: 94.92 });
    expect(blockMetrics(block, { ...PROFILE, vmax: 9.8 }, { ...SETTINGS, nearMaxPct: 95 }).nearMaxM).toBe(0);
  });

  it("tempo counts in runM and HSR but not in sprint metres or steps", () => {
    const m = blockMetrics(runBlock("tempo", { reps: 6, distanceM: 100, intensityPct: 70, start: "standing" }), PROFILE, SETTINGS);
    expect(m.runM).toBe(600);
    expect(m.hsrM).toBeGreaterThan(0); // 70% of 10 m/s = 7 m/s > 5.5
    expect(m.nearMaxM).toBe(0);
    expect(m.sprintM).toBe(0);
    expect(m.sprintSteps).toBe(0);
  });

  it("sprint steps = sprint metres ÷ step length (estimate)", () => {
    const m = blockMetrics(runBlock("speed_endurance", { reps: 3, distanceM: 150, intensityPct: 90 }), PROFILE, SETTINGS);
    expect(m.sprintSteps).toBeCloseTo(450 / 2.2, 12);
  });

  it("untested athletes use the documented defaults", () => {
    const rp = resolveProfile({ vmax: null, tau: null, stepLengthM: null, plyoLevel: "beginner" }, SETTINGS);
    expect([rp.vmax, rp.tau, rp.stepLengthM]).toEqual([DEFAULT_VMAX, DEFAULT_TAU, DEFAULT_STEP_LENGTH]);
    expect(rp.nearMaxSpeed).toBeCloseTo(0.9 * DEFAULT_VMAX, 12);
  });

  it("ignores form data that does not match the kind and bad numbers", () => {
    const strength = { kind: "strength" as const, title: "Squats", running: runBlock("tempo").running };
    expect(blockMetrics(strength, PROFILE, SETTINGS).runM).toBe(0);
    const broken = runBlock("acceleration", { sets: Number.NaN, reps: 3 });
    expect(blockMetrics(broken, PROFILE, SETTINGS).runM).toBe(0);
  });
});

describe("plyometric contacts (NSCA: one contact per landing of one foot or both feet; lib/load/README.md §2 [C])", () => {
  it("P1: 2×10 pogo + 3×8 box jumps + 4×6 bounds = 68 contacts", () => {
    const m = blockMetrics(
      plyoBlock([drill(2, 10, 1, "low", "pogo hops"), drill(3, 8, 1, "moderate", "box jumps"), drill(4, 6, 1, "high", "alternate-leg bounds")]),
      PROFILE,
      SETTINGS,
    );
    expect(m.contacts).toEqual({ low: 20, moderate: 24, high: 24, total: 68 });
  });

  it("P2: 3×10 hurdle hops + 4×10 ankle hops + 5×8 bounds = 110 contacts", () => {
    const m = blockMetrics(
      plyoBlock([drill(3, 10, 1, "moderate"), drill(4, 10, 1, "low"), drill(5, 8, 1, "high")]),
      PROFILE,
      SETTINGS,
    );
    expect(m.contacts.total).toBe(110);
  });

  it("P3: single-leg hops, 10 per leg = 20 contacts; a bilateral jump = 1 contact per landing", () => {
    expect(blockMetrics(plyoBlock([drill(1, 10, 2, "moderate", "single-leg hops, each leg")]), PROFILE, SETTINGS).contacts.total).toBe(20);
    expect(blockMetrics(plyoBlock([drill(1, 1, 1, "low", "squat jump")]), PROFILE, SETTINGS).contacts.total).toBe(1);
  });
});
