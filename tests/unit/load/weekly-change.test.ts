import { describe, expect, it } from "vitest";
import { exceedsWeeklyLimit, weeklyChangePct } from "@/lib/load/weekly-change";

// Δ% = (W_t − W_{t−1}) / W_{t−1} × 100. Check values: lib/load/README.md §8 [C]. The 10% rule of thumb is Gabbett 2016
// [from memory]; the 15–49% spike band is Harrison & Johnston 2017, JSCR 31:2686 [confirmed abstract].

describe("weeklyChangePct", () => {
  it("1000 → 1100 = +10.0%, 1000 → 1150 = +15.0% (exact), 2000 → 2500 = +25.0%, 1200 → 1000 = −16.667%", () => {
    expect(weeklyChangePct(1000, 1100)).toBe(10);
    expect(weeklyChangePct(1000, 1150)).toBe(15);
    expect(weeklyChangePct(2000, 2500)).toBe(25);
    expect(weeklyChangePct(1200, 1000)).toBeCloseTo(-16.667, 3);
  });

  it("last week 0 → null (undefined, not Infinity)", () => {
    expect(weeklyChangePct(0, 500)).toBeNull();
    expect(weeklyChangePct(0, 0)).toBeNull();
  });

  it("absolute change 1000 → 2300 = +1300 AU, above Rogalski et al. 2013's 1250 AU (JSMS 16:499)", () => {
    expect(weeklyChangePct(1000, 2300)).toBe(130);
  });
});

describe("exceedsWeeklyLimit: strictly greater than the limit (pinned > not ≥)", () => {
  it("with the 15% team default: exactly +15% passes, +25% is flagged", () => {
    expect(exceedsWeeklyLimit(weeklyChangePct(1000, 1150), 15)).toBe(false);
    expect(exceedsWeeklyLimit(weeklyChangePct(1000, 1151), 15)).toBe(true);
    expect(exceedsWeeklyLimit(weeklyChangePct(2000, 2500), 15)).toBe(true);
  });

  it("with a 10% limit: exactly +10% passes (> not ≥); −16.667% and null never flag", () => {
    expect(exceedsWeeklyLimit(weeklyChangePct(1000, 1100), 10)).toBe(false);
    expect(exceedsWeeklyLimit(weeklyChangePct(1200, 1000), 10)).toBe(false);
    expect(exceedsWeeklyLimit(null, 10)).toBe(false);
  });

  it("float noise at the boundary does not flag: (0.1 + 0.2) × 50 is 15.000000000000002 in float64", () => {
    expect(exceedsWeeklyLimit((0.1 + 0.2) * 50, 15)).toBe(false);
    // The naive form (cur/prev − 1)·100 gives 10.000000000000009 for 1000 → 1100; weeklyChangePct multiplies first.
    expect(exceedsWeeklyLimit((1100 / 1000 - 1) * 100, 10)).toBe(false);
  });
});
