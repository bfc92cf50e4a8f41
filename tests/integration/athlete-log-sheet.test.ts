// The athlete's log sheet over the route handlers, end to end: who may read and write a log and a check-in, the
// 48-hour lock and a coach reopening it (with the history), and a pain report above the team's line raising one
// physio alert and one e-mail delivered through the outbox to the real fake SMTP server.
import { describe, expect, it, vi } from "vitest";
import { listAlerts } from "@/lib/data/alerts";
import { addDays } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { createTestTeam } from "../helpers/fixtures";
import { setupNotices } from "./notices-setup";

const who: { userId: number | null } = { userId: null };
vi.mock("next-auth", async (orig) => ({
  ...(await orig<typeof import("next-auth")>()),
  getServerSession: async () => (who.userId ? { user: { id: who.userId } } : null),
}));

const n = await setupNotices();
const { d } = n;
const logRoute = await import("@/app/api/sessions/[sessionId]/log/route");
const unlockRoute = await import("@/app/api/sessions/[sessionId]/log/unlock/route");
const checkIns = await import("@/app/api/athletes/[athleteId]/check-ins/route");
const sessionRoute = await import("@/app/api/sessions/[sessionId]/route");
const threadRoute = await import("@/app/api/sessions/[sessionId]/messages/route");
const reportSettings = await import("@/app/api/teams/[teamId]/athlete-reports/route");

const team = await createTestTeam(d, { name: "Sheet Club" });
const { head_coach: head, coach, physio } = team.users;
const ada = team.users["ada@sheetclub.test"];
const ben = team.users["ben@sheetclub.test"];
const today = teamToday({ timeZone: "Europe/London", now: new Date() });

async function session(athleteId: number, date: string, title = "Acceleration") {
  const s = await d.PlannedSession.create({
    teamId: team.teamId,
    athleteId,
    date,
    startTime: "07:00",
    durationMin: 60,
    title,
    plannedRpe: 6,
    notes: null,
    status: "published",
    publishedAt: new Date(),
  });
  const running = {
    sets: 1,
    reps: 4,
    distanceM: 30,
    intensityPct: 95,
    start: "crouch" as const,
    runInM: 0,
    restSec: 180,
  };
  for (const [position, t] of ["Starts", "Flys", "Tempo"].entries())
    await d.SessionBlock.create({
      sessionId: s.id,
      templateId: null,
      position,
      kind: "acceleration",
      title: t,
      running,
      drills: null,
      notes: null,
    });
  return s.id;
}

const p = <T>(v: T) => ({ params: Promise.resolve(v) });
const req = (method: string, body?: unknown, query = "") =>
  new Request(`http://test/x${query}`, {
    method,
    headers: { "content-type": "application/json" },
    ...(body === undefined ? {} : { body: JSON.stringify(body) }),
  });
type Body = Record<string, unknown> & { error?: { code: string; message: string; fields?: Record<string, string[]> } };
const json = async (res: Response) => ({ status: res.status, body: (await res.json()) as Body });
const as = (userId: number) => {
  who.userId = userId;
};
const sid = (id: number) => p({ sessionId: String(id) });
const aid = (id: number) => p({ athleteId: String(id) });
const putLog = (id: number, body: unknown) => logRoute.PUT(req("PUT", body), sid(id)).then(json);
const log = { completion: "partly", rpe: 7, minutes: 60, completedReps: null, notes: null };

describe("an athlete sees and writes only their own", () => {
  it("answers 404 for another athlete's session, log and check-ins, 403 for staff writing a check-in", async () => {
    const bens = await session(ben.athleteId!, today);
    as(ada.userId);
    // The session itself and its thread (log note and messages) answer like a missing id.
    expect((await sessionRoute.GET(req("GET"), sid(bens)).then(json)).status).toBe(404);
    expect((await threadRoute.GET(req("GET"), sid(bens)).then(json)).status).toBe(404);
    expect((await logRoute.GET(req("GET"), sid(bens)).then(json)).status).toBe(404);
    expect((await putLog(bens, log)).status).toBe(404);
    expect((await logRoute.DELETE(req("DELETE"), sid(bens)).then(json)).status).toBe(404);
    expect((await checkIns.GET(req("GET"), aid(ben.athleteId!)).then(json)).status).toBe(404);
    const scores = { sleep: 4, fatigue: 4, soreness: 3, stress: 4, mood: 5 };
    expect((await checkIns.PUT(req("PUT", scores), aid(ben.athleteId!)).then(json)).status).toBe(404);
    expect(await d.SessionLog.count({ where: { sessionId: bens } })).toBe(0);
    expect(await d.CheckIn.count()).toBe(0);

    as(physio.userId);
    expect((await checkIns.PUT(req("PUT", scores), aid(ben.athleteId!)).then(json)).status).toBe(403);
    // Ben's own session and check-in are his to read.
    as(ben.userId);
    expect((await sessionRoute.GET(req("GET"), sid(bens)).then(json)).status).toBe(200);
    expect((await logRoute.GET(req("GET"), sid(bens)).then(json)).status).toBe(200);
    expect((await checkIns.GET(req("GET"), aid(ben.athleteId!)).then(json)).status).toBe(200);
  });
});

describe("the 48-hour lock", () => {
  it("refuses an athlete's log after it, names why, and a coach reopens it (every change kept)", async () => {
    const old = await session(ada.athleteId!, addDays(today, -3), "Old session");
    as(ada.userId);
    const refused = await putLog(old, { ...log, completion: "yes" });
    expect(refused.status).toBe(409);
    expect(refused.body.error?.message).toMatch(/locked/i);
    expect(refused.body.error?.message).toMatch(/48 hours after the session/);
    expect(refused.body.error?.message).toMatch(/coach to reopen/);
    expect(await d.SessionLog.count({ where: { sessionId: old } })).toBe(0);
    expect((await unlockRoute.POST(req("POST"), sid(old)).then(json)).status).toBe(403);

    as(physio.userId);
    expect((await unlockRoute.POST(req("POST"), sid(old)).then(json)).status).toBe(403);
    as(coach.userId);
    const unlocked = await unlockRoute.POST(req("POST"), sid(old)).then(json);
    expect(unlocked.status).toBe(200);
    expect(unlocked.body.lock).toMatchObject({ locked: false });

    as(ada.userId);
    expect((await putLog(old, { ...log, completion: "yes" })).status).toBe(200);
    expect((await putLog(old, { ...log, rpe: 6 })).status).toBe(200);
    const read = await logRoute.GET(req("GET"), sid(old)).then(json);
    const history = read.body.history as { action: string; byName: string; after: { rpe?: number } | null }[];
    expect(history.map((h) => [h.action, h.byName])).toEqual([
      ["unlocked", "Cato Coach"],
      ["created", "Ada Athlete"],
      ["updated", "Ada Athlete"],
    ]);
    expect(history[2].after?.rpe).toBe(6);
  });

  it("lets an athlete edit a fresh log, and lets a coach correct an old one without reopening it", async () => {
    const fresh = await session(ada.athleteId!, today, "Fresh");
    as(ada.userId);
    expect((await putLog(fresh, log)).status).toBe(200);
    const old = await session(ben.athleteId!, addDays(today, -5), "Old for coach");
    as(coach.userId);
    expect((await putLog(old, log)).status).toBe(200);
  });
});

describe("a pain report above the team's line", () => {
  it("raises exactly one physio alert and one e-mail, also when the log is saved again", async () => {
    const id = await session(ada.athleteId!, today, "Hill sprints");
    const pain = { region: "calf", severity: 6, stoppedSession: true };
    as(ada.userId);
    expect((await putLog(id, { ...log, notes: "Tight calf on the last rep", pain })).status).toBe(200);
    expect((await putLog(id, { ...log, rpe: 8, pain })).status).toBe(200);
    const alerts = (
      await listAlerts({ teamId: team.teamId, userId: physio.userId, query: { status: "all", limit: 50 } })
    ).filter((a) => a.kind === "pain");
    expect(alerts).toHaveLength(1);
    expect(alerts[0]).toMatchObject({
      athleteId: ada.athleteId,
      value: 6,
      threshold: 3,
      level: "alert",
      status: "open",
    });
    expect((await d.PainReport.findOne({ where: { sessionId: id } }))?.alertId).toBe(alerts[0].id);

    await n.worker.runOnce();
    const mails = (await n.mailTo("physio@sheetclub.test")).filter((m) => m.subject.startsWith("Pain reported"));
    expect(mails).toHaveLength(1);
    expect(mails[0].subject).toBe("Pain reported: Ada Athlete · Calf 6/10");
    expect(mails[0].text).toContain("Stopped the session: Yes");
    expect(mails[0].text).toContain("Tight calf on the last rep");
    // Coaches opt in to load alerts; the pain e-mail goes to the medical staff only.
    expect((await n.mailTo("coach@sheetclub.test")).filter((m) => m.subject.startsWith("Pain"))).toHaveLength(0);
    // One e-mail in all: the outbox holds a single message about it, to the team's one physio.
    const queued = await d.OutboxMessage.findAll({ where: { kind: "alert" }, attributes: ["toEmail", "subject"] });
    expect(queued.filter((m) => m.subject.startsWith("Pain reported")).map((m) => m.toEmail)).toEqual([
      "physio@sheetclub.test",
    ]);
  });

  it("raises nothing at or below the line, which the head coach sets", async () => {
    as(coach.userId);
    const T = p({ teamId: String(team.teamId) });
    expect((await reportSettings.PATCH(req("PATCH", { painAlertAbove: 6 }), T).then(json)).status).toBe(403);
    as(head.userId);
    const set = await reportSettings.PATCH(req("PATCH", { painAlertAbove: 6 }), T).then(json);
    expect(set.body.settings).toEqual({ painAlertAbove: 6, checkInsEnabled: false });
    const bad = await reportSettings.PATCH(req("PATCH", { painAlertAbove: 11 }), T).then(json);
    expect(bad.status).toBe(400);
    expect(bad.body.error?.fields?.painAlertAbove).toBeDefined();

    const id = await session(ben.athleteId!, today, "Block starts");
    as(ben.userId);
    const before = await d.Alert.count({ where: { kind: "pain" } });
    expect((await putLog(id, { ...log, pain: { region: "knee", severity: 6, stoppedSession: false } })).status).toBe(
      200,
    );
    expect(await d.Alert.count({ where: { kind: "pain" } })).toBe(before);
    expect(await d.PainReport.count({ where: { sessionId: id } })).toBe(1);
    // Clearing the report from the log removes it.
    expect((await putLog(id, log)).status).toBe(200);
    expect(await d.PainReport.count({ where: { sessionId: id } })).toBe(0);
  });
});

describe("the daily check-in", () => {
  it("is refused while the team has it off, then kept once a day with the athlete's trend", async () => {
    const scores = { sleep: 4, fatigue: 3, soreness: 2, stress: 4, mood: 5 };
    as(ada.userId);
    const off = await checkIns.PUT(req("PUT", scores), aid(ada.athleteId!)).then(json);
    expect(off.status).toBe(409);
    expect(off.body.error?.message).toMatch(/turned off/);
    as(head.userId);
    await reportSettings.PATCH(req("PATCH", { checkInsEnabled: true }), p({ teamId: String(team.teamId) }));
    as(ada.userId);
    expect((await checkIns.PUT(req("PUT", scores), aid(ada.athleteId!)).then(json)).status).toBe(200);
    const again = await checkIns.PUT(req("PUT", { ...scores, mood: 2 }), aid(ada.athleteId!)).then(json);
    expect(again.body.checkIn).toMatchObject({ date: today, mood: 2, total: 15 });
    const bad = await checkIns.PUT(req("PUT", { ...scores, sleep: 6 }), aid(ada.athleteId!)).then(json);
    expect(bad.status).toBe(400);
    expect(bad.body.error?.fields?.sleep).toBeDefined();
    const trend = await checkIns.GET(req("GET", undefined, "?days=7"), aid(ada.athleteId!)).then(json);
    expect(trend.body.checkIns).toEqual([expect.objectContaining({ date: today, total: 15 })]);
  });
});
