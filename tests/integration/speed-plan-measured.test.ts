// A speed trace attached to a planned session is that session's measured running load (lib/speed/README.md §8),
// over a temp SQLite file: the speed page, the planner's week (its session dialog) and the athlete's load page
// read it from one function, the planned side is the engine's own session figures, and the load ledger does not
// change (it keeps counting the plan and the log).
import { QueryTypes } from "sequelize";
import { describe, expect, it } from "vitest";
import { sessionMetrics } from "@/lib/load/session-metrics";
import { toSessionInput } from "@/lib/plan/blocks";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";
import { who } from "../helpers/handler-session";

const d = await setupTestDb();
const upload = await import("@/app/api/teams/[teamId]/speed/measure-uploads/route");
const { listPlanMeasured } = await import("@/lib/data/measured-load");
const { getAthleteSpeed } = await import("@/lib/data/speed-views");
const { getPlanWeek } = await import("@/lib/data/plan");
const { ensureLedgerFresh } = await import("@/lib/data/ledger");
const { getTeamLoadSettings } = await import("@/lib/data/team-settings");

const a = await createTestTeam(d, { name: "Alpha Track" });
const ada = a.users["ada@alphatrack.test"].athleteId!; // vmax 9.5 m/s, τ 1.15 s, step 2.1 m (fixtures)
const DAY = "2026-11-18";
const session = await d.PlannedSession.create({
  teamId: a.teamId,
  athleteId: ada,
  date: DAY,
  startTime: "17:00",
  durationMin: 45,
  title: "Flying 30s",
  plannedRpe: 6,
  status: "published",
  notes: null,
  publishedAt: new Date(),
});
await d.SessionBlock.create({
  sessionId: session.id,
  templateId: null,
  position: 0,
  kind: "max_velocity",
  title: "Flying 30",
  running: { sets: 1, reps: 3, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
  drills: null,
  notes: null,
});

/** 12 s at 50 Hz: standing 1 s, the sprint model 9.5 m/s, τ 1.1 s (lib/speed/README.md T4) for 6 s, then 4 m/s. */
function sprintTrace() {
  const rows = ["time_s,speed_ms"];
  for (let i = 0; i <= 600; i++) {
    const t = i / 50;
    const v = t < 1 ? 0 : t < 7 ? 9.5 * (1 - Math.exp(-(t - 1) / 1.1)) : 4;
    rows.push(`${t.toFixed(3)},${v.toFixed(4)}`);
  }
  return rows.join("\n");
}
const ledger = () =>
  d.sequelize.query<{ v: string }>(
    "SELECT day || ':' || hex(past) || hex(today) || hex(ahead) || hex(planned) || hex(acute) || hex(chronic) AS v " +
      "FROM load_ledger WHERE athlete_id = :ada ORDER BY day",
    { type: QueryTypes.SELECT, replacements: { ada } },
  );

describe("planned against measured", () => {
  it("one reader for every screen; the planned side is the engine's session figures; the ledger is unchanged", async () => {
    await ensureLedgerFresh({});
    const before = await ledger();
    expect(before.length).toBeGreaterThan(0);
    who.userId = a.users.coach.userId;
    const res = await upload.POST(
      new Request(`http://localhost/api/teams/${a.teamId}/speed/measure-uploads`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({
          kind: "trace",
          fileName: "radar.csv",
          content: sprintTrace(),
          athleteId: ada,
          testDate: DAY,
          plannedSessionId: session.id,
        }),
      }),
      { params: Promise.resolve({ teamId: String(a.teamId) }) },
    );
    expect(res.status).toBe(201);
    const { testId } = (await res.json()) as { testId: number };

    const all = await listPlanMeasured({ teamId: a.teamId });
    expect(all).toHaveLength(1);
    const [m] = all;
    expect(m).toMatchObject({ testId, athleteId: ada, sessionId: session.id, date: DAY, title: "Flying 30s" });
    // Measured: the stored analysis of the trace.
    const stored = JSON.parse((await d.SpeedTest.findByPk(testId, { raw: true }))!.result);
    expect(m.measured).toEqual({ hsrM: stored.hsrM, nearMaxM: stored.nearMaxM, runM: stored.distanceM });
    // Planned: the engine's figures for the session with Ada's profile (no test accepted: the typed one).
    const staff = { canEdit: true, ownAthleteId: null, scope: "team" as const };
    const week = await getPlanWeek({ teamId: a.teamId, date: DAY, today: "2026-12-02", audience: staff });
    const dto = week.athletes.find((x) => x.id === ada)!.sessions[0];
    const engine = sessionMetrics(
      toSessionInput(dto),
      { vmax: 9.5, tau: 1.15, stepLengthM: 2.1, plyoLevel: "intermediate" },
      await getTeamLoadSettings({ teamId: a.teamId }),
    );
    expect(m.planned).toEqual({ hsrM: engine.metrics.hsrM, nearMaxM: engine.metrics.nearMaxM, runM: engine.runM });
    expect(m.planned.runM).toBeGreaterThan(0);

    // Every screen reads the same: the speed page, the planner's week (session dialog), the load page's span.
    expect((await getAthleteSpeed({ teamId: a.teamId, athleteId: ada })).measured).toEqual(all);
    expect(week.measured).toEqual(all);
    expect(await listPlanMeasured({ teamId: a.teamId, athleteId: ada, from: "2026-10-08" })).toEqual(all);
    expect(await listPlanMeasured({ teamId: a.teamId, athleteId: ada, from: "2026-11-19" })).toEqual([]);
    // The next week's plan has none; an athlete's own plan view carries none.
    expect(
      (await getPlanWeek({ teamId: a.teamId, date: "2026-11-25", today: "2026-12-02", audience: staff })).measured,
    ).toEqual([]);
    const own = { canEdit: false, ownAthleteId: ada, scope: "own" as const };
    expect((await getPlanWeek({ teamId: a.teamId, date: DAY, today: "2026-12-02", audience: own })).measured).toEqual(
      [],
    );

    // The load series keeps counting the plan and the log: not one ledger row moved.
    await ensureLedgerFresh({});
    expect(await ledger()).toEqual(before);
  });
});
