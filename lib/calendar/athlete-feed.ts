import { addDays } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import {
  addSessionEvent,
  assertTimeZone,
  calendarText,
  defaultSessionUrl,
  escapeText,
  newCalendar,
} from "./session-event";
import type { CalendarPerson, CalendarSession, CalendarTeam, SessionUrlFn } from "./types";

/** How far back a served feed reaches; every session ahead is always in it. */
const FEED_WEEKS_BACK = 8;

/**
 * Bump when the rendered text changes for the same data (wording, properties): stored renders
 * (lib/notices/feed.ts) carry it in their stamp, so old ones are not served after a deploy.
 */
export const FEED_FORMAT = 1;

/** The first date (YYYY-MM-DD, the team's zone) a feed served at `now` shows: 8 weeks before today. */
export function feedStartDate({ now, timeZone }: { now: Date; timeZone: string }): string {
  return addDays(teamToday({ timeZone, now }), -7 * FEED_WEEKS_BACK);
}

export interface AthleteFeedInput {
  team: CalendarTeam;
  athlete: Pick<CalendarPerson, "name">;
  /** Every session the athlete should see (the caller leaves drafts out). */
  sessions: readonly CalendarSession[];
  appUrl: string;
  sessionUrl?: SessionUrlFn;
  /** Set when `sessions` are only those from `feedStartDate` on: the description says so. */
  bounded?: boolean;
}

const BOUND_NOTE = `: the last ${FEED_WEEKS_BACK} weeks and everything ahead`;

/** The athlete's subscribable .ics feed (no METHOD: a plain published calendar, RFC 5545 §3.7.2). */
export function buildAthleteFeed(input: AthleteFeedInput): string {
  assertTimeZone(input.team.timeZone);
  const sessionUrl = input.sessionUrl ?? defaultSessionUrl(input.appUrl);
  const cal = newCalendar()
    .name(escapeText(`${input.athlete.name} · Sprintwright`))
    .description(escapeText(`Training sessions from ${input.team.name}${input.bounded ? BOUND_NOTE : ""}`))
    // REFRESH-INTERVAL (RFC 7986 §5.7) and X-PUBLISHED-TTL: ask subscribers to re-fetch hourly.
    .ttl(60 * 60);
  for (const session of input.sessions) {
    // Without METHOD, DTSTAMP is when the event was last revised (RFC 5545 §3.8.7.2).
    addSessionEvent(cal, session, { team: input.team, sessionUrl, stamp: session.updatedAt });
  }
  return calendarText(cal);
}
