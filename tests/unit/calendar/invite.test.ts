// iTIP invitations (RFC 5546) built on RFC 5545 objects, parsed back with ical.js.
import { describe, expect, it } from "vitest";
import { buildAthleteFeed } from "@/lib/calendar/athlete-feed";
import { buildInvite, type InviteInput } from "@/lib/calendar/invite";
import { APP_URL, LONDON, parse, session, unfoldedLines } from "./fixtures";

const organizer = { name: 'Coach "Sam" Reed', email: "sam.reed@harbourvale.test" };
const attendee = { name: "Maya Okafor", email: "maya@harbourvale.test" };
const now = new Date("2026-03-22T09:00:00Z");

function invite(overrides: Partial<InviteInput> = {}): string {
  return buildInvite({
    method: "REQUEST",
    team: LONDON,
    organizer,
    attendee,
    sessions: [session()],
    appUrl: APP_URL,
    now,
    ...overrides,
  });
}

describe("session invitations", () => {
  it("says METHOD:REQUEST for new or changed sessions (RFC 5546 §3.2.2)", () => {
    const { cal } = parse(invite());
    expect(cal.getFirstPropertyValue("method")).toBe("REQUEST");
  });

  it("says METHOD:CANCEL with STATUS:CANCELLED and keeps the given SEQUENCE (RFC 5546 §3.2.5, RFC 5545 §3.8.1.11)", () => {
    const ics = invite({ method: "CANCEL", sessions: [session({ sequence: 5, status: "published" })] });
    const { cal, events } = parse(ics);
    expect(cal.getFirstPropertyValue("method")).toBe("CANCEL");
    expect(events[0]?.component.getFirstPropertyValue("status")).toBe("CANCELLED");
    expect(events[0]?.sequence).toBe(5);
  });

  it("uses the feed's UIDs so a client updates the same event (RFC 5545 §3.8.4.7)", () => {
    const sessions = [session({ id: "x9" }), session({ id: "y8", date: "2026-04-02" })];
    const fromInvite = parse(invite({ sessions })).events.map((e) => e.uid);
    const fromFeed = parse(buildAthleteFeed({ team: LONDON, athlete: attendee, sessions, appUrl: APP_URL })).events.map(
      (e) => e.uid,
    );
    expect(fromInvite).toEqual(["session-x9@sprintwright", "session-y8@sprintwright"]);
    expect(fromInvite).toEqual(fromFeed);
  });

  it("has ORGANIZER and one ATTENDEE with RSVP=FALSE, PARTSTAT=NEEDS-ACTION (RFC 5545 §3.8.4.3, §3.8.4.1, §3.2.17, §3.2.12)", () => {
    const [event] = parse(invite()).events;
    const org = event?.component.getFirstProperty("organizer");
    expect(String(org?.getFirstValue()).toLowerCase()).toBe("mailto:sam.reed@harbourvale.test");
    // A DQUOTE cannot appear inside a quoted param-value (RFC 5545 §3.1), so it is dropped from CN.
    expect(org?.getParameter("cn")).toBe("Coach Sam Reed");
    const attendees = event?.component.getAllProperties("attendee") ?? [];
    expect(attendees).toHaveLength(1);
    const [a] = attendees;
    expect(String(a?.getFirstValue()).toLowerCase()).toBe("mailto:maya@harbourvale.test");
    expect(a?.getParameter("rsvp")).toBe("FALSE");
    expect(a?.getParameter("partstat")).toBe("NEEDS-ACTION");
    expect(a?.getParameter("cn")).toBe("Maya Okafor");
  });

  it("stamps the message time in UTC and bumps SEQUENCE when the caller does (RFC 5545 §3.8.7.2, §3.8.7.4)", () => {
    expect(unfoldedLines(invite())).toContain("DTSTAMP:20260322T090000Z");
    const first = parse(invite({ sessions: [session({ sequence: 1 })] })).events[0]?.sequence ?? 0;
    const update = parse(invite({ sessions: [session({ sequence: 2, startTime: "18:30" })] })).events[0]?.sequence ?? 0;
    expect(update).toBeGreaterThan(first);
  });

  it("keeps line rules in invitations too: CRLF, ≤ 75 octets (RFC 5545 §3.1)", () => {
    const ics = invite({ sessions: [session({ notes: "Très long — ".repeat(40) })] });
    expect(/\r(?!\n)|(?<!\r)\n/.test(ics)).toBe(false);
    for (const line of ics.split("\r\n")) expect(Buffer.byteLength(line, "utf8")).toBeLessThanOrEqual(75);
  });

  it("refuses an empty invitation", () => {
    expect(() => invite({ sessions: [] })).toThrow(/at least one session/);
  });
});
