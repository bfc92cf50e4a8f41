import { ICalAttendeeRole, ICalAttendeeStatus, ICalCalendarMethod } from "ical-generator";
import {
  addSessionEvent,
  assertTimeZone,
  calendarText,
  defaultSessionUrl,
  escapeText,
  newCalendar,
  paramSafe,
} from "./session-event";
import type { CalendarPerson, CalendarSession, CalendarTeam, SessionUrlFn } from "./types";

type InviteMethod = "REQUEST" | "CANCEL";

export interface InviteInput {
  method: InviteMethod;
  team: CalendarTeam;
  organizer: CalendarPerson;
  attendee: CalendarPerson;
  sessions: readonly CalendarSession[];
  appUrl: string;
  sessionUrl?: SessionUrlFn;
  /** DTSTAMP of the message; defaults to now. */
  now?: Date;
}

/**
 * An iTIP message (RFC 5546) for e-mail (iMIP, RFC 6047): REQUEST adds or updates the sessions,
 * CANCEL removes them. UIDs match the feed; the caller bumps `sequence` before sending a change.
 */
export function buildInvite(input: InviteInput): string {
  if (input.sessions.length === 0) throw new RangeError("An invitation needs at least one session");
  assertTimeZone(input.team.timeZone);
  const sessionUrl = input.sessionUrl ?? defaultSessionUrl(input.appUrl);
  const stamp = input.now ?? new Date();
  const cal = newCalendar()
    .method(input.method === "CANCEL" ? ICalCalendarMethod.CANCEL : ICalCalendarMethod.REQUEST)
    .name(escapeText(`${input.team.name} · Sprintwright`));

  for (const session of input.sessions) {
    // A CANCEL carries STATUS:CANCELLED on every event (RFC 5546 §3.2.5), whatever the stored status says.
    const asSent: CalendarSession = input.method === "CANCEL" ? { ...session, status: "cancelled" } : session;
    const event = addSessionEvent(cal, asSent, { team: input.team, sessionUrl, stamp });
    event.organizer({ name: paramSafe(input.organizer.name), email: input.organizer.email });
    event.createAttendee({
      name: paramSafe(input.attendee.name),
      email: input.attendee.email,
      role: ICalAttendeeRole.REQ,
      status: ICalAttendeeStatus.NEEDSACTION,
      rsvp: false,
    });
  }
  return calendarText(cal);
}
