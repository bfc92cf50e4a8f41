import "server-only";
import type { PlyoLevel, Sex } from "@/lib/domain/athletes";
import type { Transaction } from "sequelize";
import { AppError } from "@/lib/errors";
import type { AthleteInput } from "@/lib/validations/athlete";
import { db } from "@/models";

export type AthleteRow = {
  id: number;
  name: string;
  groupId: number | null;
  groupName: string | null;
  sex: Sex | null;
  birthDate: string | null;
  bodyMassKg: number | null;
  vmaxMs: number | null;
  vmaxTestedOn: string | null;
  tauS: number | null;
  stepLengthM: number | null;
  plyoLevel: PlyoLevel;
  hasAccount: boolean;
};

const ATHLETE_FIELDS = [
  "id",
  "name",
  "groupId",
  "userId",
  "sex",
  "birthDate",
  "bodyMassKg",
  "vmaxMs",
  "vmaxTestedOn",
  "tauS",
  "stepLengthM",
  "plyoLevel",
] as const;

export type GroupRow = { id: number; name: string; sortOrder: number };

export async function listGroups({ teamId }: { teamId: number }): Promise<GroupRow[]> {
  const { TrainingGroup } = await db();
  const groups = await TrainingGroup.findAll({
    where: { teamId },
    attributes: ["id", "name", "sortOrder"],
    order: [
      ["sortOrder", "ASC"],
      ["name", "ASC"],
    ],
  });
  return groups.map((g) => ({ id: g.id, name: g.name, sortOrder: g.sortOrder }));
}

/** The team's athletes, ordered by training group then name. */
export async function listSquad({ teamId, athleteId }: { teamId: number; athleteId?: number }): Promise<AthleteRow[]> {
  const { Athlete } = await db();
  const [groups, athletes] = await Promise.all([
    listGroups({ teamId }),
    Athlete.findAll({
      where: athleteId ? { teamId, id: athleteId } : { teamId },
      attributes: [...ATHLETE_FIELDS],
      order: [["name", "ASC"]],
    }),
  ]);
  const byId = new Map(groups.map((g) => [g.id, g]));
  const order = (groupId: number | null) => (groupId && byId.has(groupId) ? byId.get(groupId)!.sortOrder : 1e9);
  return athletes
    .map((a) => ({
      id: a.id,
      name: a.name,
      groupId: a.groupId,
      groupName: a.groupId ? (byId.get(a.groupId)?.name ?? null) : null,
      sex: a.sex,
      birthDate: a.birthDate,
      bodyMassKg: a.bodyMassKg,
      vmaxMs: a.vmaxMs,
      vmaxTestedOn: a.vmaxTestedOn,
      tauS: a.tauS,
      stepLengthM: a.stepLengthM,
      plyoLevel: a.plyoLevel,
      hasAccount: a.userId !== null,
    }))
    .sort((x, y) => order(x.groupId) - order(y.groupId) || x.name.localeCompare(y.name));
}

export async function getAthlete({
  teamId,
  athleteId,
}: {
  teamId: number;
  athleteId: number;
}): Promise<AthleteRow | null> {
  const [row] = await listSquad({ teamId, athleteId });
  return row ?? null;
}

export async function listUnlinkedAthletes({ teamId }: { teamId: number }) {
  const { Athlete } = await db();
  const rows = await Athlete.findAll({
    where: { teamId, userId: null },
    attributes: ["id", "name"],
    order: [["name", "ASC"]],
  });
  return rows.map((a) => ({ id: a.id, name: a.name }));
}

export async function assertGroupOfTeam({
  teamId,
  groupId,
  transaction,
}: {
  teamId: number;
  groupId: number | null;
  transaction: Transaction;
}) {
  if (groupId === null) return;
  const { TrainingGroup } = await db();
  if (!(await TrainingGroup.count({ where: { id: groupId, teamId }, transaction }))) {
    throw new AppError("invalid", "Choose a training group of this team", { fields: { groupId: ["Unknown group"] } });
  }
}

export async function insertAthlete({
  teamId,
  input,
  transaction,
}: {
  teamId: number;
  input: AthleteInput;
  transaction: Transaction;
}): Promise<{ id: number }> {
  const { Athlete } = await db();
  await assertGroupOfTeam({ teamId, groupId: input.groupId, transaction });
  const athlete = await Athlete.create({ teamId, userId: null, ...input }, { transaction });
  return { id: athlete.id };
}

export async function updateAthleteRow({
  teamId,
  athleteId,
  input,
  transaction,
}: {
  teamId: number;
  athleteId: number;
  input: AthleteInput;
  transaction: Transaction;
}): Promise<{ id: number }> {
  const { Athlete } = await db();
  await assertGroupOfTeam({ teamId, groupId: input.groupId, transaction });
  const [count] = await Athlete.update(input, { where: { id: athleteId, teamId }, transaction });
  if (!count) throw new AppError("not_found", "No such athlete");
  return { id: athleteId };
}

/** Id → name of some of the team's athletes. */
export async function athleteNames({
  athleteIds,
  transaction,
}: {
  athleteIds: readonly number[];
  transaction?: Transaction;
}): Promise<Map<number, string>> {
  const { Athlete } = await db();
  const athletes = await Athlete.findAll({
    where: { id: [...new Set(athleteIds)] },
    attributes: ["id", "name"],
    transaction,
  });
  return new Map(athletes.map((a) => [a.id, a.name]));
}

/** An athlete of the team and the account it is linked to, or null. */
export async function findAthleteLink({
  teamId,
  athleteId,
  transaction,
}: {
  teamId: number;
  athleteId: number;
  transaction: Transaction;
}): Promise<{ id: number; userId: number | null } | null> {
  const { Athlete } = await db();
  const athlete = await Athlete.findOne({
    where: { id: athleteId, teamId },
    attributes: ["id", "userId"],
    transaction,
  });
  return athlete ? { id: athlete.id, userId: athlete.userId } : null;
}

/** A profile with only a name (the rest is filled in by the staff later); its id. */
export async function insertAthleteProfile({
  teamId,
  userId,
  name,
  transaction,
}: {
  teamId: number;
  userId: number | null;
  name: string;
  transaction: Transaction;
}): Promise<number> {
  const { Athlete } = await db();
  const empty = { groupId: null, sex: null, birthDate: null, bodyMassKg: null, vmaxMs: null, vmaxTestedOn: null };
  const row = await Athlete.create({ teamId, userId, name, ...empty, tauS: null, stepLengthM: null }, { transaction });
  return row.id;
}

/** Unlinks the account from the team's athlete profiles; the training history stays with the team. */
export async function unlinkAthletes({
  teamId,
  userId,
  transaction,
}: {
  teamId: number;
  userId: number;
  transaction: Transaction;
}) {
  const { Athlete } = await db();
  await Athlete.update({ userId: null }, { where: { teamId, userId }, transaction });
}
