import "server-only";
import { refreshLedger } from "@/lib/data/ledger";
import { destroySessionLog, writeSessionLog, type LogTarget, type SessionLogDto } from "@/lib/data/logs";
import { inTeamTransaction } from "@/lib/data/transaction";
import { AppError, type FieldErrors } from "@/lib/errors";
import { afterLogChange } from "@/lib/notices/hooks";
import type { SessionLogInput } from "@/lib/validations/log";

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
    else if (reps > prescribed * 2)
      fields[`completedReps.${blockId}`] = [`At most ${prescribed * 2} (prescribed ${prescribed})`];
  }
  if (Object.keys(fields).length > 0)
    throw new AppError("invalid", `Invalid ${Object.keys(fields).join(", ")}`, { fields });
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
  // A session not done has no RPE or duration to record.
  const done =
    input.completion === "no"
      ? { rpe: null, minutes: null, completedReps: null }
      : { rpe: input.rpe, minutes: input.minutes, completedReps: input.completedReps };
  const values = { completion: input.completion, notes: input.notes, ...done };
  return inTeamTransaction(target.teamId, async (transaction) => {
    const log = await writeSessionLog({ target, values, transaction });
    await refreshLedger({ transaction });
    await afterLogChange({
      transaction,
      teamId: target.teamId,
      athleteId: target.athleteId,
      sessionId: target.id,
      actorUserId,
    });
    return log;
  });
}

/** Removes the session's log (the session counts as not logged again); false when there was none. */
export async function deleteSessionLog({
  target,
  actorUserId,
}: {
  target: LogTarget;
  actorUserId: number;
}): Promise<boolean> {
  return inTeamTransaction(target.teamId, async (transaction) => {
    const removed = await destroySessionLog({ sessionId: target.id, transaction });
    await refreshLedger({ transaction });
    if (removed)
      await afterLogChange({
        transaction,
        teamId: target.teamId,
        athleteId: target.athleteId,
        sessionId: target.id,
        actorUserId,
      });
    return removed;
  });
}
