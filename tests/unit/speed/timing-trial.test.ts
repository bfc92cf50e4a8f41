import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { T4_GATES } from "./fixtures";
import { distanceAt, timeToDistance } from "@/lib/load/sprint-model";
import { forceVelocityProfile } from "@/lib/speed/force-velocity";
import { FIT_BOUNDS, fitSprint } from "@/lib/speed/sprint-fit";
import { analyseTimingTrial } from "@/lib/speed/timing-trial";

const T4 = T4_GATES;

describe("split and interval speeds (lib/speed/README.md §1)", () => {
  it("T1: 20 m in 2.000 s = 10.0 m/s = 36.0 km/h; 10 m in 1.05 s = 9.523810 m/s = 34.285714 km/h", () => {
    const a = analyseTimingTrial({ gates: [], flying: { lengthM: 20, timeS: 2 } });
    expect(a.bestFlying?.speed.ms).toBeCloseTo(10, 12);
    expect(a.bestFlying?.speed.kmh).toBeCloseTo(36, 12);
    const b = analyseTimingTrial({ gates: [{ distanceM: 10, timeS: 1.05 }] });
    expect(b.splits[0].speed.ms).toBeCloseTo(9.52381, 6);
    expect(b.splits[0].speed.kmh).toBeCloseTo(34.285714, 6);
    expect(b.fit).toBeNull(); // one gate cannot fix two unknowns
  });

  it("T4: flying intervals 20–30 m 9.1539 and 30–40 m 9.3705 m/s; the best flying speed is below vmax", () => {
    const a = analyseTimingTrial({ gates: T4 });
    const iv = (from: number) => a.intervals.find((i) => i.fromM === from)!;
    // The printed averages come from the model's unrounded times; the 0.1 ms rounding of the splits moves them
    // by up to 0.001 m/s, so the rounded splits are checked to 2 decimals and the exact times to 4.
    expect(iv(20).speed.ms).toBeCloseTo(9.1539, 2);
    expect(iv(30).speed.ms).toBeCloseTo(9.3705, 2);
    const exact = analyseTimingTrial({
      gates: [10, 20, 30, 40].map((d) => ({ distanceM: d, timeS: timeToDistance(d, 9.5, 1.1) })),
    });
    expect(exact.intervals[2].speed.ms).toBeCloseTo(9.1539, 4);
    expect(exact.intervals[3].speed.ms).toBeCloseTo(9.3705, 4);
    expect(a.intervals.map((i) => i.fromM)).toEqual([0, 10, 20, 30]);
    expect(a.bestFlying).toMatchObject({ fromM: 30, toM: 40 });
    expect(a.bestFlying!.speed.ms).toBeLessThan(9.5);
    // 20–40 m: 20 / (5.3017 − 3.1420) = 9.2609 m/s = 33.339 km/h
    expect(msOver(20, 40)).toBeCloseTo(9.2609, 2);
    expect(msOver(20, 40) * 3.6).toBeCloseTo(33.339, 1);
    function msOver(from: number, to: number) {
      const t = (d: number) => T4.find((g) => g.distanceM === d)!.timeS;
      return (to - from) / (t(to) - t(from));
    }
  });

  it("a flying zone faster than any interval is the best flying speed", () => {
    const a = analyseTimingTrial({ gates: T4, flying: { lengthM: 20, timeS: 2.1 } });
    expect(a.bestFlying).toMatchObject({ fromM: 0, toM: 20 });
    expect(a.bestFlying!.speed.ms).toBeCloseTo(20 / 2.1, 12);
  });
});

describe("fit of v(t) = vmax(1 − e^(−t/τ)) by least squares (lib/speed/README.md §2)", () => {
  it("T4: recovers vmax 9.5 m/s and τ 1.1 s to 1e-3 from the printed splits, with small residuals", () => {
    const fit = fitSprint(T4)!;
    expect(Math.abs(fit.vmax - 9.5)).toBeLessThan(1e-3);
    expect(Math.abs(fit.tau - 1.1)).toBeLessThan(1e-3);
    expect(fit.residuals).toHaveLength(4);
    // The splits are printed to 0.1 ms: every residual is within that rounding.
    for (const r of fit.residuals) expect(Math.abs(r.timeResidualS)).toBeLessThan(1e-4);
    expect(fit.rmseTimeS).toBeLessThan(1e-4);
  });

  it("exact model times give the parameters back to 1e-6 (T3: vmax 10, τ 1, lib/load/README.md §1)", () => {
    const gates = [
      { distanceM: 5, timeS: 1.19829 },
      { distanceM: 10, timeS: 1.841406 },
      { distanceM: 20, timeS: 2.947531 },
      { distanceM: 30, timeS: 3.981339 },
    ];
    const fit = fitSprint(gates)!;
    expect(fit.vmax).toBeCloseTo(10, 4);
    expect(fit.tau).toBeCloseTo(1, 4);
  });

  it("refuses what cannot come from a run: times going backwards, repeated distances, fewer than two gates", () => {
    expect(fitSprint([T4[1], { distanceM: 20, timeS: 1.5 }])).toBeNull();
    expect(fitSprint([T4[1], { distanceM: 10, timeS: 2.5 }])).toBeNull();
    expect(fitSprint([T4[1]])).toBeNull();
    expect(fitSprint([])).toBeNull();
  });

  it("degrades gracefully with noisy splits: ±0.02 s on each T4 split keeps vmax within 0.5 m/s, τ within 0.4 s", () => {
    // Our tolerance (lib/speed/README.md §2); noise of a few hundredths is common practice for timing gates.
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -0.02, max: 0.02, noNaN: true }), { minLength: 4, maxLength: 4 }),
        (noise) => {
          const gates = T4.slice(1).map((g, i) => ({ distanceM: g.distanceM, timeS: g.timeS + noise[i] }));
          const fit = fitSprint(gates)!;
          expect(fit).not.toBeNull();
          expect(Math.abs(fit.vmax - 9.5)).toBeLessThan(0.5);
          expect(Math.abs(fit.tau - 1.1)).toBeLessThan(0.4);
          expect(Number.isFinite(fit.rmseTimeS)).toBe(true);
        },
      ),
      { numRuns: 200 },
    );
  });

  it("never throws or answers NaN on any increasing gate times: a fit inside its box or null", () => {
    const gatesArb = fc
      .array(fc.tuple(fc.double({ min: 0.5, max: 30, noNaN: true }), fc.double({ min: 0.05, max: 3, noNaN: true })), {
        minLength: 0,
        maxLength: 7,
      })
      .map((steps) => {
        let d = 0;
        let t = 0;
        return steps.map(([dd, dt]) => ({ distanceM: (d += dd), timeS: (t += dt) }));
      });
    fc.assert(
      fc.property(gatesArb, (gates) => {
        const fit = fitSprint(gates);
        if (gates.length < 2) {
          expect(fit).toBeNull();
          return;
        }
        expect(fit).not.toBeNull();
        expect(fit!.vmax).toBeGreaterThanOrEqual(FIT_BOUNDS.vmax[0]);
        expect(fit!.vmax).toBeLessThanOrEqual(FIT_BOUNDS.vmax[1]);
        expect(fit!.tau).toBeGreaterThanOrEqual(FIT_BOUNDS.tau[0]);
        expect(fit!.tau).toBeLessThanOrEqual(FIT_BOUNDS.tau[1]);
        for (const r of fit!.residuals) expect(Number.isFinite(r.distanceResidualM)).toBe(true);
      }),
      { numRuns: 200 },
    );
  });

  it("the residuals are the model's distance at each time minus the gate", () => {
    const fit = fitSprint(T4)!;
    for (const r of fit.residuals)
      expect(r.distanceResidualM).toBeCloseTo(distanceAt(r.timeS, fit.vmax, fit.tau) - r.distanceM, 12);
  });
});

describe("force–velocity profile without drag (lib/speed/README.md §3)", () => {
  it("T5: 75 kg, vmax 10 m/s, τ 1.2 s → F0 625 N, V0 10 m/s, Pmax 1562.5 W", () => {
    const p = forceVelocityProfile({ bodyMassKg: 75, vmax: 10, tau: 1.2 });
    expect(p.f0N).toBeCloseTo(625, 9);
    expect(p.v0).toBe(10);
    expect(p.pmaxW).toBeCloseTo(1562.5, 9);
    expect(p.f0PerKg).toBeCloseTo(625 / 75, 12);
  });

  it("T6: Samozino et al. 2016's printed means F0 638 N, V0 10.5 m/s → F0·V0/4 = 1674.75 W, 0.3 % from 1680 W", () => {
    // F0 = m·vmax/τ with m·vmax/τ = 638 when m = 63.8, vmax 10.5, τ = 1.05.
    const p = forceVelocityProfile({ bodyMassKg: 63.8, vmax: 10.5, tau: 1.05 });
    expect(p.f0N).toBeCloseTo(638, 9);
    expect(p.pmaxW).toBeCloseTo(1674.75, 9);
    expect(Math.abs(p.pmaxW - 1680) / 1680).toBeLessThan(0.005);
  });

  it("a trial with body mass carries the profile of its fit; without it, none", () => {
    const a = analyseTimingTrial({ gates: T4, bodyMassKg: 75 });
    expect(a.profile!.f0N).toBeCloseTo((75 * a.fit!.vmax) / a.fit!.tau, 9);
    expect(analyseTimingTrial({ gates: T4 }).profile).toBeNull();
  });
});
