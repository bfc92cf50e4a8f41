import { getVtimezoneComponent } from "@touch4it/ical-timezones";
import ical, { ICalEventStatus, type ICalCalendar, type ICalEvent } from "ical-generator";
import { DateTime } from "luxon";
import { blockDescription } from "@/lib/format/block-summary";
import { sessionHeadline } from "@/lib/format/session-line";
import type { CalendarSession, CalendarTeam, SessionUrlFn } from "./types";

const PROD_ID = { company: "Sprintwright", product: "Training calendar", language: "EN" } as const;

const DATE = /^\d{4}-\d{2}-\d{2}$/;
const TIME = /^([01]\d|2[0-3]):[0-5]\d$/;

/** Stable across feed and invitations, so a client updates the same event (RFC 5545 §3.8.4.7). */
function sessionUid(sessionId: string | number): string {
  return `session-${sessionId}@sprintwright`;
}

export function defaultSessionUrl(appUrl: string): SessionUrlFn {
  const base = appUrl.replace(/\/+$/, "");
  return (s) => `${base}/sessions/${encodeURIComponent(String(s.id))}`;
}

// RFC 5545 §3.3.11: a TEXT value holds no CONTROL character but HTAB; a line break is written as "\n".
// C1 controls go too (U+0085 is a line break to some readers). Stored text is checked at the schema
// (lib/validations/text.ts), but rows written before that, and names from elsewhere, pass through here.
const LINE_BREAK = /\r\n|\r|\n|\u2028|\u2029/g;
const CONTROL = /[\u0000-\u0008\u000B-\u001F\u007F-\u009F]/g;

/** Text with every line break as "\n" and no other control character: safe for ical-generator to escape. */
function plainText(value: string): string {
  return value.replace(LINE_BREAK, "\n").replace(CONTROL, "");
}

/** An escaped TEXT value for the properties ical-generator writes as given (NAME, X-WR-CALNAME, X-WR-CALDESC). */
export function escapeText(value: string): string {
  return plainText(value)
    .replace(/[\\;,]/g, (ch) => `\\${ch}`)
    .replace(/\n/g, "\\n");
}

/** A parameter value (CN) may not hold DQUOTE or control characters (RFC 5545 §3.1 param-value). */
export function paramSafe(value: string): string {
  return value
    .replace(/[\u0000-\u001f\u007f-\u009f"\\]+/g, " ")
    .replace(/\s{2,}/g, " ")
    .trim();
}

/** A calendar whose VTIMEZONE blocks come from @touch4it/ical-timezones for every zone its events use. */
export function newCalendar(): ICalCalendar {
  // Calendar zone name stays null: with a name, ical-generator would write DTSTAMP/LAST-MODIFIED as local time.
  return ical({ prodId: PROD_ID, timezone: { name: null, generator: getVtimezoneComponent } });
}

/** Serialises with a CRLF after the last line too: every content line ends in CRLF (RFC 5545 §3.1). */
export function calendarText(cal: ICalCalendar): string {
  const text = cal.toString();
  return text.endsWith("\r\n") ? text : `${text}\r\n`;
}

export function assertTimeZone(timeZone: string): void {
  if (timeZone === "UTC") return;
  if (!DateTime.local().setZone(timeZone).isValid) throw new RangeError(`Unknown time zone "${timeZone}"`);
  if (!getVtimezoneComponent(timeZone)) throw new RangeError(`No VTIMEZONE data for "${timeZone}"`);
}

function sessionTimes(session: CalendarSession, timeZone: string): { start: DateTime; end: DateTime } {
  if (!DATE.test(session.date)) throw new RangeError(`Session ${session.id}: date must be YYYY-MM-DD`);
  if (!TIME.test(session.startTime)) throw new RangeError(`Session ${session.id}: startTime must be HH:MM`);
  if (!Number.isInteger(session.durationMin) || session.durationMin <= 0 || session.durationMin > 24 * 60) {
    throw new RangeError(`Session ${session.id}: durationMin must be 1–1440 minutes`);
  }
  // Local wall time in the team's zone; a time inside a spring-forward gap moves forward (luxon's rule).
  const start = DateTime.fromISO(`${session.date}T${session.startTime}`, { zone: timeZone });
  if (!start.isValid) throw new RangeError(`Session ${session.id}: no such date ${session.date}`);
  return { start, end: start.plus({ minutes: session.durationMin }) };
}

function sessionDescription(session: CalendarSession, url: string): string {
  const paragraphs: string[] = [];
  if (session.status === "cancelled") paragraphs.push("This session is cancelled.");
  for (const block of session.blocks) paragraphs.push(blockDescription(block).join("\n"));
  const notes = session.notes?.trim();
  if (notes) paragraphs.push(`Coach's notes: ${notes}`);
  paragraphs.push(`Open in Sprintwright: ${url}`);
  return paragraphs.join("\n\n");
}

const STATUS: Record<CalendarSession["status"], ICalEventStatus> = {
  published: ICalEventStatus.CONFIRMED,
  draft: ICalEventStatus.TENTATIVE,
  cancelled: ICalEventStatus.CANCELLED,
};

export interface AddSessionOptions {
  team: CalendarTeam;
  sessionUrl: SessionUrlFn;
  /** DTSTAMP (RFC 5545 §3.8.7.2): with METHOD the time the message is made; without, the last revision. */
  stamp: Date;
}

export function addSessionEvent(cal: ICalCalendar, session: CalendarSession, opts: AddSessionOptions): ICalEvent {
  if (!Number.isInteger(session.sequence) || session.sequence < 0) {
    throw new RangeError(`Session ${session.id}: sequence must be a whole number ≥ 0`);
  }
  const { start, end } = sessionTimes(session, opts.team.timeZone);
  const url = opts.sessionUrl(session);
  const headline = sessionHeadline(session);
  return cal.createEvent({
    id: sessionUid(session.id),
    sequence: session.sequence,
    stamp: opts.stamp,
    start,
    end,
    timezone: opts.team.timeZone,
    // ical-generator escapes these three (RFC 5545 §3.3.11) but passes other control characters through.
    summary: plainText(session.status === "cancelled" ? `Cancelled: ${headline}` : headline),
    description: plainText(sessionDescription(session, url)),
    location: plainText(session.location?.trim() ?? "") || null,
    url,
    status: STATUS[session.status],
    lastModified: session.updatedAt,
  });
}
