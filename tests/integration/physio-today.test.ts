import { describe, expect, it } from "vitest";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";

// The physio's day on a throwaway SQLite file with a fixed "today" (Wednesday 2026-12-02): pain alerts ahead of
// newer load alerts, the last 7 days' pain reports, who is below full training, and sessions planned against a
// restriction, each from rows of this test's own; another team's rows never show.
const d = await setupTestDb();
const { getPhysioToday } = await import("@/lib/data/physio-today");

const TODAY = "2026-12-02";
const WEEK = startOfWeek(TODAY, 1);
const t = await createTestTeam(d, { name: "Medic Track" });
const other = await createTestTeam(d, { name: "Far Track" });
const ada = t.users["ada@medictrack.test"].athleteId!;
const ben = t.users["ben@medictrack.test"].athleteId!;
const physio = t.users.physio;

const alert = (athleteId: number, kind: "pain" | "spike", createdAt: Date, teamId = t.teamId) =>
  d.Alert.create({
    teamId,
    athleteId,
    kind,
    level: "alert",
    metric: kind === "spike" ? "srpe" : null,
    value: kind === "spike" ? 1.8 : 6,
    threshold: kind === "spike" ? 1.5 : 3,
    date: TODAY,
    weekStart: WEEK,
    basis: kind === "spike" ? "planned" : "actual",
    reason: kind === "spike" ? "ACWR (sRPE) 1.80 is at or above the spike threshold 1.50." : "Calf 6/10",
    note: null,
    acknowledgedBy: null,
    acknowledgedAt: null,
    resolvedBy: null,
    resolvedAt: null,
    createdAt,
  });
// The pain alert is older than the spike: the physio still sees it first.
await alert(ben, "pain", new Date("2026-12-01T08:00:00Z"));
await alert(ada, "spike", new Date("2026-12-02T08:00:00Z"));
await alert(other.users["ada@fartrack.test"].athleteId!, "pain", new Date("2026-12-02T09:00:00Z"), other.teamId);

const pain = (athleteId: number, date: string, severity: number, teamId = t.teamId) =>
  d.PainReport.create({
    teamId,
    athleteId,
    sessionId: null,
    date,
    region: "calf",
    severity,
    stoppedSession: severity > 5,
    alertId: null,
  });
await pain(ben, addDays(TODAY, -1), 6);
await pain(ada, addDays(TODAY, -6), 2);
await pain(ada, addDays(TODAY, -7), 5); // a day too old
await pain(other.users["ben@fartrack.test"].athleteId!, TODAY, 7, other.teamId);

// Ben on modified training since Monday, back on Saturday; Ada's level ended yesterday (full again today).
async function level(athleteId: number, lvl: "modified" | "unavailable", startsOn: string, returnOn: string) {
  const r = await d.Restriction.create({
    teamId: t.teamId,
    athleteId,
    rule: lvl === "modified" ? "max_intensity" : "no_training",
    blockKinds: null,
    limitValue: lvl === "modified" ? 85 : null,
    startsOn,
    endsOn: addDays(returnOn, -1),
    liftedOn: null,
    note: "Calf",
    createdBy: physio.userId,
    liftedBy: null,
  });
  await d.AthleteAvailability.create({
    teamId: t.teamId,
    athleteId,
    level: lvl,
    startsOn,
    returnOn,
    note: "Calf strain settling",
    restrictionId: r.id,
    createdBy: physio.userId,
  });
}
await level(ben, "modified", WEEK, addDays(WEEK, 5));
await level(ada, "unavailable", addDays(WEEK, -7), TODAY);

// Ben's flys on Thursday run faster than modified training allows.
const flys = await d.PlannedSession.create({
  teamId: t.teamId,
  athleteId: ben,
  date: addDays(TODAY, 1),
  startTime: "17:00",
  durationMin: 45,
  title: "Flying 30s",
  plannedRpe: 7,
  status: "published",
  notes: null,
  publishedAt: new Date(),
});
await d.SessionBlock.create({
  sessionId: flys.id,
  templateId: null,
  position: 0,
  kind: "max_velocity",
  title: "Flys",
  running: { sets: 1, reps: 4, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
  drills: null,
  notes: null,
});

const day = await getPhysioToday({ teamId: t.teamId, userId: physio.userId, today: TODAY });

describe("the physio's day", () => {
  it("lists the team's open alerts with pain first, then the newest", () => {
    expect(day.day.alerts.map((a) => [a.kind, a.athleteName])).toEqual([
      ["pain", "Ben Athlete"],
      ["spike", "Ada Athlete"],
    ]);
    expect(day.day.alertCount).toBe(2);
  });

  it("lists the pain reports of the last 7 days, newest first, named", () => {
    expect(day.pains.map((p) => [p.athleteName, p.date, p.severity])).toEqual([
      ["Ben Athlete", addDays(TODAY, -1), 6],
      ["Ada Athlete", addDays(TODAY, -6), 2],
    ]);
  });

  it("lists who is below full training today with the return date; a level that ended is left out", () => {
    expect(day.away).toEqual([
      {
        athleteId: ben,
        athleteName: "Ben Athlete",
        level: "modified",
        returnOn: addDays(WEEK, 5),
        note: "Calf strain settling",
      },
    ]);
  });

  it("lists the sessions planned against a restriction", () => {
    expect(day.conflicts).toEqual([
      expect.objectContaining({
        sessionId: flys.id,
        athleteName: "Ben Athlete",
        title: "Flying 30s",
        status: "published",
      }),
    ]);
    expect(day.conflicts[0]!.rule).toMatch(/85% of vmax/);
  });

  it("carries the week's restriction changes from the same reader as the coach's day", () => {
    expect(day.day.restrictions.map((r) => [r.athleteName, r.change, r.date])).toEqual([
      ["Ben Athlete", "starts", WEEK],
      ["Ada Athlete", "ends", addDays(TODAY, -1)],
      ["Ben Athlete", "ends", addDays(WEEK, 4)],
    ]);
  });
});
