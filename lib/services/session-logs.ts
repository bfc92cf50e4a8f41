import "server-only";
import type { Transaction } from "sequelize";
import { getAthleteReportSettings } from "@/lib/data/athlete-report-settings";
import { refreshLedger } from "@/lib/data/ledger";
import { lastUnlockAt, recordLogChange } from "@/lib/data/log-changes";
import { destroySessionLog, hasSessionLog, writeSessionLog, type LogTarget, type SessionLogDto } from "@/lib/data/logs";
import { destroyPainReport, writePainReport, type PainReportDto } from "@/lib/data/pain-reports";
import { inTeamTransaction } from "@/lib/data/transaction";
import { zonedInstant, zonedLabel } from "@/lib/dates/zoned";
import { AppError, type FieldErrors } from "@/lib/errors";
import { formatDayLong } from "@/lib/format/dates";
import { afterLogChange } from "@/lib/notices/hooks";
import { raisePainAlert } from "@/lib/notices/pain-alerts";
import { logLockState, type LogLock } from "@/lib/plan/log-lock";
import type { PainReportInput } from "@/lib/validations/athlete-reports";
import type { SessionLogInput } from "@/lib/validations/log";

/** A log write; `pain` left out means none (the log replaces what was there). */
export type SessionLogWrite = Omit<SessionLogInput, "pain"> & { pain?: PainReportInput | null };

/** Who is bound by the 48-hour lock (an athlete on their own log) and the clock to judge it by. */
export type LockCheck = { now: Date; timeZone: string };

/** Whether the session's log is still open to its athlete, and until when. */
export async function sessionLogLock({
  target,
  clock,
  transaction,
}: {
  target: Pick<LogTarget, "id" | "date" | "startTime" | "durationMin">;
  clock: LockCheck;
  transaction?: Transaction;
}): Promise<LogLock> {
  const start = zonedInstant({ date: target.date, time: target.startTime, timeZone: clock.timeZone });
  return logLockState({
    sessionEndsAt: new Date(start.getTime() + target.durationMin * 60_000),
    unlockedAt: await lastUnlockAt({ sessionId: target.id, transaction }),
    now: clock.now,
  });
}

async function refuseIfLocked(target: LogTarget, clock: LockCheck | undefined, transaction: Transaction) {
  if (!clock) return;
  const lock = await sessionLogLock({ target, clock, transaction });
  if (!lock.locked) return;
  const at = zonedLabel({ instant: lock.locksAt, timeZone: clock.timeZone });
  throw new AppError(
    "conflict",
    `This log is locked: logs close 48 hours after the session (this one on ${formatDayLong(at.date)} at ${at.time}). ` +
      "Ask your coach to reopen it.",
    { details: { locked: true, locksAt: lock.locksAt.toISOString() } },
  );
}

/** Rules that need the stored session; each failure names its field (400). */
function checkLog(target: LogTarget, input: SessionLogWrite, today: string): void {
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

export type SavedLog = SessionLogDto & { pain: PainReportDto | null };

/**
 * Creates or replaces the session's log and its pain report, keeps the change in the history and tells notices
 * (load alerts; a pain report above the team's line alerts the physio once), in one transaction. With `lock`, the
 * 48-hour lock applies (an athlete on their own log).
 */
export async function saveSessionLog({
  target,
  input,
  actorUserId,
  today,
  lock,
}: {
  target: LogTarget;
  input: SessionLogWrite;
  actorUserId: number;
  today: string;
  lock?: LockCheck;
}): Promise<SavedLog> {
  checkLog(target, input, today);
  // A session not done has no RPE or duration to record.
  const done =
    input.completion === "no"
      ? { rpe: null, minutes: null, completedReps: null }
      : { rpe: input.rpe, minutes: input.minutes, completedReps: input.completedReps };
  const values = { completion: input.completion, notes: input.notes, ...done };
  return inTeamTransaction(target.teamId, async (transaction) => {
    await refuseIfLocked(target, lock, transaction);
    const existed = await hasSessionLog({ sessionId: target.id, transaction });
    const log = await writeSessionLog({ target, values, transaction });
    let pain: PainReportDto | null = null;
    if (input.pain) {
      pain = await writePainReport({ target, values: input.pain, transaction });
      const { painAlertAbove } = await getAthleteReportSettings({ teamId: target.teamId, transaction });
      const alertId = await raisePainAlert({
        transaction,
        teamId: target.teamId,
        report: pain,
        threshold: painAlertAbove,
        sessionTitle: target.title,
        note: values.notes,
      });
      if (alertId !== null) pain = { ...pain, alertId };
    } else await destroyPainReport({ sessionId: target.id, transaction });
    await recordLogChange({
      target,
      action: existed ? "updated" : "created",
      after: { ...values, pain: input.pain ?? null },
      userId: actorUserId,
      transaction,
    });
    await refreshLedger({ transaction });
    await afterLogChange({
      transaction,
      teamId: target.teamId,
      athleteId: target.athleteId,
      sessionId: target.id,
      actorUserId,
    });
    return { ...log, pain };
  });
}

/**
 * Removes the session's log (the session counts as not logged again); false when there was none. A pain report
 * stays: the medical staff may already have acted on it.
 */
export async function deleteSessionLog({
  target,
  actorUserId,
  lock,
}: {
  target: LogTarget;
  actorUserId: number;
  lock?: LockCheck;
}): Promise<boolean> {
  return inTeamTransaction(target.teamId, async (transaction) => {
    await refuseIfLocked(target, lock, transaction);
    const removed = await destroySessionLog({ sessionId: target.id, transaction });
    if (!removed) return false;
    await recordLogChange({ target, action: "deleted", after: null, userId: actorUserId, transaction });
    await refreshLedger({ transaction });
    await afterLogChange({
      transaction,
      teamId: target.teamId,
      athleteId: target.athleteId,
      sessionId: target.id,
      actorUserId,
    });
    return true;
  });
}

/** A coach reopens the session's log for its athlete: another 48 hours from now, kept in the history. */
export async function unlockSessionLog({
  target,
  actorUserId,
  clock,
}: {
  target: LogTarget;
  actorUserId: number;
  clock: LockCheck;
}): Promise<LogLock> {
  return inTeamTransaction(target.teamId, async (transaction) => {
    await recordLogChange({ target, action: "unlocked", after: null, userId: actorUserId, transaction });
    return sessionLogLock({ target, clock, transaction });
  });
}
