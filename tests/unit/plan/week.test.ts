import { describe, expect, it } from "vitest";
import { isoWeekOf, teamWeekStart, weekDays, weekRangeLabel } from "@/lib/plan/week";

describe("team weeks in the team's zone", () => {
  it("starts on the team's day (ISO weekday numbers, 1 = Monday … 7 = Sunday)", () => {
    expect(teamWeekStart("2026-03-05", 1)).toBe("2026-03-02");
    expect(teamWeekStart("2026-03-02", 1)).toBe("2026-03-02");
    expect(teamWeekStart("2026-03-05", 7)).toBe("2026-03-01");
    expect(teamWeekStart("2026-03-01", 1)).toBe("2026-02-23");
    expect(weekDays("2026-02-23")).toEqual([
      "2026-02-23",
      "2026-02-24",
      "2026-02-25",
      "2026-02-26",
      "2026-02-27",
      "2026-02-28",
      "2026-03-01",
    ]);
  });

  it("numbers weeks by ISO 8601: week 1 holds the year's first Thursday", () => {
    // ISO 8601-1:2019 §3.1.1.23 (week 1 contains the first Thursday). 2026-01-01 is a Thursday, so the week of
    // Mon 2025-12-29 is 2026-W01; 2020 began on a Wednesday in a leap year, so it has 53 weeks and
    // Mon 2020-12-28 is 2020-W53. Cross-checked below against the rule computed with Date.
    expect(isoWeekOf("2025-12-29")).toEqual({ week: 1, year: 2026 });
    expect(isoWeekOf("2020-12-28")).toEqual({ week: 53, year: 2020 });
    expect(isoWeekOf("2026-03-02")).toEqual({ week: 10, year: 2026 });
    for (let i = 0; i < 400; i++) {
      const monday = new Date(Date.UTC(2019, 11, 30 + 7 * i));
      const thursday = new Date(monday.getTime() + 3 * 86400000);
      const jan1 = Date.UTC(thursday.getUTCFullYear(), 0, 1);
      const week = Math.floor((thursday.getTime() - jan1) / 86400000 / 7) + 1;
      expect(isoWeekOf(monday.toISOString().slice(0, 10))).toEqual({ week, year: thursday.getUTCFullYear() });
    }
  });

  it("labels a week for people", () => {
    expect(weekRangeLabel("2026-03-02")).toBe("2–8 Mar 2026");
    expect(weekRangeLabel("2026-03-30")).toBe("30 Mar – 5 Apr 2026");
    expect(weekRangeLabel("2025-12-29")).toBe("29 Dec 2025 – 4 Jan 2026");
  });
});
