// A team whose week starts on Sunday, end to end through the route handlers: the head coach sets the week start,
// then the planner's week grid, the squad table's week totals, the week-over-week change, the athlete's page, the
// load alert and digest e-mails, the calendar invitations and the feed must all cut the weeks at the same Sunday.
// Weekdays are checked with luxon (an independent ISO 8601 implementation: 1 = Monday … 7 = Sunday).
import ICAL from "ical.js";
import { DateTime } from "luxon";
import { beforeEach, describe, expect, it } from "vitest";
import { notices, who } from "../helpers/handler-session";
import { addDays, startOfWeek, weekDays } from "@/lib/dates/plain-date";
import { formatDayLong, formatDayShort } from "@/lib/format/dates";
import type { AthleteLoadDto, SquadWeekDto } from "@/lib/data/load-views";
import type { PlanWeek, PlanWriteResult } from "@/lib/plan/types";
import { createTestTeam } from "../helpers/fixtures";
import { setupNotices } from "./notices-setup";

// Alerts, calendar invitations and their e-mails run for real here.
notices.hooks = "on";

const n = await setupNotices();
const { d } = n;
const { teamToday } = await import("@/lib/dates/zoned");
const weekStartRoute = await import("@/app/api/teams/[teamId]/week-start/route");
const planRoute = await import("@/app/api/teams/[teamId]/plan/route");
const toolsRoute = await import("@/app/api/teams/[teamId]/plan/[tool]/route");
const sessionsRoute = await import("@/app/api/teams/[teamId]/sessions/route");
const squadRoute = await import("@/app/api/teams/[teamId]/load/route");
const athleteRoute = await import("@/app/api/athletes/[athleteId]/load/route");
const feedRoute = await import("@/app/api/calendar/[token]/route");
const { rotateCalendarToken } = await import("@/lib/data/calendar-tokens");
const { updateNotificationSettings } = await import("@/lib/data/notification-settings");
const { queueDueDigests } = await import("@/lib/notices/digests");

const team = await createTestTeam(d, { name: "Sunday Club" });
const other = await createTestTeam(d, { name: "Other Club" });
const head = team.users.head_coach.userId;
const coach = team.users.coach.userId;
const physio = team.users.physio.userId;
const ada = team.users["ada@sundayclub.test"].athleteId!;
const T = String(team.teamId);

const isoWeekday = (date: string) => DateTime.fromISO(date, { zone: "utc" }).weekday;
// A Sunday three to four weeks ahead: every session is in the future, so the projected view counts the plan.
const W = startOfWeek(addDays(teamToday({ timeZone: "Europe/London", now: new Date() }), 21), 7);
const SAT_BEFORE = addDays(W, -1);
const SAT = addDays(W, 6);
const NEXT_SUN = addDays(W, 7);

const p = <T>(v: T) => ({ params: Promise.resolve(v) });
const url = (path: string) => `http://test${path}`;
const send = (path: string, method: string, body: unknown) =>
  new Request(url(path), {
    method,
    headers: { "content-type": "application/json" },
    body: JSON.stringify(body),
  });
type Err = { error?: { code: string; message: string; fields?: Record<string, string[]> } };
async function json<T>(res: Response): Promise<{ status: number; body: T & Err }> {
  return { status: res.status, body: (await res.json()) as T & Err };
}
const as = (userId: number | null) => void (who.userId = userId);
beforeEach(() => as(coach));

const setWeekStart = (body: unknown, teamId = T) =>
  weekStartRoute
    .PATCH(send(`/api/teams/${teamId}/week-start`, "PATCH", body), p({ teamId }))
    .then(json<{ weekStartDay: number }>);
const plan = (week: string) =>
  planRoute.GET(new Request(url(`/api/teams/${T}/plan?week=${week}`)), p({ teamId: T })).then(json<PlanWeek>);
const squad = (week: string) =>
  squadRoute
    .GET(new Request(url(`/api/teams/${T}/load?week=${week}&view=projected`)), p({ teamId: T }))
    .then(json<SquadWeekDto>);
const athlete = (from: string, to: string) =>
  athleteRoute
    .GET(
      new Request(url(`/api/athletes/${ada}/load?from=${from}&to=${to}&view=projected&metric=srpe`)),
      p({ athleteId: String(ada) }),
    )
    .then(json<AthleteLoadDto>);
/** A draft session through the planner's create handler; its sRPE is RPE × minutes (Foster 2001). */
const draft = (date: string, minutes: number, rpe: number) =>
  sessionsRoute
    .POST(
      send(`/api/teams/${T}/sessions`, "POST", {
        from: "blank",
        athleteId: ada,
        date,
        startTime: "17:00",
        durationMin: minutes,
        title: `Session ${date}`,
        plannedRpe: rpe,
        blocks: [],
      }),
      p({ teamId: T }),
    )
    .then(json<PlanWriteResult>);

describe("the team's week start (head coach only, Monday or Sunday)", () => {
  it("refuses other roles and other teams", async () => {
    for (const userId of [coach, physio, team.users["ada@sundayclub.test"].userId]) {
      as(userId);
      expect((await setWeekStart({ weekStartDay: 7 })).status).toBe(403);
    }
    as(other.users.head_coach.userId);
    expect((await setWeekStart({ weekStartDay: 7 })).status).toBe(404);
    as(null);
    expect((await setWeekStart({ weekStartDay: 7 })).status).toBe(401);
    expect((await d.Team.findByPk(team.teamId))!.weekStartDay).toBe(1);
  });

  it("answers 400 naming weekStartDay for anything but 1 or 7, and changes nothing", async () => {
    as(head);
    for (const bad of [{ weekStartDay: 0 }, { weekStartDay: 3 }, { weekStartDay: "7" }, { weekStartDay: 7.5 }, {}]) {
      const res = await setWeekStart(bad);
      expect(res.status, JSON.stringify(bad)).toBe(400);
      expect(res.body.error?.fields?.weekStartDay?.[0]).toBe("Choose Monday or Sunday");
      expect(res.body.error?.message).toContain("weekStartDay");
    }
    expect((await setWeekStart({ weekStartDay: 7, name: "x" })).status).toBe(400);
    expect((await d.Team.findByPk(team.teamId))!.weekStartDay).toBe(1);
  });

  it("the head coach sets Sunday (ISO 7)", async () => {
    as(head);
    const res = await setWeekStart({ weekStartDay: 7 });
    expect(res).toEqual({ status: 200, body: { weekStartDay: 7 } });
    expect((await d.Team.findByPk(team.teamId))!.weekStartDay).toBe(7);
  });
});

describe("a Sunday-start team: every screen, e-mail and feed cuts the week at the same Sunday", () => {
  it("sets up the plan: Saturday before, Sunday, Saturday, next Sunday", async () => {
    expect(isoWeekday(W)).toBe(7);
    // Created in this order so the only weekly jump appears when the Saturday before arrives:
    // week W = 8 × 50 + 8 × 40 = 720 AU against 5 × 60 = 300 AU the week before, +140 % (over the 15 % default limit).
    for (const [date, minutes, rpe] of [
      [NEXT_SUN, 10, 8],
      [W, 50, 8],
      [SAT, 40, 8],
      [SAT_BEFORE, 60, 5],
    ] as const) {
      expect((await draft(date, minutes, rpe)).status).toBe(201);
    }
  });

  it("the planner's week runs Sunday to Saturday and holds exactly that week's sessions", async () => {
    for (const anyDay of [W, addDays(W, 3), SAT]) {
      const { status, body } = await plan(anyDay);
      expect(status).toBe(200);
      expect(body.weekStartDay).toBe(7);
      expect(body.weekStart).toBe(W);
      expect(body.weekEnd).toBe(SAT);
      expect(body.days).toEqual(weekDays(W));
      expect(body.days.map(isoWeekday)).toEqual([7, 1, 2, 3, 4, 5, 6]);
      // The ISO week of the Sunday week's Wednesday (luxon).
      const mid = DateTime.fromISO(addDays(W, 3), { zone: "utc" });
      expect({ week: body.isoWeek, year: body.isoYear }).toEqual({ week: mid.weekNumber, year: mid.weekYear });
      const row = body.athletes.find((a) => a.id === ada)!;
      expect(row.sessions.map((s) => s.date)).toEqual([W, SAT]);
      expect(row.load.week.weekStart).toBe(W);
      expect(row.load.week.totals.srpe).toBe(720);
      expect(row.load.week.changePct.srpe).toBeCloseTo(140, 9);
    }
    // The Saturday before belongs to the week before.
    expect((await plan(SAT_BEFORE)).body.weekStart).toBe(addDays(W, -7));
  });

  it("the squad table's week totals and week-over-week change use the same week", async () => {
    const { status, body } = await squad(addDays(W, 4));
    expect(status).toBe(200);
    expect(body).toMatchObject({ weekStart: W, weekEnd: SAT, weekStartDay: 7, previousWeek: addDays(W, -7) });
    const row = body.rows.find((r) => r.id === ada)!;
    expect(row.totals.srpe).toBe(720);
    expect(row.previousTotals.srpe).toBe(300);
    // Δ % = (720 − 300) ÷ 300 × 100 = 140 (lib/load/README.md §8).
    expect(row.changePct.srpe).toBeCloseTo(140, 9);
    expect(row.flags.some((f) => f.kind === "weekly_jump" && f.date === W && f.metric === "srpe")).toBe(true);
    // The next Sunday opens the next week.
    const next = (await squad(NEXT_SUN)).body;
    expect(next.weekStart).toBe(NEXT_SUN);
    expect(next.rows.find((r) => r.id === ada)!.totals.srpe).toBe(80);
  });

  it("the athlete's page takes this week and next from Sunday, and its days add up to the same week totals", async () => {
    const { status, body } = await athlete(addDays(W, -14), SAT);
    expect(status).toBe(200);
    // The page's summary is the week holding today: the Sunday on or before today.
    expect(isoWeekday(body.week.weekStart)).toBe(7);
    expect(body.week.weekStart).toBe(startOfWeek(body.today, 7));
    expect(body.upcoming.week.weekStart).toBe(addDays(body.week.weekStart, 7));
    const sum = (from: string) =>
      body.days.filter((day) => day.date >= from && day.date <= addDays(from, 6)).reduce((t, day) => t + day.value, 0);
    expect(sum(W)).toBe(720);
    expect(sum(addDays(W, -7))).toBe(300);
  });

  it("the load alert is filed under the Sunday and its e-mail names that Sunday", async () => {
    const alerts = await d.Alert.findAll({ where: { athleteId: ada, kind: "weekly_jump" }, raw: true });
    expect(alerts).toHaveLength(1);
    expect(alerts[0]).toMatchObject({ weekStart: W, date: W, metric: "srpe" });
    expect(alerts[0]!.value).toBeCloseTo(140, 9);
    await n.worker.runOnce();
    const mails = (await n.mailTo("physio@sundayclub.test")).filter((m) => m.subject.includes("Weekly jump"));
    expect(mails).toHaveLength(1);
    expect(formatDayLong(W).startsWith("Sun ")).toBe(true);
    expect(mails[0]!.text).toContain(`raises a load flag for ${formatDayLong(W)}`);
    expect(mails[0]!.text).toContain("140");
    expect(mails[0]!.text).toContain("monitoring aids, not diagnoses");
  });

  it("the digest lists the same alert under the same Sunday", async () => {
    await updateNotificationSettings({ userId: head, teamId: team.teamId, alertEmail: "digest" });
    // Pretend the last digest went out a day ago, so today's slot is due and the alert falls in the window.
    await d.NotificationSetting.update(
      { lastDigestAt: new Date(Date.now() - 25 * 3_600_000) },
      { where: { userId: head, teamId: team.teamId } },
    );
    await d.Alert.update({ createdAt: new Date(Date.now() - 60_000) }, { where: { athleteId: ada } });
    expect(await queueDueDigests({ now: new Date() })).toBe(1);
    await n.worker.runOnce();
    const [digest] = await n.mailTo("head@sundayclub.test");
    expect(digest).toBeDefined();
    expect(digest!.text).toContain("Weekly jump");
    expect(digest!.text).toContain(formatDayLong(W));
  });

  it("publishing the Sunday week invites the athlete to exactly its sessions, and the feed agrees", async () => {
    const res = await toolsRoute.POST(
      send(`/api/teams/${T}/plan/publish`, "POST", { week: addDays(W, 2) }),
      p({ teamId: T, tool: "publish" }),
    );
    expect(res.status).toBe(200);
    const published = ((await res.json()) as PlanWriteResult).sessions.map((s) => s.date).sort();
    expect(published).toEqual([W, SAT]);
    await n.worker.runOnce();
    const invites = (await n.mailTo("ada@sundayclub.test")).filter((m) => m.subject.startsWith("Your sessions"));
    expect(invites).toHaveLength(1);
    expect(invites[0]!.subject).toContain(`the week of ${formatDayShort(W)}`);
    const part = invites[0]!.attachments.find((a) => /^text\/calendar/i.test(a.contentType))!;
    const invited = new ICAL.Component(ICAL.parse(part.content))
      .getAllSubcomponents("vevent")
      .map((v) => new ICAL.Event(v).startDate.toString().slice(0, 10))
      .sort();
    expect(invited).toEqual([W, SAT]);

    const { token } = await rotateCalendarToken({ athleteId: ada, createdBy: null });
    const feed = await feedRoute.GET(new Request(url(`/api/calendar/${token}.ics`)), p({ token: `${token}.ics` }));
    expect(feed.status).toBe(200);
    const inFeed = new ICAL.Component(ICAL.parse(await feed.text()))
      .getAllSubcomponents("vevent")
      .map((v) => new ICAL.Event(v).startDate.toString().slice(0, 10))
      .sort();
    // The drafts either side of the week stay out of the feed: only the Sunday week was published.
    expect(inFeed).toEqual([W, SAT]);
  });
});
