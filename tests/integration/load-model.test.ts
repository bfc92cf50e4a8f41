import { describe, expect, it } from "vitest";
import { who } from "../helpers/handler-session";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import type { SquadWeekDto } from "@/lib/data/load-views";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";

// The sprint-specific modelling choices (lib/load/README.md §11) checked end to end through the route handlers, with
// hand-computed values. Only next-auth's session lookup is replaced by "who is asking".

const d = await setupTestDb();
const { teamToday } = await import("@/lib/dates/zoned");
const athleteLoad = await import("@/app/api/athletes/[athleteId]/load/route");
const squadLoad = await import("@/app/api/teams/[teamId]/load/route");
const settingsRoute = await import("@/app/api/teams/[teamId]/settings/route");
const logRoute = await import("@/app/api/sessions/[sessionId]/log/route");

const today = teamToday({ timeZone: "Europe/London", now: new Date() });
const lastWeek = addDays(startOfWeek(today, 1), -7);
const p = <T>(v: T) => ({ params: Promise.resolve(v) });
const send = (path: string, method: string, body: unknown) =>
  new Request(`http://test${path}`, {
    method,
    headers: { "content-type": "application/json" },
    body: JSON.stringify(body),
  });

type Running = {
  sets: number;
  reps: number;
  distanceM: number;
  intensityPct: number;
  start: "standing" | "crouch" | "blocks" | "flying";
  runInM: number;
  restSec: number;
};
const run = (r: Partial<Running>): Running => ({
  sets: 1,
  reps: 1,
  distanceM: 30,
  intensityPct: 95,
  start: "crouch",
  runInM: 0,
  restSec: 180,
  ...r,
});

/** A team whose athlete Ada has vmax 10 m/s and τ 1 s (invented), and helpers to plan and read. */
async function team(name: string) {
  const t = await createTestTeam(d, { name });
  const ada = t.users[`ada@${name.toLowerCase().replace(/[^a-z]+/g, "")}.test`];
  await d.Athlete.update({ vmaxMs: 10, tauS: 1, stepLengthM: 2.2 }, { where: { id: ada.athleteId! } });
  const head = t.users.head_coach.userId;
  async function plan(
    date: string,
    blocks: { kind: string; running?: Running | null; drills?: unknown }[],
    o: {
      rpe?: number;
      minutes?: number;
      startTime?: string;
      status?: "published" | "draft";
      log?: { completion: "yes" | "partly" | "no"; rpe: number | null; minutes: number | null };
    } = {},
  ) {
    const s = await d.PlannedSession.create({
      teamId: t.teamId,
      athleteId: ada.athleteId!,
      date,
      startTime: o.startTime ?? "17:00",
      durationMin: o.minutes ?? 60,
      title: "Speed",
      plannedRpe: o.rpe ?? 6,
      status: o.status ?? "published",
      notes: null,
      publishedAt: new Date(),
    });
    let position = 0;
    for (const b of blocks)
      await d.SessionBlock.create({
        sessionId: s.id,
        templateId: null,
        position: position++,
        kind: b.kind as "acceleration",
        title: b.kind,
        running: b.running ?? null,
        drills: (b.drills as null) ?? null,
        notes: null,
      });
    if (o.log)
      await d.SessionLog.create({
        sessionId: s.id,
        athleteId: ada.athleteId!,
        completedReps: null,
        notes: null,
        ...o.log,
      });
    return s.id;
  }
  async function days(metric: string, from: string, to: string) {
    who.userId = head;
    const res = await athleteLoad.GET(
      new Request(`http://test/api/athletes/${ada.athleteId}/load?view=actual&metric=${metric}&from=${from}&to=${to}`),
      p({ athleteId: String(ada.athleteId) }),
    );
    expect(res.status).toBe(200);
    const body = (await res.json()) as {
      days: { date: string; value: number; ratio: number | null; missing: boolean; logged: boolean }[];
    };
    return body.days;
  }
  async function squad(week: string) {
    who.userId = head;
    const res = await squadLoad.GET(
      new Request(`http://test/api/teams/${t.teamId}/load?week=${week}&view=actual`),
      p({ teamId: String(t.teamId) }),
    );
    expect(res.status).toBe(200);
    return (await res.json()) as SquadWeekDto;
  }
  async function setSettings(body: unknown) {
    who.userId = head;
    const res = await settingsRoute.PATCH(
      send(`/api/teams/${t.teamId}/settings`, "PATCH", body),
      p({ teamId: String(t.teamId) }),
    );
    return {
      status: res.status,
      body: (await res.json()) as { settings?: Record<string, unknown>; error?: { fields?: Record<string, string[]> } },
    };
  }
  async function putLog(sessionId: number, body: unknown) {
    who.userId = ada.userId;
    const res = await logRoute.PUT(
      send(`/api/sessions/${sessionId}/log`, "PUT", body),
      p({ sessionId: String(sessionId) }),
    );
    return { status: res.status, body: (await res.json()) as { error?: { fields?: Record<string, string[]> } } };
  }
  return { ...t, ada, plan, days, squad, setSettings, putLog };
}

const yes = { completion: "yes" as const, rpe: 6, minutes: 60 };

describe("speed zones, starts and run-ins through GET /api/athletes/[id]/load", () => {
  // vmax 10, τ 1, 2 × 3 × 30 m at 95% (T = 9.5 m/s): x* = T·t* − τ·s with t* = −τ·ln(1 − s/T) (Furusawa et al. 1927).
  // 5.5 m/s: x* = 2.717476 m → 6 × 27.282524 = 163.695146 m. 75% line 7.5 m/s: x* = 7.302375 m → 136.185757 m.
  // 90% line 9.0 m/s: x* = 18.972170 m → 66.166978 m. Blocks (τ × 0.95): 5.5 m/s x* = 2.581602 m → 164.510389 m.
  it("absolute HSR 163.695 m, relative HSR 136.186 m, near-max 66.167 m; a block start 164.510 m", async () => {
    const t = await team("Zone Track");
    const day = addDays(today, -3);
    const dayBlocks = addDays(today, -2);
    await t.plan(day, [{ kind: "acceleration", running: run({ sets: 2, reps: 3 }) }], { log: yes });
    await t.plan(dayBlocks, [{ kind: "acceleration", running: run({ sets: 2, reps: 3, start: "blocks" }) }], {
      log: yes,
    });
    const abs = await t.days("hsrM", day, dayBlocks);
    expect(abs[0].value).toBeCloseTo(163.695146, 4);
    expect(abs[1].value).toBeCloseTo(164.510389, 4);
    expect((await t.days("nearMaxM", day, day))[0].value).toBeCloseTo(66.166978, 4);
    expect((await t.setSettings({ speedZones: "relative" })).status).toBe(200);
    expect((await t.days("hsrM", day, day))[0].value).toBeCloseTo(136.185757, 4);
    // Sprint metres: 6 × 30 = 180 m, whatever the start.
    expect((await t.days("sprintM", day, day))[0].value).toBe(180);
  });

  // Flying 4 × (20 m run-in + 30 m) at 97% (T = 9.7): the run-in builds up to T by its end (x = 20·(s/T)²) but never
  // faster than all-out. 5.5 m/s: max(6.430014, 2.619301) = 6.430014 m → 4 × 43.569986 = 174.279945 m.
  // 9.0 m/s: max(17.217558, 16.499368) → 4 × 32.782442 = 131.129769 m. Sprint metres: the timed 4 × 30 = 120 m.
  it("a flying rep's run-in is a build-up, counted in band metres but not as sprint metres", async () => {
    const t = await team("Flying Track");
    const day = addDays(today, -2);
    await t.plan(
      day,
      [
        {
          kind: "max_velocity",
          running: run({ reps: 4, intensityPct: 97, start: "flying", runInM: 20, restSec: 300 }),
        },
      ],
      { log: yes },
    );
    expect((await t.days("hsrM", day, day))[0].value).toBeCloseTo(174.279945, 4);
    expect((await t.days("nearMaxM", day, day))[0].value).toBeCloseTo(131.129769, 4);
    expect((await t.days("sprintM", day, day))[0].value).toBe(120);
  });
});

describe("the squad table shows absolute and relative bands and the week's contacts (GET /api/teams/[id]/load)", () => {
  // Same rep as above (lib/load/README.md §11.1 check values): ≥ 5.5 m/s 163.695 m, ≥ 7.0 m/s 145.905 m, ≥ 75 % 136.186 m,
  // ≥ 90 % 66.167 m, ≥ 95 % 0 m. Plyometrics P1 (§2): 20 low + 24 moderate + 24 high = 68 contacts, weighted
  // 20 × 1 + 24 × 2 + 24 × 3 = 140 (§11.5).
  it("gives every band next to the driving one, and weighted contacts next to the count", async () => {
    const t = await team("Band Track");
    const drills = [
      { name: "pogo hops", sets: 2, reps: 10, contactsPerRep: 1, intensity: "low" },
      { name: "box jumps", sets: 3, reps: 8, contactsPerRep: 1, intensity: "moderate" },
      { name: "bounds", sets: 4, reps: 6, contactsPerRep: 1, intensity: "high" },
    ];
    await t.plan(
      addDays(lastWeek, 2),
      [
        { kind: "acceleration", running: run({ sets: 2, reps: 3 }) },
        { kind: "plyometric", drills },
      ],
      { log: yes },
    );
    const { rows } = await t.squad(lastWeek);
    const row = rows.find((r) => r.totals.contacts === 68)!;
    expect(row.bands.absHsrM).toBeCloseTo(163.695146, 4);
    expect(row.bands.absSprintM).toBeCloseTo(145.904939, 4);
    expect(row.bands.relHsrM).toBeCloseTo(136.185757, 4);
    expect(row.bands.relNearMaxM).toBeCloseTo(66.166978, 4);
    expect(row.bands.relMaximalM).toBe(0);
    expect(row.totals.hsrM).toBeCloseTo(163.695146, 4);
    expect(row.contactsByIntensity).toMatchObject({ total: 68, weighted: 140 });
  });
});

describe("partial sessions by block (PUT /api/sessions/[id]/log, then GET the load)", () => {
  // Accelerations 2 × 3 × 30 m at 95% (27.282524 m of HSR a rep, as above) and tempo 6 × 100 m at 70% (T = 7.0 m/s:
  // t* = −ln(1.5/7) = 1.540445 s, x* = 7 × 1.540445 − 5.5 = 5.283115 m, so 94.716885 m a rep).
  // "Did part of it" without blocks: half of each = 0.5 × (6 × 27.282524 + 6 × 94.716885) = 365.998227 m.
  // Ticked: 4 of 6 accelerations, tempo skipped: 4 × 27.282524 = 109.130097 m.
  it("counts the blocks and reps the athlete ticked instead of half of everything", async () => {
    const t = await team("Part Track");
    const day = addDays(today, -1);
    const id = await t.plan(day, [
      { kind: "acceleration", running: run({ sets: 2, reps: 3 }) },
      { kind: "tempo", running: run({ reps: 6, distanceM: 100, intensityPct: 70, start: "standing", restSec: 60 }) },
    ]);
    const [accel, tempo] = await d.SessionBlock.findAll({ where: { sessionId: id }, order: [["position", "ASC"]] });
    expect((await t.putLog(id, { completion: "partly", rpe: 6, minutes: 40 })).status).toBe(200);
    expect((await t.days("hsrM", day, day))[0].value).toBeCloseTo(365.998227, 4);
    const ticked = await t.putLog(id, {
      completion: "partly",
      rpe: 6,
      minutes: 40,
      completedReps: { [String(accel.id)]: 4, [String(tempo.id)]: 0 },
    });
    expect(ticked.status).toBe(200);
    expect((await t.days("hsrM", day, day))[0].value).toBeCloseTo(109.130097, 4);
    // Sprint metres: 4 × 30 = 120 m (tempo is not sprinting); sRPE 6 × 40 = 240 AU (Foster 2001).
    expect((await t.days("sprintM", day, day))[0].value).toBe(120);
    expect((await t.days("srpe", day, day))[0].value).toBe(240);
    const tooMany = await t.putLog(id, { completion: "partly", completedReps: { [String(accel.id)]: 13 } });
    expect(tooMany.status).toBe(400);
    expect(tooMany.body.error?.fields).toHaveProperty([`completedReps.${accel.id}`]);
  });
});

describe("missing logs are not zero", () => {
  // A published past session without a log: by default its plan stands in (RPE 6 × 60 min = 360 AU, Foster 2001)
  // and the day is marked missing; with "exclude" it carries no load (0) and stays marked.
  it("counts the plan as an estimate by default, marks the day, and leaves it out on request", async () => {
    const t = await team("Missing Track");
    const day = addDays(today, -2);
    await t.plan(day, [{ kind: "acceleration", running: run({}) }]);
    const [est] = await t.days("srpe", day, day);
    expect(est).toMatchObject({ value: 360, missing: true, estimated: true, logged: false });
    expect((await t.setSettings({ missingLogs: "exclude" })).status).toBe(200);
    expect((await t.days("srpe", day, day))[0]).toMatchObject({ value: 0, missing: true, estimated: false });
  });
});

describe("the ACWR with a missing log (EWMA, first-day seed; lib/load/README.md §6 and §11.3)", () => {
  // Logged 100 AU (RPE 5 × 20 min), then an unlogged published session planned at RPE 6 × 60 = 360 AU, then logged
  // 200 AU (RPE 5 × 40). Estimate: acute 0.25·360 + 0.75·100 = 165 then 0.25·200 + 0.75·165 = 173.75; chronic
  // (2/29)·360 + (27/29)·100 = 117.931034 then (2/29)·200 + (27/29)·117.931034 = 123.591320; ratio 1.405847.
  // Left out: the middle day carries over, so day 3 is E1: acute 125, chronic 3100/29, ratio 1.169355.
  it("counts the plan (1.405847) or leaves the day out of the EWMA (1.169355)", async () => {
    const t = await team("Gap Track");
    const [d1, d2, d3] = [addDays(today, -3), addDays(today, -2), addDays(today, -1)];
    await t.plan(d1, [], { rpe: 5, minutes: 20, log: { completion: "yes", rpe: 5, minutes: 20 } });
    await t.plan(d2, [], { rpe: 6, minutes: 60 });
    await t.plan(d3, [], { rpe: 5, minutes: 40, log: { completion: "yes", rpe: 5, minutes: 40 } });
    const est = await t.days("srpe", d1, d3);
    expect(est.map((x) => x.value)).toEqual([100, 360, 200]);
    expect(est[2].ratio).toBeCloseTo(1.405847, 6);
    expect((await t.setSettings({ missingLogs: "exclude" })).status).toBe(200);
    const left = await t.days("srpe", d1, d3);
    expect(left.map((x) => x.missing)).toEqual([false, true, false]);
    expect(left[1].ratio).toBe(1);
    expect(left[2].ratio).toBeCloseTo(1.169355, 6);
  });
});

describe("flags through GET /api/teams/[id]/load", () => {
  // Foster 1998: six days of 300 AU (RPE 5 × 60) and a rest day give monotony √6 = 2.449 (population SD), strain
  // 1800 × √6 = 4409 (hand-derived: mean 6a/7, SD a·√6/7).
  it("raises a monotony caution above 2.0 with the strain", async () => {
    const t = await team("Same Track");
    for (let i = 0; i < 6; i++)
      await t.plan(addDays(lastWeek, i), [], { rpe: 5, log: { completion: "yes", rpe: 5, minutes: 60 } });
    const { rows } = await t.squad(lastWeek);
    const ada = rows.find((r) => r.totals.srpe === 1800)!;
    const mono = ada.flags.find((f) => f.kind === "monotony");
    expect(mono?.value).toBeCloseTo(2.44949, 5);
    expect(mono?.reason).toContain("strain 4,409");
  });

  // Two sessions 24 h apart, each with 6 × 20 m accelerations at 95% (maximal, Malone et al. 2017): short recovery
  // under the default 48 h (NSCA 48–72 h); not when the team counts only max-velocity blocks.
  it("counts maximal accelerations and speed endurance for the recovery window, as the team chose", async () => {
    const t = await team("Rest Track");
    await t.plan(addDays(lastWeek, 1), [{ kind: "acceleration", running: run({ reps: 6, distanceM: 20 }) }], {
      log: yes,
    });
    await t.plan(
      addDays(lastWeek, 2),
      [{ kind: "speed_endurance", running: run({ reps: 2, distanceM: 150, intensityPct: 90, start: "standing" }) }],
      { log: yes },
    );
    const kinds = async () => (await t.squad(lastWeek)).rows.flatMap((r) => r.flags.map((f) => f.kind));
    expect(await kinds()).toContain("recovery");
    expect((await t.setSettings({ recoveryWork: ["max_velocity", "high_plyo"] })).status).toBe(200);
    expect(await kinds()).not.toContain("recovery");
  });
});

describe("PATCH /api/teams/[id]/settings: the new choices", () => {
  it("stores them and names a bad field", async () => {
    const t = await team("Settings Track");
    const ok = await t.setSettings({
      speedZones: "relative",
      hsrPct: 80,
      maximalPct: 96,
      sprintSpeedMs: 7.5,
      monotonyLimit: 2.5,
      missingLogs: "exclude",
      recoveryWork: ["speed_endurance"],
    });
    expect(ok.status).toBe(200);
    expect(ok.body.settings).toMatchObject({
      speedZones: "relative",
      hsrPct: 80,
      maximalPct: 96,
      sprintSpeedMs: 7.5,
      monotonyLimit: 2.5,
      missingLogs: "exclude",
      recoveryWork: ["speed_endurance"],
    });
    for (const [body, field] of [
      [{ speedZones: "fast" }, "speedZones"],
      [{ hsrPct: 20 }, "hsrPct"],
      [{ missingLogs: "zero" }, "missingLogs"],
      [{ monotonyLimit: 9 }, "monotonyLimit"],
      [{ recoveryWork: ["nap"] }, "recoveryWork.0"],
      [{ recoveryWork: "max_velocity" }, "recoveryWork"],
    ] as const) {
      const res = await t.setSettings(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error?.fields, JSON.stringify(body)).toHaveProperty([field]);
    }
  });
});
