import { beforeEach, describe, expect, it, vi } from "vitest";
import { notices, who } from "../helpers/handler-session";
import type { SessionChange } from "@/lib/plan/changes";
import type { PlanSession, PlanWeek, PlanWriteResult } from "@/lib/plan/types";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { rowLoad } from "@/lib/plan/preview";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";

// The route handlers run for real over a temp SQLite file; only next-auth's session lookup is replaced by
// "who is asking", and the notices hook records what it is told instead of queueing mail.
const told: SessionChange[][] = [];
const failNotice = { next: false };
notices.hooks = {
  afterPlanChange: async ({ changes }: { changes: SessionChange[] }) => {
    if (failNotice.next) {
      failNotice.next = false;
      throw new Error("notices unavailable");
    }
    told.push(changes);
  },
  afterLogChange: async () => {},
};

const d = await setupTestDb();
const { teamToday } = await import("@/lib/dates/zoned");
const plan = await import("@/app/api/teams/[teamId]/plan/route");
const tools = await import("@/app/api/teams/[teamId]/plan/[tool]/route");
const sessions = await import("@/app/api/teams/[teamId]/sessions/route");
const session = await import("@/app/api/sessions/[sessionId]/route");
const blocks = await import("@/app/api/sessions/[sessionId]/blocks/route");
const block = await import("@/app/api/sessions/[sessionId]/blocks/[blockId]/route");
const templates = await import("@/app/api/teams/[teamId]/templates/route");
const template = await import("@/app/api/templates/[templateId]/route");

const a = await createTestTeam(d, { name: "Alpha Track" });
const b = await createTestTeam(d, { name: "Bravo Track" });
const coach = a.users.coach.userId;
const physio = a.users.physio.userId;
const ada = a.users["ada@alphatrack.test"];
const ben = a.users["ben@alphatrack.test"];
const bravoCoach = b.users.coach.userId;
const bravoAda = b.users["ada@bravotrack.test"].athleteId!;

// Next week: every session there is "planned" in the projected view whatever today is.
const week = addDays(startOfWeek(teamToday({ timeZone: "Europe/London", now: new Date() }), 1), 7);
const tue = addDays(week, 1);
const thu = addDays(week, 3);

const flying = {
  kind: "max_velocity" as const,
  title: "Flying 30s",
  running: { sets: 1, reps: 4, distanceM: 30, intensityPct: 95, start: "flying" as const, runInM: 20, restSec: 240 },
  drills: null,
  notes: null,
  durationMin: 50,
  plannedRpe: 7,
};
const pogo = {
  kind: "plyometric" as const,
  title: "Pogo hops",
  running: null,
  drills: [{ name: "Pogo", sets: 3, reps: 10, contactsPerRep: 2, intensity: "low" as const }],
  notes: null,
  durationMin: 20,
  plannedRpe: 4,
};
const bravoTemplate = await d.BlockTemplate.create({ teamId: b.teamId, ...flying });

const p = <T>(v: T) => ({ params: Promise.resolve(v) });
const url = (path: string) => `http://test${path}`;
const send = (path: string, method: string, body?: unknown) =>
  new Request(url(path), {
    method,
    headers: { "content-type": "application/json" },
    body: body === undefined ? undefined : typeof body === "string" ? body : JSON.stringify(body),
  });
type Answer<T> = {
  status: number;
  body: T & { error?: { code: string; message: string; fields?: Record<string, string[]>; current?: PlanSession } };
};
async function json<T>(res: Response): Promise<Answer<T>> {
  return { status: res.status, body: (await res.json()) as Answer<T>["body"] };
}
const as = (userId: number | null) => void (who.userId = userId);
beforeEach(() => {
  as(coach);
  told.length = 0;
});

const T = String(a.teamId);
const getWeek = (q = `?week=${week}`, teamId = T) =>
  plan.GET(new Request(url(`/api/teams/${teamId}/plan${q}`)), p({ teamId })).then(json<PlanWeek>);
const create = (body: unknown, teamId = T) =>
  sessions.POST(send(`/api/teams/${teamId}/sessions`, "POST", body), p({ teamId })).then(json<PlanWriteResult>);
const patch = (id: number, body: unknown) =>
  session.PATCH(send(`/api/sessions/${id}`, "PATCH", body), p({ sessionId: String(id) })).then(json<PlanWriteResult>);
const del = (id: number, version?: number) =>
  session
    .DELETE(
      send(`/api/sessions/${id}${version === undefined ? "" : `?version=${version}`}`, "DELETE"),
      p({ sessionId: String(id) }),
    )
    .then(json<PlanWriteResult>);
const tool = (name: string, body: unknown) =>
  tools
    .POST(send(`/api/teams/${T}/plan/${name}`, "POST", body), p({ teamId: T, tool: name }))
    .then(json<PlanWriteResult>);
const newTemplate = (body: unknown, teamId = T) =>
  templates
    .POST(send(`/api/teams/${teamId}/templates`, "POST", body), p({ teamId }))
    .then(json<{ template: { id: number } }>);

as(coach);
const maxV = (await newTemplate(flying)).body.template.id;
const plyo = (await newTemplate(pogo)).body.template.id;

describe("templates", () => {
  it("creates, lists, updates and deletes the team's templates", async () => {
    const made = await newTemplate({ ...pogo, title: "Skips" });
    expect(made.status).toBe(201);
    const id = made.body.template.id;
    const list = await templates
      .GET(new Request(url(`/api/teams/${T}/templates`)), p({ teamId: T }))
      .then(json<{ templates: { title: string }[] }>);
    expect(list.body.templates.map((t) => t.title)).toEqual(
      expect.arrayContaining(["Flying 30s", "Pogo hops", "Skips"]),
    );
    const put = await template
      .PUT(
        send(`/api/templates/${id}`, "PUT", { ...pogo, title: "A skips", version: 1 }),
        p({ templateId: String(id) }),
      )
      .then(json<{ template: { title: string; version: number } }>);
    expect(put.body.template).toMatchObject({ title: "A skips", version: 2 });
    // The same edit again carries a version that has moved on: 409 "stale" with the stored template, nothing written.
    const stale = await template
      .PUT(
        send(`/api/templates/${id}`, "PUT", { ...pogo, title: "B skips", version: 1 }),
        p({ templateId: String(id) }),
      )
      .then(json<{ error: { code: string; current: { title: string } } }>);
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatchObject({ code: "stale", current: { title: "A skips" } });
    const missing = await template
      .PUT(send(`/api/templates/${id}`, "PUT", { ...pogo, title: "C skips" }), p({ templateId: String(id) }))
      .then(json<{ error: { fields: Record<string, string[]> } }>);
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields).toHaveProperty("version");
    expect((await template.DELETE(send(`/api/templates/${id}`, "DELETE"), p({ templateId: String(id) }))).status).toBe(
      200,
    );
    expect((await template.GET(new Request(url(`/api/templates/${id}`)), p({ templateId: String(id) }))).status).toBe(
      404,
    );
  });

  it("answers 400 with the field for a running block without its prescription", async () => {
    const res = await newTemplate({ ...flying, running: null });
    expect(res.status).toBe(400);
    expect(res.body.error?.fields).toHaveProperty("running");
    const bad = await newTemplate({ ...flying, running: { ...flying.running, intensityPct: 140 } });
    expect(bad.body.error?.fields).toHaveProperty(["running.intensityPct"]);
  });

  it("keeps only the prescription a kind uses", async () => {
    const res = await newTemplate({ ...pogo, kind: "strength", title: "Squats", drills: pogo.drills });
    const t = await template
      .GET(new Request(url(`/api/templates/${res.body.template.id}`)), p({ templateId: String(res.body.template.id) }))
      .then(json<{ template: { drills: unknown } }>);
    expect(t.body.template.drills).toBeNull();
  });

  it("refuses physios (403) and another team (404)", async () => {
    as(physio);
    expect((await newTemplate(flying)).status).toBe(403);
    as(bravoCoach);
    expect(
      (
        await template.PUT(
          send(`/api/templates/${maxV}`, "PUT", { ...flying, version: 1 }),
          p({ templateId: String(maxV) }),
        )
      ).status,
    ).toBe(404);
  });
});

describe("dropping templates", () => {
  it("makes a draft session from a template: its title, duration and RPE, starting 16:00", async () => {
    const res = await create({ from: "template", templateId: maxV, athleteId: ada.athleteId, date: tue });
    expect(res.status).toBe(201);
    const [s] = res.body.sessions;
    expect(s).toMatchObject({
      athleteId: ada.athleteId,
      date: tue,
      startTime: "16:00",
      title: "Flying 30s",
      durationMin: 50,
      plannedRpe: 7,
      status: "draft",
      version: 1,
      sequence: 0,
    });
    expect(s.blocks).toEqual([
      expect.objectContaining({ kind: "max_velocity", templateId: maxV, position: 0, running: flying.running }),
    ]);
    expect(told).toEqual([
      [
        expect.objectContaining({
          kind: "created",
          sessionId: s.id,
          before: null,
          after: expect.objectContaining({ id: s.id, status: "draft" }),
        }),
      ],
    ]);
  });

  it("answers each write with the server's week numbers for the touched athletes, equal to a fresh GET", async () => {
    const res = await create({
      from: "template",
      templateId: plyo,
      athleteId: ben.athleteId,
      date: addDays(week, 6),
    });
    expect(res.body.touched).toEqual([{ athleteId: ben.athleteId, date: addDays(week, 6) }]);
    expect(res.body.rows?.map((r) => [r.athleteId, r.weekStart])).toEqual([[ben.athleteId, week]]);
    const fresh = (await getWeek()).body.athletes.find((x) => x.id === ben.athleteId)!;
    expect(res.body.rows![0].load).toEqual(fresh.load);
    const [s] = res.body.sessions;
    const gone = await del(s.id, 1);
    expect(gone.body.touched).toEqual([{ athleteId: ben.athleteId, date: addDays(week, 6) }]);
    expect(gone.body.rows![0].load).toEqual((await getWeek()).body.athletes.find((x) => x.id === ben.athleteId)!.load);
  });

  it("appends the template as a block to a session, bumping its version", async () => {
    const [s] = (await create({ from: "template", templateId: maxV, athleteId: ben.athleteId, date: tue })).body
      .sessions;
    const res = await blocks
      .POST(
        send(`/api/sessions/${s.id}/blocks`, "POST", { version: 1, templateId: plyo }),
        p({ sessionId: String(s.id) }),
      )
      .then(json<PlanWriteResult>);
    expect(res.status).toBe(201);
    const after = res.body.sessions[0];
    expect(after.version).toBe(2);
    expect(after.blocks.map((x) => [x.kind, x.position])).toEqual([
      ["max_velocity", 0],
      ["plyometric", 1],
    ]);
    expect(told.at(-1)?.[0]).toMatchObject({
      kind: "updated",
      before: { blocks: [expect.anything()] },
      after: { blocks: [expect.anything(), expect.anything()] },
    });
  });

  it("gives a group drop to every athlete of the group in one write (adding to a session already there)", async () => {
    const day = addDays(week, 4);
    const [existing] = (await create({ from: "template", templateId: maxV, athleteId: ada.athleteId, date: day })).body
      .sessions;
    told.length = 0;
    const res = await create({ from: "template", templateId: plyo, groupId: a.groupId, date: day });
    expect(res.status).toBe(201);
    const byAthlete = new Map(res.body.sessions.map((s) => [s.athleteId, s]));
    expect(byAthlete.get(ada.athleteId!)).toMatchObject({ id: existing.id, version: 2 });
    expect(byAthlete.get(ada.athleteId!)!.blocks.map((x) => x.kind)).toEqual(["max_velocity", "plyometric"]);
    expect(byAthlete.get(ben.athleteId!)).toMatchObject({ title: "Pogo hops", version: 1 });
    expect(told).toHaveLength(1);
    expect(told[0].map((c) => c.kind).sort()).toEqual(["created", "updated"]);
  });

  it("writes a group drop in one transaction: when anything in it fails, no athlete gets a session", async () => {
    const day = addDays(week, 5);
    const before = await d.PlannedSession.count({ where: { teamId: a.teamId, date: day } });
    failNotice.next = true;
    const spy = vi.spyOn(console, "error").mockImplementation(() => {});
    const res = await create({ from: "template", templateId: maxV, groupId: a.groupId, date: day });
    spy.mockRestore();
    expect(res.status).toBe(500);
    expect(await d.PlannedSession.count({ where: { teamId: a.teamId, date: day } })).toBe(before);
  });

  it("answers 404 for another team's template, athlete or group, and 400 for a drop with neither", async () => {
    expect(
      (await create({ from: "template", templateId: bravoTemplate.id, athleteId: ada.athleteId, date: tue })).status,
    ).toBe(404);
    const other = await create({ from: "template", templateId: maxV, athleteId: bravoAda, date: tue });
    expect(other.status).toBe(404);
    expect(other.body.error?.fields).toHaveProperty("athleteId");
    expect((await create({ from: "template", templateId: maxV, groupId: b.groupId, date: tue })).status).toBe(404);
    const neither = await create({ from: "template", templateId: maxV, date: tue });
    expect(neither.status).toBe(400);
    expect(neither.body.error?.fields).toHaveProperty("athleteId");
  });

  it("answers 400 with the field for bad input, and never writes", async () => {
    const before = await d.PlannedSession.count();
    const noDate = await create({ from: "template", templateId: maxV, athleteId: ada.athleteId });
    expect(noDate.status).toBe(400);
    expect(noDate.body.error?.fields).toHaveProperty("date");
    expect(
      (await create({ from: "template", templateId: maxV, athleteId: ada.athleteId, date: "2026-02-30" })).body.error
        ?.fields,
    ).toHaveProperty("date");
    expect((await create({ from: "somewhere" })).status).toBe(400);
    const blank = await create({
      from: "blank",
      athleteId: ada.athleteId,
      date: tue,
      durationMin: 60,
      title: "X",
      plannedRpe: 11,
      blocks: [],
    });
    expect(blank.body.error?.fields).toHaveProperty("plannedRpe");
    expect((await create("{not json")).status).toBe(400);
    expect(await d.PlannedSession.count()).toBe(before);
  });
});

describe("moving, copying, editing", () => {
  it(
    "moves a session to another day and athlete with the version it read; " +
      "a stale version answers 409 with the current session",
    async () => {
      const [s] = (await create({ from: "template", templateId: maxV, athleteId: ada.athleteId, date: tue })).body
        .sessions;
      const moved = await patch(s.id, { version: 1, date: thu });
      expect(moved.status).toBe(200);
      expect(moved.body.sessions[0]).toMatchObject({ date: thu, version: 2, sequence: 0 });
      const stale = await patch(s.id, { version: 1, athleteId: ben.athleteId });
      expect(stale.status).toBe(409);
      expect(stale.body.error).toMatchObject({ code: "stale", current: { id: s.id, date: thu, version: 2 } });
      const other = await patch(s.id, { version: 2, athleteId: ben.athleteId });
      expect(other.body.sessions[0]).toMatchObject({ athleteId: ben.athleteId, version: 3 });
    },
  );

  it("copies a session as a new draft with its blocks", async () => {
    const [s] = (await create({ from: "template", templateId: plyo, athleteId: ada.athleteId, date: tue })).body
      .sessions;
    const res = await create({ from: "copy", sessionId: s.id, athleteId: ben.athleteId, date: addDays(week, 5) });
    const [c] = res.body.sessions;
    expect(c.id).not.toBe(s.id);
    expect(c).toMatchObject({ athleteId: ben.athleteId, status: "draft", title: "Pogo hops", version: 1 });
    expect(c.blocks).toEqual([expect.objectContaining({ kind: "plyometric", templateId: plyo, drills: pogo.drills })]);
    expect(c.blocks[0].id).not.toBe(s.blocks[0].id);
  });

  it("rewrites a session's fields and blocks from the editor, and edits and removes one block", async () => {
    const [s] = (await create({ from: "template", templateId: maxV, athleteId: ada.athleteId, date: addDays(week, 6) }))
      .body.sessions;
    const edited = await patch(s.id, {
      version: 1,
      startTime: "09:30",
      durationMin: 75,
      plannedRpe: 8,
      notes: "  Spikes on  ",
      blocks: [
        { ...s.blocks[0], title: "Flying 20s" },
        { kind: "recovery", title: "Walk back", running: null, drills: null, notes: null },
      ],
    });
    const e = edited.body.sessions[0];
    expect(e).toMatchObject({ startTime: "09:30", durationMin: 75, plannedRpe: 8, notes: "Spikes on", version: 2 });
    expect(e.blocks.map((x) => x.title)).toEqual(["Flying 20s", "Walk back"]);
    const one = await block
      .PATCH(
        send(`/api/sessions/${s.id}/blocks/${e.blocks[1].id}`, "PATCH", {
          version: 2,
          block: { kind: "recovery", title: "Easy jog", running: null, drills: null, notes: null },
        }),
        p({ sessionId: String(s.id), blockId: String(e.blocks[1].id) }),
      )
      .then(json<PlanWriteResult>);
    expect(one.body.sessions[0].blocks.map((x) => x.title)).toEqual(["Flying 20s", "Easy jog"]);
    const gone = await block
      .DELETE(
        send(`/api/sessions/${s.id}/blocks/${e.blocks[1].id}?version=3`, "DELETE"),
        p({ sessionId: String(s.id), blockId: String(e.blocks[1].id) }),
      )
      .then(json<PlanWriteResult>);
    expect(gone.body.sessions[0].blocks).toHaveLength(1);
    expect(gone.body.sessions[0].version).toBe(4);
    const badField = await patch(s.id, { version: 4, startTime: "25:00" });
    expect(badField.body.error?.fields).toHaveProperty("startTime");
    expect((await patch(s.id, { version: 4, colour: "red" })).status).toBe(400);
  });

  it("keeps a logged session on its day", async () => {
    const [s] = (await create({ from: "template", templateId: maxV, athleteId: ada.athleteId, date: tue })).body
      .sessions;
    await d.SessionLog.create({
      sessionId: s.id,
      athleteId: ada.athleteId!,
      completion: "yes",
      rpe: 7,
      minutes: 50,
      completedReps: null,
      notes: null,
    });
    const res = await patch(s.id, { version: 1, date: thu });
    expect(res.status).toBe(409);
    expect(res.body.error?.code).toBe("conflict");
    // Deleting keeps it too (as cancelled), so the athlete's log is never lost.
    const gone = await del(s.id, 1);
    expect(gone.body.sessions[0]).toMatchObject({ id: s.id, status: "cancelled" });
    expect(await d.SessionLog.count({ where: { sessionId: s.id } })).toBe(1);
  });
});

describe("deleting and the week tools", () => {
  it("removes a draft, and keeps a published session as cancelled with a new SEQUENCE", async () => {
    const day = addDays(week, 2);
    const [draft] = (await create({ from: "template", templateId: plyo, athleteId: ben.athleteId, date: day })).body
      .sessions;
    expect((await del(draft.id)).body.error?.fields).toHaveProperty("version");
    const gone = await del(draft.id, 1);
    expect(gone.body).toMatchObject({ sessions: [], removedIds: [draft.id] });
    expect(told.at(-1)).toEqual([
      expect.objectContaining({ kind: "deleted", before: expect.objectContaining({ id: draft.id }), after: null }),
    ]);

    const [s] = (await create({ from: "template", templateId: maxV, athleteId: ben.athleteId, date: day })).body
      .sessions;
    const pub = await patch(s.id, { version: 1, status: "published" });
    expect(pub.body.sessions[0]).toMatchObject({ status: "published", sequence: 0, version: 2 });
    expect(pub.body.sessions[0].publishedAt).not.toBeNull();
    expect(told.at(-1)?.[0].kind).toBe("published");
    const edited = await patch(s.id, { version: 2, startTime: "17:00" });
    expect(edited.body.sessions[0]).toMatchObject({ sequence: 1, version: 3 });
    const cancelled = await del(s.id, 3);
    expect(cancelled.body.sessions[0]).toMatchObject({ status: "cancelled", sequence: 2, version: 4 });
    expect(told.at(-1)).toEqual([
      expect.objectContaining({
        kind: "deleted",
        before: expect.objectContaining({ status: "published" }),
        after: expect.objectContaining({ status: "cancelled", sequence: 2 }),
      }),
    ]);
    const back = await patch(s.id, { version: 4, status: "published" });
    expect(back.body.sessions[0]).toMatchObject({ status: "published", sequence: 3 });
  });

  it("publishes the week's drafts, copies the week to the next, and clears a week", async () => {
    const w = addDays(week, 14);
    for (const [athleteId, date] of [
      [ada.athleteId, w],
      [ben.athleteId, addDays(w, 2)],
    ] as const)
      await create({ from: "template", templateId: maxV, athleteId, date });
    const published = await tool("publish", { week: addDays(w, 3) });
    expect(published.body.sessions.map((s) => [s.status, s.sequence])).toEqual([
      ["published", 0],
      ["published", 0],
    ]);
    expect(told.at(-1)?.map((c) => c.kind)).toEqual(["published", "published"]);

    const copied = await tool("copy-to-next", { week: w });
    expect(copied.body.sessions.map((s) => [s.date, s.status])).toEqual([
      [addDays(w, 7), "draft"],
      [addDays(w, 9), "draft"],
    ]);
    expect(copied.body.sessions[0].blocks).toHaveLength(1);

    const cleared = await tool("clear", { week: w });
    expect(cleared.body.sessions.map((s) => s.status)).toEqual(["cancelled", "cancelled"]);
    const next = await tool("clear", { week: addDays(w, 7) });
    expect(next.body.removedIds).toHaveLength(2);
    expect((await tool("publish", { week: "soon" })).body.error?.fields).toHaveProperty("week");
    expect(
      (await tools.POST(send(`/api/teams/${T}/plan/shred`, "POST", { week: w }), p({ teamId: T, tool: "shred" })))
        .status,
    ).toBe(404);
  });
});

describe("reading the week and who may write", () => {
  it("gives staff the squad grouped, with templates and the server's week numbers (equal to the browser preview)", async () => {
    const res = await getWeek();
    expect(res.status).toBe(200);
    const w = res.body;
    expect(w.days).toHaveLength(7);
    expect(w.days[0]).toBe(week);
    expect(w.groups).toEqual([{ id: a.groupId, name: "Sprint", athleteIds: [ada.athleteId, ben.athleteId] }]);
    expect(w.templates.map((t) => t.title)).toEqual(expect.arrayContaining(["Flying 30s", "Pogo hops"]));
    expect(w.canEdit).toBe(true);
    const adaRow = w.athletes.find((x) => x.id === ada.athleteId)!;
    expect(adaRow.sessions.length).toBeGreaterThan(0);
    expect(adaRow.load.week.totals.hsrM).toBeGreaterThan(0);
    // The preview the browser computes from the same payload must match the stored numbers exactly.
    const local = rowLoad(w, adaRow);
    expect(local.week.totals).toEqual(adaRow.load.week.totals);
    expect(local.flags).toEqual(adaRow.load.flags);
  });

  it("lets a physio read but not write", async () => {
    as(physio);
    const res = await getWeek();
    expect(res.status).toBe(200);
    expect(res.body.canEdit).toBe(false);
    expect((await create({ from: "template", templateId: maxV, athleteId: ada.athleteId, date: tue })).status).toBe(
      403,
    );
    const s = res.body.athletes[0].sessions[0];
    expect((await patch(s.id, { version: s.version, date: thu })).status).toBe(403);
    expect((await tool("publish", { week })).status).toBe(403);
  });

  it("shows an athlete only their own row, without drafts or templates, and refuses writes", async () => {
    as(ada.userId);
    const res = await getWeek();
    expect(res.body.athletes.map((x) => x.id)).toEqual([ada.athleteId]);
    expect(res.body.athletes[0].sessions.every((s) => s.status !== "draft")).toBe(true);
    expect(res.body.templates).toEqual([]);
    expect(res.body.canEdit).toBe(false);
    expect(res.body.scope).toBe("own");
    const benSession = (await d.PlannedSession.findOne({ where: { athleteId: ben.athleteId! } }))!;
    expect(
      (await session.GET(new Request(url(`/api/sessions/${benSession.id}`)), p({ sessionId: String(benSession.id) })))
        .status,
    ).toBe(404);
    expect((await del(benSession.id, benSession.version)).status).toBe(403);
  });

  it("answers 404 to another team and 401 when signed out", async () => {
    as(bravoCoach);
    expect((await getWeek()).status).toBe(404);
    const s = (await d.PlannedSession.findOne({ where: { teamId: a.teamId } }))!;
    expect((await patch(s.id, { version: s.version, date: thu })).status).toBe(404);
    expect((await session.GET(new Request(url(`/api/sessions/${s.id}`)), p({ sessionId: String(s.id) }))).status).toBe(
      404,
    );
    expect((await getWeek("", String(b.teamId))).status).toBe(200);
    as(null);
    expect((await getWeek()).status).toBe(401);
    expect((await getWeek("?week=nope")).status).toBe(401);
    as(coach);
    expect((await getWeek("?week=nope")).body.error?.fields).toHaveProperty("week");
    expect((await session.GET(new Request(url(`/api/sessions/abc`)), p({ sessionId: "abc" }))).status).toBe(404);
  });
});
