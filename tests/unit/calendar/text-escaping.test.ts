// RFC 5545 §3.3.11 (TEXT): no CONTROL character but HTAB inside a value, line breaks written as "\n";
// §3.1: every content line ends in CRLF and holds no bare CR or LF. ical.js reads the output back.
import ICAL from "ical.js";
import { describe, expect, it } from "vitest";
import { buildAthleteFeed } from "@/lib/calendar/athlete-feed";
import { buildInvite } from "@/lib/calendar/invite";
import { APP_URL, LONDON, parse, session } from "./fixtures";

// ical.js reads unknown properties as raw text: NAME is TEXT (RFC 7986 §5.1), and so are the X-WR- copies
// (common practice), so tell it, and it unescapes them like SUMMARY.
for (const name of ["name", "x-wr-calname", "x-wr-caldesc"])
  ICAL.design.icalendar.property[name] = { defaultType: "text" };

const hostile = "Ada\rX-INJECTED:1\u0000\u000b\u0085 Okafor";
const team = { ...LONDON, name: "Harbour\rVale\nSprint" };
const stored = session({ title: "Flying\r30s\u0000", notes: "one\rtwo\u001b", location: "Track\r2" });

/** Every physical line (before unfolding) is free of CR, LF and other controls, except a fold's leading tab/space. */
function assertCleanLines(ics: string) {
  expect(ics.endsWith("\r\n")).toBe(true);
  for (const line of ics.slice(0, -2).split("\r\n")) {
    expect(line, JSON.stringify(line)).not.toMatch(/[\u0000-\u0008\u000a-\u001f\u007f-\u009f]/);
  }
}

describe("iCalendar TEXT escaping", () => {
  it("a lone CR in the athlete's name stays inside the calendar name (X-WR-CALNAME and NAME)", () => {
    const ics = buildAthleteFeed({ team, athlete: { name: hostile }, sessions: [stored], appUrl: APP_URL });
    assertCleanLines(ics);
    const { cal, events } = parse(ics);
    expect(cal.getFirstPropertyValue("x-injected")).toBeNull();
    expect(cal.getFirstPropertyValue("name")).toBe("Ada\nX-INJECTED:1 Okafor · Sprintwright");
    expect(cal.getFirstPropertyValue("x-wr-calname")).toBe("Ada\nX-INJECTED:1 Okafor · Sprintwright");
    expect(cal.getFirstPropertyValue("x-wr-caldesc")).toBe("Training sessions from Harbour\nVale\nSprint");
    expect(events[0]?.summary).toMatch(/^Flying\n30s · /);
    expect(events[0]?.description).toContain("Coach's notes: one\ntwo\n");
    expect(events[0]?.location).toBe("Track\n2");
  });

  it("invitations carry the same clean values, and names in parameters lose their controls", () => {
    const ics = buildInvite({
      method: "REQUEST",
      team,
      organizer: { name: "Sam\rReed", email: "sam@harbourvale.test" },
      attendee: { name: hostile, email: "ada@harbourvale.test" },
      sessions: [stored],
      appUrl: APP_URL,
    });
    assertCleanLines(ics);
    const { cal, events } = parse(ics);
    expect(cal.getFirstPropertyValue("name")).toBe("Harbour\nVale\nSprint · Sprintwright");
    expect(events[0]?.summary).toMatch(/^Flying\n30s · /);
    expect(events[0]?.attendees[0]?.getParameter("cn")).toBe("Ada X-INJECTED:1 Okafor");
  });
});
