import { beforeEach, describe, expect, it } from "vitest";
import { who } from "../helpers/handler-session";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";

// Plan versus actual through its handler, on a throwaway SQLite file, against the two screens that already show
// the same weeks: the squad week (GET /api/teams/[teamId]/load) and the athlete page (GET /api/athletes/[id]/load).
const d = await setupTestDb();
const { teamToday } = await import("@/lib/dates/zoned");
const planActual = await import("@/app/api/teams/[teamId]/plan-vs-actual/route");
const squadLoad = await import("@/app/api/teams/[teamId]/load/route");
const athleteLoad = await import("@/app/api/athletes/[athleteId]/load/route");

const a = await createTestTeam(d, { name: "Alpha Track" });
const b = await createTestTeam(d, { name: "Bravo Track" });
const ada = a.users["ada@alphatrack.test"];
const ben = a.users["ben@alphatrack.test"];
const today = teamToday({ timeZone: "Europe/London", now: new Date() });
const week = startOfWeek(today, 1);
const lastWeek = addDays(week, -7);
const nextWeek = addDays(week, 7);

const sprint = {
  kind: "acceleration" as const,
  title: "Starts",
  running: { sets: 2, reps: 3, distanceM: 30, intensityPct: 95, start: "crouch" as const, runInM: 0, restSec: 180 },
  drills: null,
  notes: null,
};
const bounds = {
  kind: "plyometric" as const,
  title: "Bounds",
  running: null,
  drills: [{ name: "Bounds", sets: 3, reps: 10, contactsPerRep: 1, intensity: "moderate" as const }],
  notes: null,
};

async function addSession(athleteId: number, date: string, status: "published" | "draft" = "published") {
  const s = await d.PlannedSession.create({
    teamId: a.teamId,
    athleteId,
    date,
    startTime: "17:00",
    durationMin: 60,
    title: "Speed",
    plannedRpe: 6,
    status,
    notes: null,
    publishedAt: status === "published" ? new Date() : null,
  });
  const run = await d.SessionBlock.create({ sessionId: s.id, templateId: null, position: 0, ...sprint });
  await d.SessionBlock.create({ sessionId: s.id, templateId: null, position: 1, ...bounds });
  return { id: s.id, runId: run.id };
}

async function addLog(athleteId: number, sessionId: number, values: Record<string, unknown>) {
  await d.SessionLog.create({
    sessionId,
    athleteId,
    rpe: 7,
    minutes: 50,
    completedReps: null,
    notes: null,
    ...values,
  } as never);
}

// Last week: Ada logged all three sessions (one with 3 of 6 sprint reps), Ben one of two. Next week: the plan only.
const adaMon = await addSession(ada.athleteId!, lastWeek);
await addLog(ada.athleteId!, adaMon.id, { completion: "yes" });
const adaWed = await addSession(ada.athleteId!, addDays(lastWeek, 2));
await addLog(ada.athleteId!, adaWed.id, { completion: "partly", completedReps: { [adaWed.runId]: 3 } });
const adaFri = await addSession(ada.athleteId!, addDays(lastWeek, 4));
await addLog(ada.athleteId!, adaFri.id, { completion: "no", rpe: null, minutes: null });
const benMon = await addSession(ben.athleteId!, lastWeek);
await addLog(ben.athleteId!, benMon.id, { completion: "yes", rpe: 8, minutes: 60 });
await addSession(ben.athleteId!, addDays(lastWeek, 3));
await addSession(ada.athleteId!, addDays(nextWeek, 1));
await addSession(ada.athleteId!, addDays(nextWeek, 3), "draft");
await addSession(ben.athleteId!, addDays(nextWeek, 2));

type Figures = {
  prescribed: Record<string, number>;
  prescribedToDate: Record<string, number>;
  done: Record<string, number>;
  difference: Record<string, number>;
  differencePct: Record<string, number | null>;
  sessions: Record<string, number>;
  completionPct: number | null;
};
type Dto = {
  weekStart: string;
  weeks: string[];
  athletes: { id: number; name: string; weeks: (Figures & { weekStart: string })[] }[];
  squad: (Figures & { weekStart: string })[];
  error?: { fields?: Record<string, string[]> };
};

const p = <T>(v: T) => ({ params: Promise.resolve(v) });
const get = (path: string) => new Request(`http://test${path}`);
const as = (userId: number | null) => {
  who.userId = userId;
};
beforeEach(() => as(a.users.coach.userId));

async function compare(q: string, teamId = a.teamId) {
  const res = await planActual.GET(get(`/api/teams/${teamId}/plan-vs-actual${q}`), p({ teamId: String(teamId) }));
  return { status: res.status, body: (await res.json()) as Dto };
}
async function squadWeek(weekOf: string, view: "actual" | "projected") {
  const res = await squadLoad.GET(
    get(`/api/teams/${a.teamId}/load?week=${weekOf}&view=${view}`),
    p({ teamId: String(a.teamId) }),
  );
  return (await res.json()) as { rows: { id: number; totals: Record<string, number> }[] };
}
/** The athlete page's days of one week summed: the chosen view's values and the plan line. */
async function athleteWeek(athleteId: number, weekOf: string, metric: string, view: "actual" | "projected") {
  const q = `?from=${weekOf}&to=${addDays(weekOf, 6)}&view=${view}&metric=${metric}`;
  const res = await athleteLoad.GET(get(`/api/athletes/${athleteId}/load${q}`), p({ athleteId: String(athleteId) }));
  const body = (await res.json()) as { days: { value: number; planned: number }[] };
  return {
    value: body.days.reduce((s, x) => s + x.value, 0),
    planned: body.days.reduce((s, x) => s + x.planned, 0),
  };
}

const METRICS = ["hsrM", "nearMaxM", "contacts", "srpe"] as const;

describe("GET /api/teams/[teamId]/plan-vs-actual", () => {
  it("gives eight weeks ending with the chosen one, per athlete and for the squad", async () => {
    const { status, body } = await compare(`?week=${addDays(nextWeek, 3)}`);
    expect(status).toBe(200);
    expect(body.weekStart).toBe(nextWeek);
    expect(body.weeks).toHaveLength(8);
    expect(body.weeks[7]).toBe(nextWeek);
    expect(body.weeks[5]).toBe(lastWeek);
    expect(body.athletes.map((x) => x.name)).toEqual(["Ada Athlete", "Ben Athlete"]);
    for (const [i, ws] of body.weeks.entries()) {
      expect(body.squad[i].weekStart).toBe(ws);
      for (const m of METRICS) {
        const sum = body.athletes.reduce((s, x) => s + x.weeks[i].done[m], 0);
        expect(body.squad[i].done[m]).toBeCloseTo(sum, 9);
      }
    }
  });

  it("last week's figures equal the squad week and the athlete page; the session counts are the logs'", async () => {
    const { body } = await compare(`?week=${lastWeek}&weeks=1`);
    const actual = await squadWeek(lastWeek, "actual");
    const [adaRow, benRow] = body.athletes.map((x) => x.weeks[0]);
    for (const m of METRICS) {
      // Every one of Ada's sessions is logged, so the squad week's actual totals are exactly what she did.
      expect(adaRow.done[m]).toBeCloseTo(actual.rows.find((r) => r.id === ada.athleteId)!.totals[m], 9);
      const page = await athleteWeek(ada.athleteId!, lastWeek, m, "actual");
      expect(adaRow.done[m]).toBeCloseTo(page.value, 9);
      expect(adaRow.prescribed[m]).toBeCloseTo(page.planned, 9);
      expect(benRow.prescribed[m]).toBeCloseTo((await athleteWeek(ben.athleteId!, lastWeek, m, "actual")).planned, 9);
    }
    // sRPE by hand (Foster et al. 2001: RPE × minutes): Ada 7 × 50 + 7 × 50 + 0 ("not done" is a logged 0);
    // the plan 3 × 6 × 60. Ben: 8 × 60 done of 2 × 360 planned.
    expect(adaRow.done.srpe).toBe(700);
    expect(adaRow.prescribed.srpe).toBe(1080);
    expect(adaRow.difference.srpe).toBe(-380);
    expect(benRow.done.srpe).toBe(480);
    expect(benRow.difference.srpe).toBe(-240);
    expect(benRow.differencePct.srpe).toBeCloseTo(-100 / 3, 9);
    // Contacts: 3 × 10 a session; Ada 30 + 15 ("partly" halves the drills without reps of their own) + 0.
    expect(adaRow.prescribed.contacts).toBe(90);
    // Sprint reps: 6 + 3 of 6 + 0 done of 3 × 6, so half the prescribed HSR and near-max metres.
    expect(adaRow.done.hsrM).toBeGreaterThan(0);
    expect(adaRow.done.hsrM).toBeCloseTo(adaRow.prescribed.hsrM / 2, 9);
    expect(adaRow.differencePct.nearMaxM).toBeCloseTo(-50, 9);
    expect(adaRow.done.contacts).toBe(45);
    expect(adaRow.sessions).toEqual({ planned: 3, due: 3, full: 1, partly: 1, skipped: 1, unlogged: 0 });
    expect(adaRow.completionPct).toBeCloseTo((2 / 3) * 100, 9);
    expect(benRow.sessions).toEqual({ planned: 2, due: 2, full: 1, partly: 0, skipped: 0, unlogged: 1 });
    expect(benRow.completionPct).toBe(50);
  });

  it("next week's prescribed equals the squad week's projected totals and the athlete page's plan line", async () => {
    const { body } = await compare(`?week=${nextWeek}&weeks=1`);
    const projected = await squadWeek(nextWeek, "projected");
    for (const x of body.athletes) {
      const row = x.weeks[0];
      for (const m of METRICS) {
        expect(row.prescribed[m]).toBeCloseTo(projected.rows.find((r) => r.id === x.id)!.totals[m], 9);
        expect(row.prescribed[m]).toBeCloseTo((await athleteWeek(x.id, nextWeek, m, "projected")).planned, 9);
        expect(row.prescribedToDate[m]).toBe(0);
        expect(row.done[m]).toBe(0);
      }
      expect(row.completionPct).toBeNull();
    }
    // Ada's draft counts in the plan the staff see (drafts in, cancelled out, as on the athlete page).
    expect(body.athletes[0].weeks[0].sessions.planned).toBe(2);
  });

  it("refuses athletes (403), other teams (404) and the signed out (401); a bad query names its field", async () => {
    as(ada.userId);
    expect((await compare("")).status).toBe(403);
    as(b.users.head_coach.userId);
    expect((await compare("")).status).toBe(404);
    as(null);
    expect((await compare("")).status).toBe(401);
    as(a.users.physio.userId);
    expect((await compare("")).status).toBe(200);
    for (const [q, field] of [
      ["?weeks=0", "weeks"],
      ["?weeks=13", "weeks"],
      ["?weeks=2.5", "weeks"],
      ["?weeks=many", "weeks"],
      ["?week=2026-02-30", "week"],
    ]) {
      const res = await compare(q);
      expect(res.status).toBe(400);
      expect(res.body.error?.fields).toHaveProperty(field);
    }
  });
});
