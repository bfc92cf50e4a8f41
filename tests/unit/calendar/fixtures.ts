import ICAL from "ical.js";
import type { CalendarSession, CalendarTeam } from "@/lib/calendar/types";

export const LONDON: CalendarTeam = { name: "Harbour Vale Sprint Club", timeZone: "Europe/London" };
export const SYDNEY: CalendarTeam = { name: "Harbour Vale Sprint Club (tour)", timeZone: "Australia/Sydney" };
export const APP_URL = "https://sprintwright.test";

export function session(overrides: Partial<CalendarSession> = {}): CalendarSession {
  return {
    id: "s-1",
    date: "2026-03-30",
    startTime: "18:00",
    durationMin: 75,
    title: "Flying 30s",
    status: "published",
    sequence: 0,
    updatedAt: new Date("2026-03-20T10:15:00Z"),
    blocks: [
      {
        kind: "max_velocity",
        title: "Flying 30s",
        running: { sets: 2, reps: 3, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
      },
    ],
    notes: null,
    location: "Track 2",
    ...overrides,
  };
}

export function parse(ics: string): { cal: ICAL.Component; events: ICAL.Event[] } {
  const cal = new ICAL.Component(ICAL.parse(ics));
  return { cal, events: cal.getAllSubcomponents("vevent").map((c) => new ICAL.Event(c)) };
}

/** Content lines after unfolding (RFC 5545 §3.1: CRLF followed by one space or tab is removed). */
export function unfoldedLines(ics: string): string[] {
  return ics
    .replace(/\r\n[ \t]/g, "")
    .split("\r\n")
    .filter(Boolean);
}
