// Accepting a speed test (lib/speed/README.md §4) on a real SQLite file with the demo club: the profile changes
// from the test's date on, earlier ledger rows stay bit for bit as they were, and the ledger equals a rebuild.
import { QueryTypes } from "sequelize";
import { describe, expect, it } from "vitest";
import { T4_GATES } from "../unit/speed/fixtures";
import { addDays, dayIndex } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { seedDemo } from "@/lib/seed";
import { setupTestDb } from "../helpers/db";

const d = await setupTestDb();
const { ensureLedgerFresh } = await import("@/lib/data/ledger");
const { rebuildLedger } = await import("@/lib/data/ledger-rebuild");
const { acceptSpeedTest, recordTimingTrials } = await import("@/lib/services/speed-lab");
const { listProfileEntries } = await import("@/lib/data/speed-profiles");
const today = teamToday({ timeZone: "Europe/London", now: new Date() });
await seedDemo(d, { today });
await ensureLedgerFresh({});

const T4 = T4_GATES;

async function rows(athleteId?: number): Promise<{ day: number; v: string }[]> {
  return d.sequelize.query<{ day: number; v: string }>(
    `SELECT day, athlete_id || ':' || flags || hex(past) || hex(today) || hex(ahead) || hex(planned) || hex(cum) || hex(acute)
      || hex(chronic) || hex(ratio) AS v FROM load_ledger WHERE (:a = 0 OR athlete_id = :a) ORDER BY athlete_id, day`,
    { type: QueryTypes.SELECT, replacements: { a: athleteId ?? 0 } },
  );
}

const athlete = (await d.Athlete.findOne({
  where: { name: (await d.Athlete.findOne({ raw: true }))!.name },
  raw: true,
}))!;
const coach = (await d.Membership.findOne({ where: { teamId: athlete.teamId, role: "head_coach" }, raw: true }))!;
const testDate = addDays(today, -14);

describe("accepting a timing test", () => {
  it("saves the trial with its fit, then accepting changes the profile from the test date on only", async () => {
    expect(athlete.vmaxMs).not.toBeCloseTo(9.5, 2);
    const { testIds } = await recordTimingTrials({
      teamId: athlete.teamId,
      userId: coach.userId,
      trials: [{ athleteId: athlete.id, testDate, startType: "standing", gates: T4 }],
    });
    const stored = (await d.SpeedTest.findByPk(testIds[0], { raw: true }))!;
    const result = JSON.parse(stored.result);
    expect(Math.abs(result.fit.vmax - 9.5)).toBeLessThan(1e-3);
    expect(result.profile.f0N).toBeGreaterThan(0); // body mass from the athlete row

    const before = await rows(athlete.id);
    const cut = dayIndex(testDate);
    const accepted = await acceptSpeedTest({
      teamId: athlete.teamId,
      testId: testIds[0],
      userId: coach.userId,
      now: new Date("2026-01-02T10:00:00Z"),
    });
    expect(accepted.effectiveFrom).toBe(testDate);
    const after = await rows(athlete.id);
    expect(after.filter((r) => r.day < cut)).toEqual(before.filter((r) => r.day < cut));
    expect(after.filter((r) => r.day >= cut)).not.toEqual(before.filter((r) => r.day >= cut));

    const row = (await d.Athlete.findByPk(athlete.id, { raw: true }))!;
    expect(row.vmaxMs).toBeCloseTo(9.5, 2);
    expect(row.tauS).toBeCloseTo(1.1, 2);
    expect(row.vmaxTestedOn).toBe(testDate);
    expect(row.stepLengthM).toBe(athlete.stepLengthM); // not measured: the value in force carries on

    const entries = await listProfileEntries({ teamId: athlete.teamId, athleteId: athlete.id });
    expect(entries.map((e) => e.effectiveFrom)).toEqual(["0001-01-01", testDate]);
    expect(entries[0]).toMatchObject({ vmaxMs: athlete.vmaxMs, tauS: athlete.tauS, acceptedByUserId: null });
    expect(entries[1]).toMatchObject({ speedTestId: testIds[0], acceptedByUserId: coach.userId });
    expect(entries[1].acceptedAt.toISOString()).toBe("2026-01-02T10:00:00.000Z");

    // Nothing left marked, and the stored ledger is what a rebuild from scratch gives.
    const all = await rows();
    await rebuildLedger();
    expect(await rows()).toEqual(all);
  });

  it("an older test accepted later changes only the days between the two tests", async () => {
    const olderDate = addDays(testDate, -21);
    const { testIds } = await recordTimingTrials({
      teamId: athlete.teamId,
      userId: coach.userId,
      trials: [
        {
          athleteId: athlete.id,
          testDate: olderDate,
          startType: "standing",
          gates: T4.map((g) => ({ ...g, timeS: g.timeS * 1.04 })),
        },
      ],
    });
    const before = await rows(athlete.id);
    await acceptSpeedTest({ teamId: athlete.teamId, testId: testIds[0], userId: coach.userId, now: new Date() });
    const after = await rows(athlete.id);
    const [a, b] = [dayIndex(olderDate), dayIndex(testDate)];
    expect(after.filter((r) => r.day < a)).toEqual(before.filter((r) => r.day < a));
    // The later test's profile still holds from its date: the current row keeps the later test's vmax.
    expect((await d.Athlete.findByPk(athlete.id, { raw: true }))!.vmaxMs).toBeCloseTo(9.5, 2);
    expect(after.filter((r) => r.day >= a && r.day < b)).not.toEqual(before.filter((r) => r.day >= a && r.day < b));
    const all = await rows();
    await rebuildLedger();
    expect(await rows()).toEqual(all);
  });

  it("refuses a second acceptance, another team's test and a test without a fit (nothing changes)", async () => {
    const [test] = await d.SpeedTest.findAll({ where: { athleteId: athlete.id }, raw: true, order: [["id", "ASC"]] });
    const snapshot = await rows();
    await expect(
      acceptSpeedTest({ teamId: athlete.teamId, testId: test.id, userId: coach.userId, now: new Date() }),
    ).rejects.toMatchObject({ status: 409 });
    await expect(
      acceptSpeedTest({ teamId: athlete.teamId + 999, testId: test.id, userId: coach.userId, now: new Date() }),
    ).rejects.toMatchObject({ status: 404 });
    const { testIds } = await recordTimingTrials({
      teamId: athlete.teamId,
      userId: coach.userId,
      trials: [
        {
          athleteId: athlete.id,
          testDate: addDays(today, -1),
          startType: "flying",
          gates: [],
          flying: { lengthM: 20, timeS: 2 },
        },
      ],
    });
    await expect(
      acceptSpeedTest({ teamId: athlete.teamId, testId: testIds[0], userId: coach.userId, now: new Date() }),
    ).rejects.toMatchObject({ status: 400 });
    expect(await rows()).toEqual(snapshot);
  });
});
