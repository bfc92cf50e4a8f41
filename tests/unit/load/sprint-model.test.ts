import { describe, expect, it } from "vitest";
import {
  accelerationAt,
  averageSpeed,
  distanceAt,
  kmhToMs,
  metresAtOrAbove,
  msToKmh,
  percentOfVmax,
  timeToDistance,
  velocityAt,
} from "@/lib/load/sprint-model";

// Model: Furusawa, Hill & Parkinson 1927, Proc R Soc B 102:29–42. Check values: lib/load/README.md §1 [C].

describe("T1: average speed between gates (lib/load/README.md §1 [C])", () => {
  it("a flying 20 m in 2.000 s = 10 m/s = 36 km/h; 10 m in 1.05 s = 9.523810 m/s = 34.285714 km/h", () => {
    expect(averageSpeed(20, 2)).toBe(10);
    expect(msToKmh(averageSpeed(20, 2))).toBeCloseTo(36, 12);
    expect(averageSpeed(10, 1.05)).toBeCloseTo(9.52381, 6);
    expect(msToKmh(averageSpeed(10, 1.05))).toBeCloseTo(34.285714, 6);
  });
});

describe("T2: vmax 10 m/s, τ 1.0 s (lib/load/README.md §1 [C])", () => {
  it("speeds", () => {
    expect(velocityAt(1, 10, 1)).toBeCloseTo(6.321206, 6);
    expect(velocityAt(2, 10, 1)).toBeCloseTo(8.646647, 6);
    expect(velocityAt(3, 10, 1)).toBeCloseTo(9.502129, 6);
    // v(τ) = 0.632·vmax
    expect(velocityAt(1.3, 9, 1.3) / 9).toBeCloseTo(0.632, 3);
  });

  it("distances", () => {
    expect(distanceAt(1, 10, 1)).toBeCloseTo(3.678794, 6);
    expect(distanceAt(2, 10, 1)).toBeCloseTo(11.353353, 6);
    expect(distanceAt(3, 10, 1)).toBeCloseTo(20.497871, 6);
  });

  it("accelerations: a(0) = vmax/τ = 10 m/s², a(1) = 3.678794 m/s²", () => {
    expect(accelerationAt(0, 10, 1)).toBe(10);
    expect(accelerationAt(1, 10, 1)).toBeCloseTo(3.678794, 6);
  });
});

describe("T3: time to distance, vmax 10, τ 1 (lib/load/README.md §1 [C])", () => {
  const cases: [number, number][] = [
    [5, 1.19829],
    [10, 1.841406],
    [20, 2.947531],
    [30, 3.981339],
    [40, 4.993216],
  ];
  it.each(cases)("%d m in %f s", (d, t) => {
    const solved = timeToDistance(d, 10, 1);
    expect(solved).toBeCloseTo(t, 6);
    // Exact to 1e-9: the solved time reproduces the distance.
    expect(Math.abs(distanceAt(solved, 10, 1) - d)).toBeLessThan(1e-9);
  });

  it("closed-form check at 30 m: t = 4 − e^(−t)", () => {
    const t = timeToDistance(30, 10, 1);
    expect(Math.abs(t - (4 - Math.exp(-t)))).toBeLessThan(1e-12);
  });

  it("0 m takes 0 s", () => {
    expect(timeToDistance(0, 10, 1)).toBe(0);
  });
});

describe("T4: vmax 9.5 m/s, τ 1.1 s splits and flying averages (lib/load/README.md §1 [C])", () => {
  const split = (d: number) => timeToDistance(d, 9.5, 1.1);
  it("splits 10/20/30/40 m = 1.9690 / 3.1420 / 4.2345 / 5.3017 s", () => {
    expect(split(10)).toBeCloseTo(1.969, 4);
    expect(split(20)).toBeCloseTo(3.142, 4);
    expect(split(30)).toBeCloseTo(4.2345, 4);
    expect(split(40)).toBeCloseTo(5.3017, 4);
  });

  it("flying averages sit below vmax: 20–30 9.1539, 30–40 9.3705, 20–40 9.2609 m/s (33.339 km/h)", () => {
    expect(averageSpeed(10, split(30) - split(20))).toBeCloseTo(9.1539, 4);
    expect(averageSpeed(10, split(40) - split(30))).toBeCloseTo(9.3705, 4);
    expect(averageSpeed(20, split(40) - split(20))).toBeCloseTo(9.2609, 4);
    expect(msToKmh(averageSpeed(20, split(40) - split(20)))).toBeCloseTo(33.339, 3);
  });
});

describe("HSR thresholds and %vmax (Bradley et al. 2009 bands [from memory]; lib/load/README.md §1 [C])", () => {
  it("19.8 km/h = 5.5 m/s and 25.2 km/h = 7.0 m/s (compared with a tolerance)", () => {
    expect(kmhToMs(19.8)).toBeCloseTo(5.5, 12);
    expect(kmhToMs(25.2)).toBeCloseTo(7, 12);
    expect(kmhToMs(14.4)).toBeCloseTo(4, 12);
  });

  it("H2: vmax 10, flying 30 m in 3.20 s = 93.75% vmax: ≥90% but not ≥95%", () => {
    const pct = percentOfVmax(averageSpeed(30, 3.2), 10);
    expect(pct).toBeCloseTo(93.75, 9);
  });

  it("H3: vmax 9.8, flying 20 m in 2.15 s = 9.302326 m/s = 94.92%, just under 95%", () => {
    expect(averageSpeed(20, 2.15)).toBeCloseTo(9.302326, 6);
    const pct = percentOfVmax(averageSpeed(20, 2.15), 9.8);
    expect(pct).toBeCloseTo(94.92, 2);
  });

  it("H4: 95% of 10.0 m/s = 9.5 m/s = 34.2 km/h", () => {
    expect(msToKmh(0.95 * 10)).toBeCloseTo(34.2, 12);
  });
});

describe("metresAtOrAbove: analytic threshold metres", () => {
  /** Fine time-step integration of the same model: metres covered while v ≥ speed. */
  function numericMetres(speed: number, target: number, tau: number, total: number, dt = 1e-5): number {
    let t = 0;
    let x = 0;
    let above = 0;
    while (x < total) {
      const v = velocityAt(t + dt / 2, target, tau);
      const step = Math.min(v * dt, total - x);
      if (v >= speed) above += step;
      x += step;
      t += dt;
    }
    return above;
  }

  it.each([
    [5.5, 9.5, 1.1, 30],
    [5.5, 9.5, 1.1, 60],
    [8.55, 9.5, 1.1, 50],
    [5.5, 6.3, 1.2, 100],
    [9, 10, 1, 40],
  ])("speed %f, target %f, τ %f over %f m agrees with numeric integration", (speed, target, tau, total) => {
    const analytic = metresAtOrAbove(speed, { targetSpeed: target, tau, totalDistance: total });
    expect(Math.abs(analytic - numericMetres(speed, target, tau, total))).toBeLessThan(1e-3);
  });

  it("equals total − x(t*) with t* = −τ·ln(1 − speed/target)", () => {
    const tStar = -1.1 * Math.log(1 - 5.5 / 9.5);
    expect(metresAtOrAbove(5.5, { targetSpeed: 9.5, tau: 1.1, totalDistance: 40 })).toBeCloseTo(
      40 - distanceAt(tStar, 9.5, 1.1),
      12,
    );
  });

  it("is 0 when the threshold is at or above the target (the model only approaches the target)", () => {
    expect(metresAtOrAbove(9.5, { targetSpeed: 9.5, tau: 1.1, totalDistance: 60 })).toBe(0);
    expect(metresAtOrAbove(10, { targetSpeed: 9.5, tau: 1.1, totalDistance: 60 })).toBe(0);
  });

  it("is 0 when the rep ends before reaching the threshold", () => {
    // x(t*) for 8.55 of 9.5 m/s with τ 1.1 is about 15.9 m
    expect(metresAtOrAbove(8.55, { targetSpeed: 9.5, tau: 1.1, totalDistance: 10 })).toBe(0);
  });
});
