import type { BlockInput, SessionStatus } from "@/lib/load/types";

/** A training session as the calendar needs it (plain data; the caller loads it). */
export interface CalendarSession {
  /** Database ids are numbers; both work (the UID is built from the text form). */
  id: string | number;
  /** Local date in the team's zone, YYYY-MM-DD. */
  date: string;
  /** Local wall-clock start, HH:MM. */
  startTime: string;
  durationMin: number;
  title: string;
  status: SessionStatus;
  /** Bumped by the caller on every change that attendees should see (RFC 5545 §3.8.7.4). */
  sequence: number;
  updatedAt: Date;
  blocks: BlockInput[];
  notes?: string | null;
  location?: string | null;
}

export interface CalendarTeam {
  name: string;
  /** IANA zone, e.g. "Europe/London". */
  timeZone: string;
}

export interface CalendarPerson {
  name: string;
  email: string;
}

/** Link from an event back to the app; defaults to `${appUrl}/sessions/<id>`. */
export type SessionUrlFn = (session: CalendarSession) => string;
