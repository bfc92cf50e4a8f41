import {
  addSessionEvent,
  assertTimeZone,
  calendarText,
  defaultSessionUrl,
  escapeText,
  newCalendar,
} from "./session-event";
import type { CalendarPerson, CalendarSession, CalendarTeam, SessionUrlFn } from "./types";

/** Content-Type for serving a feed or attaching an .ics file. */
export const ICS_CONTENT_TYPE = "text/calendar; charset=utf-8";

export interface AthleteFeedInput {
  team: CalendarTeam;
  athlete: Pick<CalendarPerson, "name">;
  /** Every session the athlete should see (the caller leaves drafts out). */
  sessions: readonly CalendarSession[];
  appUrl: string;
  sessionUrl?: SessionUrlFn;
}

/** The athlete's subscribable .ics feed (no METHOD: a plain published calendar, RFC 5545 §3.7.2). */
export function buildAthleteFeed(input: AthleteFeedInput): string {
  assertTimeZone(input.team.timeZone);
  const sessionUrl = input.sessionUrl ?? defaultSessionUrl(input.appUrl);
  const cal = newCalendar()
    .name(escapeText(`${input.athlete.name} · Sprintwright`))
    .description(escapeText(`Training sessions from ${input.team.name}`))
    // REFRESH-INTERVAL (RFC 7986 §5.7) and X-PUBLISHED-TTL: ask subscribers to re-fetch hourly.
    .ttl(60 * 60);
  for (const session of input.sessions) {
    // Without METHOD, DTSTAMP is when the event was last revised (RFC 5545 §3.8.7.2).
    addSessionEvent(cal, session, { team: input.team, sessionUrl, stamp: session.updatedAt });
  }
  return calendarText(cal);
}
