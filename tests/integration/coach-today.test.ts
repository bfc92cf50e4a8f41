import { describe, expect, it } from "vitest";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";

// The coach's Today on a throwaway SQLite file with a fixed "today" (Wednesday 2026-12-02): every list against
// rows of this test's own, and the spikes ahead against the squad week's own projected ratios.
const d = await setupTestDb();
const { getCoachToday } = await import("@/lib/data/coach-today");
const { getSquadWeekLoad } = await import("@/lib/data/load-views");
const { DEFAULT_RETEST_WEEKS } = await import("@/lib/speed/retest");
// A team without a speed-lab setting uses the default interval.
const RETEST_AFTER_DAYS = DEFAULT_RETEST_WEEKS * 7;

const TODAY = "2026-12-02";
const WEEK = startOfWeek(TODAY, 1); // Monday 2026-11-30
const t = await createTestTeam(d, { name: "Alpha Track" });
const ada = t.users["ada@alphatrack.test"];
const ben = t.users["ben@alphatrack.test"];
const coach = t.users.coach;

const sprint = (reps: number) => ({
  kind: "acceleration" as const,
  title: "Starts",
  running: { sets: 1, reps, distanceM: 30, intensityPct: 95, start: "crouch" as const, runInM: 0, restSec: 180 },
  drills: null,
  notes: null,
});

async function addSession(
  athleteId: number,
  date: string,
  o: { status?: "published" | "draft"; title?: string; reps?: number; rpe?: number; min?: number } = {},
) {
  const status = o.status ?? "published";
  const s = await d.PlannedSession.create({
    teamId: t.teamId,
    athleteId,
    date,
    startTime: "17:00",
    durationMin: o.min ?? 45,
    title: o.title ?? "Speed",
    plannedRpe: o.rpe ?? 5,
    status,
    notes: null,
    publishedAt: status === "published" ? new Date() : null,
  });
  await d.SessionBlock.create({ sessionId: s.id, templateId: null, position: 0, ...sprint(o.reps ?? 4) });
  return s.id;
}
async function logged(athleteId: number, sessionId: number) {
  await d.SessionLog.create({
    sessionId,
    athleteId,
    completion: "yes",
    rpe: 5,
    minutes: 45,
    completedReps: null,
    notes: null,
  });
}

// Five weeks of light, logged work for both, so the ratios behind this week are settled.
for (let back = 35; back >= 3; back -= 2)
  for (const who of [ada, ben]) await logged(who.athleteId!, await addSession(who.athleteId!, addDays(TODAY, -back)));
// This week: Monday's sessions (Ada's logged, Ben's not), today's sessions (Ada logged, Ben not, a draft for Ada).
await logged(ada.athleteId!, await addSession(ada.athleteId!, WEEK, { title: "Monday speed" }));
await addSession(ben.athleteId!, WEEK, { title: "Monday speed" });
await logged(ada.athleteId!, await addSession(ada.athleteId!, TODAY, { title: "Today speed" }));
await addSession(ben.athleteId!, TODAY, { title: "Today speed" });
await addSession(ada.athleteId!, TODAY, { status: "draft", title: "Extra starts" });
// Ben's plan ahead is four times his usual week, in the next days: a spike by his own projected ratio.
for (const ahead of [1, 2, 3, 4, 5])
  await addSession(ben.athleteId!, addDays(TODAY, ahead), { reps: 12, rpe: 9, min: 90, title: "Big block" });
// Restrictions: one starting Friday, one that ended last week (not listed), one ending tomorrow.
const restriction = (athleteId: number, startsOn: string, endsOn: string | null) =>
  d.Restriction.create({
    teamId: t.teamId,
    athleteId,
    rule: "no_kind",
    blockKinds: JSON.stringify(["max_velocity"]),
    limitValue: null,
    startsOn,
    endsOn,
    liftedOn: null,
    note: "Hamstring care",
    createdBy: t.users.physio.userId,
    liftedBy: null,
  });
const starts = await restriction(ada.athleteId!, addDays(TODAY, 2), null);
await restriction(ben.athleteId!, addDays(WEEK, -14), addDays(WEEK, -3));
const ends = await restriction(ben.athleteId!, addDays(WEEK, -10), addDays(TODAY, 1));
// Speed tests: Ada's is RETEST_AFTER_DAYS old to the day (due), Ben's a day younger (not due).
await d.Athlete.update({ vmaxTestedOn: addDays(TODAY, -RETEST_AFTER_DAYS) }, { where: { id: ada.athleteId! } });
await d.Athlete.update({ vmaxTestedOn: addDays(TODAY, 1 - RETEST_AFTER_DAYS) }, { where: { id: ben.athleteId! } });
await d.Alert.create({
  teamId: t.teamId,
  athleteId: ben.athleteId!,
  kind: "spike",
  level: "alert",
  metric: "srpe",
  value: 1.8,
  threshold: 1.5,
  date: addDays(TODAY, 3),
  weekStart: WEEK,
  basis: "planned",
  reason: "ACWR (sRPE) 1.80 is at or above the spike threshold 1.50.",
  note: null,
  acknowledgedBy: null,
  acknowledgedAt: null,
  resolvedBy: null,
  resolvedAt: null,
});

// Notes on logs: Ada's on Monday and (with a pain report) three days ago are of the last 7 days; Ben's of 9 days
// ago is not.
async function noteOn(athleteId: number, date: string, notes: string) {
  const [log] = await d.SessionLog.findAll({
    where: { athleteId },
    include: [{ model: d.PlannedSession, as: "session", where: { date }, required: true }],
  });
  await log.update({ notes });
  return log.sessionId;
}
const mondayNote = await noteOn(ada.athleteId!, WEEK, "Felt quick today.");
const painNote = await noteOn(ada.athleteId!, addDays(TODAY, -3), "Left calf a bit tight on the last run.");
await d.PainReport.create({
  teamId: t.teamId,
  athleteId: ada.athleteId!,
  sessionId: painNote,
  date: addDays(TODAY, -3),
  region: "calf",
  severity: 2,
  stoppedSession: false,
  alertId: null,
});
await noteOn(ben.athleteId!, addDays(TODAY, -9), "Old news.");

const today = await getCoachToday({ teamId: t.teamId, userId: coach.userId, today: TODAY });

describe("the coach's Today", () => {
  it("lists today's sessions with who has logged, drafts marked, and this week's unlogged ones", () => {
    expect(today.today).toBe(TODAY);
    expect(today.weekStart).toBe(WEEK);
    const line = (s: (typeof today.sessions)[number]) => [s.athleteName, s.title, s.status, s.logged];
    expect(today.sessions.map(line).sort()).toEqual(
      [
        ["Ada Athlete", "Extra starts", "draft", false],
        ["Ada Athlete", "Today speed", "published", true],
        ["Ben Athlete", "Today speed", "published", false],
      ].sort(),
    );
    expect(today.unlogged.map((s) => [s.athleteName, s.date, s.title])).toEqual([
      ["Ben Athlete", WEEK, "Monday speed"],
    ]);
  });

  it("lists the open alerts, restrictions that start or end this week, and the athletes due a re-test", () => {
    expect(today.alertCount).toBe(1);
    expect(today.alerts[0]).toMatchObject({ athleteName: "Ben Athlete", kind: "spike", status: "open" });
    expect(today.restrictions.map((r) => [r.id, r.change, r.date])).toEqual([
      [ends.id, "ends", addDays(TODAY, 1)],
      [starts.id, "starts", addDays(TODAY, 2)],
    ]);
    expect(today.retests.map((r) => [r.athleteName, r.daysSince])).toEqual([["Ada Athlete", RETEST_AFTER_DAYS]]);
  });

  it("spikes ahead are the squad week's projected ratios of the next 7 days at or above the spike line", async () => {
    const weeks = await Promise.all(
      [WEEK, addDays(WEEK, 7)].map((week) =>
        getSquadWeekLoad({ teamId: t.teamId, week, view: "projected", today: TODAY }),
      ),
    );
    const offset = 2; // Wednesday
    const expected = weeks[0].rows.flatMap((r) => {
      const next = weeks[1].rows.find((n) => n.id === r.id)!;
      const days = [...r.dailyRatio, ...next.dailyRatio].slice(offset, offset + 7);
      const peak = Math.max(...days.map((x) => x ?? -Infinity));
      return peak >= weeks[0].settings.spikeRatio ? [{ athleteId: r.id, ratio: peak }] : [];
    });
    expect(expected.map((e) => e.athleteId)).toEqual([ben.athleteId]);
    expect(today.spikes.map((s) => ({ athleteId: s.athleteId, ratio: s.ratio }))).toEqual(expected);
    expect(today.spikes[0].date > TODAY).toBe(true);
    expect(today.spikes[0].provisional).toBe(false);
  });

  it("gives the athletes' log notes of the last 7 days, newest first, with a pain report where there is one", () => {
    expect(today.notes.map((n) => [n.sessionId, n.athleteName, n.note, n.aboutPain])).toEqual([
      [mondayNote, "Ada Athlete", "Felt quick today.", false],
      [painNote, "Ada Athlete", "Left calf a bit tight on the last run.", true],
    ]);
    expect(today.notes[1].pain).toEqual({ region: "calf", severity: 2, stoppedSession: false });
    expect(today.notes[0].pain).toBeNull();
  });
});
