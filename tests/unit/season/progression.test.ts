import { describe, expect, it } from "vitest";
import { progressionFactors } from "@/lib/season/progression";

// Expected factors are worked by hand from the rules stated in lib/season/README.md.
describe("build and unload", () => {
  it("+8 % a week for three weeks, a 40 % unload, then the next build one step higher (common practice)", () => {
    const f = progressionFactors({ kind: "build", weeklyIncreasePct: 8, buildWeeks: 3, unloadPct: 40 }, 8);
    const expected = [1.08, 1.1664, 1.259712, 0.7558272, 1.1664, 1.259712, 1.36048896, 0.816293376];
    f.forEach((v, i) => expect(v).toBeCloseTo(expected[i], 12));
  });

  it("+10 % with one build week alternates build and unload", () => {
    const f = progressionFactors({ kind: "build", weeklyIncreasePct: 10, buildWeeks: 1, unloadPct: 30 }, 4);
    [1.1, 0.77, 1.21, 0.847].forEach((v, i) => expect(f[i]).toBeCloseTo(v, 12));
  });

  it("answers nothing for zero, negative or fractional spans", () => {
    const rule = { kind: "build", weeklyIncreasePct: 8, buildWeeks: 3, unloadPct: 40 } as const;
    expect(progressionFactors(rule, 0)).toEqual([]);
    expect(progressionFactors(rule, -2)).toEqual([]);
    expect(progressionFactors(rule, 1.5)).toEqual([]);
  });
});

describe("taper before an A meet", () => {
  // Volume cut of 41–60 % over 8–14 days, progressive (Bosquet et al. 2007, Med Sci Sports Exerc 39:1358; from memory).
  it("linear: the cut grows evenly to the full reduction in the last week", () => {
    expect(progressionFactors({ kind: "taper", reductionPct: 50, shape: "linear" }, 2)).toEqual([0.75, 0.5]);
  });

  it("step: the whole cut at once", () => {
    expect(progressionFactors({ kind: "taper", reductionPct: 40, shape: "step" }, 2)).toEqual([0.6, 0.6]);
  });

  it("exponential (time constant half the taper): fast early cut that levels off at the full reduction", () => {
    // 1 − 0.5 · (1 − e^(−k/1.5)) / (1 − e^(−2)) for k = 1, 2, 3.
    const f = progressionFactors({ kind: "taper", reductionPct: 50, shape: "exponential" }, 3);
    [0.718629156750616, 0.5741685490297463, 0.5].forEach((v, i) => expect(f[i]).toBeCloseTo(v, 12));
    expect(f[0] - f[1]).toBeGreaterThan(f[1] - f[2]);
  });
});
