import { z } from "zod";
import "./jitless";
import { isLocalDate } from "@/lib/dates/plain-date";

// Plans, logs, load views and restrictions live within these bounds: wide enough for any history a club keeps
// and any plan it makes, and far enough from year 9999 that week and range arithmetic never leaves four-digit years.
const EARLIEST_DATE = "1900-01-01";
const LATEST_DATE = "2100-12-31";

const FORMAT = "Enter a date as YYYY-MM-DD";

function utcToday(): string {
  return new Date().toISOString().slice(0, 10);
}

/** A calendar date "YYYY-MM-DD" from 1900-01-01 to 2100-12-31. */
export const localDateSchema = z
  .string({ error: FORMAT })
  .refine((v) => /^\d{4}-\d{2}-\d{2}$/.test(v) && isLocalDate(v), { message: FORMAT, abort: true })
  .refine((v) => v >= EARLIEST_DATE && v <= LATEST_DATE, `Use a date from ${EARLIEST_DATE} to ${LATEST_DATE}`);

/**
 * The date something already happened (a birth, a test): from 1900-01-01 to today. "Today" is UTC plus one day,
 * so a club east of UTC can enter today's test in its morning.
 */
export const pastDateSchema = z
  .string({ error: FORMAT })
  .refine((v) => /^\d{4}-\d{2}-\d{2}$/.test(v) && isLocalDate(v), { message: FORMAT, abort: true })
  .refine((v) => v >= EARLIEST_DATE, `Use a date from ${EARLIEST_DATE} on`)
  .refine((v) => v <= tomorrowUtc(), "Cannot be in the future");

function tomorrowUtc(): string {
  const t = new Date(`${utcToday()}T00:00:00Z`);
  t.setUTCDate(t.getUTCDate() + 1);
  return t.toISOString().slice(0, 10);
}
