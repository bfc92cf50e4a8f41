// Local calendar dates as "YYYY-MM-DD" and wall-clock times as "HH:MM", handled with integer day
// arithmetic. A local date is a calendar date, so no timezone library (and no Date object) is needed: the
// same answer on server and browser whatever their zones. Day numbers count days since 1970-01-01
// (proleptic Gregorian). Weekdays are ISO 8601 (1 = Monday … 7 = Sunday) everywhere in Sprintwright.
// Isomorphic and pure: the planner, the load engine, the calendar and the mails share it. Anything that
// needs a time zone (today's date in the team's zone, instants) is in ./zoned.ts.

const DASH = 45;
const ZERO = 48;
const COLON = 58;

function digit(s: string, i: number): number {
  const d = s.charCodeAt(i) - ZERO;
  return d >= 0 && d <= 9 ? d : -1;
}

function invalid(what: string, value: string): never {
  throw new RangeError(`Invalid ${what} "${value}"`);
}

// days_from_civil, H. Hinnant, "chrono-Compatible Low-Level Date Algorithms" (howardhinnant.github.io/date_algorithms.html)
function daysFromCivil(y: number, m: number, d: number): number {
  const yy = m <= 2 ? y - 1 : y;
  const era = Math.floor(yy / 400);
  const yoe = yy - era * 400;
  const doy = Math.floor((153 * (m + (m > 2 ? -3 : 9)) + 2) / 5) + d - 1;
  const doe = yoe * 365 + Math.floor(yoe / 4) - Math.floor(yoe / 100) + doy;
  return era * 146097 + doe - 719468;
}

function daysInMonth(year: number, month: number): number {
  if (month === 2) return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0 ? 29 : 28;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}

/** Day number (days since 1970-01-01) of a "YYYY-MM-DD" date. Throws RangeError on a malformed or impossible date. */
export function dayIndex(date: string): number {
  if (date.length !== 10 || date.charCodeAt(4) !== DASH || date.charCodeAt(7) !== DASH) invalid("date", date);
  const d0 = digit(date, 0),
    d1 = digit(date, 1),
    d2 = digit(date, 2),
    d3 = digit(date, 3);
  const m0 = digit(date, 5),
    m1 = digit(date, 6),
    a0 = digit(date, 8),
    a1 = digit(date, 9);
  if ((d0 | d1 | d2 | d3 | m0 | m1 | a0 | a1) < 0) invalid("date", date);
  const y = d0 * 1000 + d1 * 100 + d2 * 10 + d3;
  const m = m0 * 10 + m1;
  const d = a0 * 10 + a1;
  if (m < 1 || m > 12 || d < 1 || d > daysInMonth(y, m)) invalid("date", date);
  return daysFromCivil(y, m, d);
}

function pad2(n: number): string {
  return n < 10 ? `0${n}` : `${n}`;
}

// civil_from_days, H. Hinnant (same source as daysFromCivil)
function civilFromDay(day: number): { year: number; month: number; day: number } {
  const z = day + 719468;
  const era = Math.floor(z / 146097);
  const doe = z - era * 146097;
  const yoe = Math.floor((doe - Math.floor(doe / 1460) + Math.floor(doe / 36524) - Math.floor(doe / 146096)) / 365);
  const doy = doe - (365 * yoe + Math.floor(yoe / 4) - Math.floor(yoe / 100));
  const mp = Math.floor((5 * doy + 2) / 153);
  const d = doy - Math.floor((153 * mp + 2) / 5) + 1;
  const m = mp < 10 ? mp + 3 : mp - 9;
  return { year: yoe + era * 400 + (m <= 2 ? 1 : 0), month: m, day: d };
}

/** "YYYY-MM-DD" for a day number (years 0–9999). */
export function dateFromDayIndex(day: number): string {
  const c = civilFromDay(day);
  return `${String(c.year).padStart(4, "0")}-${pad2(c.month)}-${pad2(c.day)}`;
}

export function isLocalDate(value: string): boolean {
  try {
    dayIndex(value);
    return true;
  } catch {
    return false;
  }
}

export function addDays(date: string, days: number): string {
  return dateFromDayIndex(dayIndex(date) + days);
}

/** Whole days from `from` to `to` (positive when `to` is later). */
export function diffDays(to: string, from: string): number {
  return dayIndex(to) - dayIndex(from);
}

type IsoWeekday = 1 | 2 | 3 | 4 | 5 | 6 | 7;

/** ISO 8601 weekday of a day number: 1 = Monday … 7 = Sunday. 1970-01-01 was a Thursday (4). */
function weekdayOfDay(day: number): IsoWeekday {
  return (((((day + 3) % 7) + 7) % 7) + 1) as IsoWeekday;
}

export function weekday(date: string): IsoWeekday {
  return weekdayOfDay(dayIndex(date));
}

function isIsoWeekday(value: unknown): value is IsoWeekday {
  return typeof value === "number" && Number.isInteger(value) && value >= 1 && value <= 7;
}

function checkWeekStart(weekStartDay: number): void {
  // A stray 0 (the old "0 = Sunday" numbering) must fail loudly rather than pass as Sunday by accident.
  if (!isIsoWeekday(weekStartDay)) throw new RangeError(`Week start must be an ISO weekday 1–7, got ${weekStartDay}`);
}

/** Day number of the first day of the week holding `day`; `weekStartDay` is ISO (1 = Monday, default … 7 = Sunday). */
export function weekStartOfDay(day: number, weekStartDay = 1): number {
  checkWeekStart(weekStartDay);
  return day - ((weekdayOfDay(day) - weekStartDay + 7) % 7);
}

/** First day of the week holding `date`; `weekStartDay` is ISO (1 = Monday, default … 7 = Sunday). */
export function startOfWeek(date: string, weekStartDay = 1): string {
  return dateFromDayIndex(weekStartOfDay(dayIndex(date), weekStartDay));
}

/** The seven dates of the week starting on `weekStart`. */
export function weekDays(weekStart: string): string[] {
  const start = dayIndex(weekStart);
  return Array.from({ length: 7 }, (_, i) => dateFromDayIndex(start + i));
}

export function shiftWeek(weekStart: string, weeks: number): string {
  return addDays(weekStart, weeks * 7);
}

/**
 * ISO 8601 week number of a week. A Monday week is exactly one ISO week; a week starting on another day takes
 * the ISO week of its fourth day, which holds most of its days (the same rule ISO uses for years: week 1 holds
 * the year's first Thursday, ISO 8601-1:2019 §3.1.1.23).
 */
export function isoWeekOf(weekStart: string): { week: number; year: number } {
  const mid = dayIndex(weekStart) + 3;
  const thursday = mid - weekdayOfDay(mid) + 4;
  const year = civilFromDay(thursday).year;
  return { week: Math.floor((thursday - daysFromCivil(year, 1, 1)) / 7) + 1, year };
}

/** Inclusive list of dates from `from` to `to`; empty when `to` is before `from`. */
export function dateRange(from: string, to: string): string[] {
  const start = dayIndex(from);
  const n = dayIndex(to) - start + 1;
  const out: string[] = [];
  for (let i = 0; i < n; i++) out.push(dateFromDayIndex(start + i));
  return out;
}

/** Minutes after midnight of "HH:MM" (00:00–23:59). Throws RangeError when malformed. */
export function minutesOfDay(time: string): number {
  if (time.length !== 5 || time.charCodeAt(2) !== COLON) invalid("time", time);
  const h0 = digit(time, 0),
    h1 = digit(time, 1),
    m0 = digit(time, 3),
    m1 = digit(time, 4);
  if ((h0 | h1 | m0 | m1) < 0) invalid("time", time);
  const h = h0 * 10 + h1;
  const m = m0 * 10 + m1;
  if (h > 23 || m > 59) invalid("time", time);
  return h * 60 + m;
}

/**
 * Wall-clock minutes from (dateA, timeA) to (dateB, timeB). Local wall-clock arithmetic: across a DST
 * change the real elapsed time differs by the shift, which is acceptable for a recovery-window check.
 */
export function minutesBetween(dateA: string, timeA: string, dateB: string, timeB: string): number {
  return (dayIndex(dateB) - dayIndex(dateA)) * 1440 + minutesOfDay(timeB) - minutesOfDay(timeA);
}

const WEEKDAY_SHORT = ["Mon", "Tue", "Wed", "Thu", "Fri", "Sat", "Sun"];
const MONTH_SHORT = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

// Labels use fixed English names, not the locale APIs: server and browser must print the same text.

/** "Thu 12 Mar". */
export function formatDayLabel(date: string): string {
  const h = dayHeading(date);
  return `${h.weekday} ${h.date}`;
}

/** Column heading parts: { weekday: "Tue", date: "3 Mar" }. */
export function dayHeading(date: string): { weekday: string; date: string } {
  const day = dayIndex(date);
  const c = civilFromDay(day);
  return { weekday: WEEKDAY_SHORT[weekdayOfDay(day) - 1], date: `${c.day} ${MONTH_SHORT[c.month - 1]}` };
}

/** "3–9 Mar 2026", "30 Mar – 5 Apr 2026" or "29 Dec 2025 – 4 Jan 2026". */
export function weekRangeLabel(weekStart: string): string {
  const a = civilFromDay(dayIndex(weekStart));
  const b = civilFromDay(dayIndex(weekStart) + 6);
  const month = (c: { month: number }) => MONTH_SHORT[c.month - 1];
  if (a.year !== b.year) return `${a.day} ${month(a)} ${a.year} – ${b.day} ${month(b)} ${b.year}`;
  if (a.month !== b.month) return `${a.day} ${month(a)} – ${b.day} ${month(b)} ${b.year}`;
  return `${a.day}–${b.day} ${month(b)} ${b.year}`;
}
