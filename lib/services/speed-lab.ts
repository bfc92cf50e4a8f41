import "server-only";
import type { Transaction } from "sequelize";
import { dayIndex } from "@/lib/dates/plain-date";
import { refreshLedger } from "@/lib/data/ledger";
import {
  BASELINE_FROM,
  copyCurrentProfile,
  getAthleteSpeedRow,
  insertProfileEntry,
  listProfileEntries,
  replaceProfileEntry,
} from "@/lib/data/speed-profiles";
import { getSpeedTest, insertSpeedTests, insertSpeedUpload } from "@/lib/data/speed-tests";
import { inTeamTransaction } from "@/lib/data/transaction";
import { AppError } from "@/lib/errors";
import {
  measuredProfileValues,
  mergeProfile,
  PROFILE_VALUE_KEYS,
  type SpeedProfileValues,
} from "@/lib/speed/profile-values";
import { analyseTimingTrial } from "@/lib/speed/timing-trial";
import type { TimingTrialInput } from "@/lib/validations/speed";

// Accepting a speed test: the athlete's profile changes from the test's date on, earlier days keep the profile
// that was in force (lib/speed/README.md §4), and the load ledger is refreshed from that date inside the same
// transaction.

const NO_VALUES: SpeedProfileValues = Object.fromEntries(
  PROFILE_VALUE_KEYS.map((k) => [k, null]),
) as SpeedProfileValues;

/**
 * Saves timing trials (typed in, or read from an uploaded file that is kept as it came) with their results, all
 * or nothing. A trial without body mass takes the athlete's.
 */
export async function recordTimingTrials({
  teamId,
  userId,
  trials,
  upload,
}: {
  teamId: number;
  userId: number;
  trials: readonly TimingTrialInput[];
  upload?: { fileName: string; content: string } | null;
}): Promise<{ testIds: number[]; uploadId: number | null }> {
  return inTeamTransaction(teamId, async (transaction) => {
    const uploadId = upload
      ? (await insertSpeedUpload({ teamId, userId, kind: "timing", ...upload, transaction })).id
      : null;
    const tests = [];
    for (const t of trials) {
      const row = await getAthleteSpeedRow({ teamId, athleteId: t.athleteId, transaction });
      const bodyMassKg = t.bodyMassKg ?? row.bodyMassKg;
      const data = { gates: t.gates, flying: t.flying ?? null };
      tests.push({
        athleteId: t.athleteId,
        kind: "timing" as const,
        testDate: t.testDate,
        startType: t.startType,
        bodyMassKg,
        plannedSessionId: null,
        data,
        result: analyseTimingTrial({ ...data, bodyMassKg }),
      });
    }
    const testIds = await insertSpeedTests({ teamId, userId, uploadId, tests, transaction });
    return { testIds, uploadId };
  });
}

export async function acceptSpeedTest({
  teamId,
  testId,
  userId,
  now,
  replace = false,
}: {
  teamId: number;
  testId: number;
  userId: number;
  now: Date;
  /** Replace a result already in use from the test's date (else that is a 409 saying so). */
  replace?: boolean;
}): Promise<{ entryId: number; effectiveFrom: string; values: SpeedProfileValues; replaced: boolean }> {
  return inTeamTransaction(teamId, async (transaction) => {
    const test = await getSpeedTest({ teamId, testId, transaction });
    const measured = measuredProfileValues(test.kind, test.result);
    if (!measured)
      throw new AppError("invalid", "This test has no result to accept", { fields: { testId: ["No fitted result"] } });
    // The athlete form's bounds (lib/validations/athlete.ts): an accepted profile must stay editable there.
    const outside = (v: number | null | undefined, lo: number, hi: number) =>
      typeof v === "number" && (v < lo || v > hi);
    if (outside(measured.vmaxMs, 4, 13) || outside(measured.tauS, 0.4, 3) || outside(measured.stepLengthM, 1, 3.2)) {
      throw new AppError(
        "invalid",
        "A measured value is outside the accepted range (vmax 4–13 m/s, τ 0.4–3 s, step length 1–3.2 m)",
        { fields: { testId: ["Measured values out of range"] } },
      );
    }
    const { athleteId, testDate } = test;
    let entries = await listProfileEntries({ teamId, athleteId, transaction });
    if (entries.some((e) => e.speedTestId === testId))
      throw new AppError("conflict", "This result is already accepted");
    const sameDay = entries.find((e) => e.effectiveFrom === testDate);
    if (sameDay && !replace) {
      const who = sameDay.acceptedByName ?? "a former member";
      throw new AppError(
        "conflict",
        `Another result is already in use from ${testDate} (accepted by ${who} on ` +
          `${sameDay.acceptedAt.toISOString().slice(0, 10)}). Use this one instead to replace it for that day; ` +
          "the replaced result stays in the history.",
        {
          fields: { testId: ["Another result is in use from this date"] },
          details: { sameDay: { speedTestId: sameDay.speedTestId, acceptedByName: who, effectiveFrom: testDate } },
        },
      );
    }
    if (sameDay) {
      // Same kind: the new result replaces the day's whole result (a second trial). Another kind: its values go
      // over the day's result, so a timing test and a contact test of one day both count (README §4).
      const replacedKind = sameDay.speedTestId
        ? (await getSpeedTest({ teamId, testId: sameDay.speedTestId, transaction })).kind
        : null;
      const before = entries.filter((e) => e.effectiveFrom < testDate).at(-1);
      const base = replacedKind === test.kind && before ? pick(before) : pick(sameDay);
      const values = mergeProfile(base, measured);
      await replaceProfileEntry({
        teamId,
        entry: { ...sameDay, athleteId },
        speedTestId: testId,
        userId,
        now,
        values,
        transaction,
      });
      await afterProfileChange({ athleteId, entries, testDate, values, transaction });
      return { entryId: sameDay.id, effectiveFrom: testDate, values, replaced: true };
    }
    const row = await getAthleteSpeedRow({ teamId, athleteId, transaction });
    if (entries.length === 0) {
      // The hand-typed values stay in force before the first accepted test.
      await insertProfileEntry({
        teamId,
        athleteId,
        effectiveFrom: BASELINE_FROM,
        speedTestId: null,
        acceptedByUserId: null,
        acceptedAt: now,
        values: { ...NO_VALUES, vmaxMs: row.vmaxMs, tauS: row.tauS, stepLengthM: row.stepLengthM },
        transaction,
      });
      entries = await listProfileEntries({ teamId, athleteId, transaction });
    }
    const inForce = entries.filter((e) => e.effectiveFrom < testDate).at(-1)!;
    const values = mergeProfile(pick(inForce), measured);
    const { id } = await insertProfileEntry({
      teamId,
      athleteId,
      effectiveFrom: testDate,
      speedTestId: testId,
      acceptedByUserId: userId,
      acceptedAt: now,
      values,
      transaction,
    });
    await afterProfileChange({ athleteId, entries, testDate, values, transaction });
    return { entryId: id, effectiveFrom: testDate, values, replaced: false };
  });
}

/**
 * The entry of `testDate` changed: the latest entry is copied onto the athlete row (the current profile), and
 * the ledger is refreshed from that date in the same transaction.
 */
async function afterProfileChange({
  athleteId,
  entries,
  testDate,
  values,
  transaction,
}: {
  athleteId: number;
  entries: readonly { effectiveFrom: string }[];
  testDate: string;
  values: SpeedProfileValues;
  transaction: Transaction;
}) {
  if (entries.every((e) => e.effectiveFrom <= testDate)) {
    await copyCurrentProfile({
      athleteId,
      values: { vmaxMs: values.vmaxMs, tauS: values.tauS, stepLengthM: values.stepLengthM },
      testedOn: testDate,
      fromDate: testDate,
      transaction,
    });
  }
  await refreshLedger({ transaction, athleteIds: [athleteId], fromDay: dayIndex(testDate) });
}

function pick(v: SpeedProfileValues): SpeedProfileValues {
  return Object.fromEntries(PROFILE_VALUE_KEYS.map((k) => [k, v[k]])) as SpeedProfileValues;
}
