// The feed as calendar apps poll it: a bounded range (8 weeks back, everything ahead), validators (RFC 9110
// §8.8: ETag, Last-Modified) and conditional GETs answered 304 (RFC 9110 §13.1.1, §13.1.3, §15.4.5), and a
// stored render that any app server serves until the athlete's sessions change. Parsed with ical.js.
import ICAL from "ical.js";
import { DateTime } from "luxon";
import { describe, expect, it } from "vitest";
import { GET } from "@/app/api/calendar/[token]/route";
import { rotateCalendarToken } from "@/lib/data/calendar-tokens";
import { serveFeedForSegment } from "@/lib/notices/feed";
import { deleteSession, updateSession } from "@/lib/services/plan-sessions";
import { updateSessionSchema } from "@/lib/validations/plan";
import { createTestTeam } from "../helpers/fixtures";
import { setupNotices } from "./notices-setup";

const { d } = await setupNotices();
const team = await createTestTeam(d, { name: "Poll Club" });
const coach = team.users.coach.userId;
const ada = team.users["ada@pollclub.test"].athleteId!;
const ben = team.users["ben@pollclub.test"].athleteId!;

const today = DateTime.now().setZone("Europe/London").startOf("day");
const day = (offset: number) => today.plus({ days: offset }).toISODate()!;

async function addSession(athleteId: number, date: string, title: string, status: "published" | "draft" = "published") {
  const s = await d.PlannedSession.create({
    teamId: team.teamId,
    athleteId,
    date,
    startTime: "17:30",
    durationMin: 60,
    title,
    plannedRpe: 6,
    status,
    notes: null,
    publishedAt: status === "published" ? new Date() : null,
  });
  await d.SessionBlock.create({
    sessionId: s.id,
    templateId: null,
    position: 0,
    kind: "acceleration",
    title: "Block starts",
    running: { sets: 2, reps: 4, distanceM: 20, intensityPct: 100, start: "blocks", runInM: 0, restSec: 180 },
    drills: null,
    notes: null,
  });
  return s;
}

const ancient = await addSession(ada, day(-400), "Last season's starts");
const justOut = await addSession(ada, day(-57), "Just out of range");
const justIn = await addSession(ada, day(-56), "Eight weeks ago");
const recent = await addSession(ada, day(-2), "Recent flys");
const ahead = await addSession(ada, day(3), "Starts ahead");
const farAhead = await addSession(ada, day(300), "Next season");
const token = (await rotateCalendarToken({ athleteId: ada, createdBy: null })).token;

async function poll(headers: Record<string, string> = {}) {
  return GET(new Request(`http://sprintwright.test/api/calendar/${token}.ics`, { headers }), {
    params: Promise.resolve({ token: `${token}.ics` }),
  });
}

function events(ics: string) {
  const cal = new ICAL.Component(ICAL.parse(ics));
  return { cal, list: cal.getAllSubcomponents("vevent").map((v) => new ICAL.Event(v)) };
}

const uid = (id: number) => `session-${id}@sprintwright`;

async function version(id: number) {
  return (await d.PlannedSession.findByPk(id, { attributes: ["version"] }))!.version;
}

type Seen = { etag: string; text: string };

async function current(): Promise<Seen> {
  const res = await poll();
  return { etag: res.headers.get("etag")!, text: await res.text() };
}

/** A change must give a new ETag and a new body; the old ETag then gets the full feed again. */
async function expectChanged(before: Seen, change: () => Promise<unknown>): Promise<Seen> {
  await change();
  const after = await poll({ "if-none-match": before.etag });
  expect(after.status).toBe(200);
  const seen = { etag: after.headers.get("etag")!, text: await after.text() };
  expect(seen.etag).not.toBe(before.etag);
  expect(seen.text).not.toBe(before.text);
  // The new ETag is the one that now gets 304.
  expect((await poll({ "if-none-match": seen.etag })).status).toBe(304);
  return seen;
}

describe("calendar feed range", () => {
  it("holds the sessions from 8 weeks back and everything ahead, nothing older, and says so", async () => {
    const res = await poll();
    expect(res.status).toBe(200);
    const { cal, list } = events(await res.text());
    expect(list.map((e) => e.uid)).toEqual([justIn, recent, ahead, farAhead].map((s) => uid(s.id)));
    expect(list.map((e) => e.uid)).not.toContain(uid(ancient.id));
    expect(list.map((e) => e.uid)).not.toContain(uid(justOut.id));
    expect(cal.getFirstPropertyValue("x-wr-caldesc")).toBe(
      "Training sessions from Poll Club: the last 8 weeks and everything ahead",
    );
  });

  it("moves with the calendar: a day later the session of 8 weeks ago leaves, and the ETag changes", async () => {
    const now = await serveFeedForSegment(`${token}.ics`);
    const tomorrow = await serveFeedForSegment(`${token}.ics`, today.plus({ days: 1, hours: 12 }).toJSDate());
    expect(now!.ics).toContain(uid(justIn.id));
    expect(tomorrow!.ics).not.toContain(uid(justIn.id));
    expect(tomorrow!.etag).not.toBe(now!.etag);
  });
});

describe("conditional polls", () => {
  it("gives a strong ETag and Last-Modified, and 304 with no body to If-None-Match", async () => {
    const first = await poll();
    const etag = first.headers.get("etag")!;
    // RFC 9110 §8.8.3: a strong entity tag is a quoted string without the W/ prefix.
    expect(etag).toMatch(/^"[A-Za-z0-9_-]+"$/);
    const lastModified = first.headers.get("last-modified")!;
    // RFC 9110 §5.6.7: IMF-fixdate.
    expect(lastModified).toMatch(/^[A-Z][a-z]{2}, \d{2} [A-Z][a-z]{2} \d{4} \d{2}:\d{2}:\d{2} GMT$/);
    expect(first.headers.get("cache-control")).toBe("private, no-cache");
    const body = await first.text();

    const again = await poll({ "if-none-match": etag });
    expect(again.status).toBe(304);
    expect(await again.text()).toBe("");
    expect(again.headers.get("etag")).toBe(etag);
    expect(again.headers.get("content-type")).toBeNull();

    // A list, and the weak form of the same tag, match too (If-None-Match compares weakly, §13.1.2).
    expect((await poll({ "if-none-match": `"other", W/${etag}` })).status).toBe(304);
    // §13.1.3: If-Modified-Since at or after Last-Modified, and no If-None-Match: 304.
    expect((await poll({ "if-modified-since": lastModified })).status).toBe(304);
    const earlier = new Date(Date.parse(lastModified) - 1000).toUTCString();
    expect((await poll({ "if-modified-since": earlier })).status).toBe(200);
    // §13.2.2: when If-None-Match is present, If-Modified-Since is ignored.
    expect((await poll({ "if-none-match": '"other"', "if-modified-since": lastModified })).status).toBe(200);
    // Without validators, the same bytes again (served from the stored render).
    const plain = await poll();
    expect(plain.headers.get("etag")).toBe(etag);
    expect(await plain.text()).toBe(body);
    expect((await d.CalendarFeedRender.findByPk(ada))!.ics).toBe(body);
  });

  it("a moved, edited or cancelled session changes the ETag and the body", async () => {
    const moved = await expectChanged(await current(), () =>
      updateSession({
        teamId: team.teamId,
        actorUserId: coach,
        sessionId: ahead.id,
        input: updateSessionSchema.parse({ version: 1, date: day(4) }),
      }),
    );
    const start = DateTime.fromISO(`${day(4)}T17:30`, { zone: "Europe/London" })
      .toUTC()
      .toISO({ suppressMilliseconds: false });
    const movedEvent = events(moved.text).list.find((e) => e.uid === uid(ahead.id))!;
    expect(movedEvent.startDate.toJSDate().toISOString()).toBe(start);

    const edited = await expectChanged(moved, async () =>
      updateSession({
        teamId: team.teamId,
        actorUserId: coach,
        sessionId: recent.id,
        input: updateSessionSchema.parse({ version: await version(recent.id), title: "Recent flys, longer" }),
      }),
    );
    expect(events(edited.text).list.map((e) => e.summary)).toContain("Recent flys, longer · Acceleration");

    const cancelled = await expectChanged(edited, async () =>
      deleteSession({
        teamId: team.teamId,
        actorUserId: coach,
        sessionId: farAhead.id,
        version: await version(farAhead.id),
      }),
    );
    const gone = events(cancelled.text).list.find((e) => e.uid === uid(farAhead.id))!;
    expect(gone.component.getFirstPropertyValue("status")).toBe("CANCELLED");

    // Moved to another athlete: it leaves Ada's feed.
    const away = await expectChanged(cancelled, async () =>
      updateSession({
        teamId: team.teamId,
        actorUserId: coach,
        sessionId: justIn.id,
        input: updateSessionSchema.parse({ version: await version(justIn.id), athleteId: ben }),
      }),
    );
    expect(events(away.text).list.map((e) => e.uid)).not.toContain(uid(justIn.id));
  });

  it("a change to the team's name or time zone, or the athlete's name, renders again", async () => {
    const renamed = await expectChanged(await current(), () =>
      d.Team.update({ name: "Poll Club East" }, { where: { id: team.teamId } }),
    );
    expect(renamed.text).toContain("Poll Club East");
    const moved = await expectChanged(renamed, () =>
      d.Team.update({ timeZone: "Europe/Berlin" }, { where: { id: team.teamId } }),
    );
    expect(moved.text).toContain("TZID:Europe/Berlin");
    const athlete = await expectChanged(moved, () => d.Athlete.update({ name: "Ada Runner" }, { where: { id: ada } }));
    expect(athlete.text).toContain("Ada Runner");
  });

  it("drafts stay out, and a draft being published changes the feed", async () => {
    const draft = await addSession(ada, day(5), "Quiet draft", "draft");
    const before = await poll();
    const etag = before.headers.get("etag")!;
    expect(await before.text()).not.toContain("Quiet draft");
    expect((await poll({ "if-none-match": etag })).status).toBe(304);
    const published = await expectChanged(await current(), () =>
      updateSession({
        teamId: team.teamId,
        actorUserId: coach,
        sessionId: draft.id,
        input: updateSessionSchema.parse({ version: 1, status: "published" }),
      }),
    );
    expect(published.text).toContain("Quiet draft");
  });
});
