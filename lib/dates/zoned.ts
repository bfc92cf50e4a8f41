import { DateTime } from "luxon";

// The only date code that needs a time zone: which local date an instant falls on in the team's zone.
// Pure given its inputs: callers read the clock (`new Date()`) at the edge and pass it in.

/** The local date ("YYYY-MM-DD") of `now` in `timeZone`; an unknown zone falls back to UTC. */
export function teamToday({ timeZone, now }: { timeZone: string; now: Date }): string {
  const dt = DateTime.fromJSDate(now).setZone(timeZone);
  return (dt.isValid ? dt : DateTime.fromJSDate(now).toUTC()).toISODate()!;
}

/** The latest instant at or before `now` whose local time in `timeZone` is `hour`:00 (today's, or yesterday's). */
export function lastLocalHour({ now, timeZone, hour }: { now: Date; timeZone: string; hour: number }): Date {
  const local = DateTime.fromJSDate(now).setZone(timeZone);
  const zoned = local.isValid ? local : DateTime.fromJSDate(now).toUTC();
  const slot = zoned.startOf("day").set({ hour });
  return (slot > zoned ? slot.minus({ days: 1 }) : slot).toJSDate();
}

/** A team's zone and the ISO weekday its week starts on (1 = Monday … 7 = Sunday, as stored). */
export type TeamClock = { teamId: number; timeZone: string; weekStartDay: number };

/** The clock of an authorized viewer (lib/auth's Viewer carries the team's zone and week start). */
export function viewerClock(viewer: { timeZone: string; weekStartDay: number }): Omit<TeamClock, "teamId"> {
  return { timeZone: viewer.timeZone, weekStartDay: viewer.weekStartDay };
}

/** The instant of a local date and "HH:MM" time in `timeZone` (an unknown zone falls back to UTC). */
export function zonedInstant({ date, time, timeZone }: { date: string; time: string; timeZone: string }): Date {
  const dt = DateTime.fromISO(`${date}T${time}`, { zone: timeZone });
  return (dt.isValid ? dt : DateTime.fromISO(`${date}T${time}`, { zone: "utc" })).toJSDate();
}

/** The local date and "HH:MM" of an instant in `timeZone`, for messages ("2026-12-04 18:30"). */
export function zonedLabel({ instant, timeZone }: { instant: Date; timeZone: string }): { date: string; time: string } {
  const dt = DateTime.fromJSDate(instant).setZone(timeZone);
  const ok = dt.isValid ? dt : DateTime.fromJSDate(instant).toUTC();
  return { date: ok.toISODate()!, time: ok.toFormat("HH:mm") };
}
