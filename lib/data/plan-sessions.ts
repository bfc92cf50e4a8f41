import "server-only";
import { Op, type InferAttributes, type Transaction } from "sequelize";
import { AppError } from "@/lib/errors";
import type { BlockContent } from "@/lib/plan/blocks";
import { db, type PlannedSession } from "@/models";
import { insertRowsReturningIds } from "@/lib/db/insert-rows";
import { assertTemplateLinks, blockValues, insertBlocks } from "./plan-rows";

// Row writes of planned sessions and their blocks. The workflows (transaction, rules, restriction guard,
// notices) are the plan services' (lib/services/plan-sessions.ts, lib/services/plan-week.ts).

type Columns = InferAttributes<PlannedSession>;

export type NewSession = Pick<
  Columns,
  "athleteId" | "date" | "startTime" | "durationMin" | "title" | "plannedRpe" | "notes"
> & {
  blocks: readonly BlockContent[];
};

/** The session columns a write may set. */
export type SessionValues = Partial<
  Omit<NewSession, "blocks"> & Pick<Columns, "status" | "publishedAt" | "version" | "sequence">
>;

/** A new session's own columns (its blocks are rows of their own). */
const sessionColumns = ({ athleteId, date, startTime, durationMin, title, plannedRpe, notes }: NewSession) =>
  ({ athleteId, date, startTime, durationMin, title, plannedRpe, notes }) satisfies Omit<NewSession, "blocks">;

/** New drafts with their blocks, in one statement per table (a generated season is hundreds); their ids in order. */
export async function insertSessions({
  teamId,
  sessions,
  transaction,
}: {
  teamId: number;
  sessions: readonly NewSession[];
  transaction: Transaction;
}): Promise<number[]> {
  if (sessions.length === 0) return [];
  const { PlannedSession, SessionBlock } = await db();
  await assertTemplateLinks({ teamId, blocks: sessions.flatMap((s) => s.blocks), transaction });
  const ids = await insertRowsReturningIds(
    PlannedSession,
    sessions.map((s) => ({ teamId, ...sessionColumns(s), status: "draft" as const, publishedAt: null })),
    transaction,
  );
  const blocks = sessions.flatMap((s, i) =>
    s.blocks.map((raw, position) => ({ sessionId: ids[i], position, ...blockValues(raw) })),
  );
  await insertRowsReturningIds(SessionBlock, blocks, transaction);
  return ids;
}

/** A new draft with its blocks; its id. */
export async function insertSession(args: { teamId: number; session: NewSession; transaction: Transaction }) {
  const [id] = await insertSessions({ teamId: args.teamId, sessions: [args.session], transaction: args.transaction });
  return id;
}

export async function updateSessionRow({
  sessionId,
  values,
  transaction,
}: {
  sessionId: number;
  values: SessionValues;
  transaction: Transaction;
}): Promise<void> {
  const { PlannedSession } = await db();
  await PlannedSession.update(values, { where: { id: sessionId }, transaction });
}

export async function destroySessions({
  sessionIds,
  transaction,
}: {
  sessionIds: readonly number[];
  transaction: Transaction;
}): Promise<void> {
  if (sessionIds.length === 0) return;
  const { PlannedSession } = await db();
  await PlannedSession.destroy({ where: { id: { [Op.in]: [...sessionIds] } }, transaction });
}

/** Replaces the session's whole block list. */
export async function replaceBlocks({
  teamId,
  sessionId,
  blocks,
  transaction,
}: {
  teamId: number;
  sessionId: number;
  blocks: readonly BlockContent[];
  transaction: Transaction;
}): Promise<void> {
  const { SessionBlock } = await db();
  await SessionBlock.destroy({ where: { sessionId }, transaction });
  await insertBlocks({ teamId, sessionId, blocks, transaction });
}

/** Rewrites one block (`block` null removes it). */
export async function writeBlock({
  teamId,
  sessionId,
  blockId,
  block,
  transaction,
}: {
  teamId: number;
  sessionId: number;
  blockId: number;
  block: BlockContent | null;
  transaction: Transaction;
}): Promise<void> {
  const { SessionBlock } = await db();
  if (block) {
    await assertTemplateLinks({ teamId, blocks: [block], transaction });
    await SessionBlock.update(blockValues(block), { where: { id: blockId, sessionId }, transaction });
  } else {
    await SessionBlock.destroy({ where: { id: blockId, sessionId }, transaction });
  }
}

/** The athletes of one of the team's groups, by name; 404 for another team's group, 400 for an empty one. */
export async function listGroupAthleteIds({
  teamId,
  groupId,
  transaction,
}: {
  teamId: number;
  groupId: number;
  transaction: Transaction;
}): Promise<number[]> {
  const { TrainingGroup, Athlete } = await db();
  const group = await TrainingGroup.findOne({ where: { id: groupId, teamId }, attributes: ["id"], transaction });
  if (!group)
    throw new AppError("not_found", "That group was not found in this team", {
      fields: { groupId: ["Not found in this team"] },
    });
  const athletes = await Athlete.findAll({
    where: { teamId, groupId },
    attributes: ["id"],
    order: [["name", "ASC"]],
    transaction,
  });
  if (athletes.length === 0)
    throw new AppError("invalid", "That group has no athletes yet", {
      fields: { groupId: ["No athletes in this group"] },
    });
  return athletes.map((a) => a.id);
}
