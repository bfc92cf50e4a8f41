import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { DEFAULT_TEAM_LOAD_SETTINGS } from "@/lib/load/types";
import { analyseSpeedTrace, metresAbove, smoothSpeed, TRACE_SMOOTHING_S } from "@/lib/speed/speed-trace";

// Speed traces (lib/speed/README.md §8): check values worked by hand [C] and the sprint model's own curve.
const sample = (hz: number, seconds: number, v: (t: number) => number) => {
  const t = Array.from({ length: Math.round(seconds * hz) + 1 }, (_, i) => i / hz);
  return { t, v: t.map(v) };
};
const model =
  (vmax: number, tau: number, t0 = 0) =>
  (t: number) =>
    t <= t0 ? 0 : vmax * (1 - Math.exp(-(t - t0) / tau));

describe("metres in a speed band", () => {
  it("a steady 8 m/s for 10 s is 80 m above 5.5 m/s and none above 8.5 m/s [C]", () => {
    const tr = sample(10, 10, () => 8);
    expect(metresAbove(tr, 5.5)).toBeCloseTo(80, 10);
    expect(metresAbove(tr, 8.5)).toBe(0);
  });

  it("a ramp 0 → 10 m/s over 10 s holds (10² − 5.5²)/2 = 34.875 m above 5.5 m/s, exact on any sampling [C]", () => {
    for (const hz of [10, 13, 100])
      expect(
        metresAbove(
          sample(hz, 10, (t) => t),
          5.5,
        ),
      ).toBeCloseTo(34.875, 9);
  });
});

describe("vmax with a 0.5 s centred moving average", () => {
  it("removes a 2 Hz ±0.3 m/s stride oscillation on a 10 m/s plateau: vmax 10.0, the raw peak 10.3 [C]", () => {
    // 0.5 s is one period of 2 Hz, so the average of the oscillation over the window is zero.
    const tr = sample(100, 6, (t) => 10 + 0.3 * Math.sin(2 * Math.PI * 2 * t));
    const a = analyseSpeedTrace(tr, 10, DEFAULT_TEAM_LOAD_SETTINGS);
    expect(TRACE_SMOOTHING_S).toBe(0.5);
    expect(a.vmaxMs).toBeCloseTo(10, 3);
    expect(a.rawPeakMs).toBeCloseTo(10.3, 2); // the samples at 0.12 and 0.13 s straddle the crest
  });

  it("averages over the samples within ±0.25 s, fewer at the ends", () => {
    const s = smoothSpeed(sample(10, 1, (t) => t * 10));
    expect(s[5]).toBeCloseTo(5, 12); // 3,4,5,6,7
    expect(s[0]).toBeCloseTo(1, 12); // 0,1,2
  });
});

describe("τ fitted to the sprint in a trace", () => {
  it("recovers vmax 9.5 m/s and τ 1.1 s (lib/speed/README.md T4's sprint) from a 100 Hz trace to 1e-3, with the start", () => {
    // 1.3 s standing still, then the sprint for 7 s, then a slow-down.
    const run = model(9.5, 1.1, 1.3);
    const tr = sample(100, 12, (t) => (t < 8.3 ? run(t) : Math.max(0, run(8.3) - 2 * (t - 8.3))));
    const a = analyseSpeedTrace(tr, 9.5, DEFAULT_TEAM_LOAD_SETTINGS);
    expect(Math.abs(a.fit!.vmax - 9.5)).toBeLessThan(1e-3);
    expect(Math.abs(a.fit!.tau - 1.1)).toBeLessThan(1e-3);
    expect(Math.abs(a.fit!.startS - 1.3)).toBeLessThan(1e-2);
    expect(a.samplingHz).toBeCloseTo(100, 6);
    // The model's own peak 7 s in is 9.5·(1 − e^(−7/1.1)) = 9.4837 m/s; the smoothed peak sits just under it.
    expect(a.vmaxMs).toBeGreaterThan(9.47);
    expect(a.vmaxMs).toBeLessThan(9.4837);
  });

  it("stays finite and inside its box with noisy samples (fast-check, ±0.2 m/s)", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -0.2, max: 0.2, noNaN: true }), { minLength: 801, maxLength: 801 }),
        (noise) => {
          const run = model(9.5, 1.1);
          const tr = sample(100, 8, (t) => Math.max(0, run(t) + noise[Math.round(t * 100)]));
          const a = analyseSpeedTrace(tr, 9.5, DEFAULT_TEAM_LOAD_SETTINGS);
          if (!a.fit) return;
          expect(Math.abs(a.fit.vmax - 9.5)).toBeLessThan(0.3);
          expect(Math.abs(a.fit.tau - 1.1)).toBeLessThan(0.3);
        },
      ),
      { numRuns: 20 },
    );
  });
});

describe("the athlete's bands", () => {
  it("relative bands follow the athlete's vmax; the team's HSR line picks absolute or relative", () => {
    const tr = sample(10, 10, () => 8); // 80 m at 8 m/s
    const abs = analyseSpeedTrace(tr, 10, DEFAULT_TEAM_LOAD_SETTINGS);
    // 8 m/s is 80 % of a 10 m/s vmax: above 75 % (HSR), below 90 % (near-max).
    expect(abs.bands).toMatchObject({ absHsrM: 80, absSprintM: 80, relHsrM: 80, relNearMaxM: 0, relMaximalM: 0 });
    expect([abs.hsrM, abs.nearMaxM]).toEqual([80, 0]);
    const slower = analyseSpeedTrace(tr, 8.5, { ...DEFAULT_TEAM_LOAD_SETTINGS, speedZones: "relative" });
    // 8 m/s is 94 % of 8.5 m/s: near-max, not maximal (95 %).
    expect([slower.hsrM, slower.nearMaxM, slower.bands.relMaximalM]).toEqual([80, 80, 0]);
  });
});
