import { describe, expect, it } from "vitest";
import { blockMetrics, resolveProfile } from "@/lib/load/block-metrics";
import { DEFAULT_STEP_LENGTH, DEFAULT_TAU, DEFAULT_VMAX } from "@/lib/load/types";
import { PROFILE, SETTINGS, drill, plyoBlock, runBlock } from "./fixtures";

describe("running blocks", () => {
  // Hand-computed (lib/load/README.md §1 B1): a rep from rest towards target T = 95% × 10 = 9.5 m/s with
  // τ = 1 s reaches speed s after t* = −τ·ln(1 − s/T) and x* = T·t* − τ·s metres (Furusawa, Hill & Parkinson 1927).
  // s = 5.5: t* = −ln(4/9.5) = 0.864997, x* = 2.717476 m, so 30 − x* = 27.282524 m a rep, × 6 reps = 163.695146 m.
  // s = 9.0: t* = −ln(0.5/9.5) = 2.944439, x* = 18.972170 m, so 11.027830 m a rep, × 6 = 66.166978 m.
  it("2 × 3 × 30 m at 95% from a crouch (vmax 10, τ 1): HSR 163.695 m above 5.5 m/s, 66.167 m above 9.0 m/s", () => {
    const m = blockMetrics(
      runBlock("acceleration", { sets: 2, reps: 3, distanceM: 30, intensityPct: 95 }),
      PROFILE,
      SETTINGS,
    );
    expect(m.runM).toBe(180);
    expect(m.sprintM).toBe(180);
    expect(m.hsrM).toBeCloseTo(163.695146, 5);
    expect(m.nearMaxM).toBeCloseTo(66.166978, 5);
    expect(m.contacts.total).toBe(0);
  });

  // Blocks: τ × 0.95 (lib/load/README.md §11.2, common practice / from memory). x* is proportional to τ, so
  // x*(5.5) = 0.95 × 2.717476 = 2.581602 m and x*(9.0) = 0.95 × 18.972170 = 18.023562 m:
  // HSR = 6 × (30 − 2.581602) = 164.510389 m; near-max = 6 × (30 − 18.023562) = 71.858629 m.
  it("a block start reaches each line sooner than a crouch start (τ × 0.95)", () => {
    const m = blockMetrics(
      runBlock("acceleration", { sets: 2, reps: 3, distanceM: 30, intensityPct: 95, start: "blocks" }),
      PROFILE,
      SETTINGS,
    );
    expect(m.hsrM).toBeCloseTo(164.510389, 5);
    expect(m.nearMaxM).toBeCloseTo(71.858629, 5);
    const standing = blockMetrics(
      runBlock("acceleration", { sets: 2, reps: 3, distanceM: 30, intensityPct: 95, start: "standing" }),
      PROFILE,
      SETTINGS,
    );
    expect(standing.hsrM).toBeCloseTo(163.695146, 5);
  });

  // Flying 4 × (20 m run-in + 30 m) at 97% (T = 9.7 m/s), vmax 10, τ 1. The run-in is a build-up that would reach T at
  // the end of the run-in at constant acceleration (v² = 2ax, so speed s at x = 20·(s/T)²), never faster than all-out:
  // s = 5.5: build-up 20 × (5.5/9.7)² = 6.430014 m; all-out x* = 9.7 × 0.837032 − 5.5 = 2.619301 m; later = 6.430014 m,
  //   so 50 − 6.430014 = 43.569986 m a rep, × 4 = 174.279945 m (all-out from rest gave 189.52 m before).
  // s = 9.0: build-up 20 × (9/9.7)² = 17.217558 m; all-out 9.7 × 2.628826 − 9 = 16.499368 m; later = 17.217558 m,
  //   so 32.782442 m a rep, × 4 = 131.129769 m.
  // Sprint metres count the timed 30 m only (4 × 30 = 120 m); running metres count the run-in too (200 m).
  it("a flying rep's run-in is a build-up: counted in running and band metres, not in sprint metres", () => {
    const flying = blockMetrics(
      runBlock("max_velocity", { start: "flying", runInM: 20, distanceM: 30, intensityPct: 97, reps: 4 }),
      PROFILE,
      SETTINGS,
    );
    expect(flying.runM).toBe(200);
    expect(flying.sprintM).toBe(120);
    expect(flying.sprintSteps).toBeCloseTo(120 / 2.2, 12);
    expect(flying.hsrM).toBeCloseTo(174.279945, 5);
    expect(flying.nearMaxM).toBeCloseTo(131.129769, 5);
  });

  // Relative zones (lib/load/README.md §11.1; team setting speedZones "relative", hsrPct 75): the HSR line is 75% × 10 = 7.5 m/s.
  // Same rep as above (T = 9.5, τ 1): t* = −ln(2/9.5) = 1.558145, x* = 9.5 × 1.558145 − 7.5 = 7.302375 m,
  // so 6 × (30 − 7.302375) = 136.185757 m. Absolute sprint band 7.0 m/s: t* = −ln(2.5/9.5) = 1.335001,
  // x* = 5.682508 m, 6 × 24.317492 = 145.904939 m. The ≥ 95% band is 0 (the model only approaches T = 9.5).
  it("relative speed zones: HSR from 75% of the athlete's vmax, and every band shown", () => {
    const block = runBlock("acceleration", { sets: 2, reps: 3, distanceM: 30, intensityPct: 95 });
    const rel = blockMetrics(block, PROFILE, { ...SETTINGS, speedZones: "relative" });
    expect(rel.hsrM).toBeCloseTo(136.185757, 5);
    expect(rel.bands.absHsrM).toBeCloseTo(163.695146, 5);
    expect(rel.bands.absSprintM).toBeCloseTo(145.904939, 5);
    expect(rel.bands.relHsrM).toBeCloseTo(136.185757, 5);
    expect(rel.bands.relNearMaxM).toBeCloseTo(66.166978, 5);
    expect(rel.bands.relMaximalM).toBe(0);
    expect(blockMetrics(block, PROFILE, SETTINGS).bands).toEqual(rel.bands);
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
    const m = blockMetrics(
      runBlock("tempo", { reps: 6, distanceM: 100, intensityPct: 70, start: "standing" }),
      PROFILE,
      SETTINGS,
    );
    expect(m.runM).toBe(600);
    expect(m.hsrM).toBeGreaterThan(0); // 70% of 10 m/s = 7 m/s > 5.5
    expect(m.nearMaxM).toBe(0);
    expect(m.sprintM).toBe(0);
    expect(m.sprintSteps).toBe(0);
  });

  it("sprint steps = sprint metres ÷ step length (estimate)", () => {
    const m = blockMetrics(
      runBlock("speed_endurance", { reps: 3, distanceM: 150, intensityPct: 90 }),
      PROFILE,
      SETTINGS,
    );
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
      plyoBlock([
        drill(2, 10, 1, "low", "pogo hops"),
        drill(3, 8, 1, "moderate", "box jumps"),
        drill(4, 6, 1, "high", "alternate-leg bounds"),
      ]),
      PROFILE,
      SETTINGS,
    );
    // Weighted by intensity (plyo.ts PLYO_INTENSITY_WEIGHT 1/2/3, a design choice): 20 + 2 × 24 + 3 × 24 = 140.
    expect(m.contacts).toEqual({ low: 20, moderate: 24, high: 24, total: 68, weighted: 140 });
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
    expect(
      blockMetrics(plyoBlock([drill(1, 10, 2, "moderate", "single-leg hops, each leg")]), PROFILE, SETTINGS).contacts
        .total,
    ).toBe(20);
    expect(blockMetrics(plyoBlock([drill(1, 1, 1, "low", "squat jump")]), PROFILE, SETTINGS).contacts.total).toBe(1);
  });
});
