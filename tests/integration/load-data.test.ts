import { describe, expect, it } from "vitest";
import { getAthleteLoadInputs, getLoadSeriesInputs } from "@/lib/data/load";
import { teamToday } from "@/lib/dates/zoned";
import { getTeamLoadSettings } from "@/lib/data/team-settings";
import { updateTeamLoadSettings } from "@/lib/services/team-settings";
import { DEFAULT_TEAM_LOAD_SETTINGS } from "@/lib/load/types";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";

const d = await setupTestDb();
const a = await createTestTeam(d, { name: "Alpha Track" });
const b = await createTestTeam(d, { name: "Bravo Track" });
const ada = a.users["ada@alphatrack.test"].athleteId!;
const ben = a.users["ben@alphatrack.test"].athleteId!;
const bravoAda = b.users["ada@bravotrack.test"].athleteId!;

async function session(
  teamId: number,
  athleteId: number,
  date: string,
  status: "draft" | "published" | "cancelled" = "published",
) {
  const s = await d.PlannedSession.create({
    teamId,
    athleteId,
    date,
    startTime: "17:00",
    durationMin: 60,
    title: "Speed",
    plannedRpe: 6,
    status,
    notes: null,
    publishedAt: null,
  });
  const b1 = await d.SessionBlock.create({
    sessionId: s.id,
    templateId: null,
    position: 1,
    kind: "plyometric",
    title: "Hops",
    running: null,
    drills: [{ name: "Pogo", sets: 2, reps: 10, contactsPerRep: 1, intensity: "low" }],
    notes: null,
  });
  const b0 = await d.SessionBlock.create({
    sessionId: s.id,
    templateId: null,
    position: 0,
    kind: "acceleration",
    title: "Starts",
    running: { sets: 1, reps: 6, distanceM: 20, intensityPct: 95, start: "blocks", runInM: 0, restSec: 180 },
    drills: null,
    notes: "Block starts",
  });
  return { s, b0, b1 };
}

const s1 = await session(a.teamId, ada, "2026-11-02");
const s2 = await session(a.teamId, ada, "2026-11-04", "draft");
await session(a.teamId, ben, "2026-11-03");
await session(a.teamId, ada, "2026-12-20"); // after `through` below
await session(b.teamId, bravoAda, "2026-11-02");
await d.SessionLog.create({
  sessionId: s1.s.id,
  athleteId: ada,
  completion: "partly",
  rpe: 7,
  minutes: 50,
  completedReps: { [String(s1.b0.id)]: 4 },
  notes: null,
});

describe("getLoadSeriesInputs", () => {
  it("returns the team's athletes with their sessions, blocks in position order and logs, as engine inputs", async () => {
    const inputs = await getLoadSeriesInputs({ teamId: a.teamId, through: "2026-11-30" });
    expect(inputs.timeZone).toBe("Europe/London");
    expect(inputs.weekStartDay).toBe(1);
    expect(inputs.settings).toEqual(DEFAULT_TEAM_LOAD_SETTINGS);
    expect(inputs.athletes.map((x) => x.name)).toEqual(["Ada Athlete", "Ben Athlete"]);
    const adaIn = inputs.athletes[0];
    expect(adaIn.groupName).toBe("Sprint");
    expect(adaIn.profile).toEqual({ vmax: 9.5, tau: 1.15, stepLengthM: 2.1, plyoLevel: "intermediate" });
    expect(adaIn.sessions.map((s) => [s.date, s.status])).toEqual([
      ["2026-11-02", "published"],
      ["2026-11-04", "draft"],
    ]);
    expect(adaIn.sessions[0].id).toBe(String(s1.s.id));
    expect(adaIn.sessions[0].blocks.map((x) => x.kind)).toEqual(["acceleration", "plyometric"]);
    expect(adaIn.sessions[0].blocks[0].running?.distanceM).toBe(20);
    expect(adaIn.sessions[0].blocks[1].drills?.[0].contactsPerRep).toBe(1);
    expect(adaIn.logs).toEqual([
      {
        sessionId: String(s1.s.id),
        completion: "partly",
        rpe: 7,
        minutes: 50,
        completedReps: { [String(s1.b0.id)]: 4 },
      },
    ]);
    expect(inputs.athletes[1].logs).toEqual([]);
    expect(s2.s.id).toBeGreaterThan(0);
  });

  it("never includes another team's athletes or sessions", async () => {
    const inputs = await getLoadSeriesInputs({ teamId: b.teamId, through: "2026-11-30" });
    expect(inputs.athletes.map((x) => x.id)).toEqual([bravoAda, b.users["ben@bravotrack.test"].athleteId]);
    expect(inputs.athletes[0].sessions).toHaveLength(1);
  });

  it("uses a constant number of queries whatever the squad size", async () => {
    let count = 0;
    const opts = d.sequelize.options;
    const before = opts.logging;
    opts.logging = () => void count++;
    try {
      await getLoadSeriesInputs({ teamId: a.teamId, through: "2026-12-31" });
    } finally {
      opts.logging = before;
    }
    expect(count).toBe(3);
  });
});

describe("getAthleteLoadInputs", () => {
  it("returns one athlete, 404 for an unknown id", async () => {
    const inputs = await getAthleteLoadInputs({ athleteId: ben, through: "2026-11-30" });
    expect(inputs.athletes).toHaveLength(1);
    expect(inputs.athlete.sessions).toHaveLength(1);
    await expect(getAthleteLoadInputs({ athleteId: 999999, through: "2026-11-30" })).rejects.toMatchObject({
      status: 404,
    });
  });
});

describe("teamToday and the history read", () => {
  it("reads today in the team's zone", () => {
    // 23:30 UTC on 31 Dec is already 1 Jan in Auckland (UTC+13 in summer) and still 31 Dec in London.
    const now = new Date("2026-12-31T23:30:00Z");
    expect(teamToday({ timeZone: "Europe/London", now })).toBe("2026-12-31");
    expect(teamToday({ timeZone: "Pacific/Auckland", now })).toBe("2027-01-01");
  });
  it("reads every session from the athlete's first, however old, up to `through` (lib/load/README.md §5)", async () => {
    const old = await session(a.teamId, ben, "2024-01-15");
    const inputs = await getAthleteLoadInputs({ athleteId: ben, through: "2026-11-30" });
    expect(inputs.athlete.sessions.map((s) => s.date)).toEqual(["2024-01-15", "2026-11-03"]);
    await old.s.destroy();
  });
});

describe("team settings", () => {
  it("defaults without a row, merges a patch, and refuses thresholds out of order", async () => {
    await d.TeamLoadSettings.destroy({ where: { teamId: b.teamId } });
    expect(await getTeamLoadSettings({ teamId: b.teamId })).toEqual(DEFAULT_TEAM_LOAD_SETTINGS);
    const updated = await updateTeamLoadSettings({
      teamId: b.teamId,
      input: { spikeRatio: 1.6, acwrMethod: "rolling_uncoupled" },
    });
    expect(updated).toMatchObject({ spikeRatio: 1.6, acwrMethod: "rolling_uncoupled", risingRatio: 1.3 });
    expect(await getTeamLoadSettings({ teamId: b.teamId })).toEqual(updated);
    await expect(updateTeamLoadSettings({ teamId: b.teamId, input: { risingRatio: 1.7 } })).rejects.toMatchObject({
      issues: [expect.objectContaining({ path: ["risingRatio"] })],
    });
  });
});
