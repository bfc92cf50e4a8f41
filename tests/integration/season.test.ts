// The season plan through its route handlers over a temp SQLite file: phases and meets with their checks,
// generated weeks that are ordinary plan sessions (restriction guard, publish, regenerate), the season view's
// figures equal to the week grid's, its forecast warning, the CSV export and copying a phase to next season.
import { describe, expect, it } from "vitest";
import { addDays, shiftWeek, startOfWeek } from "@/lib/dates/plain-date";
import type { PlanWeek } from "@/lib/plan/types";
import type { SeasonViewDto } from "@/lib/data/season-view";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";
import { who } from "../helpers/handler-session";

const d = await setupTestDb();
const { teamToday } = await import("@/lib/dates/zoned");
const sessions = await import("@/app/api/teams/[teamId]/sessions/route");
const plan = await import("@/app/api/teams/[teamId]/plan/route");
const tools = await import("@/app/api/teams/[teamId]/plan/[tool]/route");
const season = await import("@/app/api/teams/[teamId]/season/route");
const phases = await import("@/app/api/teams/[teamId]/season/phases/route");
const phase = await import("@/app/api/season-phases/[phaseId]/route");
const copy = await import("@/app/api/season-phases/[phaseId]/copy/route");
const meets = await import("@/app/api/teams/[teamId]/season/meets/route");
const meet = await import("@/app/api/meets/[meetId]/route");
const progression = await import("@/app/api/teams/[teamId]/season/progression/route");
const session = await import("@/app/api/sessions/[sessionId]/route");
const availability = await import("@/app/api/athletes/[athleteId]/availability/route");
const csv = await import("@/app/api/teams/[teamId]/season/export/route");

const a = await createTestTeam(d, { name: "Season Track" });
const b = await createTestTeam(d, { name: "Other Track" });
const coach = a.users.coach.userId;
const ada = a.users["ada@seasontrack.test"].athleteId!;
const T = String(a.teamId);
const thisWeek = startOfWeek(teamToday({ timeZone: "Europe/London", now: new Date() }), 1);
const W1 = shiftWeek(thisWeek, 1); // the source week: all ahead, so the projected view counts the plan

const p = <T>(v: T) => ({ params: Promise.resolve(v) });
const send = (path: string, method: string, body?: unknown) =>
  new Request(`http://test${path}`, {
    method,
    headers: { "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
type Err = { error?: { code: string; fields?: Record<string, string[]> } };
const json = async <B>(res: Response) => ({ status: res.status, body: (await res.json()) as B & Err });
const as = (userId: number | null) => (who.userId = userId);

const flying = {
  kind: "max_velocity" as const,
  title: "Flying 30s",
  running: { sets: 2, reps: 5, distanceM: 30, intensityPct: 95, start: "flying" as const, runInM: 20, restSec: 240 },
  drills: null,
  notes: null,
};
async function plant(date: string, durationMin = 60) {
  as(coach);
  const res = await sessions.POST(
    send(`/api/teams/${T}/sessions`, "POST", {
      from: "blank",
      athleteId: ada,
      date,
      title: "Speed",
      durationMin,
      plannedRpe: 7,
      blocks: [flying],
    }),
    p({ teamId: T }),
  );
  expect(res.status).toBe(201);
}
const sessionsOf = (from: string, to: string) =>
  d.PlannedSession.findAll({ where: { athleteId: ada }, order: [["date", "ASC"]] }).then((rows) =>
    rows.filter((r) => r.date >= from && r.date <= to),
  );

describe("phases and meets", () => {
  const body = {
    kind: "specific_preparation",
    name: "Speed block",
    startsOn: W1,
    endsOn: addDays(shiftWeek(W1, 5), 6),
    goal: "Raise max velocity",
    targets: { hsrM: { min: 200, max: 800 } },
  };

  it("creates a phase and refuses one that ends before it starts, overlaps, or has a range upside down", async () => {
    as(coach);
    const made = await json<{ phase: { id: number } }>(await phases.POST(send("/", "POST", body), p({ teamId: T })));
    expect(made.status).toBe(201);
    const backwards = await json(
      await phases.POST(send("/", "POST", { ...body, endsOn: addDays(W1, -1) }), p({ teamId: T })),
    );
    expect(backwards.status).toBe(400);
    expect(backwards.body.error?.fields).toHaveProperty("endsOn");
    const overlap = await json(await phases.POST(send("/", "POST", body), p({ teamId: T })));
    expect(overlap.status).toBe(409);
    expect(overlap.body.error?.fields).toHaveProperty("startsOn");
    const upside = await json(
      await phases.POST(
        send("/", "POST", {
          ...body,
          startsOn: shiftWeek(W1, 20),
          endsOn: shiftWeek(W1, 22),
          targets: { srpe: { min: 9, max: 1 } },
        }),
        p({ teamId: T }),
      ),
    );
    expect(upside.status).toBe(400);
    expect(Object.keys(upside.body.error?.fields ?? {})).toContain("targets.srpe.max");
    expect(await d.SeasonPhase.count({ where: { teamId: a.teamId } })).toBe(1);
  });

  it("lets only coaches write, answers 404 to another team and 409 to a stale version", async () => {
    const [row] = await d.SeasonPhase.findAll({ where: { teamId: a.teamId } });
    as(a.users.physio.userId);
    expect((await phases.POST(send("/", "POST", body), p({ teamId: T }))).status).toBe(403);
    as(b.users.head_coach.userId);
    expect(
      (await phase.PATCH(send("/", "PATCH", { ...body, version: 1 }), p({ phaseId: String(row.id) }))).status,
    ).toBe(404);
    as(coach);
    const renamed = await phase.PATCH(
      send("/", "PATCH", { ...body, name: "Speed I", version: 1 }),
      p({ phaseId: String(row.id) }),
    );
    expect(renamed.status).toBe(200);
    const stale = await phase.PATCH(send("/", "PATCH", { ...body, version: 1 }), p({ phaseId: String(row.id) }));
    expect(stale.status).toBe(409);
  });

  it("keeps a meet for the team, one group or one athlete, never an athlete of another team", async () => {
    as(coach);
    const m = { name: "County champs", date: addDays(shiftWeek(W1, 5), 5), priority: "A" };
    expect((await meets.POST(send("/", "POST", m), p({ teamId: T }))).status).toBe(201);
    const both = await json(
      await meets.POST(send("/", "POST", { ...m, groupId: 1, athleteId: ada }), p({ teamId: T })),
    );
    expect(both.status).toBe(400);
    const foreign = b.users["ada@othertrack.test"].athleteId!;
    const outsider = await json(await meets.POST(send("/", "POST", { ...m, athleteId: foreign }), p({ teamId: T })));
    expect(outsider.status).toBe(400);
    expect(outsider.body.error?.fields).toHaveProperty("athleteId");
    const bad = await json(await meets.POST(send("/", "POST", { ...m, priority: "D" }), p({ teamId: T })));
    expect(bad.body.error?.fields).toHaveProperty("priority");
    const [row] = await d.Meet.findAll({ where: { teamId: a.teamId } });
    expect((await meet.PATCH(send("/", "PATCH", { ...m, priority: "B" }), p({ meetId: String(row.id) }))).status).toBe(
      200,
    );
    expect((await d.Meet.findByPk(row.id))!.priority).toBe("B");
    await meet.PATCH(send("/", "PATCH", m), p({ meetId: String(row.id) }));
  });
});

describe("generated weeks", () => {
  const rule = { kind: "build", weeklyIncreasePct: 10, buildWeeks: 3, unloadPct: 40 };
  const gen = (extra: Record<string, unknown> = {}) =>
    progression.POST(
      send("/", "POST", { sourceWeek: W1, firstWeek: shiftWeek(W1, 1), weeks: 5, rule, ...extra }),
      p({ teamId: T }),
    );
  const W2 = shiftWeek(W1, 1);
  const W6end = addDays(shiftWeek(W1, 5), 6);

  it("writes draft weeks whose reps follow the rule, and replaces them when generated again", async () => {
    await plant(addDays(W1, 1), 60);
    await plant(addDays(W1, 3), 60);
    as(coach);
    const res = await json<{ weeks: { factor: number }[] }>(await gen());
    expect(res.status).toBe(201);
    expect(res.body.weeks.map((w) => Number(w.factor.toFixed(4)))).toEqual([1.1, 1.21, 1.331, 0.7986, 1.21]);
    const made = await sessionsOf(W2, W6end);
    expect(made).toHaveLength(10);
    expect(made.every((s) => s.status === "draft")).toBe(true);
    const reps = await Promise.all(
      made
        .filter((_, i) => i % 2 === 0)
        .map(async (s) => {
          const [block] = await d.SessionBlock.findAll({ where: { sessionId: s.id } });
          return block.running!.sets * block.running!.reps;
        }),
    );
    // 10 reps × 1.1, 1.21, 1.331, 0.7986, 1.21, rounded to whole reps over 2 sets (lib/season/README.md).
    expect(reps).toEqual([12, 12, 14, 8, 12]);
    expect((await json(await gen())).status).toBe(201);
    expect(await sessionsOf(W2, W6end)).toHaveLength(10);
  });

  it("are ordinary sessions: the week tool publishes them", async () => {
    as(coach);
    const res = await tools.POST(send("/", "POST", { week: W2 }), p({ teamId: T, tool: "publish" }));
    expect(res.status).toBe(200);
    expect((await sessionsOf(W2, addDays(W2, 6))).every((s) => s.status === "published")).toBe(true);
  });

  it("respects a physio restriction: refused without a reason, written with one", async () => {
    await d.Restriction.create({
      teamId: a.teamId,
      athleteId: ada,
      rule: "no_kind",
      blockKinds: JSON.stringify(["max_velocity"]),
      limitValue: null,
      startsOn: shiftWeek(W1, 3),
      endsOn: addDays(shiftWeek(W1, 3), 6),
      liftedOn: null,
      note: "Hamstring: no max velocity this week",
      createdBy: a.users.physio.userId,
      liftedBy: null,
    });
    as(coach);
    const before = (await sessionsOf(W2, W6end)).map((s) => s.id);
    const refused = await json(await gen({ firstWeek: shiftWeek(W1, 2), weeks: 4 }));
    expect(refused.status).toBe(409);
    expect(refused.body.error?.code).toBe("restricted");
    expect((await sessionsOf(W2, W6end)).map((s) => s.id)).toEqual(before);
    const forced = await gen({
      firstWeek: shiftWeek(W1, 2),
      weeks: 4,
      override: { reason: "Coach and physio agreed" },
    });
    expect(forced.status).toBe(201);
  });

  it("respects the physio's availability the same way: an unavailable athlete's weeks need a reason", async () => {
    const away = shiftWeek(W1, 8);
    as(a.users.physio.userId);
    const set = await availability.POST(
      send(`/api/athletes/${ada}/availability`, "POST", {
        level: "unavailable",
        startsOn: away,
        returnOn: addDays(away, 6),
        note: "Ankle sprain",
      }),
      p({ athleteId: String(ada) }),
    );
    expect(set.status).toBe(201);
    as(coach);
    const refused = await json(await gen({ firstWeek: away, weeks: 1 }));
    expect(refused.status).toBe(409);
    expect(refused.body.error?.code).toBe("restricted");
    expect(await sessionsOf(away, addDays(away, 6))).toHaveLength(0);
    const forced = await gen({
      firstWeek: away,
      weeks: 1,
      override: { reason: "Pool sessions agreed with the physio" },
    });
    expect(forced.status).toBe(201);
    expect(await sessionsOf(away, addDays(away, 6))).toHaveLength(2);
  });

  it("are ordinary sessions: a generated draft moves to another day like any other", async () => {
    const [draft] = (await sessionsOf(shiftWeek(W1, 5), W6end)).filter((s) => s.status === "draft");
    as(coach);
    const moved = await session.PATCH(
      send(`/api/sessions/${draft.id}`, "PATCH", { version: draft.version, date: addDays(draft.date, 1) }),
      p({ sessionId: String(draft.id) }),
    );
    expect(moved.status).toBe(200);
    expect((await d.PlannedSession.findByPk(draft.id))!.date).toBe(addDays(draft.date, 1));
  });

  it("refuses a source week after the first generated week and more than 12 weeks", async () => {
    as(coach);
    const back = await json(await gen({ firstWeek: W1 }));
    expect(back.status).toBe(400);
    expect(back.body.error?.fields).toHaveProperty("firstWeek");
    const long = await json(await gen({ weeks: 13 }));
    expect(long.body.error?.fields).toHaveProperty("weeks");
  });
});

describe("the season view", () => {
  it("shows each week's figures exactly as the week grid does, with the jump after the unload warned", async () => {
    as(coach);
    await json(await gen2());
    const view = await json<SeasonViewDto>(await season.GET(send(`/?from=${W1}&weeks=6`, "GET"), p({ teamId: T })));
    expect(view.status).toBe(200);
    const row = view.body.athletes.find((x) => x.id === ada)!;
    for (const cell of row.cells) {
      const grid = await json<PlanWeek>(await plan.GET(send(`/?week=${cell.weekStart}`, "GET"), p({ teamId: T })));
      const load = grid.body.athletes.find((x) => x.id === ada)!.load.week;
      expect(cell.totals.hsrM).toBe(load.totals.hsrM);
      expect(cell.totals.srpe).toBe(load.totals.srpe);
      expect(cell.ratio).toBe(load.peakRatio);
    }
    expect(row.cells[0].targets.map((t) => t.metric)).toEqual(["hsrM"]);
    expect(row.warnings.map((w) => [w.kind, w.weekStart])).toContainEqual(["jump_after_unload", shiftWeek(W1, 5)]);
    expect(view.body.meets.map((m) => m.name)).toEqual(["County champs"]);
  });

  it("is the staff's: an athlete gets 403, another team 404", async () => {
    as(a.users["ada@seasontrack.test"].userId);
    expect((await season.GET(send("/", "GET"), p({ teamId: T }))).status).toBe(403);
    as(b.users.head_coach.userId);
    expect((await season.GET(send("/", "GET"), p({ teamId: T }))).status).toBe(404);
    as(a.users.physio.userId);
    expect((await season.GET(send("/?weeks=0", "GET"), p({ teamId: T }))).status).toBe(400);
  });

  it("exports CSV with the load caution on its first line", async () => {
    as(coach);
    const res = await csv.GET(send(`/?from=${W1}&weeks=6`, "GET"), p({ teamId: T }));
    expect(res.headers.get("content-type")).toContain("text/csv");
    const lines = (await res.text()).split("\r\n");
    expect(lines[0]).toMatch(/^# Load flags are monitoring aids, not diagnoses/);
    expect(lines[1]).toBe(
      "athlete,group,week_start,phase,logged_or_planned,hsr_m,near_max_m,contacts,srpe_au,acwr,change_pct,flags,off_target",
    );
    expect(lines.filter((l) => l.startsWith("Ada"))).toHaveLength(6);
  });
});

describe("copying a phase to next season", () => {
  it("copies the phase 52 weeks on with its sessions as drafts", async () => {
    as(coach);
    const [row] = await d.SeasonPhase.findAll({ where: { teamId: a.teamId } });
    const inPhase = (await sessionsOf(row.startsOn, row.endsOn)).filter((s) => s.status !== "cancelled");
    const res = await json<{ sessionsCopied: number; phase: { startsOn: string } }>(
      await copy.POST(send("/", "POST", {}), p({ phaseId: String(row.id) })),
    );
    expect(res.body.error).toBeUndefined();
    expect(res.status).toBe(201);
    expect(res.body.phase.startsOn).toBe(shiftWeek(row.startsOn, 52));
    expect(res.body.sessionsCopied).toBe(inPhase.length);
    const later = await sessionsOf(shiftWeek(row.startsOn, 52), shiftWeek(row.endsOn, 52));
    expect(later.map((s) => s.date)).toEqual(inPhase.map((s) => shiftWeek(s.date, 52)));
    expect(later.every((s) => s.status === "draft")).toBe(true);
    const again = await json(await copy.POST(send("/", "POST", {}), p({ phaseId: String(row.id) })));
    expect(again.status).toBe(409);
  });
});

// The plain build rule from the source week over the next five weeks, lifted restriction aside.
function gen2() {
  return progression.POST(
    send("/", "POST", {
      sourceWeek: W1,
      firstWeek: shiftWeek(W1, 1),
      weeks: 5,
      rule: { kind: "build", weeklyIncreasePct: 10, buildWeeks: 3, unloadPct: 40 },
      override: { reason: "Coach and physio agreed" },
    }),
    p({ teamId: T }),
  );
}
