import { describe, expect, it } from "vitest";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";
import { who } from "../helpers/handler-session";

// Plausibility limits through the real handlers over a temp SQLite file (limits and their sources:
// lib/plan/plausibility.ts): a write past one answers 422 "implausible" naming the field and the limit and
// saves nothing; the same write with `confirmed: true` saves. Impossible athlete dates are refused.

const d = await setupTestDb();
const { teamToday } = await import("@/lib/dates/zoned");
const sessions = await import("@/app/api/teams/[teamId]/sessions/route");
const session = await import("@/app/api/sessions/[sessionId]/route");
const blocks = await import("@/app/api/sessions/[sessionId]/blocks/route");
const tools = await import("@/app/api/teams/[teamId]/plan/[tool]/route");
const templates = await import("@/app/api/teams/[teamId]/templates/route");
const { saveAthleteAction } = await import("@/app/(workspace)/squad/actions");

const a = await createTestTeam(d, { name: "Alpha Track" });
const ada = a.users["ada@alphatrack.test"].athleteId!;
const ben = a.users["ben@alphatrack.test"].athleteId!;
const T = String(a.teamId);
const week = addDays(startOfWeek(teamToday({ timeZone: "Europe/London", now: new Date() }), 1), 14);
who.userId = a.users.coach.userId;

const p = <V>(v: V) => ({ params: Promise.resolve(v) });
const req = (path: string, method: string, body: unknown) =>
  new Request(`http://test${path}`, {
    method,
    headers: { "content-type": "application/json" },
    body: JSON.stringify(body),
  });
type Body = {
  error?: { code: string; message: string; fields?: Record<string, string[]>; checks?: { limit: string }[] };
  sessions?: { id: number; version: number; blocks: unknown[] }[];
  template?: { id: number };
};
const json = async (res: Response) => ({ status: res.status, body: (await res.json()) as Body });
const create = (body: unknown) =>
  sessions.POST(req(`/api/teams/${T}/sessions`, "POST", body), p({ teamId: T })).then(json);
const patch = (id: number, body: unknown) =>
  session.PATCH(req(`/api/sessions/${id}`, "PATCH", body), p({ sessionId: String(id) })).then(json);
const count = () => d.PlannedSession.count({ where: { teamId: a.teamId } });

// The example: 10 × 30 × 600 m at 100 %.
const absurd = {
  kind: "speed_endurance" as const,
  title: "Long reps",
  running: {
    sets: 10,
    reps: 30,
    distanceM: 600,
    intensityPct: 100,
    start: "standing" as const,
    runInM: 0,
    restSec: 600,
  },
  drills: null,
  notes: null,
};
const normal = { ...absurd, title: "Flying 30s", running: { ...absurd.running, sets: 1, reps: 4, distanceM: 30 } };
const blank = (block: typeof absurd, date = week) => ({
  from: "blank",
  athleteId: ada,
  date,
  startTime: "16:00",
  durationMin: 60,
  title: "Speed",
  plannedRpe: 7,
  blocks: [block],
});

describe("plausibility limits", () => {
  it("an absurd session answers 422 naming each field with its limit, saves nothing, then saves when confirmed", async () => {
    const before = await count();
    const refused = await create(blank(absurd));
    expect(refused.status).toBe(422);
    expect(refused.body.error?.code).toBe("implausible");
    expect(refused.body.error?.message).toMatch(/^Are you sure\? Long reps: 600 m a rep at 100 %/);
    expect(refused.body.error?.fields).toMatchObject({
      "blocks.0.running.distanceM": [expect.stringContaining("more than the 150 m")],
      "blocks.0.running.reps": [expect.stringContaining("10 × 30 = 300 reps is more than 40")],
      "blocks.0.running.sets": [expect.stringContaining("180,000 m is more than 3,000 m")],
      blocks: [expect.stringContaining("180,000 m of running"), expect.stringContaining("at 90 % of max velocity")],
    });
    expect(await count()).toBe(before);

    const saved = await create({ ...blank(absurd), confirmed: true });
    expect(saved.status).toBe(201);
    expect(await count()).toBe(before + 1);
    const s = saved.body.sessions![0]!;

    // Moving the confirmed session keeps its numbers: not asked again.
    const moved = await patch(s.id, { version: s.version, date: addDays(week, 1) });
    expect(moved.status).toBe(200);
    // Changing the numbers asks again.
    const more = { ...absurd, running: { ...absurd.running, reps: 29 } };
    const changed = await patch(s.id, { version: moved.body.sessions![0]!.version, blocks: [more] });
    expect(changed.status).toBe(422);
    expect(changed.body.error?.fields).toHaveProperty(["blocks.0.running.reps"]);
    const ok = await patch(s.id, { version: moved.body.sessions![0]!.version, blocks: [more], confirmed: true });
    expect(ok.status).toBe(200);
  });

  it("a normal session saves without a question; an added absurd block and a dropped absurd template ask", async () => {
    const made = await create(blank(normal, addDays(week, 3)));
    expect(made.status).toBe(201);
    const s = made.body.sessions![0]!;
    const add = (body: unknown) =>
      blocks.POST(req(`/api/sessions/${s.id}/blocks`, "POST", body), p({ sessionId: String(s.id) })).then(json);
    const asked = await add({ version: s.version, block: absurd });
    expect(asked.status).toBe(422);
    expect(asked.body.error?.fields).toHaveProperty(["blocks.1.running.distanceM"]);
    expect((await add({ version: s.version, block: absurd, confirmed: true })).status).toBe(201);

    const t = await templates
      .POST(req(`/api/teams/${T}/templates`, "POST", { ...absurd, durationMin: 90, plannedRpe: 9 }), p({ teamId: T }))
      .then(json);
    const drop = { from: "template", templateId: t.body.template!.id, athleteId: ben, date: addDays(week, 4) };
    expect((await create(drop)).status).toBe(422);
    expect((await create({ ...drop, confirmed: true })).status).toBe(201);
  });

  it("copying the week with an absurd session asks once for the whole copy", async () => {
    const tool = (body: unknown) =>
      tools
        .POST(req(`/api/teams/${T}/plan/copy-to-next`, "POST", body), p({ teamId: T, tool: "copy-to-next" }))
        .then(json);
    const before = await count();
    const asked = await tool({ week });
    expect(asked.status).toBe(422);
    expect(asked.body.error?.code).toBe("implausible");
    expect(await count()).toBe(before);
    expect((await tool({ week, confirmed: true })).status).toBe(200);
    expect(await count()).toBeGreaterThan(before);
  });

  it("confirmed must be true: anything else is a 400 naming it", async () => {
    const r = await create({ ...blank(normal), confirmed: "yes" });
    expect(r.status).toBe(400);
    expect(r.body.error?.fields).toHaveProperty(["confirmed"]);
  });
});

describe("impossible athlete dates", () => {
  const profile = {
    name: "Nia Test",
    groupId: "",
    sex: "",
    bodyMassKg: "",
    tauS: "",
    stepLengthM: "",
    plyoLevel: "beginner" as const,
  };
  it("refuses a birth date or a test date in the future, and a test before birth, naming the field", async () => {
    const future = `${Number(teamToday({ timeZone: "UTC", now: new Date() }).slice(0, 4)) + 4}-05-01`;
    const born = await saveAthleteAction(ada, { ...profile, birthDate: future, vmaxMs: "", vmaxTestedOn: "" });
    expect(born).toMatchObject({ ok: false, fields: { birthDate: ["Cannot be in the future"] } });
    const tested = await saveAthleteAction(ada, {
      ...profile,
      birthDate: "2004-03-01",
      vmaxMs: "9.8",
      vmaxTestedOn: future,
    });
    expect(tested).toMatchObject({ ok: false, fields: { vmaxTestedOn: ["Cannot be in the future"] } });
    const early = await saveAthleteAction(ada, {
      ...profile,
      birthDate: "2004-03-01",
      vmaxMs: "9.8",
      vmaxTestedOn: "2003-06-01",
    });
    expect(early).toMatchObject({
      ok: false,
      fields: { vmaxTestedOn: ["The test cannot be before the date of birth"] },
    });
    const row = await d.Athlete.findByPk(ada);
    expect(row?.birthDate ?? null).not.toBe("2003-06-01");
    expect(row?.vmaxTestedOn ?? null).not.toBe("2003-06-01");
  });
});
