import "server-only";
import { Op, type Transaction } from "sequelize";
import { AppError } from "@/lib/errors";
import type { MeetPriority, SeasonPhaseKind } from "@/lib/domain/season";
import type { WeekTargets } from "@/lib/season/targets";
import type { MeetInput, PhaseInput } from "@/lib/validations/season";
import { db, type Meet as MeetRow, type SeasonPhase as PhaseRow } from "@/models";
import { assertGroupOfTeam } from "./athletes";

export type SeasonPhase = {
  id: number;
  groupId: number | null;
  kind: SeasonPhaseKind;
  name: string;
  startsOn: string;
  endsOn: string;
  goal: string;
  targets: WeekTargets;
  version: number;
};

export type SeasonMeet = {
  id: number;
  groupId: number | null;
  athleteId: number | null;
  name: string;
  date: string;
  priority: MeetPriority;
};

function toPhase(row: PhaseRow): SeasonPhase {
  const { id, groupId, kind, name, startsOn, endsOn, goal, version } = row;
  return { id, groupId, kind, name, startsOn, endsOn, goal, version, targets: JSON.parse(row.targets) as WeekTargets };
}

function toMeet(row: MeetRow): SeasonMeet {
  const { id, groupId, athleteId, name, date, priority } = row;
  return { id, groupId, athleteId, name, date, priority };
}

/** Phases that overlap [from, to], by start date. */
export async function listPhases({ teamId, from, to }: { teamId: number; from: string; to: string }) {
  const { SeasonPhase } = await db();
  const rows = await SeasonPhase.findAll({
    where: { teamId, startsOn: { [Op.lte]: to }, endsOn: { [Op.gte]: from } },
    order: [
      ["startsOn", "ASC"],
      ["id", "ASC"],
    ],
  });
  return rows.map(toPhase);
}

/** Meets in [from, to], by date. */
export async function listMeets({ teamId, from, to }: { teamId: number; from: string; to: string }) {
  const { Meet } = await db();
  const rows = await Meet.findAll({
    where: { teamId, date: { [Op.between]: [from, to] } },
    order: [
      ["date", "ASC"],
      ["id", "ASC"],
    ],
  });
  return rows.map(toMeet);
}

/** Two phases of the same group (or two team-wide phases) may not overlap: a week has one phase. */
async function assertNoOverlap({
  teamId,
  input,
  exceptId,
  transaction,
}: {
  teamId: number;
  input: Pick<PhaseInput, "groupId" | "startsOn" | "endsOn">;
  exceptId?: number;
  transaction: Transaction;
}) {
  const { SeasonPhase } = await db();
  const clash = await SeasonPhase.findOne({
    where: {
      teamId,
      groupId: input.groupId,
      startsOn: { [Op.lte]: input.endsOn },
      endsOn: { [Op.gte]: input.startsOn },
      ...(exceptId ? { id: { [Op.ne]: exceptId } } : {}),
    },
    transaction,
  });
  if (clash)
    throw new AppError("conflict", `It overlaps "${clash.name}" (${clash.startsOn} to ${clash.endsOn})`, {
      fields: { startsOn: [`Overlaps "${clash.name}"`] },
    });
}

function phaseValues({ kind, name, startsOn, endsOn, groupId, goal, targets }: PhaseInput) {
  return { kind, name, startsOn, endsOn, groupId, goal, targets: JSON.stringify(targets) };
}

export async function insertPhase({
  teamId,
  input,
  transaction,
}: {
  teamId: number;
  input: PhaseInput;
  transaction: Transaction;
}) {
  const { SeasonPhase } = await db();
  await assertGroupOfTeam({ teamId, groupId: input.groupId, transaction });
  await assertNoOverlap({ teamId, input, transaction });
  return toPhase(await SeasonPhase.create({ teamId, ...phaseValues(input) }, { transaction }));
}

/** Replaces a phase when `version` is the stored one; 409 "stale" with the current phase otherwise. */
export async function updatePhaseRow({
  teamId,
  phaseId,
  version,
  input,
  transaction,
}: {
  teamId: number;
  phaseId: number;
  version: number;
  input: PhaseInput;
  transaction: Transaction;
}) {
  const { SeasonPhase } = await db();
  const row = await SeasonPhase.findOne({ where: { id: phaseId, teamId }, transaction });
  if (!row) throw new AppError("not_found", "That phase was not found");
  if (row.version !== version)
    throw new AppError("stale", "Someone changed this phase after you opened it. Nothing was saved.", {
      details: { current: toPhase(row) },
    });
  await assertGroupOfTeam({ teamId, groupId: input.groupId, transaction });
  await assertNoOverlap({ teamId, input, exceptId: phaseId, transaction });
  await row.update({ ...phaseValues(input), version: version + 1 }, { transaction });
  return toPhase(row);
}

export async function getPhase({
  teamId,
  phaseId,
  transaction,
}: {
  teamId: number;
  phaseId: number;
  transaction?: Transaction;
}) {
  const { SeasonPhase } = await db();
  const row = await SeasonPhase.findOne({ where: { id: phaseId, teamId }, transaction });
  if (!row) throw new AppError("not_found", "That phase was not found");
  return toPhase(row);
}

export async function destroyPhase({ teamId, phaseId }: { teamId: number; phaseId: number }) {
  const { SeasonPhase } = await db();
  if (!(await SeasonPhase.destroy({ where: { id: phaseId, teamId } })))
    throw new AppError("not_found", "That phase was not found");
}

/** The team a phase belongs to, for the permission check; null when there is no such phase. */
export async function phaseTeam({ phaseId }: { phaseId: number }): Promise<{ teamId: number } | null> {
  const { SeasonPhase } = await db();
  const row = await SeasonPhase.findByPk(phaseId, { attributes: ["teamId"] });
  return row ? { teamId: row.teamId } : null;
}

async function assertMeetTarget({
  teamId,
  input,
  transaction,
}: {
  teamId: number;
  input: MeetInput;
  transaction: Transaction;
}) {
  await assertGroupOfTeam({ teamId, groupId: input.groupId, transaction });
  if (input.athleteId === null) return;
  const { Athlete } = await db();
  if (!(await Athlete.count({ where: { id: input.athleteId, teamId }, transaction })))
    throw new AppError("invalid", "Choose an athlete of this team", { fields: { athleteId: ["Unknown athlete"] } });
}

export async function insertMeet({
  teamId,
  input,
  transaction,
}: {
  teamId: number;
  input: MeetInput;
  transaction: Transaction;
}) {
  const { Meet } = await db();
  await assertMeetTarget({ teamId, input, transaction });
  return toMeet(await Meet.create({ teamId, ...input }, { transaction }));
}

export async function updateMeetRow({
  teamId,
  meetId,
  input,
  transaction,
}: {
  teamId: number;
  meetId: number;
  input: MeetInput;
  transaction: Transaction;
}) {
  const { Meet } = await db();
  const row = await Meet.findOne({ where: { id: meetId, teamId }, transaction });
  if (!row) throw new AppError("not_found", "That meet was not found");
  await assertMeetTarget({ teamId, input, transaction });
  await row.update(input, { transaction });
  return toMeet(row);
}

export async function destroyMeet({ teamId, meetId }: { teamId: number; meetId: number }) {
  const { Meet } = await db();
  if (!(await Meet.destroy({ where: { id: meetId, teamId } })))
    throw new AppError("not_found", "That meet was not found");
}

export async function meetTeam({ meetId }: { meetId: number }): Promise<{ teamId: number } | null> {
  const { Meet } = await db();
  const row = await Meet.findByPk(meetId, { attributes: ["teamId"] });
  return row ? { teamId: row.teamId } : null;
}
