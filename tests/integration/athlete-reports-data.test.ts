import { describe, expect, it } from "vitest";
import { latestCheckInByAthlete } from "@/lib/data/check-ins";
import { latestPainReportByAthlete } from "@/lib/data/pain-reports";
import { createTestTeam } from "../helpers/fixtures";
import { setupTestDb } from "../helpers/db";

const d = await setupTestDb();
const { teamId, users } = await createTestTeam(d, { name: "Report Club" });
const other = await createTestTeam(d, { name: "Other Report Club" });
const ada = users["ada@reportclub.test"].athleteId!;
const ben = users["ben@reportclub.test"].athleteId!;
const stranger = other.users["ada@otherreportclub.test"].athleteId!;

const scores = { sleep: 4, fatigue: 3, soreness: 2, stress: 4, mood: 5 };

describe("latest reports per athlete (the physio's squad status reads these)", () => {
  it("picks each athlete's latest day, then the last written that day, within the team only", async () => {
    const pain = (athleteId: number, team: number, date: string, severity: number) =>
      d.PainReport.create({
        teamId: team,
        athleteId,
        sessionId: null,
        date,
        region: "calf",
        severity,
        stoppedSession: false,
        alertId: null,
      });
    await pain(ada, teamId, "2026-11-03", 6);
    await pain(ada, teamId, "2026-11-05", 2);
    await pain(ada, teamId, "2026-11-05", 4);
    await pain(ada, teamId, "2026-11-04", 9);
    await pain(stranger, other.teamId, "2026-11-06", 7);
    const latest = await latestPainReportByAthlete({ teamId });
    expect([...latest.keys()]).toEqual([ada]);
    expect(latest.get(ada)).toMatchObject({ date: "2026-11-05", severity: 4, region: "calf", stoppedSession: false });
    expect((await latestPainReportByAthlete({ teamId, athleteIds: [ben] })).size).toBe(0);
  });

  it("gives each athlete's latest check-in with its sum", async () => {
    await d.CheckIn.create({ teamId, athleteId: ben, date: "2026-11-04", ...scores });
    await d.CheckIn.create({ teamId, athleteId: ben, date: "2026-11-06", ...scores, mood: 1 });
    await d.CheckIn.create({ teamId, athleteId: ada, date: "2026-11-01", ...scores });
    await d.CheckIn.create({ teamId: other.teamId, athleteId: stranger, date: "2026-11-07", ...scores });
    const latest = await latestCheckInByAthlete({ teamId });
    expect(latest.get(ben)).toMatchObject({ date: "2026-11-06", mood: 1, total: 14 });
    expect(latest.get(ada)).toMatchObject({ date: "2026-11-01", total: 18 });
    expect(latest.has(stranger)).toBe(false);
  });

  // The production bundle minifies class names, and Sequelize names the outer table after the model's class: the
  // correlated MAX spelled "PainReport" once and /status failed under `next start` only. Rename the classes as the
  // minifier does and read again.
  it("reads the same under minified model class names", async () => {
    const before = [await latestPainReportByAthlete({ teamId }), await latestCheckInByAthlete({ teamId })];
    const rename = (model: object, name: string) => Object.defineProperty(model, "name", { value: name });
    rename(d.PainReport, "s");
    rename(d.CheckIn, "t");
    try {
      expect(await latestPainReportByAthlete({ teamId })).toEqual(before[0]);
      expect(await latestCheckInByAthlete({ teamId })).toEqual(before[1]);
    } finally {
      rename(d.PainReport, "PainReport");
      rename(d.CheckIn, "CheckIn");
    }
  });

  it("keeps a pain report when its session is deleted", async () => {
    const session = await d.PlannedSession.create({
      teamId,
      athleteId: ben,
      date: "2026-11-02",
      startTime: "16:00",
      durationMin: 60,
      title: "Acc",
      plannedRpe: 6,
      notes: null,
      publishedAt: null,
    } as never);
    await d.PainReport.create({
      teamId,
      athleteId: ben,
      sessionId: session.id,
      date: "2026-11-02",
      region: "knee",
      severity: 3,
      stoppedSession: true,
      alertId: null,
    });
    await session.destroy();
    expect((await latestPainReportByAthlete({ teamId, athleteIds: [ben] })).get(ben)).toMatchObject({
      sessionId: null,
      region: "knee",
    });
  });
});
