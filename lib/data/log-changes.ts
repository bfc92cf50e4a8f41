import "server-only";
import type { Transaction } from "sequelize";
import type { LogChangeAction } from "@/lib/domain/wellbeing";
import { db } from "@/models";
import { userNames } from "./users";

export type LogChangeDto = {
  id: number;
  action: LogChangeAction;
  /** The log (and its pain report) after the change, as stored; null for a removal or an unlock. */
  after: unknown;
  byName: string | null;
  at: string;
};

/** Keeps one change of a session's log with who made it; the history is only ever added to. */
export async function recordLogChange({
  target,
  action,
  after,
  userId,
  transaction,
}: {
  target: { id: number; teamId: number; athleteId: number; date: string };
  action: LogChangeAction;
  after: unknown;
  userId: number;
  transaction: Transaction;
}): Promise<void> {
  const { SessionLogChange } = await db();
  await SessionLogChange.create(
    {
      teamId: target.teamId,
      athleteId: target.athleteId,
      sessionId: target.id,
      sessionDate: target.date,
      action,
      after: after === null ? null : JSON.stringify(after),
      userId,
    },
    { transaction },
  );
}

/** When a coach last reopened the session's log, or null. */
export async function lastUnlockAt({
  sessionId,
  transaction,
}: {
  sessionId: number;
  transaction?: Transaction;
}): Promise<Date | null> {
  const { SessionLogChange } = await db();
  const row = await SessionLogChange.findOne({
    where: { sessionId, action: "unlocked" },
    attributes: ["createdAt"],
    order: [["id", "DESC"]],
    transaction,
  });
  return row ? row.createdAt : null;
}

/** Every change of the session's log, oldest first, with the names of who made them. */
export async function listLogChanges({ sessionId }: { sessionId: number }): Promise<LogChangeDto[]> {
  const { SessionLogChange } = await db();
  const rows = await SessionLogChange.findAll({
    where: { sessionId },
    attributes: ["id", "action", "after", "userId", "createdAt"],
    order: [["id", "ASC"]],
  });
  const names = await userNames(rows.map((r) => r.userId));
  return rows.map((r) => ({
    id: r.id,
    action: r.action,
    after: r.after === null ? null : (JSON.parse(r.after) as unknown),
    byName: r.userId ? (names.get(r.userId) ?? null) : null,
    at: r.createdAt.toISOString(),
  }));
}
