import "server-only";
import type { Completion, SessionStatus } from "@/lib/domain/sessions";
import type { Transaction } from "sequelize";
import { prescribedReps } from "@/lib/load";
import type { BlockInput, BlockKind, PlyoDrill, RunningPrescription } from "@/lib/load/types";
import { db } from "@/models";

export type LogTarget = {
  id: number;
  teamId: number;
  athleteId: number;
  date: string;
  status: SessionStatus;
  title: string;
  startTime: string;
  durationMin: number;
  /** Block id → prescribed reps (sets × reps; for plyometrics summed over drills). */
  blockReps: Record<string, number>;
};

export type SessionLogDto = {
  sessionId: number;
  athleteId: number;
  completion: Completion;
  rpe: number | null;
  minutes: number | null;
  completedReps: Record<string, number> | null;
  notes: string | null;
  updatedAt: string;
};

/** The session a log is written against, or null; the caller authorizes against its athleteId. */
export async function getLogTarget({ sessionId }: { sessionId: number }): Promise<LogTarget | null> {
  const { PlannedSession, SessionBlock } = await db();
  const session = await PlannedSession.findByPk(sessionId, {
    attributes: ["id", "teamId", "athleteId", "date", "status", "title", "startTime", "durationMin"],
  });
  if (!session) return null;
  const blocks = await SessionBlock.findAll({
    where: { sessionId },
    attributes: ["id", "kind", "title", "running", "drills"],
  });
  const blockReps: Record<string, number> = {};
  for (const b of blocks) {
    const input: BlockInput = {
      id: String(b.id),
      kind: b.kind as BlockKind,
      title: b.title,
      running: b.running as RunningPrescription | null,
      drills: b.drills as PlyoDrill[] | null,
    };
    blockReps[String(b.id)] = prescribedReps(input);
  }
  return {
    id: session.id,
    teamId: session.teamId,
    athleteId: session.athleteId,
    date: session.date,
    status: session.status,
    title: session.title,
    startTime: session.startTime,
    durationMin: session.durationMin,
    blockReps,
  };
}

function toDto(log: {
  sessionId: number;
  athleteId: number;
  completion: SessionLogDto["completion"];
  rpe: number | null;
  minutes: number | null;
  completedReps: Record<string, number> | null;
  notes: string | null;
  updatedAt: Date;
}): SessionLogDto {
  return {
    sessionId: log.sessionId,
    athleteId: log.athleteId,
    completion: log.completion,
    rpe: log.rpe,
    minutes: log.minutes,
    completedReps: log.completedReps,
    notes: log.notes,
    updatedAt: log.updatedAt.toISOString(),
  };
}

/** The stored columns of a log. */
export type SessionLogValues = Pick<SessionLogDto, "completion" | "rpe" | "minutes" | "completedReps" | "notes">;

/** Creates or replaces the session's log. */
export async function writeSessionLog({
  target,
  values,
  transaction,
}: {
  target: Pick<LogTarget, "id" | "athleteId">;
  values: SessionLogValues;
  transaction: Transaction;
}): Promise<SessionLogDto> {
  const { SessionLog } = await db();
  const row = { sessionId: target.id, athleteId: target.athleteId, ...values };
  const existing = await SessionLog.findOne({ where: { sessionId: target.id }, transaction });
  return toDto(existing ? await existing.update(row, { transaction }) : await SessionLog.create(row, { transaction }));
}

/** Removes the session's log; false when there was none. */
export async function destroySessionLog({
  sessionId,
  transaction,
}: {
  sessionId: number;
  transaction: Transaction;
}): Promise<boolean> {
  const { SessionLog } = await db();
  return (await SessionLog.destroy({ where: { sessionId }, transaction })) > 0;
}

/** The session's log, or null. */
export async function getSessionLog({ sessionId }: { sessionId: number }): Promise<SessionLogDto | null> {
  const { SessionLog } = await db();
  const row = await SessionLog.findOne({ where: { sessionId } });
  return row ? toDto(row) : null;
}

/** Whether the session has a log (inside a write, to tell a first log from an edit). */
export async function hasSessionLog({
  sessionId,
  transaction,
}: {
  sessionId: number;
  transaction: Transaction;
}): Promise<boolean> {
  const { SessionLog } = await db();
  return (await SessionLog.count({ where: { sessionId }, transaction })) > 0;
}
