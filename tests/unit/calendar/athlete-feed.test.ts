// Checks the athlete feed against RFC 5545 (iCalendar) and RFC 7986, parsing with ical.js as an independent reader.
import ICAL from "ical.js";
import { DateTime } from "luxon";
import { describe, expect, it } from "vitest";
import { buildAthleteFeed } from "@/lib/calendar/athlete-feed";
import { APP_URL, LONDON, SYDNEY, parse, session, unfoldedLines } from "./fixtures";

const athlete = { name: "Maya Okafor" };

function feed(sessions = [session()], team = LONDON): string {
  return buildAthleteFeed({ team, athlete, sessions, appUrl: APP_URL });
}

function instants(team: typeof LONDON, date: string, startTime: string, durationMin: number) {
  const ics = feed([session({ date, startTime, durationMin })], team);
  const [event] = parse(ics).events;
  if (!event) throw new Error("no event");
  return { ics, event, start: event.startDate.toJSDate().toISOString(), end: event.endDate.toJSDate().toISOString() };
}

function luxonUtc(team: typeof LONDON, date: string, time: string, plusMin = 0): string {
  return DateTime.fromISO(`${date}T${time}`, { zone: team.timeZone }).plus({ minutes: plusMin }).toUTC().toISO()!;
}

describe("athlete feed", () => {
  it("gives every session a stable UID and a DTSTAMP (RFC 5545 §3.6.1: both REQUIRED in VEVENT)", () => {
    const ics = feed([session({ id: "a1" }), session({ id: "b2", date: "2026-04-01" })]);
    const { events } = parse(ics);
    expect(events.map((e) => e.uid)).toEqual(["session-a1@sprintwright", "session-b2@sprintwright"]);
    for (const e of events) expect(e.component.getFirstPropertyValue("dtstamp")).toBeTruthy();
    // Same input, same UIDs: a re-fetch updates events instead of duplicating them (§3.8.4.7 UID is persistent).
    expect(parse(feed([session({ id: "a1" })])).events[0]?.uid).toBe("session-a1@sprintwright");
  });

  it("round-trips commas, semicolons, backslashes and newlines in TEXT (RFC 5545 §3.3.11)", () => {
    const title = "Starts, flys; and \\ back";
    const ics = feed([session({ title, notes: "Line one, still one;\nline two" })]);
    const [event] = parse(ics).events;
    expect(event?.summary).toBe(`${title} · Max velocity`);
    expect(event?.description).toContain("Coach's notes: Line one, still one;\nline two");
    // On the wire the specials are backslash-escaped.
    expect(unfoldedLines(ics)).toContain("SUMMARY:Starts\\, flys\\; and \\\\ back · Max velocity");
  });

  it("names the calendar and asks for hourly refresh (RFC 7986 §5.1 NAME, §5.7 REFRESH-INTERVAL)", () => {
    const ics = buildAthleteFeed({ team: LONDON, athlete: { name: "Okafor, Maya" }, sessions: [], appUrl: APP_URL });
    // ical.js predates RFC 7986: declare NAME (and the common X-WR-CALNAME) as TEXT so it decodes them.
    const props = ICAL.design.icalendar.property as Record<string, { defaultType: string }>;
    props.name = { defaultType: "text" };
    props["x-wr-calname"] = { defaultType: "text" };
    const { cal } = parse(ics);
    expect(cal.getFirstPropertyValue("name")).toBe("Okafor, Maya · Sprintwright");
    expect(cal.getFirstPropertyValue("x-wr-calname")).toBe("Okafor, Maya · Sprintwright");
    expect(unfoldedLines(ics)).toContain("REFRESH-INTERVAL;VALUE=DURATION:PT1H");
    expect(cal.getFirstPropertyValue("prodid")).toBe("-//Sprintwright//Training calendar//EN");
  });

  it("writes local wall time with TZID and the right instants across the UK spring change (RFC 5545 §3.3.5 form 3)", () => {
    // UK clocks go forward on the last Sunday of March: 29 March 2026 (common practice; luxon's tz data agrees below).
    const before = instants(LONDON, "2026-03-28", "18:00", 75);
    expect(before.start).toBe("2026-03-28T18:00:00.000Z"); // GMT = UTC+0
    expect(before.end).toBe("2026-03-28T19:15:00.000Z");
    const after = instants(LONDON, "2026-03-30", "18:00", 75);
    expect(after.start).toBe("2026-03-30T17:00:00.000Z"); // BST = UTC+1
    expect(after.end).toBe("2026-03-30T18:15:00.000Z");
    expect(unfoldedLines(after.ics)).toContain("DTSTART;TZID=Europe/London:20260330T180000");
    expect(unfoldedLines(after.ics)).toContain("DTEND;TZID=Europe/London:20260330T191500");
    for (const [x, date] of [
      [before, "2026-03-28"],
      [after, "2026-03-30"],
    ] as const) {
      expect(x.start).toBe(luxonUtc(LONDON, date, "18:00"));
      expect(x.end).toBe(luxonUtc(LONDON, date, "18:00", 75));
    }
  });

  it("gets southern-hemisphere changes right: Sydney ends DST in April and starts it in October", () => {
    // NSW: daylight time ends first Sunday of April (5 Apr 2026), starts first Sunday of October (4 Oct 2026) (common practice).
    const cases = [
      ["2026-04-04", "2026-04-04T07:00:00.000Z"], // AEDT, UTC+11
      ["2026-04-06", "2026-04-06T08:00:00.000Z"], // AEST, UTC+10
      ["2026-10-03", "2026-10-03T08:00:00.000Z"], // AEST
      ["2026-10-05", "2026-10-05T07:00:00.000Z"], // AEDT
    ] as const;
    for (const [date, utc] of cases) {
      const x = instants(SYDNEY, date, "18:00", 60);
      expect(x.start, date).toBe(utc);
      expect(x.start, date).toBe(luxonUtc(SYDNEY, date, "18:00"));
      expect(x.end, date).toBe(luxonUtc(SYDNEY, date, "18:00", 60));
      expect(x.event.startDate.zone?.tzid).toBe("Australia/Sydney");
    }
  });

  it("includes a VTIMEZONE whose TZID matches every TZID parameter (RFC 5545 §3.6.5)", () => {
    const ics = feed([session(), session({ id: "s-2", date: "2026-11-02" })]);
    const { cal, events } = parse(ics);
    const zones = cal.getAllSubcomponents("vtimezone").map((z) => z.getFirstPropertyValue("tzid"));
    expect(zones).toEqual(["Europe/London"]);
    for (const e of events) {
      expect(e.component.getFirstProperty("dtstart")?.getParameter("tzid")).toBe("Europe/London");
      expect(e.component.getFirstProperty("dtend")?.getParameter("tzid")).toBe("Europe/London");
    }
  });

  it("ends every line with CRLF, including the last (RFC 5545 §3.1)", () => {
    const ics = feed([session({ notes: "two\nlines" })]);
    expect(ics.endsWith("END:VCALENDAR\r\n")).toBe(true);
    expect(/\r(?!\n)|(?<!\r)\n/.test(ics)).toBe(false);
  });

  it("folds long lines at ≤ 75 octets, counting UTF-8 bytes, without splitting a character (RFC 5545 §3.1)", () => {
    const notes = "Üben über Hürden – 速度 🏃‍♀️ mañana, ¿vale? ".repeat(12);
    const ics = feed([session({ title: "Tempo über 200 m – Ünïcödé ✓".repeat(3), notes })]);
    const raw = Buffer.from(ics, "utf8");
    expect(raw.toString("utf8")).toBe(ics); // no lone surrogates were produced by folding
    for (const line of ics.split("\r\n")) expect(Buffer.byteLength(line, "utf8")).toBeLessThanOrEqual(75);
    expect(ics.split("\r\n").some((l) => l.startsWith(" "))).toBe(true); // folding actually happened
    const [event] = parse(ics).events;
    expect(event?.description).toContain(`Coach's notes: ${notes.trim()}`);
  });

  it("carries SEQUENCE and LAST-MODIFIED from the session, DTSTAMP in UTC (RFC 5545 §3.8.7.4, §3.8.7.3, §3.8.7.2)", () => {
    const updatedAt = new Date("2026-03-21T08:30:00Z");
    const v1 = parse(feed([session({ sequence: 3, updatedAt })])).events[0];
    const v2 = parse(feed([session({ sequence: 4, updatedAt })])).events[0];
    expect(v1?.sequence).toBe(3);
    expect(v2?.sequence).toBeGreaterThan(v1?.sequence ?? Infinity);
    const lines = unfoldedLines(feed([session({ sequence: 3, updatedAt })]));
    expect(lines).toContain("LAST-MODIFIED:20260321T083000Z");
    // Without METHOD, DTSTAMP is the last revision time (§3.8.7.2); it MUST be UTC.
    expect(lines).toContain("DTSTAMP:20260321T083000Z");
  });

  it("marks cancelled sessions STATUS:CANCELLED and published ones CONFIRMED (RFC 5545 §3.8.1.11)", () => {
    const ics = feed([session({ id: "p" }), session({ id: "c", status: "cancelled" })]);
    const [published, cancelled] = parse(ics).events;
    expect(published?.component.getFirstPropertyValue("status")).toBe("CONFIRMED");
    expect(cancelled?.component.getFirstPropertyValue("status")).toBe("CANCELLED");
    expect(cancelled?.summary.startsWith("Cancelled: ")).toBe(true);
  });

  it("links each event to the app and describes the blocks in plain words (RFC 5545 §3.8.4.6 URL)", () => {
    const [event] = parse(feed()).events;
    expect(event?.component.getFirstPropertyValue("url")).toBe(`${APP_URL}/sessions/s-1`);
    expect(event?.description).toContain(
      "Max velocity – Flying 30s: 2 sets of 3 × 30 m from a flying start with a 20 m run-in at 95% of top speed, 4 min rest",
    );
    expect(event?.location).toBe("Track 2");
  });

  it("rejects an unknown zone and malformed times instead of writing a wrong calendar", () => {
    expect(() => feed([session()], { name: "X", timeZone: "Mars/Olympus" })).toThrow(/time zone/);
    expect(() => feed([session({ startTime: "25:00" })])).toThrow(/startTime/);
    expect(() => feed([session({ date: "2026-02-30" })])).toThrow(/date/);
  });
});
