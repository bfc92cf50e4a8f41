// Two results for one day (lib/speed/README.md §4) on a real SQLite file with the demo club: accepting the second
// answers 409 saying which result is in use; replacing it puts the second in its place for that day, keeps the
// replaced one in the history (who had accepted it and when, who replaced it and when), and changes figures from
// that day on only.
import { QueryTypes } from "sequelize";
import { describe, expect, it } from "vitest";
import { T4_GATES } from "../unit/speed/fixtures";
import { addDays, dayIndex } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { seedDemo } from "@/lib/seed";
import { setupTestDb } from "../helpers/db";
import { who } from "../helpers/handler-session";

const d = await setupTestDb();
const { ensureLedgerFresh } = await import("@/lib/data/ledger");
const { rebuildLedger } = await import("@/lib/data/ledger-rebuild");
const { acceptSpeedTest, recordTimingTrials } = await import("@/lib/services/speed-lab");
const { listProfileEntries, listProfileReplacements } = await import("@/lib/data/speed-profiles");
const acceptRoute = await import("@/app/api/teams/[teamId]/speed/tests/[testId]/accept/route");
const measure = await import("@/app/api/teams/[teamId]/speed/measure-uploads/route");
const today = teamToday({ timeZone: "Europe/London", now: new Date() });
await seedDemo(d, { today });
await ensureLedgerFresh({});

const athlete = (await d.Athlete.findOne({ order: [["id", "DESC"]], raw: true }))!;
const teamId = athlete.teamId;
const head = (await d.Membership.findOne({ where: { teamId, role: "head_coach" }, raw: true }))!;
const coach = (await d.Membership.findOne({ where: { teamId, role: "coach" }, raw: true }))!;
const day = addDays(today, -10);

const rows = () =>
  d.sequelize.query<{ day: number; v: string }>(
    "SELECT day, hex(past) || hex(today) || hex(ahead) || hex(planned) || hex(acute) || hex(chronic) AS v " +
      "FROM load_ledger WHERE athlete_id = :a ORDER BY day",
    { type: QueryTypes.SELECT, replacements: { a: athlete.id } },
  );
const everything = () =>
  Promise.all([
    d.SpeedProfileEntry.findAll({ raw: true }),
    d.SpeedProfileReplacement.count(),
    d.Athlete.findByPk(athlete.id, { raw: true }),
    rows(),
  ]);
/** T4 splits (lib/speed/README.md §1: vmax 9.5 m/s, τ 1.1 s) stretched by `k`: the same τ, vmax 9.5 ÷ k. */
const trial = (k: number) => ({
  athleteId: athlete.id,
  testDate: day,
  startType: "standing" as const,
  gates: T4_GATES.map((g) => ({ distanceM: g.distanceM, timeS: g.timeS * k })),
});
function accept(testId: number, body?: unknown) {
  return acceptRoute.POST(
    new Request("http://localhost/x", {
      method: "POST",
      ...(body === undefined ? {} : { headers: { "content-type": "application/json" }, body: JSON.stringify(body) }),
    }),
    { params: Promise.resolve({ teamId: String(teamId), testId: String(testId) }) },
  );
}

describe("two results on one day", () => {
  it("the second answers 409 naming the result in use; nothing changes", async () => {
    const { testIds } = await recordTimingTrials({ teamId, userId: head.userId, trials: [trial(1.02), trial(1)] });
    who.userId = head.userId;
    expect((await accept(testIds[0])).status).toBe(200);
    const before = await everything();
    who.userId = coach.userId;
    const res = await accept(testIds[1]);
    expect(res.status).toBe(409);
    const { error } = (await res.json()) as { error: { message: string; sameDay: { speedTestId: number } } };
    expect(error.message).toMatch(
      new RegExp(`^Another result is already in use from ${day} \\(accepted by .+ on \\d{4}-`),
    );
    expect(error.message).toContain("Use this one instead to replace it for that day");
    expect(error.sameDay.speedTestId).toBe(testIds[0]);
    expect(await everything()).toEqual(before);
    // A bad option is a 400 naming it, and changes nothing either.
    const bad = await accept(testIds[1], { replace: "yes" });
    expect(bad.status).toBe(400);
    expect(Object.keys(((await bad.json()) as { error: { fields: object } }).error.fields)).toEqual(["replace"]);
    expect(await everything()).toEqual(before);
  });

  it("replacing: the second trial's values from that day on, the first kept in the history with who and when", async () => {
    const tests = await d.SpeedTest.findAll({ where: { athleteId: athlete.id }, order: [["id", "ASC"]], raw: true });
    const [first, second] = tests.map((t) => t.id);
    const firstEntry = (await listProfileEntries({ teamId, athleteId: athlete.id })).at(-1)!;
    const before = await rows();
    const now = new Date("2026-01-05T09:30:00Z");
    const r = await acceptSpeedTest({ teamId, testId: second, userId: coach.userId, now, replace: true });
    expect(r.replaced).toBe(true);
    // lib/speed/README.md §2 T4: the unstretched splits fit vmax 9.5 m/s, τ 1.1 s to 1e-3.
    expect(Math.abs(r.values.vmaxMs! - 9.5)).toBeLessThan(1e-3);
    const entries = await listProfileEntries({ teamId, athleteId: athlete.id });
    expect(entries.filter((e) => e.effectiveFrom === day)).toHaveLength(1);
    expect(entries.at(-1)).toMatchObject({ id: firstEntry.id, speedTestId: second, acceptedByUserId: coach.userId });
    expect(entries.at(-1)!.acceptedAt.toISOString()).toBe(now.toISOString());
    const history = await listProfileReplacements({ teamId, athleteId: athlete.id });
    expect(history).toHaveLength(1);
    expect(history[0]).toMatchObject({ effectiveFrom: day, speedTestId: first, acceptedByName: expect.any(String) });
    expect(history[0].replacedAt.toISOString()).toBe(now.toISOString());
    expect(history[0].values.vmaxMs).toBeCloseTo(firstEntry.vmaxMs!, 12);
    expect(history[0].values.vmaxMs!).toBeCloseTo(9.5 / 1.02, 2);
    const row = (await d.Athlete.findByPk(athlete.id, { raw: true }))!;
    expect(row.vmaxMs).toBeCloseTo(9.5, 3);
    // Days before the test keep their figures bit for bit; later ones follow the new vmax; the ledger is a rebuild.
    const after = await rows();
    const cut = dayIndex(day);
    expect(after.filter((x) => x.day < cut)).toEqual(before.filter((x) => x.day < cut));
    expect(after.filter((x) => x.day >= cut)).not.toEqual(before.filter((x) => x.day >= cut));
    await rebuildLedger();
    expect(await rows()).toEqual(after);
    // Accepting the same result again is still "already accepted".
    await expect(
      acceptSpeedTest({ teamId, testId: second, userId: coach.userId, now, replace: true }),
    ).rejects.toMatchObject({ status: 409 });
  });

  it("a contact test of the same day adds its values to the day's timing result instead of dropping it", async () => {
    who.userId = coach.userId;
    const up = await measure.POST(
      new Request("http://localhost/x", {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({
          kind: "contacts",
          fileName: "mat.csv",
          content: "contact_time_s,flight_time_s\n0.086,0.145\n",
          athleteId: athlete.id,
          testDate: day,
        }),
      }),
      { params: Promise.resolve({ teamId: String(teamId) }) },
    );
    const { testId } = (await up.json()) as { testId: number };
    expect((await accept(testId)).status).toBe(409);
    const res = await accept(testId, { replace: true });
    expect(res.status).toBe(200);
    const { values } = (await res.json()) as { values: Record<string, number> };
    // B1/B2 (lib/speed/README.md §7) with the day's timing result (T4: vmax 9.5 m/s) kept.
    expect(values.stepFrequencyHz).toBeCloseTo(4.329, 3);
    expect(values.stanceForceBw).toBeCloseTo(2.686, 3);
    expect(Math.abs(values.vmaxMs - 9.5)).toBeLessThan(1e-3);
    expect(await listProfileReplacements({ teamId, athleteId: athlete.id })).toHaveLength(2);
  });
});
