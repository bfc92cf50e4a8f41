import { DateTime } from "luxon";

// A plan week is a run of 7 local calendar dates in the team's zone. Dates are zone-less "YYYY-MM-DD"
// strings, so they are read as UTC here: the weekday never shifts with the server's or browser's zone.

function day(date: string): DateTime {
  const d = DateTime.fromISO(date, { zone: "utc" });
  if (!d.isValid || !/^\d{4}-\d{2}-\d{2}$/.test(date))
    throw new RangeError(`Expected a date as YYYY-MM-DD, got "${date}"`);
  return d;
}

/** First day of the team week holding `date`; `weekStartDay` is ISO (1 = Monday … 7 = Sunday). */
export function teamWeekStart(date: string, weekStartDay = 1): string {
  const d = day(date);
  const back = (d.weekday - weekStartDay + 7) % 7;
  return d.minus({ days: back }).toISODate()!;
}

export function addDaysTo(date: string, days: number): string {
  return day(date).plus({ days }).toISODate()!;
}

export function weekDays(weekStart: string): string[] {
  return Array.from({ length: 7 }, (_, i) => addDaysTo(weekStart, i));
}

export function shiftWeek(weekStart: string, weeks: number): string {
  return addDaysTo(weekStart, weeks * 7);
}

/**
 * ISO 8601 week number of a team week. A Monday week is exactly one ISO week; a week starting on another day
 * takes the ISO week of its fourth day, which holds most of its days (the same rule ISO uses for years).
 */
export function isoWeekOf(weekStart: string): { week: number; year: number } {
  const mid = day(weekStart).plus({ days: 3 });
  return { week: mid.weekNumber, year: mid.weekYear };
}

/** Column heading parts: { weekday: "Tue", date: "3 Mar" }. */
export function dayHeading(date: string): { weekday: string; date: string } {
  const d = day(date).setLocale("en-GB");
  return { weekday: d.toFormat("ccc"), date: d.toFormat("d LLL") };
}

/** "3–9 Mar 2026" or "29 Dec 2025 – 4 Jan 2026". */
export function weekRangeLabel(weekStart: string): string {
  const a = day(weekStart).setLocale("en-GB");
  const b = a.plus({ days: 6 });
  if (a.year !== b.year) return `${a.toFormat("d LLL yyyy")} – ${b.toFormat("d LLL yyyy")}`;
  if (a.month !== b.month) return `${a.toFormat("d LLL")} – ${b.toFormat("d LLL yyyy")}`;
  return `${a.toFormat("d")}–${b.toFormat("d LLL yyyy")}`;
}

export function isDateInWeek(date: string, weekStart: string): boolean {
  return date >= weekStart && date <= addDaysTo(weekStart, 6);
}
