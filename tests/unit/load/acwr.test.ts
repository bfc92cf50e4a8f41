import { describe, expect, it } from "vitest";
import {
  acwrSeries,
  coupledFromUncoupled,
  coupledRatio,
  ewma,
  ewmaLambda,
  uncoupledFromCoupled,
  uncoupledRatio,
} from "@/lib/load/acwr";

const rep = (value: number, n: number): number[] => Array.from({ length: n }, () => value);

describe("EWMA constants (Williams et al. 2017, BJSM 51:209: λ = 2/(N+1); lib/load/README.md §6 [C])", () => {
  it("λ7 = 0.25 and λ28 = 2/29", () => {
    expect(ewmaLambda(7)).toBe(0.25);
    expect(ewmaLambda(28)).toBeCloseTo(0.0689655172, 10);
  });

  // Hand values [C]: weights λ(1−λ)^k are 0.068966, 0.064209, 0.059781 (chronic); the last N days carry
  // 1 − 0.75^7 = 0.866516 (acute) and 1 − (27/29)^28 = 0.864780 (chronic) of a constant load; acute half-life 2.4094 d.
  it("a chronic impulse decays with weights 0.068966, 0.064209, 0.059781", () => {
    const e = ewma([0, 100, 0, 0], 28).subarray(1);
    expect(e[0]).toBeCloseTo(6.896552, 6);
    expect(e[1]).toBeCloseTo(6.420927, 6);
    expect(e[2]).toBeCloseTo(5.978105, 6);
  });

  it("from 0, seven days of 100 reach 86.6516 (acute) and 28 days reach 86.4780 (chronic)", () => {
    expect(ewma([0, ...rep(100, 7)], 7)[7]).toBeCloseTo(86.651611, 6);
    expect(ewma([0, ...rep(100, 28)], 28)[28]).toBeCloseTo(86.478, 3);
  });

  it("an acute impulse is above half after 2 days and below half after 3 (half-life 2.4094 d)", () => {
    const e = ewma([100, 0, 0, 0], 7);
    expect(e[2]).toBeGreaterThan(50);
    expect(e[3]).toBeLessThan(50);
  });

  it("an impulse after a first day of 0 decays with weights 0.25, 0.1875, 0.140625", () => {
    const e = ewma([0, 100, 0, 0], 7);
    expect(Array.from(e)).toEqual([0, 25, 18.75, 14.0625]);
  });
});

describe("EWMA check values (lib/load/README.md §6 [C], recurrence of Williams et al. 2017)", () => {
  it("E1: loads [100, 200] seeded with day 1 → acute 125, chronic 106.896552, ratio 1.169355", () => {
    const s = acwrSeries([100, 200], "ewma");
    expect(s.acute[1]).toBe(125);
    expect(s.chronic[1]).toBeCloseTo(3100 / 29, 9);
    expect(s.chronic[1]).toBeCloseTo(106.896552, 6);
    expect(s.ratio[1]).toBeCloseTo(1.169355, 6);
  });

  it("E1 matches pandas ewm(span=N, adjust=False): y0 = x0, y_t = (1−α)y_{t−1} + αx_t (pandas.Series.ewm docs)", () => {
    const xs = [3, 7, 1, 9, 4];
    const alpha = 2 / (7 + 1);
    let y = xs[0];
    const expected = xs.map((x, i) => (i === 0 ? y : (y = (1 - alpha) * y + alpha * x)));
    expect(Array.from(ewma(xs, 7))).toEqual(expected);
  });

  it("E2: 21×300 then 7×600, seed = first → day 28 acute 559.954834, chronic 418.079509, ratio 1.339350", () => {
    const loads = [...rep(300, 21), ...rep(600, 7)];
    const s = acwrSeries(loads, "ewma");
    expect(s.acute[27]).toBeCloseTo(559.954834, 6);
    expect(s.chronic[27]).toBeCloseTo(418.079509, 6);
    expect(s.ratio[27]).toBeCloseTo(1.33935, 6);
  });

  it("E2 behind one padded rest day (a seed of 0) → acute 559.859590, chronic 377.513460, ratio 1.483019 (why nothing is padded)", () => {
    const loads = [0, ...rep(300, 21), ...rep(600, 7)];
    const s = acwrSeries(loads, "ewma");
    expect(s.acute[28]).toBeCloseTo(559.85959, 6);
    expect(s.chronic[28]).toBeCloseTo(377.51346, 6);
    expect(s.ratio[28]).toBeCloseTo(1.483019, 6);
  });

  it("acwrSeries' fused EWMA pass equals ewma() exactly", () => {
    const xs = [0, 310, 0, 0, 455.5, 120, 0, 610, 90, 0, 0, 333];
    const s = acwrSeries(xs, "ewma");
    expect(Array.from(s.acute)).toEqual(Array.from(ewma(xs, 7)));
    expect(Array.from(s.chronic)).toEqual(Array.from(ewma(xs, 28)));
  });

  it("E3: a constant load seeded with itself keeps both EWMAs at L and the ratio at exactly 1", () => {
    const s = acwrSeries(rep(420, 60), "ewma");
    expect(s.acute.every((v) => v === 420)).toBe(true);
    expect(s.chronic.every((v) => v === 420)).toBe(true);
    expect(s.ratio.every((r) => r === 1)).toBe(true);
  });
});

describe("rolling ACWR (Hulin 2016 coupled; Lolli 2019 / Gabbett 2019 uncoupled; lib/load/README.md §6 [C])", () => {
  it("R1 weekly form: A 1800, W 1200/1100/1000 → C = 1.411765, U = 1.636364", () => {
    const c = coupledRatio(1800, 1200, 1100, 1000)!;
    const u = uncoupledRatio(1800, 1200, 1100, 1000)!;
    expect(c).toBeCloseTo(1.411765, 6);
    expect(u).toBeCloseTo(1.636364, 6);
    // Exact link U = 3C / (4 − C) and back (derived, lib/load/README.md §6).
    expect(uncoupledFromCoupled(c)).toBeCloseTo(u, 12);
    expect(coupledFromUncoupled(u)).toBeCloseTo(c, 12);
  });

  it("R1 daily form gives the same ratios when each week is spread over its 7 days", () => {
    const loads = [...rep(1000 / 7, 7), ...rep(1100 / 7, 7), ...rep(1200 / 7, 7), ...rep(1800 / 7, 7)];
    expect(acwrSeries(loads, "rolling_coupled").ratio[27]).toBeCloseTo(1.411765, 6);
    expect(acwrSeries(loads, "rolling_uncoupled").ratio[27]).toBeCloseTo(1.636364, 6);
  });

  it("R2: a constant 150 AU for 28 days gives C = U = 1", () => {
    expect(acwrSeries(rep(150, 28), "rolling_coupled").ratio[27]).toBeCloseTo(1, 12);
    expect(acwrSeries(rep(150, 28), "rolling_uncoupled").ratio[27]).toBeCloseTo(1, 12);
  });

  it("R3: 21×150 then 7×300 → acute 300, coupled chronic 187.5 (C = 1.6), uncoupled chronic 150 (U = 2.0)", () => {
    const loads = [...rep(150, 21), ...rep(300, 7)];
    const c = acwrSeries(loads, "rolling_coupled");
    const u = acwrSeries(loads, "rolling_uncoupled");
    expect(c.acute[27]).toBeCloseTo(300, 9);
    expect(c.chronic[27]).toBeCloseTo(187.5, 9);
    expect(c.ratio[27]).toBeCloseTo(1.6, 9);
    expect(u.chronic[27]).toBeCloseTo(150, 9);
    expect(u.ratio[27]).toBeCloseTo(2.0, 9);
    // The same series under EWMA (E2 scaled by ½) gives 1.339350: the method must be pinned.
    expect(acwrSeries(loads, "ewma").ratio[27]).toBeCloseTo(1.33935, 6);
  });

  it("uncoupled chronic window is empty (no ratio) during the first 7 days", () => {
    const s = acwrSeries(rep(100, 10), "rolling_uncoupled");
    expect(s.ratio.slice(0, 7)).toEqual(rep(0, 7).map(() => null));
    expect(s.ratio[7]).toBeCloseTo(1, 12);
  });
});

describe("provisional ratios and zero chronic (design choices, lib/load/README.md §6)", () => {
  it("ratios with fewer than 28 days of history are provisional", () => {
    const s = acwrSeries(rep(100, 40), "ewma");
    expect(s.provisional[26]).toBe(true);
    expect(s.provisional[27]).toBe(false);
    expect(s.provisional[39]).toBe(false);
  });

  it("history counts from the first day with data", () => {
    const s = acwrSeries(rep(100, 60), "ewma", { firstDataIndex: 10 });
    expect(s.provisional[36]).toBe(true);
    expect(s.provisional[37]).toBe(false);
  });

  it("chronic 0 gives null, never Infinity or NaN", () => {
    for (const method of ["ewma", "rolling_coupled", "rolling_uncoupled"] as const) {
      const s = acwrSeries(rep(0, 30), method);
      expect(s.ratio.every((r) => r === null)).toBe(true);
    }
    expect(coupledRatio(0, 0, 0, 0)).toBeNull();
    expect(uncoupledRatio(500, 0, 0, 0)).toBeNull();
  });

  it("a 28-day block of rest after training is exactly 0, so no ratio is invented from rounding residue", () => {
    const loads = [...Array.from({ length: 90 }, (_, i) => 137.3 + (i % 5) * 41.9), ...rep(0, 30)];
    const s = acwrSeries(loads, "rolling_coupled");
    expect(s.chronic[119]).toBe(0);
    expect(s.ratio[119]).toBeNull();
  });
});
