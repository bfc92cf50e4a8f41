import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { acwrSeries } from "@/lib/load/acwr";
import { blockMetrics } from "@/lib/load/block-metrics";
import { metresAtOrAbove } from "@/lib/load/sprint-model";
import { ACWR_METHODS, DEFAULT_TEAM_LOAD_SETTINGS, type AthleteProfile, type BlockInput } from "@/lib/load/types";

// Properties that follow from the definitions (lib/load/README.md §1, §6): checked on random inputs with fast-check.

const load = fc.oneof(fc.constant(0), fc.double({ min: 1, max: 2000, noNaN: true }));
const loads = (minLength: number) => fc.array(load, { minLength, maxLength: 160 });
const method = fc.constantFrom(...ACWR_METHODS);
const close = (a: number, b: number, rel: number) => Math.abs(a - b) <= rel * Math.max(1, Math.abs(a), Math.abs(b));

describe("ACWR properties", () => {
  it("a constant load gives ratio 1 for every method once 28 days have passed (R2/E3)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 5000, noNaN: true }),
        fc.integer({ min: 28, max: 120 }),
        method,
        (value, n, m) => {
          const s = acwrSeries(
            Array.from({ length: n }, () => value),
            m,
          );
          for (let i = 27; i < n; i++) {
            expect(close(s.ratio[i]!, 1, 1e-12)).toBe(true);
            expect(s.provisional[i]).toBe(false);
          }
        },
      ),
    );
  });

  it("scaling every load by k > 0 leaves every ratio unchanged (ACWR is unit-free)", () => {
    fc.assert(
      fc.property(loads(1), fc.double({ min: 1e-3, max: 1e3, noNaN: true }), method, (xs, k, m) => {
        const a = acwrSeries(xs, m).ratio;
        const b = acwrSeries(
          xs.map((x) => x * k),
          m,
        ).ratio;
        a.forEach((r, i) => {
          if (r === null) expect(b[i]).toBeNull();
          else expect(close(r, b[i]!, 1e-8)).toBe(true);
        });
      }),
    );
  });

  it("inserting a rest day (0) never raises the acute load on any later day", () => {
    fc.assert(
      fc.property(loads(1), fc.nat(), method, (xs, pos, m) => {
        const k = pos % (xs.length + 1);
        const ys = [...xs.slice(0, k), 0, ...xs.slice(k)];
        const before = acwrSeries(xs, m).acute;
        const after = acwrSeries(ys, m).acute;
        for (let j = 0; j < k; j++) expect(after[j]).toBe(before[j]);
        // Day j of the old series is day j + 1 of the new one.
        for (let j = k; j < xs.length; j++)
          expect(after[j + 1]).toBeLessThanOrEqual(before[j] + 1e-9 * Math.max(1, before[j]));
        if (k > 0) expect(after[k]).toBeLessThanOrEqual(before[k - 1] + 1e-9 * Math.max(1, before[k - 1]));
      }),
    );
  });

  it("ratios are never Infinity or NaN", () => {
    fc.assert(
      fc.property(loads(0), method, (xs, m) => {
        for (const r of acwrSeries(xs, m).ratio) expect(r === null || Number.isFinite(r)).toBe(true);
      }),
    );
  });
});

const runningBlock = fc.record({
  kind: fc.constantFrom("acceleration", "max_velocity", "speed_endurance", "tempo") as fc.Arbitrary<BlockInput["kind"]>,
  sets: fc.integer({ min: 0, max: 5 }),
  reps: fc.integer({ min: 0, max: 10 }),
  distanceM: fc.double({ min: 0, max: 400, noNaN: true }),
  intensityPct: fc.double({ min: 40, max: 100, noNaN: true }),
  runInM: fc.double({ min: 0, max: 40, noNaN: true }),
});
const profile = fc.record({
  vmax: fc.double({ min: 6, max: 12.5, noNaN: true }),
  tau: fc.double({ min: 0.6, max: 2, noNaN: true }),
});

function toBlock(b: {
  kind: BlockInput["kind"];
  sets: number;
  reps: number;
  distanceM: number;
  intensityPct: number;
  runInM: number;
}): BlockInput {
  return { kind: b.kind, title: "rep", running: { ...b, start: b.runInM > 0 ? "flying" : "standing", restSec: 120 } };
}

describe("running-metre properties", () => {
  it("HSR metres ≤ total running metres", () => {
    fc.assert(
      fc.property(runningBlock, profile, fc.double({ min: 0, max: 10, noNaN: true }), (b, p, hsr) => {
        const ap: AthleteProfile = { ...p, stepLengthM: 2.2, plyoLevel: "beginner" };
        const m = blockMetrics(toBlock(b), ap, { ...DEFAULT_TEAM_LOAD_SETTINGS, hsrSpeedMs: hsr });
        expect(m.hsrM).toBeGreaterThanOrEqual(0);
        expect(m.hsrM).toBeLessThanOrEqual(m.runM * (1 + 1e-12));
      }),
    );
  });

  it("near-max metres ≤ HSR metres whenever the near-max speed is at least the HSR speed", () => {
    fc.assert(
      fc.property(
        runningBlock,
        profile,
        fc.double({ min: 50, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (b, p, pct, share) => {
          const nearMaxSpeed = (pct / 100) * p.vmax;
          const settings = { ...DEFAULT_TEAM_LOAD_SETTINGS, nearMaxPct: pct, hsrSpeedMs: nearMaxSpeed * share };
          const m = blockMetrics(toBlock(b), { ...p, stepLengthM: 2.2, plyoLevel: "beginner" }, settings);
          expect(m.nearMaxM).toBeLessThanOrEqual(m.hsrM * (1 + 1e-12) + 1e-12);
        },
      ),
    );
  });

  it("metres at or above a speed fall as the speed rises", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 12, noNaN: true }),
        fc.double({ min: 0, max: 12, noNaN: true }),
        fc.double({ min: 1, max: 12, noNaN: true }),
        fc.double({ min: 1, max: 300, noNaN: true }),
        (s1, s2, target, total) => {
          const [lo, hi] = s1 <= s2 ? [s1, s2] : [s2, s1];
          const rep = { targetSpeed: target, tau: 1.1, totalDistance: total };
          expect(metresAtOrAbove(hi, rep)).toBeLessThanOrEqual(metresAtOrAbove(lo, rep) + 1e-9);
        },
      ),
    );
  });
});
