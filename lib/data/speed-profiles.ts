import "server-only";
import { QueryTypes, type Transaction } from "sequelize";
import { AppError } from "@/lib/errors";
import { PROFILE_VALUE_KEYS, type SpeedProfileValues } from "@/lib/speed/profile-values";
import { db } from "@/models";

// Each athlete's speed profile history (speed_profile_entries, migration 015; lib/speed/README.md §4). The
// entry with the latest date is also copied onto the athlete row, which the rest of the app reads as "current".

export const BASELINE_FROM = "0001-01-01";

export type ProfileValues = SpeedProfileValues;

export type ProfileEntryRow = ProfileValues & {
  id: number;
  effectiveFrom: string;
  speedTestId: number | null;
  acceptedByUserId: number | null;
  acceptedByName: string | null;
  acceptedAt: Date;
};

const VALUE_FIELDS = PROFILE_VALUE_KEYS;

/** An athlete's entries, oldest first. */
export async function listProfileEntries({
  teamId,
  athleteId,
  transaction,
}: {
  teamId: number;
  athleteId: number;
  transaction?: Transaction;
}): Promise<ProfileEntryRow[]> {
  const { SpeedProfileEntry, User } = await db();
  const rows = await SpeedProfileEntry.findAll({
    where: { teamId, athleteId },
    attributes: ["id", "effectiveFrom", "speedTestId", "acceptedByUserId", "acceptedAt", ...VALUE_FIELDS],
    order: [["effectiveFrom", "ASC"]],
    raw: true,
    transaction,
  });
  const ids = [...new Set(rows.map((r) => r.acceptedByUserId).filter((x): x is number => x !== null))];
  const users = ids.length
    ? await User.findAll({ where: { id: ids }, attributes: ["id", "name"], raw: true, transaction })
    : [];
  const names = new Map(users.map((u) => [u.id, u.name]));
  return rows.map((r) => ({
    id: r.id,
    effectiveFrom: String(r.effectiveFrom).slice(0, 10),
    speedTestId: r.speedTestId ?? null,
    acceptedByUserId: r.acceptedByUserId ?? null,
    acceptedByName: r.acceptedByUserId ? (names.get(r.acceptedByUserId) ?? null) : null,
    // raw rows from SQLite carry the timestamp as text
    acceptedAt: r.acceptedAt instanceof Date ? r.acceptedAt : new Date(String(r.acceptedAt)),
    ...Object.fromEntries(VALUE_FIELDS.map((f) => [f, r[f] === null ? null : Number(r[f])])),
  })) as ProfileEntryRow[];
}

export async function insertProfileEntry({
  teamId,
  athleteId,
  effectiveFrom,
  speedTestId,
  acceptedByUserId,
  acceptedAt,
  values,
  transaction,
}: {
  teamId: number;
  athleteId: number;
  effectiveFrom: string;
  speedTestId: number | null;
  acceptedByUserId: number | null;
  acceptedAt: Date;
  values: ProfileValues;
  transaction: Transaction;
}): Promise<{ id: number }> {
  const { SpeedProfileEntry } = await db();
  const row = await SpeedProfileEntry.create(
    { teamId, athleteId, effectiveFrom, speedTestId, acceptedByUserId, acceptedAt, ...values },
    { transaction },
  );
  return { id: row.id };
}

/** The athlete row's profile values and body mass (404 when not in the team). */
export async function getAthleteSpeedRow({
  teamId,
  athleteId,
  transaction,
}: {
  teamId: number;
  athleteId: number;
  transaction?: Transaction;
}): Promise<{ vmaxMs: number | null; tauS: number | null; stepLengthM: number | null; bodyMassKg: number | null }> {
  const { Athlete } = await db();
  const row = await Athlete.findOne({
    where: { id: athleteId, teamId },
    attributes: ["vmaxMs", "tauS", "stepLengthM", "bodyMassKg"],
    raw: true,
    transaction,
  });
  if (!row) throw new AppError("not_found", "Not found");
  return row;
}

/**
 * Copies the current entry's engine values onto the athlete row. The row's trigger (migration 011) marks the
 * athlete's whole ledger; the entries keep every earlier day's values, so only days from `fromDate` on can
 * change and the mark is narrowed back to that (never past a mark that was already there).
 */
export async function copyCurrentProfile({
  athleteId,
  values,
  testedOn,
  fromDate,
  transaction,
}: {
  athleteId: number;
  values: Pick<ProfileValues, "vmaxMs" | "tauS" | "stepLengthM">;
  testedOn: string;
  fromDate: string;
  transaction: Transaction;
}): Promise<void> {
  const { Athlete, sequelize } = await db();
  const [prior] = await sequelize.query<{ from_date: string }>(
    "SELECT from_date FROM load_ledger_dirty WHERE athlete_id = :athleteId",
    { type: QueryTypes.SELECT, replacements: { athleteId }, transaction },
  );
  await Athlete.update({ ...values, vmaxTestedOn: testedOn }, { where: { id: athleteId }, transaction });
  const from = prior && prior.from_date < fromDate ? prior.from_date : fromDate;
  await sequelize.query("UPDATE load_ledger_dirty SET from_date = :from WHERE athlete_id = :athleteId", {
    replacements: { athleteId, from },
    transaction,
  });
}

export type ReplacementRow = {
  id: number;
  effectiveFrom: string;
  speedTestId: number | null;
  acceptedByName: string | null;
  acceptedAt: Date;
  replacedByName: string | null;
  replacedAt: Date;
  values: ProfileValues;
};

/**
 * Moves the result in force from an entry's day into the replaced history (who had accepted it and when, who
 * replaced it and now) and puts the new one in its place (lib/speed/README.md §4).
 */
export async function replaceProfileEntry({
  teamId,
  entry,
  speedTestId,
  userId,
  now,
  values,
  transaction,
}: {
  teamId: number;
  entry: ProfileEntryRow & { athleteId: number };
  speedTestId: number;
  userId: number;
  now: Date;
  values: ProfileValues;
  transaction: Transaction;
}): Promise<void> {
  const { SpeedProfileEntry, SpeedProfileReplacement } = await db();
  await SpeedProfileReplacement.create(
    {
      teamId,
      athleteId: entry.athleteId,
      entryId: entry.id,
      effectiveFrom: entry.effectiveFrom,
      speedTestId: entry.speedTestId,
      acceptedByUserId: entry.acceptedByUserId,
      acceptedAt: entry.acceptedAt,
      values: JSON.stringify(Object.fromEntries(VALUE_FIELDS.map((f) => [f, entry[f]]))),
      replacedByUserId: userId,
      replacedAt: now,
    },
    { transaction },
  );
  await SpeedProfileEntry.update(
    { speedTestId, acceptedByUserId: userId, acceptedAt: now, ...values },
    { where: { id: entry.id, teamId }, transaction },
  );
}

/** The results an athlete's profile no longer uses because a same-day one replaced them, newest first. */
export async function listProfileReplacements({
  teamId,
  athleteId,
}: {
  teamId: number;
  athleteId: number;
}): Promise<ReplacementRow[]> {
  const { SpeedProfileReplacement, User } = await db();
  const rows = await SpeedProfileReplacement.findAll({
    where: { teamId, athleteId },
    attributes: [
      "id",
      "effectiveFrom",
      "speedTestId",
      "acceptedByUserId",
      "acceptedAt",
      "replacedByUserId",
      "replacedAt",
      "values",
    ],
    order: [["id", "DESC"]],
    raw: true,
  });
  const ids = [
    ...new Set(rows.flatMap((r) => [r.acceptedByUserId, r.replacedByUserId]).filter((x): x is number => x !== null)),
  ];
  const users = ids.length ? await User.findAll({ where: { id: ids }, attributes: ["id", "name"], raw: true }) : [];
  const names = new Map(users.map((u) => [u.id, u.name]));
  const date = (v: unknown) => (v instanceof Date ? v : new Date(String(v)));
  return rows.map((r) => ({
    id: r.id,
    effectiveFrom: String(r.effectiveFrom).slice(0, 10),
    speedTestId: r.speedTestId ?? null,
    acceptedByName: r.acceptedByUserId ? (names.get(r.acceptedByUserId) ?? null) : null,
    acceptedAt: date(r.acceptedAt),
    replacedByName: r.replacedByUserId ? (names.get(r.replacedByUserId) ?? null) : null,
    replacedAt: date(r.replacedAt),
    values: JSON.parse(r.values) as ProfileValues,
  }));
}
