import { describe, expect, it } from "vitest";
import { DateTime } from "luxon";
import {
  dateFromDayIndex,
  dayHeading,
  dayIndex,
  isoWeekOf,
  startOfWeek,
  weekday,
  weekDays,
  weekRangeLabel,
} from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";

describe("team weeks in the team's zone", () => {
  it("starts on the team's day (ISO weekday numbers, 1 = Monday … 7 = Sunday)", () => {
    expect(startOfWeek("2026-03-05", 1)).toBe("2026-03-02");
    expect(startOfWeek("2026-03-02", 1)).toBe("2026-03-02");
    expect(startOfWeek("2026-03-05", 7)).toBe("2026-03-01");
    expect(startOfWeek("2026-03-01", 1)).toBe("2026-02-23");
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

describe("ISO weekdays, checked against luxon (an independent ISO 8601 implementation)", () => {
  it("names the weekdays the ISO way: 1 = Monday … 7 = Sunday", () => {
    // ISO 8601-1:2019 §3.1.1.22 numbers the days of the week from Monday (1) to Sunday (7).
    // 2026-01-01 is a Thursday (luxon agrees below); 1970-01-01 was a Thursday too.
    expect(weekday("2026-01-01")).toBe(4);
    expect(weekday("2026-03-08")).toBe(7);
    expect(weekday("2026-03-09")).toBe(1);
    for (let day = dayIndex("1999-12-01"); day <= dayIndex("2031-01-31"); day += 3) {
      const date = dateFromDayIndex(day);
      expect(weekday(date)).toBe(DateTime.fromISO(date, { zone: "utc" }).weekday);
    }
  });

  it("2026-W01 starts on Monday 2025-12-29, and ISO week numbers match luxon's", () => {
    expect(DateTime.fromObject({ weekYear: 2026, weekNumber: 1, weekday: 1 }, { zone: "utc" }).toISODate()).toBe(
      "2025-12-29",
    );
    expect(startOfWeek("2026-01-01", 1)).toBe("2025-12-29");
    expect(isoWeekOf("2025-12-29")).toEqual({ week: 1, year: 2026 });
    for (let day = dayIndex("2015-12-28"); day <= dayIndex("2032-12-27"); day += 7) {
      const monday = dateFromDayIndex(day);
      const ref = DateTime.fromISO(monday, { zone: "utc" });
      expect(isoWeekOf(monday)).toEqual({ week: ref.weekNumber, year: ref.weekYear });
    }
  });

  it("a Sunday-start week (7) runs Sunday to Saturday and takes the ISO week of its Wednesday", () => {
    expect(startOfWeek("2026-03-07", 7)).toBe("2026-03-01"); // Saturday → the Sunday before
    expect(startOfWeek("2026-03-08", 7)).toBe("2026-03-08"); // Sunday starts its own week
    expect(weekDays("2026-03-08").map(weekday)).toEqual([7, 1, 2, 3, 4, 5, 6]);
    // The Sunday week 2025-12-28 … 2026-01-03 has its Wednesday (31 Dec) in 2026-W01.
    expect(isoWeekOf("2025-12-28")).toEqual({ week: 1, year: 2026 });
    for (let day = dayIndex("2024-01-01"); day < dayIndex("2027-01-01"); day++) {
      const date = dateFromDayIndex(day);
      const ref = DateTime.fromISO(date, { zone: "utc" });
      // luxon: back to the most recent Sunday (weekday 7), independent of our arithmetic.
      expect(startOfWeek(date, 7)).toBe(ref.minus({ days: ref.weekday % 7 }).toISODate());
      expect(startOfWeek(date, 1)).toBe(ref.startOf("week").toISODate());
    }
  });

  it("refuses a week start outside 1–7 (the old 0 = Sunday numbering fails loudly)", () => {
    expect(() => startOfWeek("2026-03-12", 0)).toThrow(RangeError);
    expect(() => startOfWeek("2026-03-12", 8)).toThrow(RangeError);
  });

  it("labels days with fixed English names (no locale APIs: server and browser agree)", () => {
    expect(dayHeading("2026-09-03")).toEqual({ weekday: "Thu", date: "3 Sep" });
    expect(dayHeading("2026-03-08")).toEqual({ weekday: "Sun", date: "8 Mar" });
  });
});

describe("teamToday", () => {
  it("reads the local date of the given instant in the team's zone (pure: `now` is an input)", () => {
    // 23:30 UTC on 31 Dec is already 1 Jan in Auckland (UTC+13 in summer) and still 31 Dec in London.
    const now = new Date("2026-12-31T23:30:00Z");
    expect(teamToday({ timeZone: "Europe/London", now })).toBe("2026-12-31");
    expect(teamToday({ timeZone: "Pacific/Auckland", now })).toBe("2027-01-01");
    expect(teamToday({ timeZone: "Not/AZone", now })).toBe("2026-12-31");
  });
});
