import "server-only";
import { prescribedReps } from "@/lib/load";
import type { BlockInput, BlockKind, PlyoDrill, RunningPrescription } from "@/lib/load/types";
import { AppError, type FieldErrors } from "@/lib/errors";
import { afterLogChange } from "@/lib/notices/hooks";
import type { SessionLogInput } from "@/lib/validations/log";
import { db } from "@/models";

export type LogTarget = {
  id: number;
  teamId: number;
  athleteId: number;
  date: string;
  status: "draft" | "published" | "cancelled";
  /** Block id → prescribed reps (sets × reps; for plyometrics summed over drills). */
  blockReps: Record<string, number>;
};

export type SessionLogDto = {
  sessionId: number;
  athleteId: number;
  completion: "yes" | "partly" | "no";
  rpe: number | null;
  minutes: number | null;
  completedReps: Record<string, number> | null;
  notes: string | null;
  updatedAt: string;
};

/** The session a log is written against, or null; the caller authorizes against its athleteId. */
export async function getLogTarget({ sessionId }: { sessionId: number }): Promise<LogTarget | null> {
  const { PlannedSession, SessionBlock } = await db();
  const session = await PlannedSession.findByPk(sessionId, { attributes: ["id", "teamId", "athleteId", "date", "status"] });
  if (!session) return null;
  const blocks = await SessionBlock.findAll({ where: { sessionId }, attributes: ["id", "kind", "title", "running", "drills"] });
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
  return { id: session.id, teamId: session.teamId, athleteId: session.athleteId, date: session.date, status: session.status, blockReps };
}

/** Rules that need the stored session; each failure names its field (400). */
function checkLog(target: LogTarget, input: SessionLogInput, today: string): void {
  // A draft was never sent to the athlete: logging it would pin a session the coach is still shaping.
  if (target.status === "draft")
    throw new AppError("invalid", "This session is still a draft", {
      fields: { session: ["Publish the session before it is logged"] },
    });
  if (target.status === "cancelled")
    throw new AppError("invalid", "This session was cancelled", {
      fields: { session: ["A cancelled session cannot be logged"] },
    });
  if (target.date > today)
    throw new AppError("invalid", "This session is still ahead", {
      fields: { session: [`Log it on ${target.date} or later`] },
    });
  const fields: FieldErrors = {};
  for (const [blockId, reps] of Object.entries(input.completedReps ?? {})) {
    const prescribed = target.blockReps[blockId];
    if (prescribed === undefined) fields[`completedReps.${blockId}`] = ["Not a block of this session"];
    else if (prescribed === 0) fields[`completedReps.${blockId}`] = ["This block has no reps to count"];
    // Extra reps do happen (the engine counts them), but more than double the prescription is a typo.
    else if (reps > prescribed * 2) fields[`completedReps.${blockId}`] = [`At most ${prescribed * 2} (prescribed ${prescribed})`];
  }
  if (Object.keys(fields).length > 0) throw new AppError("invalid", `Invalid ${Object.keys(fields).join(", ")}`, { fields });
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

/** Creates or replaces the session's log and tells notices, in one transaction. */
export async function saveSessionLog({
  target,
  input,
  actorUserId,
  today,
}: {
  target: LogTarget;
  input: SessionLogInput;
  actorUserId: number;
  today: string;
}): Promise<SessionLogDto> {
  checkLog(target, input, today);
  const { SessionLog, sequelize } = await db();
  // A session not done has no RPE or duration to record.
  const done =
    input.completion === "no"
      ? { rpe: null, minutes: null, completedReps: null }
      : { rpe: input.rpe, minutes: input.minutes, completedReps: input.completedReps };
  const values = {
    sessionId: target.id,
    athleteId: target.athleteId,
    completion: input.completion,
    notes: input.notes,
    ...done,
  };
  return sequelize.transaction(async (transaction) => {
    const existing = await SessionLog.findOne({ where: { sessionId: target.id }, transaction });
    const row = existing ? await existing.update(values, { transaction }) : await SessionLog.create(values, { transaction });
    await afterLogChange({ transaction, teamId: target.teamId, athleteId: target.athleteId, sessionId: target.id, actorUserId });
    return toDto(row);
  });
}

/** Removes the session's log (the session counts as not logged again); false when there was none. */
export async function deleteSessionLog({ target, actorUserId }: { target: LogTarget; actorUserId: number }): Promise<boolean> {
  const { SessionLog, sequelize } = await db();
  return sequelize.transaction(async (transaction) => {
    const removed = await SessionLog.destroy({ where: { sessionId: target.id }, transaction });
    if (removed > 0)
      await afterLogChange({
        transaction,
        teamId: target.teamId,
        athleteId: target.athleteId,
        sessionId: target.id,
        actorUserId,
      });
    return removed > 0;
  });
}

/** The session's log, or null. */
export async function getSessionLog({ sessionId }: { sessionId: number }): Promise<SessionLogDto | null> {
  const { SessionLog } = await db();
  const row = await SessionLog.findOne({ where: { sessionId } });
  return row ? toDto(row) : null;
}
