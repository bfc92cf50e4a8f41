import { DateTime } from "luxon";

/** An instant in a given zone (server-side, e.g. link expiry in mails): "8 Dec 2026, 21:44 (Europe/London)". */
export function formatInstant(instant: Date, timeZone = "UTC"): string {
  const local = DateTime.fromJSDate(instant, { zone: timeZone });
  if (!local.isValid) throw new RangeError(`Unknown time zone "${timeZone}"`);
  return `${local.setLocale("en-GB").toFormat("d LLL yyyy, HH:mm")} (${timeZone})`;
}
