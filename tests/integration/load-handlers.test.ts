import { beforeEach, describe, expect, it, vi } from "vitest";
import { notices, who } from "../helpers/handler-session";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";

// The route handlers run for real; only next-auth's session lookup is replaced by "who is asking".
const logHook = vi.fn();
notices.hooks = {
  afterLogChange: (args: unknown) => logHook(args),
  afterPlanChange: async () => {},
};

const d = await setupTestDb();
const { teamToday } = await import("@/lib/dates/zoned");
const athleteLoad = await import("@/app/api/athletes/[athleteId]/load/route");
const squadLoad = await import("@/app/api/teams/[teamId]/load/route");
const preview = await import("@/app/api/load/preview/route");
const settings = await import("@/app/api/teams/[teamId]/settings/route");
const log = await import("@/app/api/sessions/[sessionId]/log/route");

const a = await createTestTeam(d, { name: "Alpha Track" });
const b = await createTestTeam(d, { name: "Bravo Track" });
const ada = a.users["ada@alphatrack.test"];
const ben = a.users["ben@alphatrack.test"];
const bravoHead = b.users.head_coach;
const today = teamToday({ timeZone: "Europe/London", now: new Date() });
const week = startOfWeek(today, 1);

const accel = {
  kind: "acceleration" as const,
  title: "Starts",
  running: { sets: 1, reps: 6, distanceM: 20, intensityPct: 95, start: "blocks" as const, runInM: 0, restSec: 180 },
  drills: null,
  notes: null,
};

async function addSession(athleteId: number, date: string) {
  const s = await d.PlannedSession.create({
    teamId: a.teamId,
    athleteId,
    date,
    startTime: "17:00",
    durationMin: 60,
    title: "Speed",
    plannedRpe: 6,
    status: "published",
    notes: null,
    publishedAt: new Date(),
  });
  const block = await d.SessionBlock.create({ sessionId: s.id, templateId: null, position: 0, ...accel });
  return { id: s.id, blockId: block.id };
}

// Five weeks of Tuesday/Thursday sessions for Ada and Ben, logged, ending before today.
for (let i = 35; i >= 1; i -= 3) {
  for (const who of [ada, ben]) {
    const s = await addSession(who.athleteId!, addDays(today, -i));
    await d.SessionLog.create({
      sessionId: s.id,
      athleteId: who.athleteId!,
      completion: "yes",
      rpe: 6,
      minutes: 60,
      completedReps: null,
      notes: null,
    });
  }
}
const adaPast = await addSession(ada.athleteId!, addDays(today, -1));
const benPast = await addSession(ben.athleteId!, addDays(today, -1));
const adaFuture = await addSession(ada.athleteId!, addDays(today, 2));

function get(path: string) {
  return new Request(`http://test${path}`);
}
function send(path: string, method: string, body: unknown) {
  return new Request(`http://test${path}`, {
    method,
    headers: { "content-type": "application/json" },
    body: typeof body === "string" ? body : JSON.stringify(body),
  });
}
const p = <T>(v: T) => ({ params: Promise.resolve(v) });
async function json(res: Response) {
  return {
    status: res.status,
    body: (await res.json()) as Record<string, unknown> & { error?: { fields?: Record<string, string[]> } },
  };
}
const as = (userId: number | null) => {
  who.userId = userId;
};

beforeEach(() => as(null));

describe("GET /api/athletes/[athleteId]/load", () => {
  const call = (athleteId: number, q = "") =>
    athleteLoad.GET(get(`/api/athletes/${athleteId}/load${q}`), p({ athleteId: String(athleteId) })).then(json);

  it("leaves a coach's draft out of the athlete's own figures (drafts are invisible to athletes), not the coach's", async () => {
    const date = addDays(today, 4);
    as(ada.userId);
    const before = await call(ada.athleteId!, "?view=projected&metric=hsrM");
    as(a.users.coach.userId);
    const coachBefore = await call(ada.athleteId!, "?view=projected&metric=hsrM");
    const draft = await d.PlannedSession.create({
      teamId: a.teamId,
      athleteId: ada.athleteId!,
      date,
      startTime: "17:00",
      durationMin: 60,
      title: "Speed",
      plannedRpe: 6,
      status: "draft",
      notes: null,
      publishedAt: null,
    });
    await d.SessionBlock.create({ sessionId: draft.id, templateId: null, position: 0, ...accel });
    try {
      as(ada.userId);
      expect(await call(ada.athleteId!, "?view=projected&metric=hsrM")).toEqual(before);
      as(a.users.coach.userId);
      const coachAfter = await call(ada.athleteId!, "?view=projected&metric=hsrM");
      const day = (r: typeof coachAfter) =>
        (r.body.days as { date: string; planned: number }[]).find((x) => x.date === date)!;
      expect(day(coachBefore).planned).toBe(0);
      expect(day(coachAfter).planned).toBeGreaterThan(0);
    } finally {
      await draft.destroy();
    }
  });

  it("lets an athlete read their own load", async () => {
    as(ada.userId);
    const { status, body } = await call(ada.athleteId!, "?view=actual&metric=hsrM");
    expect(status).toBe(200);
    expect(body.metric).toBe("hsrM");
    const days = body.days as { date: string; value: number; planned: number }[];
    expect(days.length).toBeGreaterThan(50);
    expect(days.some((x) => x.value > 0)).toBe(true);
    // The future session counts as planned, not as actual.
    const future = days.find((x) => x.date === addDays(today, 2))!;
    expect(future.value).toBe(0);
    expect(future.planned).toBeGreaterThan(0);
  });

  it("answers 404 when an athlete asks for another athlete, and for another team", async () => {
    as(ada.userId);
    expect((await call(ben.athleteId!)).status).toBe(404);
    as(bravoHead.userId);
    expect((await call(ada.athleteId!)).status).toBe(404);
    as(a.users.physio.userId);
    expect((await call(ben.athleteId!)).status).toBe(200);
    as(null);
    expect((await call(ada.athleteId!)).status).toBe(401);
  });

  it("answers 400 naming the field on a bad query", async () => {
    as(a.users.coach.userId);
    const reversed = await call(ada.athleteId!, "?from=2026-03-10&to=2026-03-01");
    expect(reversed.status).toBe(400);
    expect(reversed.body.error?.fields).toHaveProperty("to");
    const metric = await call(ada.athleteId!, "?metric=speed");
    expect(metric.status).toBe(400);
    expect(metric.body.error?.fields).toHaveProperty("metric");
    const date = await call(ada.athleteId!, "?from=2026-02-30");
    expect(date.status).toBe(400);
    expect(date.body.error?.fields).toHaveProperty("from");
    expect((await call(ada.athleteId!, "?view=maybe")).body.error?.fields).toHaveProperty("view");
  });
});

describe("GET /api/teams/[teamId]/load", () => {
  const call = (teamId: number, q = "") =>
    squadLoad.GET(get(`/api/teams/${teamId}/load${q}`), p({ teamId: String(teamId) })).then(json);

  it("gives staff the squad's week with totals, ratio and flags per athlete", async () => {
    as(a.users.physio.userId);
    const { status, body } = await call(a.teamId, `?week=${today}`);
    expect(status).toBe(200);
    expect(body.weekStart).toBe(week);
    const rows = body.rows as {
      name: string;
      totals: Record<string, number>;
      flags: unknown[];
      ratio: number | null;
    }[];
    expect(rows.map((r) => r.name)).toEqual(["Ada Athlete", "Ben Athlete"]);
    expect(rows[0].totals).toHaveProperty("hsrM");
    expect(Array.isArray(rows[0].flags)).toBe(true);
  });

  it("refuses athletes (403) and other teams (404); bad week → 400 with the field", async () => {
    as(ada.userId);
    expect((await call(a.teamId)).status).toBe(403);
    as(bravoHead.userId);
    expect((await call(a.teamId)).status).toBe(404);
    as(a.users.coach.userId);
    const bad = await call(a.teamId, "?week=next-week");
    expect(bad.status).toBe(400);
    expect(bad.body.error?.fields).toHaveProperty("week");
  });
});

describe("POST /api/load/preview", () => {
  const call = (body: unknown) => preview.POST(send("/api/load/preview", "POST", body), p({})).then(json);
  const proposal = (days: number[]) => ({
    teamId: a.teamId,
    athleteId: ada.athleteId!,
    week,
    sessions: days.map((i) => ({ date: addDays(week, i), durationMin: 90, plannedRpe: 8, blocks: [accel] })),
  });

  it("returns the proposed week's totals and flags next to the saved week, saving nothing", async () => {
    as(a.users.coach.userId);
    const before = await d.PlannedSession.count();
    const { status, body } = await call(proposal([0, 1, 2, 3, 4, 5, 6]));
    expect(status).toBe(200);
    const proposed = body.proposed as { week: { totals: { srpe: number } }; flags: unknown[] };
    const current = body.current as { week: { totals: { srpe: number } } };
    expect(proposed.week.totals.srpe).toBeGreaterThan(current.week.totals.srpe);
    expect(await d.PlannedSession.count()).toBe(before);
  });

  it("refuses athletes and other teams' athletes; a date outside the week → 400 on that field", async () => {
    as(ada.userId);
    expect((await call(proposal([1]))).status).toBe(403);
    as(bravoHead.userId);
    expect((await call({ ...proposal([1]), teamId: b.teamId })).status).toBe(404);
    as(a.users.coach.userId);
    const outside = await call({
      ...proposal([1]),
      sessions: [{ ...proposal([1]).sessions[0], date: addDays(week, 9) }],
    });
    expect(outside.status).toBe(400);
    expect(outside.body.error?.fields).toHaveProperty(["sessions.0.date"]);
    const rpe = await call({ ...proposal([1]), sessions: [{ ...proposal([1]).sessions[0], plannedRpe: 12 }] });
    expect(rpe.body.error?.fields).toHaveProperty(["sessions.0.plannedRpe"]);
    expect((await call("{not json")).status).toBe(400);
  });
});

describe("GET/PATCH /api/teams/[teamId]/settings", () => {
  const patch = (body: unknown) =>
    settings.PATCH(send(`/api/teams/${a.teamId}/settings`, "PATCH", body), p({ teamId: String(a.teamId) })).then(json);

  it("lets members read, only the head coach edit, and names the bad field", async () => {
    as(ada.userId);
    const read = await settings.GET(get(`/api/teams/${a.teamId}/settings`), p({ teamId: String(a.teamId) })).then(json);
    expect(read.status).toBe(200);
    as(a.users.coach.userId);
    expect((await patch({ spikeRatio: 1.6 })).status).toBe(403);
    as(a.users.head_coach.userId);
    const ok = await patch({ spikeRatio: 1.6 });
    expect(ok.status).toBe(200);
    expect((ok.body.settings as { spikeRatio: number }).spikeRatio).toBe(1.6);
    const order = await patch({ risingRatio: 1.8 });
    expect(order.status).toBe(400);
    expect(order.body.error?.fields).toHaveProperty("risingRatio");
    expect((await patch({ hsrSpeedMs: 55 })).body.error?.fields).toHaveProperty("hsrSpeedMs");
    expect((await patch({ colour: "red" })).status).toBe(400);
    as(bravoHead.userId);
    expect((await patch({ spikeRatio: 1.7 })).status).toBe(404);
  });
});

describe("PUT/DELETE /api/sessions/[sessionId]/log", () => {
  const put = (sessionId: number, body: unknown) =>
    log.PUT(send(`/api/sessions/${sessionId}/log`, "PUT", body), p({ sessionId: String(sessionId) })).then(json);
  const del = (sessionId: number) =>
    log.DELETE(send(`/api/sessions/${sessionId}/log`, "DELETE", ""), p({ sessionId: String(sessionId) })).then(json);

  it("lets an athlete log their own session and tells notices inside the transaction", async () => {
    as(ada.userId);
    logHook.mockClear();
    const { status, body } = await put(adaPast.id, {
      completion: "partly",
      rpe: 7,
      minutes: 45,
      completedReps: { [String(adaPast.blockId)]: 4 },
    });
    expect(status).toBe(200);
    expect(body.log).toMatchObject({ sessionId: adaPast.id, completion: "partly", rpe: 7, minutes: 45 });
    expect(logHook).toHaveBeenCalledWith(
      expect.objectContaining({
        sessionId: adaPast.id,
        athleteId: ada.athleteId,
        actorUserId: ada.userId,
        transaction: expect.anything(),
      }),
    );
    // A second PUT replaces the log.
    expect((await put(adaPast.id, { completion: "yes", rpe: 6, minutes: 60 })).body.log).toMatchObject({
      completion: "yes",
      completedReps: null,
    });
    expect(await d.SessionLog.count({ where: { sessionId: adaPast.id } })).toBe(1);
  });

  it("refuses someone else's session (404), a physio (403) and signed-out callers (401)", async () => {
    as(ada.userId);
    expect((await put(benPast.id, { completion: "yes" })).status).toBe(404);
    as(bravoHead.userId);
    expect((await put(benPast.id, { completion: "yes" })).status).toBe(404);
    as(a.users.physio.userId);
    expect((await put(benPast.id, { completion: "yes" })).status).toBe(403);
    as(null);
    expect((await put(benPast.id, { completion: "yes" })).status).toBe(401);
    as(ada.userId);
    expect((await put(999999, { completion: "yes" })).status).toBe(404);
  });

  it("answers 400 with the field on bad input, never 500", async () => {
    as(ada.userId);
    const cases: [unknown, string][] = [
      [{ completion: "yes", rpe: 11 }, "rpe"],
      [{ completion: "yes", rpe: -1 }, "rpe"],
      [{ completion: "yes", minutes: 0 }, "minutes"],
      [{ completion: "yes", minutes: 601 }, "minutes"],
      [{ completion: "maybe" }, "completion"],
      [{ completion: "yes", completedReps: { "999999": 3 } }, "completedReps.999999"],
      [{ completion: "yes", completedReps: { [String(adaPast.blockId)]: 2.5 } }, `completedReps.${adaPast.blockId}`],
    ];
    for (const [body, field] of cases) {
      const res = await put(adaPast.id, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error?.fields, JSON.stringify(body)).toHaveProperty([field]);
    }
    const future = await put(adaFuture.id, { completion: "yes" });
    expect(future.status).toBe(400);
    expect(future.body.error?.fields).toHaveProperty("session");
  });

  it("answers an athlete's log of a draft exactly like a missing id, and refuses staff a draft too", async () => {
    const draft = await d.PlannedSession.create({
      teamId: a.teamId,
      athleteId: ada.athleteId!,
      date: addDays(today, -1),
      startTime: "17:00",
      durationMin: 60,
      title: "Speed",
      plannedRpe: 6,
      status: "draft",
      notes: null,
      publishedAt: null,
    });
    as(ada.userId);
    const missing = await put(999999, { completion: "yes" });
    const onDraft = await put(draft.id, { completion: "yes" });
    expect(onDraft).toEqual(missing);
    expect(missing.status).toBe(404);
    expect(await del(draft.id)).toEqual(await del(999999));
    as(a.users.coach.userId);
    const staff = await put(draft.id, { completion: "yes" });
    expect(staff.status).toBe(400);
    expect(staff.body.error?.fields).toHaveProperty("session");
    expect(await d.SessionLog.count({ where: { sessionId: draft.id } })).toBe(0);
  });

  it("deletes a log", async () => {
    as(a.users.coach.userId);
    expect((await del(adaPast.id)).body).toEqual({ deleted: true });
    expect((await del(adaPast.id)).body).toEqual({ deleted: false });
  });
});
