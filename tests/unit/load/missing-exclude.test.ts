import { describe, expect, it } from "vitest";
import { acwrFromFirstDay, allocAcwrColumns } from "@/lib/load/acwr";
import { monotonyOfWindow } from "@/lib/load/monotony";

// Missing logs left out (team setting missingLogs "exclude", lib/load/README.md §11.3): the day drops out of the
// EWMA (carried over unchanged) and out of rolling means and monotony (only the days kept are averaged).
describe("a left-out day", () => {
  it("EWMA: [100, left out, 200] gives E1's day-2 values on day 3 (acute 125, chronic 3100/29, ratio 1.169355)", () => {
    const out = allocAcwrColumns(3);
    acwrFromFirstDay(new Float64Array([100, 0, 200]), "ewma", out, 0, undefined, new Uint8Array([0, 1, 0]));
    // Day 2 is carried over from day 1 (seed 100 for both), so its ratio is exactly 1.
    expect(out.ratio[1]).toBe(1);
    expect(out.acute[2]).toBeCloseTo(125, 10);
    expect(out.chronic[2]).toBeCloseTo(106.896552, 5);
    expect(out.ratio[2]).toBeCloseTo(1.169355, 6);
  });

  it("EWMA: a series whose first day is left out is seeded on the first day kept", () => {
    const out = allocAcwrColumns(3);
    acwrFromFirstDay(new Float64Array([0, 300, 300]), "ewma", out, 0, undefined, new Uint8Array([1, 0, 0]));
    expect(Number.isNaN(out.ratio[0])).toBe(true);
    expect(out.ratio[1]).toBe(1);
    expect(out.ratio[2]).toBe(1);
  });

  // Days 1–8 at 100, day 9 left out, day 10 at 400 (coupled, Hulin 2016 daily form): acute = mean of the kept days
  // of days 4–10 = (5 × 100 + 400) ÷ 6 = 150; chronic = mean of the kept days 1–10 = (8 × 100 + 400) ÷ 9 = 133.333;
  // ratio 1.125. Counting day 9 as 0 would give (900 ÷ 7) ÷ (1200 ÷ 10) = 1.071429.
  it("rolling coupled: means over the kept days only", () => {
    const values = new Float64Array([100, 100, 100, 100, 100, 100, 100, 100, 0, 400]);
    const skip = new Uint8Array(10);
    skip[8] = 1;
    const out = allocAcwrColumns(10);
    acwrFromFirstDay(values, "rolling_coupled", out, 0, undefined, skip);
    expect(out.acute[9]).toBeCloseTo(150, 10);
    expect(out.chronic[9]).toBeCloseTo(133.333333, 5);
    expect(out.ratio[9]).toBeCloseTo(1.125, 10);
    const zero = allocAcwrColumns(10);
    acwrFromFirstDay(values, "rolling_coupled", zero, 0);
    expect(zero.ratio[9]).toBeCloseTo(1.071429, 6);
  });

  // Foster 1998 monotony, population SD: [300, left out, 300, 0, 300, 300, 300] keeps five days of 300 and one rest:
  // mean 250, SD √(5 × 50² + 250²) ÷ 6) = 111.803399, monotony √5 = 2.236068. Counting the left-out day as 0 gives
  // five of a and two zeros: 5/√10 = 1.581139.
  it("monotony: over the kept days only", () => {
    const week = [300, 0, 300, 0, 300, 300, 300];
    expect(monotonyOfWindow(week, 0, 7, "population", [0, 1, 0, 0, 0, 0, 0])).toBeCloseTo(2.236068, 6);
    expect(monotonyOfWindow(week, 0, 7, "population")).toBeCloseTo(1.581139, 6);
  });
});
