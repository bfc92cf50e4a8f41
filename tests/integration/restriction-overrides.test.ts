// Physio restrictions on the plan's write path, end to end: route handler → the one guard in the write
// transaction → 409 "restricted" (nothing saved) or, with the coach's reason, the session saved, the override
// recorded, an alert raised and a mail delivered through the outbox to the real fake SMTP server.
import { describe, expect, it } from "vitest";
import { notices, who } from "../helpers/handler-session";
import { listAlerts } from "@/lib/data/alerts";
import { teamToday } from "@/lib/dates/zoned";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import type { PlanWeek, PlanWriteResult } from "@/lib/plan/types";
import type { RestrictionHit } from "@/lib/restrictions/rules";
import { createTestTeam } from "../helpers/fixtures";
import { setupNotices } from "./notices-setup";

// Alerts, calendar invitations and their e-mails run for real here.
notices.hooks = "on";

const n = await setupNotices();
const { d } = n;
const sessions = await import("@/app/api/teams/[teamId]/sessions/route");
const session = await import("@/app/api/sessions/[sessionId]/route");
const plan = await import("@/app/api/teams/[teamId]/plan/route");
const tools = await import("@/app/api/teams/[teamId]/plan/[tool]/route");

const team = await createTestTeam(d, { name: "Guard Club" });
const T = String(team.teamId);
const coach = team.users.coach.userId;
const physio = team.users.physio.userId;
const ada = team.users["ada@guardclub.test"].athleteId!;
const ben = team.users["ben@guardclub.test"].athleteId!;

// Next week, so every session is plan whatever today is. Ada: no max velocity from next Wednesday to Friday.
const week = addDays(startOfWeek(teamToday({ timeZone: "Europe/London", now: new Date() }), 1), 7);
const [mon, tue, wed, thu, sat] = [0, 1, 2, 3, 5].map((k) => addDays(week, k));
const restriction = await d.Restriction.create({
  teamId: team.teamId,
  athleteId: ada,
  rule: "no_kind",
  blockKinds: JSON.stringify(["max_velocity"]),
  limitValue: null,
  startsOn: wed,
  endsOn: addDays(week, 4),
  liftedOn: null,
  note: "Hamstring: no flying sprints",
  createdBy: physio,
  liftedBy: null,
});
const flys = await d.BlockTemplate.create({
  teamId: team.teamId,
  kind: "max_velocity",
  title: "Flying 30s",
  running: { sets: 1, reps: 4, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
  drills: null,
  notes: null,
  durationMin: 50,
  plannedRpe: 7,
});

const p = <T>(v: T) => ({ params: Promise.resolve(v) });
const send = (path: string, method: string, body: unknown) =>
  new Request(`http://test${path}`, {
    method,
    headers: { "content-type": "application/json" },
    body: JSON.stringify(body),
  });
type Answer = {
  status: number;
  body: PlanWriteResult & {
    error?: { code: string; message: string; hits?: RestrictionHit[]; fields?: Record<string, string[]> };
  };
};
const json = async (res: Response): Promise<Answer> => ({
  status: res.status,
  body: (await res.json()) as Answer["body"],
});
const create = (body: unknown) =>
  sessions.POST(send(`/api/teams/${T}/sessions`, "POST", body), p({ teamId: T })).then(json);
const patch = (id: number, body: unknown) =>
  session.PATCH(send(`/api/sessions/${id}`, "PATCH", body), p({ sessionId: String(id) })).then(json);
const sessionsOf = (athleteId: number) => d.PlannedSession.count({ where: { athleteId } });
who.userId = coach;

describe("the restriction guard on plan writes", () => {
  it("refuses a max-velocity drop on a restricted day with 409 'restricted', the hits, and nothing saved", async () => {
    const before = await sessionsOf(ada);
    const res = await create({ from: "template", templateId: flys.id, athleteId: ada, date: thu });
    expect(res.status).toBe(409);
    expect(res.body.error?.code).toBe("restricted");
    expect(res.body.error?.hits).toEqual([
      expect.objectContaining({
        restrictionId: restriction.id,
        athleteId: ada,
        date: thu,
        detail: "Flying 30s: max velocity",
      }),
    ]);
    expect(res.body.error?.message).toMatch(/restriction from the medical staff/);
    expect(await sessionsOf(ada)).toBe(before);
    expect(await d.RestrictionOverride.count()).toBe(0);
  });

  it("lets the same drop through before the restriction starts and for another athlete", async () => {
    expect((await create({ from: "template", templateId: flys.id, athleteId: ada, date: tue })).status).toBe(201);
    expect((await create({ from: "template", templateId: flys.id, athleteId: ben, date: thu })).status).toBe(201);
  });

  it("a reason too short is a 400 on override.reason", async () => {
    const res = await create({
      from: "template",
      templateId: flys.id,
      athleteId: ada,
      date: thu,
      override: { reason: "ok" },
    });
    expect(res.status).toBe(400);
    expect(res.body.error?.fields).toHaveProperty(["override.reason"]);
  });

  it("with a reason: saved, the override recorded, one alert, and one mail to the physio", async () => {
    const reason = "Cleared at this morning's check; flys capped at 20 m";
    const res = await create({
      from: "template",
      templateId: flys.id,
      athleteId: ada,
      date: thu,
      override: { reason },
    });
    expect(res.status).toBe(201);
    const saved = res.body.sessions[0]!;
    const overrides = await d.RestrictionOverride.findAll({ where: { athleteId: ada } });
    expect(
      overrides.map((o) => ({
        restrictionId: o.restrictionId,
        sessionId: o.sessionId,
        sessionDate: o.sessionDate,
        reason: o.reason,
        userId: o.userId,
      })),
    ).toEqual([{ restrictionId: restriction.id, sessionId: saved.id, sessionDate: thu, reason, userId: coach }]);
    const alerts = (
      await listAlerts({ teamId: team.teamId, userId: physio, query: { status: "all", limit: 50, athleteId: ada } })
    ).filter((a) => a.kind === "restriction_override");
    expect(alerts).toHaveLength(1);
    expect(alerts[0]).toMatchObject({ status: "open", date: thu, basis: "planned" });
    expect(alerts[0]!.reason).toContain(reason);

    await n.worker.runOnce();
    const mails = (await n.mailTo("physio@guardclub.test")).filter((m) =>
      m.subject.startsWith("Restriction overridden"),
    );
    expect(mails).toHaveLength(1);
    expect(mails[0]!.text).toContain(reason);
    expect(mails[0]!.text).toContain("No max velocity");
    expect(mails[0]!.text).toContain(`/squad/${ada}`);
  });

  it("editing a session already let through does not ask again; moving one into the restriction does", async () => {
    const thuSession = (await d.PlannedSession.findOne({ where: { athleteId: ada, date: thu } }))!;
    const retitled = await patch(thuSession.id, { version: thuSession.version, title: "Flys, short" });
    expect(retitled.status).toBe(200);
    const tueSession = (await d.PlannedSession.findOne({ where: { athleteId: ada, date: tue } }))!;
    const moved = await patch(tueSession.id, { version: tueSession.version, date: wed });
    expect(moved.status).toBe(409);
    expect(moved.body.error?.code).toBe("restricted");
    expect((await d.PlannedSession.findByPk(tueSession.id))!.date).toBe(tue);
    // Moving it to Saturday, after the restriction ends, is fine.
    expect((await patch(tueSession.id, { version: tueSession.version, date: sat })).status).toBe(200);
  });

  it("a week copy that lands in a restriction asks too, and goes through with a reason", async () => {
    // This week's Thursday flys for Ada, copied into next week's restricted Thursday.
    const thisThu = addDays(thu, -7);
    await d.PlannedSession.create({
      teamId: team.teamId,
      athleteId: ada,
      date: thisThu,
      startTime: "16:00",
      durationMin: 50,
      title: "Flys",
      plannedRpe: 7,
      status: "draft",
      notes: null,
      publishedAt: null,
    }).then((s) =>
      d.SessionBlock.create({
        sessionId: s.id,
        templateId: null,
        position: 0,
        kind: "max_velocity",
        title: "Flys",
        running: flys.running,
        drills: null,
        notes: null,
      }),
    );
    const copy = (body: unknown) =>
      tools
        .POST(send(`/api/teams/${T}/plan/copy-to-next`, "POST", body), p({ teamId: T, tool: "copy-to-next" }))
        .then(json);
    const refused = await copy({ week: thisThu });
    expect(refused.status).toBe(409);
    expect(refused.body.error?.code).toBe("restricted");
    expect(
      (await copy({ week: thisThu, override: { reason: "Planned with the physio: reduced volume" } })).status,
    ).toBe(200);
  });

  it("the week the grid reads carries the athletes' restrictions", async () => {
    const res = await plan.GET(new Request(`http://test/api/teams/${T}/plan?week=${mon}`), p({ teamId: T }));
    const body = (await res.json()) as PlanWeek;
    expect(body.restrictions).toEqual([
      expect.objectContaining({
        id: restriction.id,
        athleteId: ada,
        rule: "no_kind",
        blockKinds: ["max_velocity"],
        note: "Hamstring: no flying sprints",
      }),
    ]);
  });
});
