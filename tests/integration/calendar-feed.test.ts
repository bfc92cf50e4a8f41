// The athlete's feed through its real route handler: token → data → ical-generator → ical.js (an independent
// parser) and the RFC 5545 wire rules. Another athlete's, a rotated or a revoked token gives nothing.
import ICAL from "ical.js";
import { describe, expect, it, vi } from "vitest";
import { GET } from "@/app/api/calendar/[token]/route";
import { getCalendarFeedStatus, revokeCalendarToken, rotateCalendarToken } from "@/lib/data/calendar-tokens";
import { hashToken } from "@/lib/auth/tokens";
import { updateSession } from "@/lib/services/plan-sessions";
import { updateSessionSchema } from "@/lib/validations/plan";
import { createTestTeam } from "../helpers/fixtures";
import { setupNotices } from "./notices-setup";

// The feed shows 8 weeks back and everything ahead: these March sessions are ahead of the clock set here.
vi.useFakeTimers({ toFake: ["Date"], shouldAdvanceTime: true });
vi.setSystemTime(new Date("2026-03-25T12:00:00Z"));

const { d } = await setupNotices();
const team = await createTestTeam(d, { name: "Feed Club" });
const coach = team.users.coach.userId;
const ada = team.users["ada@feedclub.test"].athleteId!;
const ben = team.users["ben@feedclub.test"].athleteId!;

async function addSession(
  athleteId: number,
  date: string,
  status: "draft" | "published" | "cancelled",
  title: string,
  notes: string | null = null,
) {
  const s = await d.PlannedSession.create({
    teamId: team.teamId,
    athleteId,
    date,
    startTime: "18:00",
    durationMin: 75,
    title,
    plannedRpe: 7,
    status,
    notes,
    publishedAt: status === "draft" ? null : new Date(),
  });
  await d.SessionBlock.create({
    sessionId: s.id,
    templateId: null,
    position: 0,
    kind: "max_velocity",
    title: "Flying 30s",
    running: { sets: 2, reps: 3, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
    drills: null,
    notes: null,
  });
  await d.SessionBlock.create({
    sessionId: s.id,
    templateId: null,
    position: 1,
    kind: "plyometric",
    title: "Hops",
    running: null,
    drills: [{ name: "Pogo jumps", sets: 2, reps: 10, contactsPerRep: 1, intensity: "low" }],
    notes: null,
  });
  return s;
}

const adaPublished = await addSession(
  ada,
  "2026-03-31",
  "published",
  "Flys, starts; and more",
  "Bring spikes, and water; it is a long one. ".repeat(4).trim(),
);
const adaCancelled = await addSession(ada, "2026-04-02", "cancelled", "Tempo");
await addSession(ada, "2026-04-03", "draft", "Secret draft");
await addSession(ben, "2026-03-31", "published", "Ben's starts");

const adaToken = (await rotateCalendarToken({ athleteId: ada, createdBy: null })).token;
const benToken = (await rotateCalendarToken({ athleteId: ben, createdBy: null })).token;

async function fetchFeed(segment: string) {
  return GET(new Request(`http://sprintwright.test/api/calendar/${segment}`), {
    params: Promise.resolve({ token: segment }),
  });
}

function parse(ics: string) {
  const cal = new ICAL.Component(ICAL.parse(ics));
  return { cal, events: cal.getAllSubcomponents("vevent").map((v) => new ICAL.Event(v)) };
}

describe("athlete calendar feed", () => {
  it("serves the athlete's published and cancelled sessions as text/calendar, never drafts", async () => {
    const res = await fetchFeed(`${adaToken}.ics`);
    expect(res.status).toBe(200);
    // RFC 5545 §8.1: the media type is text/calendar.
    expect(res.headers.get("content-type")).toBe("text/calendar; charset=utf-8");
    const ics = await res.text();
    const { cal, events } = parse(ics);
    // A subscription feed is a plain published calendar: no METHOD (RFC 5545 §3.7.2 is for iTIP only).
    expect(cal.getFirstPropertyValue("method")).toBeNull();
    expect(events.map((e) => e.uid)).toEqual([
      `session-${adaPublished.id}@sprintwright`,
      `session-${adaCancelled.id}@sprintwright`,
    ]);
    expect(events.map((e) => e.component.getFirstPropertyValue("status"))).toEqual(["CONFIRMED", "CANCELLED"]);
    expect(ics).not.toContain("Secret draft");
    expect(ics).not.toContain("Ben's starts");

    const [first] = events;
    // §3.8.3.1/§3.3.5: local time with TZID; 18:00 in London on 31 March 2026 is 17:00 UTC (BST).
    expect(first!.startDate.toJSDate().toISOString()).toBe("2026-03-31T17:00:00.000Z");
    expect(first!.endDate.toJSDate().toISOString()).toBe("2026-03-31T18:15:00.000Z");
    expect(first!.summary).toBe("Flys, starts; and more · Max velocity");
    // The description lists the blocks in words.
    expect(first!.description).toContain(
      "Max velocity – Flying 30s: 2 sets of 3 × 30 m from a flying start with a 20 m run-in at 95% of top speed, 4 min rest",
    );
    expect(first!.description).toContain("• Pogo jumps: 2 × 10, low intensity, 20 contacts");
    expect(first!.description).toContain("http://sprintwright.test/me#session-");
  });

  it("follows RFC 5545 on the wire", async () => {
    const ics = await (await fetchFeed(`${adaToken}.ics`)).text();
    // §3.1: every content line ends in CRLF; no bare LF.
    expect(ics.endsWith("\r\n")).toBe(true);
    expect(ics.replace(/\r\n/g, "")).not.toMatch(/[\r\n]/);
    // §3.1: lines SHOULD NOT be longer than 75 octets excluding the line break; folding = CRLF + one space.
    const physical = ics.split("\r\n").slice(0, -1);
    for (const line of physical) expect(Buffer.byteLength(line, "utf8")).toBeLessThanOrEqual(75);
    const logical = ics.replace(/\r\n[ \t]/g, "").split("\r\n");
    expect(physical.length).toBeGreaterThan(logical.length); // the long notes were folded
    // §3.3.11: COMMA and SEMICOLON in TEXT are escaped with a backslash.
    expect(logical).toContain("SUMMARY:Flys\\, starts\\; and more · Max velocity");
    // §3.6.1: UID and DTSTAMP are REQUIRED once in each VEVENT.
    const vevents = ics.split("BEGIN:VEVENT").slice(1);
    expect(vevents).toHaveLength(2);
    for (const v of vevents) {
      expect(v.match(/\r\nUID:/g)).toHaveLength(1);
      expect(v.match(/\r\nDTSTAMP:\d{8}T\d{6}Z/g)).toHaveLength(1);
      expect(v).toMatch(/\r\nSEQUENCE:\d+/);
      expect(v).toMatch(/\r\nLAST-MODIFIED:\d{8}T\d{6}Z/);
    }
    // §3.6.5: a TZID used by DTSTART must have its VTIMEZONE in the object.
    expect(logical).toContain("DTSTART;TZID=Europe/London:20260331T180000");
    expect(logical).toContain("BEGIN:VTIMEZONE");
    expect(logical).toContain("TZID:Europe/London");
    // §3.6: VERSION and PRODID are REQUIRED calendar properties.
    expect(logical).toContain("VERSION:2.0");
    expect(logical.some((l) => l.startsWith("PRODID:"))).toBe(true);
  });

  it("raises SEQUENCE and LAST-MODIFIED when a published session changes (RFC 5545 §3.8.7.4, §3.8.7.3)", async () => {
    const before = parse(await (await fetchFeed(`${adaToken}.ics`)).text()).events[0]!;
    const seq0 = before.sequence;
    const lm0 = String(before.component.getFirstPropertyValue("last-modified"));
    await new Promise((r) => setTimeout(r, 1100)); // LAST-MODIFIED has whole seconds
    const row = (await d.PlannedSession.findByPk(adaPublished.id))!;
    await updateSession({
      teamId: team.teamId,
      actorUserId: coach,
      sessionId: row.id,
      input: updateSessionSchema.parse({ version: row.version, startTime: "19:00" }),
    });
    const after = parse(await (await fetchFeed(`${adaToken}.ics`)).text()).events[0]!;
    expect(after.uid).toBe(before.uid);
    expect(after.sequence).toBeGreaterThan(seq0);
    expect(String(after.component.getFirstPropertyValue("last-modified"))).not.toBe(lm0);
    expect(after.startDate.toJSDate().toISOString()).toBe("2026-03-31T18:00:00.000Z");
  });

  it("another athlete's token shows only that athlete's sessions", async () => {
    const ics = await (await fetchFeed(`${benToken}.ics`)).text();
    expect(parse(ics).events.map((e) => e.summary)).toEqual(["Ben's starts · Max velocity"]);
    expect(ics).not.toContain("Flys");
  });

  it("stores only the token's hash (and a sealed copy), never the token itself", async () => {
    const row = (await d.CalendarToken.findOne({ where: { athleteId: ada, revokedAt: null } }))!;
    expect(row.tokenHash).toBe(hashToken(adaToken));
    expect(row.tokenSealed).not.toContain(adaToken);
    expect(adaToken.length).toBeGreaterThanOrEqual(43); // 32 random bytes, base64url
    expect((await getCalendarFeedStatus({ athleteId: ada })).url).toBe(
      `http://sprintwright.test/api/calendar/${adaToken}.ics`,
    );
  });

  it("a rotated, revoked, unknown or malformed token gives 404 and no calendar", async () => {
    const rotated = await rotateCalendarToken({ athleteId: ada, createdBy: coach });
    expect((await fetchFeed(`${adaToken}.ics`)).status).toBe(404);
    expect((await fetchFeed(`${rotated.token}.ics`)).status).toBe(200);
    expect(await revokeCalendarToken({ athleteId: ada })).toBe(true);
    const revoked = await fetchFeed(`${rotated.token}.ics`);
    expect(revoked.status).toBe(404);
    expect(revoked.headers.get("content-type")).toContain("application/json");
    expect(await revoked.text()).not.toContain("VCALENDAR");
    expect((await getCalendarFeedStatus({ athleteId: ada })).active).toBe(false);
    expect((await fetchFeed(`${"x".repeat(43)}.ics`)).status).toBe(404);
    expect((await fetchFeed("..%2F..%2Fetc")).status).toBe(404);
    // Ben's link is untouched by Ada's rotation and revocation.
    expect((await fetchFeed(`${benToken}.ics`)).status).toBe(200);
  });
});
