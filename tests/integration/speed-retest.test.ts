// Who is due a speed re-test (lib/speed/README.md §6) over a temp SQLite file: the team's interval set through its
// handler, the speed lab's timing tests and the profile's typed test date, and the coach's Today reading the same rule.
import { describe, expect, it } from "vitest";
import { addDays } from "@/lib/dates/plain-date";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";
import { who } from "../helpers/handler-session";

const d = await setupTestDb();
const settings = await import("@/app/api/teams/[teamId]/speed/settings/route");
const { listRetestsDue, getSquadSpeed } = await import("@/lib/data/speed-views");
const { getCoachToday } = await import("@/lib/data/coach-today");

const TODAY = "2026-12-02";
const a = await createTestTeam(d, { name: "Alpha Track" });
const b = await createTestTeam(d, { name: "Bravo Track" });
const ada = a.users["ada@alphatrack.test"].athleteId!;
const ben = a.users["ben@alphatrack.test"].athleteId!;

// Ada: typed test date 10 weeks ago, a speed-lab timing test 3 weeks ago. Ben: typed 5 weeks ago, no lab test.
await d.Athlete.update({ vmaxTestedOn: addDays(TODAY, -70) }, { where: { id: ada } });
await d.Athlete.update({ vmaxTestedOn: addDays(TODAY, -35) }, { where: { id: ben } });
await d.SpeedTest.create({
  teamId: a.teamId,
  athleteId: ada,
  kind: "timing",
  testDate: addDays(TODAY, -21),
  startType: "standing",
  bodyMassKg: 60,
  plannedSessionId: null,
  uploadId: null,
  createdByUserId: null,
  data: "{}",
  result: "{}",
});

const ctx = (teamId: number) => ({ params: Promise.resolve({ teamId: String(teamId) }) });
const patch = (teamId: number, body: unknown) =>
  settings.PATCH(
    new Request(`http://localhost/api/teams/${teamId}/speed/settings`, {
      method: "PATCH",
      headers: { "content-type": "application/json" },
      body: JSON.stringify(body),
    }),
    ctx(teamId),
  );

const due = async () => (await listRetestsDue({ teamId: a.teamId, today: TODAY })).due.map((r) => r.athleteName);

describe("due a re-test", () => {
  it("by default (6 weeks) nobody: the lab's test is newer than Ada's typed date, Ben's typed date is 5 weeks old", async () => {
    expect(await due()).toEqual([]);
    const squad = await getSquadSpeed({ teamId: a.teamId, today: TODAY });
    expect(squad.rows.map((r) => [r.name, r.lastTimingTest, r.retest.due])).toEqual([
      ["Ada Athlete", addDays(TODAY, -21), false],
      ["Ben Athlete", addDays(TODAY, -35), false],
    ]);
  });

  it("a 4-week interval set by a coach makes Ben due, and the coach's Today lists him with the interval", async () => {
    who.userId = a.users.coach.userId;
    const res = await patch(a.teamId, { retestWeeks: 4 });
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ retestWeeks: 4 });
    expect(await due()).toEqual(["Ben Athlete"]);
    const today = await getCoachToday({ teamId: a.teamId, userId: a.users.coach.userId, today: TODAY });
    expect(today.retestWeeks).toBe(4);
    expect(today.retests.map((r) => [r.athleteName, r.lastTestedOn, r.daysSince])).toEqual([
      ["Ben Athlete", addDays(TODAY, -35), 35],
    ]);
    // 3 weeks: Ada's lab test (21 days) is due to the day as well; the longest waiting comes first.
    expect((await patch(a.teamId, { retestWeeks: 3 })).status).toBe(200);
    expect(await due()).toEqual(["Ben Athlete", "Ada Athlete"]);
  });

  it("bad values are a 400 naming retestWeeks; a physio gets 403; another team's setting is its own", async () => {
    who.userId = a.users.coach.userId;
    for (const retestWeeks of [0, 53, 2.5, "6", null]) {
      const res = await patch(a.teamId, { retestWeeks });
      expect(res.status).toBe(400);
      const body = (await res.json()) as { error: { fields: Record<string, string[]> } };
      expect(Object.keys(body.error.fields)).toEqual(["retestWeeks"]);
    }
    who.userId = a.users.physio.userId;
    expect((await patch(a.teamId, { retestWeeks: 8 })).status).toBe(403);
    expect((await d.SpeedLabSettings.findByPk(a.teamId, { raw: true }))!.retestWeeks).toBe(3);
    expect((await listRetestsDue({ teamId: b.teamId, today: TODAY })).retestWeeks).toBe(6);
  });
});
