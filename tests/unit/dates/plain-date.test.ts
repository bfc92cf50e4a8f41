import { describe, expect, it } from "vitest";
import {
  addDays,
  dateFromDayIndex,
  dateRange,
  dayIndex,
  diffDays,
  formatDayLabel,
  isLocalDate,
  minutesBetween,
  minutesOfDay,
  startOfWeek,
  weekday,
} from "@/lib/dates/plain-date";

describe("local calendar dates", () => {
  it("day numbers agree with the proleptic Gregorian calendar of Date.UTC for 1900–2100", () => {
    for (let day = dayIndex("1900-01-01"); day <= dayIndex("2100-12-31"); day += 37) {
      const iso = new Date(day * 86_400_000).toISOString().slice(0, 10);
      expect(dateFromDayIndex(day)).toBe(iso);
      expect(dayIndex(iso)).toBe(day);
    }
    expect(dayIndex("1970-01-01")).toBe(0);
  });

  it("adds and diffs across month, year and leap-day boundaries", () => {
    expect(addDays("2024-02-28", 1)).toBe("2024-02-29");
    expect(addDays("2023-02-28", 1)).toBe("2023-03-01");
    expect(addDays("2025-12-31", 1)).toBe("2026-01-01");
    expect(addDays("2026-03-01", -1)).toBe("2026-02-28");
    expect(diffDays("2026-03-12", "2026-03-01")).toBe(11);
    expect(diffDays("2025-01-01", "2024-01-01")).toBe(366);
  });

  it("rejects malformed and impossible dates", () => {
    expect(isLocalDate("2024-02-29")).toBe(true);
    for (const bad of ["2026-02-29", "2026-13-01", "2026-04-31", "2026-3-1", "20260301", "2026-03-01T00:00", ""]) {
      expect(isLocalDate(bad)).toBe(false);
    }
    expect(() => dayIndex("2026-02-30")).toThrow(RangeError);
  });

  it("weekdays (ISO: 1 = Monday … 7 = Sunday) and week starts", () => {
    expect(weekday("2026-03-12")).toBe(4); // Thursday
    expect(weekday("1970-01-01")).toBe(4);
    expect(startOfWeek("2026-03-12")).toBe("2026-03-09"); // Monday
    expect(startOfWeek("2026-03-15")).toBe("2026-03-09"); // Sunday belongs to the Monday week
    expect(startOfWeek("2026-03-12", 7)).toBe("2026-03-08"); // a Sunday-start week
    expect(startOfWeek("2026-03-09")).toBe("2026-03-09");
  });

  it("ranges and labels", () => {
    expect(dateRange("2026-02-27", "2026-03-02")).toEqual(["2026-02-27", "2026-02-28", "2026-03-01", "2026-03-02"]);
    expect(dateRange("2026-03-02", "2026-03-01")).toEqual([]);
    expect(formatDayLabel("2026-03-12")).toBe("Thu 12 Mar");
  });

  it("wall-clock minutes", () => {
    expect(minutesOfDay("00:00")).toBe(0);
    expect(minutesOfDay("23:59")).toBe(1439);
    expect(() => minutesOfDay("24:00")).toThrow(RangeError);
    expect(() => minutesOfDay("9:00")).toThrow(RangeError);
    expect(minutesBetween("2026-03-09", "09:00", "2026-03-11", "09:00")).toBe(48 * 60);
  });
});
