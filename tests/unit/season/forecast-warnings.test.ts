import { describe, expect, it } from "vitest";
import { forecastWarnings, type ForecastWeek } from "@/lib/season/forecast-warnings";
import { checkTargets, standingAgainst } from "@/lib/season/targets";

const week = (weekStart: string, acwr: number | null, change: number | null, extra: Partial<ForecastWeek> = {}) => ({
  weekStart,
  acwr,
  weeklyChangePct: change,
  unload: false,
  taper: false,
  ...extra,
});

describe("taper before an A meet (lib/season/README.md)", () => {
  const meet = { date: "2027-06-19", priority: "A" as const, name: "Harbourvale Open" };

  it("warns when the meet week's ratio is not below the week before the taper", () => {
    const weeks = [
      week("2027-05-31", 1.1, 5),
      week("2027-06-07", 1.15, 4, { taper: true }),
      week("2027-06-14", 1.2, 3, { taper: true }),
    ];
    expect(forecastWarnings(weeks, [meet], 15)).toEqual([
      { kind: "taper_not_lowering", meet, weekStart: "2027-06-14", acwrBefore: 1.1, acwrAtMeet: 1.2 },
    ]);
  });

  it("is quiet when the taper brings the ratio down, for B meets and without a taper", () => {
    const lowering = [
      week("2027-05-31", 1.1, 5),
      week("2027-06-07", 0.9, -30, { taper: true }),
      week("2027-06-14", 0.8, -20, { taper: true }),
    ];
    expect(forecastWarnings(lowering, [meet], 15)).toEqual([]);
    const rising = [
      week("2027-05-31", 1.1, 5),
      week("2027-06-07", 1.3, 4, { taper: true }),
      week("2027-06-14", 1.4, 3, { taper: true }),
    ];
    expect(forecastWarnings(rising, [{ ...meet, priority: "B" }], 15)).toEqual([]);
    const noTaper = [week("2027-06-07", 1.1, 5), week("2027-06-14", 1.3, 4)];
    expect(forecastWarnings(noTaper, [meet], 15)).toEqual([]);
  });
});

describe("the build after an unload", () => {
  it("warns when the week after an unload rises by more than the weekly limit; exactly the limit passes", () => {
    const weeks = [
      week("2027-01-04", 1.0, 8),
      week("2027-01-11", 0.8, -40, { unload: true }),
      week("2027-01-18", 1.0, 15),
      week("2027-01-25", 0.8, -35, { unload: true }),
      week("2027-02-01", 1.1, 54.3),
    ];
    expect(forecastWarnings(weeks, [], 15)).toEqual([
      { kind: "jump_after_unload", weekStart: "2027-02-01", changePct: 54.3, limitPct: 15 },
    ]);
  });
});

describe("weekly targets", () => {
  it("counts both ends of a range as within and leaves open ends open", () => {
    expect(standingAgainst(300, { min: 300, max: 500 })).toBe("within");
    expect(standingAgainst(500, { min: 300, max: 500 })).toBe("within");
    expect(standingAgainst(299.9, { min: 300, max: null })).toBe("below");
    expect(standingAgainst(9e9, { min: 300, max: null })).toBe("within");
    expect(standingAgainst(501, { min: null, max: 500 })).toBe("above");
  });

  it("checks only the metrics that have a range", () => {
    const figures = { hsrM: 420, nearMaxM: 80, contacts: 140, srpe: 2100 };
    expect(checkTargets(figures, { contacts: { min: 150, max: 250 }, hsrM: { min: 300, max: 400 } })).toEqual([
      { metric: "contacts", value: 140, range: { min: 150, max: 250 }, standing: "below" },
      { metric: "hsrM", value: 420, range: { min: 300, max: 400 }, standing: "above" },
    ]);
  });
});
