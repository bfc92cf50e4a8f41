// Local calendar dates as "YYYY-MM-DD" and wall-clock times as "HH:MM", handled with integer day
// arithmetic. A local date is a calendar date, so no timezone library (and no Date object) is needed.
// Day numbers count days since 1970-01-01 (proleptic Gregorian).

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

export function daysInMonth(year: number, month: number): number {
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
export function civilFromDay(day: number): { year: number; month: number; day: number } {
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

/** Day of week, 0 = Sunday … 6 = Saturday (same numbering as Date#getDay). 1970-01-01 was a Thursday. */
export function weekdayOfDay(day: number): number {
  return (((day + 4) % 7) + 7) % 7;
}

export function weekday(date: string): number {
  return weekdayOfDay(dayIndex(date));
}

/** First day of the week holding `date`; weekStartDay 0 = Sunday, 1 = Monday (default) … 6 = Saturday. */
export function startOfWeek(date: string, weekStartDay = 1): string {
  const day = dayIndex(date);
  return dateFromDayIndex(day - ((weekdayOfDay(day) - weekStartDay + 7) % 7));
}

/** Inclusive list of dates from `from` to `to`; empty when `to` is before `from`. */
export function dateRange(from: string, to: string): string[] {
  const start = dayIndex(from);
  const n = dayIndex(to) - start + 1;
  const out: string[] = [];
  for (let i = 0; i < n; i++) out.push(dateFromDayIndex(start + i));
  return out;
}

export function minDate(a: string, b: string): string {
  return a <= b ? a : b;
}

export function maxDate(a: string, b: string): string {
  return a >= b ? a : b;
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

const WEEKDAY_SHORT = ["Sun", "Mon", "Tue", "Wed", "Thu", "Fri", "Sat"];
const MONTH_SHORT = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

/** "Thu 12 Mar": the same text on server and browser (no locale APIs). */
export function formatDayLabel(date: string): string {
  const day = dayIndex(date);
  const c = civilFromDay(day);
  return `${WEEKDAY_SHORT[weekdayOfDay(day)]} ${c.day} ${MONTH_SHORT[c.month - 1]}`;
}
