import "server-only";
import { Op, type Transaction, type WhereOptions } from "sequelize";
import { AppError } from "@/lib/errors";
import { normaliseBlock, type BlockContent } from "@/lib/plan/blocks";
import { toPlanSession, type SessionRow } from "@/lib/plan/dto";
import type { PlanSession } from "@/lib/plan/types";
import { insertRowsReturningIds } from "@/lib/db/insert-rows";
import { db } from "@/models";

// Session rows as the plan readers (lib/data/plan.ts) and the plan services (lib/services/plan-*.ts) see them.

export type Loaded = { dto: PlanSession; updatedAt: Date };

const SESSION_ATTRS = [
  "id",
  "athleteId",
  "date",
  "startTime",
  "durationMin",
  "title",
  "plannedRpe",
  "status",
  "notes",
  "version",
  "sequence",
  "publishedAt",
  "updatedAt",
];
const BLOCK_ATTRS = ["id", "templateId", "position", "kind", "title", "running", "drills", "notes"];

/** Sessions with their blocks and whether a log exists; two joined tables, one query. */
export async function loadSessions(where: WhereOptions, transaction?: Transaction): Promise<Loaded[]> {
  const { PlannedSession, SessionBlock, SessionLog } = await db();
  const rows = await PlannedSession.findAll({
    where,
    attributes: SESSION_ATTRS,
    include: [
      { model: SessionBlock, as: "blocks", attributes: BLOCK_ATTRS },
      { model: SessionLog, as: "log", attributes: ["id"] },
    ],
    order: [
      ["date", "ASC"],
      ["startTime", "ASC"],
      ["id", "ASC"],
    ],
    transaction,
  });
  return rows.map((r) => {
    const row: SessionRow = r;
    return { dto: toPlanSession(row), updatedAt: new Date(row.updatedAt) };
  });
}

export async function loadById(ids: readonly number[], transaction: Transaction): Promise<Map<number, Loaded>> {
  if (ids.length === 0) return new Map();
  const list = await loadSessions({ id: { [Op.in]: [...ids] } }, transaction);
  return new Map(list.map((l) => [l.dto.id, l]));
}

/** The team's sessions dated `from`..`to` (inclusive). */
export async function loadSessionsBetween({
  teamId,
  from,
  to,
  transaction,
}: {
  teamId: number;
  from: string;
  to: string;
  transaction?: Transaction;
}): Promise<Loaded[]> {
  return loadSessions({ teamId, date: { [Op.between]: [from, to] } }, transaction);
}

/**
 * The session as this transaction sees it (the write lock is already held: transactions are IMMEDIATE).
 * 404 when it is another team's; 409 "stale" with the current session when `version` is not the stored one.
 */
export async function lockSession({
  teamId,
  sessionId,
  version,
  transaction,
}: {
  teamId: number;
  sessionId: number;
  version?: number;
  transaction: Transaction;
}): Promise<Loaded> {
  const [loaded] = await loadSessions({ id: sessionId, teamId }, transaction);
  if (!loaded) throw new AppError("not_found", "That session was not found");
  if (version !== undefined && loaded.dto.version !== version) {
    throw new AppError(
      "stale",
      "Someone changed this session after you opened it. The grid now shows the current version.",
      { details: { current: loaded.dto } },
    );
  }
  return loaded;
}

export async function assertAthletes({
  teamId,
  athleteIds,
  transaction,
}: {
  teamId: number;
  athleteIds: readonly number[];
  transaction: Transaction;
}) {
  const { Athlete } = await db();
  const unique = [...new Set(athleteIds)];
  const found = await Athlete.count({ where: { teamId, id: { [Op.in]: unique } }, transaction });
  if (found !== unique.length)
    throw new AppError("not_found", "That athlete was not found in this team", {
      fields: { athleteId: ["Not found in this team"] },
    });
}

/** Template links must point at the team's own templates. */
export async function assertTemplateLinks({
  teamId,
  blocks,
  transaction,
}: {
  teamId: number;
  blocks: readonly BlockContent[];
  transaction: Transaction;
}) {
  const ids = [...new Set(blocks.map((b) => b.templateId).filter((id): id is number => typeof id === "number"))];
  if (ids.length === 0) return;
  const { BlockTemplate } = await db();
  const found = await BlockTemplate.count({ where: { teamId, id: { [Op.in]: ids } }, transaction });
  if (found !== ids.length)
    throw new AppError("not_found", "That template was not found in this team", {
      fields: { "blocks.templateId": ["Not found in this team"] },
    });
}

/** Writes blocks at positions from `start` on, in order. */
export async function insertBlocks({
  teamId,
  sessionId,
  blocks,
  start = 0,
  transaction,
}: {
  teamId: number;
  sessionId: number;
  blocks: readonly BlockContent[];
  start?: number;
  transaction: Transaction;
}) {
  if (blocks.length === 0) return;
  await assertTemplateLinks({ teamId, blocks, transaction });
  const { SessionBlock } = await db();
  const rows = blocks.map((raw, i) => ({ sessionId, position: start + i, ...blockValues(raw) }));
  await insertRowsReturningIds(SessionBlock, rows, transaction);
}

/** The stored columns of a block, normalised. */
export function blockValues(raw: BlockContent) {
  const b = normaliseBlock(raw);
  return {
    templateId: b.templateId ?? null,
    kind: b.kind,
    title: b.title,
    running: b.running,
    drills: b.drills,
    notes: b.notes,
  };
}
