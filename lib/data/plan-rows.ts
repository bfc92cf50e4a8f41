import "server-only";
import { Op, type Transaction, type WhereOptions } from "sequelize";
import { AppError } from "@/lib/errors";
import { afterPlanChange, type SessionChange } from "@/lib/notices/hooks";
import { normaliseBlock, type BlockContent } from "@/lib/plan/blocks";
import { toPlanSession, toSnapshot, type SessionRow } from "@/lib/plan/dto";
import type { PlanSession, PlanWriteResult, Touched } from "@/lib/plan/types";
import { db, type PlannedSession } from "@/models";
import { guardRestrictions, type Override } from "./restriction-guard";

// Internals shared by the plan readers and writers (lib/data/plan.ts, lib/data/plan-sessions.ts).

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
    order: [["date", "ASC"], ["startTime", "ASC"], ["id", "ASC"]],
    transaction,
  });
  return rows.map((r) => {
    const plain = r.get({ plain: true }) as unknown as SessionRow;
    return { dto: toPlanSession(plain), updatedAt: new Date(plain.updatedAt) };
  });
}

export async function loadById(ids: readonly number[], transaction: Transaction): Promise<Map<number, Loaded>> {
  if (ids.length === 0) return new Map();
  const list = await loadSessions({ id: { [Op.in]: [...ids] } }, transaction);
  return new Map(list.map((l) => [l.dto.id, l]));
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
}) {
  const { PlannedSession } = await db();
  const row = await PlannedSession.findOne({ where: { id: sessionId, teamId }, transaction });
  if (!row) throw new AppError("not_found", "That session was not found");
  const [loaded] = await loadSessions({ id: sessionId }, transaction);
  if (version !== undefined && row.version !== version) {
    throw new AppError(
      "stale",
      "Someone changed this session after you opened it. The grid now shows the current version.",
      { details: { current: loaded.dto } },
    );
  }
  return { row, loaded };
}

export function notCancelled(s: PlanSession) {
  if (s.status === "cancelled") throw new AppError("conflict", "This session is cancelled. Bring it back before changing it.");
}

/** Every write bumps version; a write to a session athletes were sent also bumps the iCalendar SEQUENCE. */
export function bumped(row: Pick<PlannedSession, "version" | "sequence" | "status">) {
  return { version: row.version + 1, sequence: row.status === "draft" ? row.sequence : row.sequence + 1 };
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
  // One create per block, not bulkCreate: Sequelize's SQLite bulkCreate writes the values into the SQL text,
  // where a NUL ends the statement; create() binds them. A session holds at most 20 blocks.
  for (const [i, raw] of blocks.entries())
    await SessionBlock.create({ sessionId, position: start + i, ...blockValues(raw) }, { transaction });
}

/** The stored columns of a block, normalised. */
export function blockValues(raw: BlockContent) {
  const b = normaliseBlock(raw);
  return { templateId: b.templateId ?? null, kind: b.kind, title: b.title, running: b.running, drills: b.drills, notes: b.notes };
}

export function snapshotOf(l: Loaded | undefined | null) {
  return l ? toSnapshot(l.dto, l.updatedAt) : null;
}

export function change(kind: SessionChange["kind"], before: Loaded | null, after: Loaded | null): SessionChange {
  const ref = (after ?? before)!.dto;
  return { kind, athleteId: ref.athleteId, sessionId: ref.id, before: snapshotOf(before), after: snapshotOf(after) };
}

/**
 * Every plan write ends here, inside its transaction: physio restrictions are checked first (a write that
 * breaks one without a reason throws and rolls back), then notices are recorded, so a notice exists exactly
 * when the change commits.
 */
export async function notify({
  transaction,
  teamId,
  actorUserId,
  changes,
  override,
}: {
  transaction: Transaction;
  teamId: number;
  actorUserId: number;
  changes: SessionChange[];
  override?: Override | null;
}) {
  if (changes.length === 0) return;
  await guardRestrictions({ transaction, teamId, actorUserId, changes, override });
  await afterPlanChange({ transaction, teamId, actorUserId, changes });
}

/** The athletes' days a list of changes touched, each once. */
export function touchedBy(changes: readonly SessionChange[]): Touched[] {
  const seen = new Map<string, Touched>();
  for (const c of changes) {
    for (const s of [c.before, c.after]) if (s) seen.set(`${s.athleteId}:${s.date}`, { athleteId: s.athleteId, date: s.date });
  }
  return [...seen.values()];
}

export function writeResult(after: Iterable<Loaded>, changes: readonly SessionChange[], removedIds: number[] = []): PlanWriteResult {
  return { sessions: [...after].map((l) => l.dto), removedIds, touched: touchedBy(changes) };
}
