import { LOG_EDIT_HOURS } from "@/lib/domain/wellbeing";

const HOUR_MS = 3_600_000;

export type LogLock = { locked: boolean; locksAt: Date };

/**
 * An athlete's log stays open LOG_EDIT_HOURS after the session ends, so figures a coach has read stop moving;
 * a coach reopening it gives the same time again from that moment.
 */
export function logLockState({
  sessionEndsAt,
  unlockedAt,
  now,
}: {
  sessionEndsAt: Date;
  unlockedAt: Date | null;
  now: Date;
}): LogLock {
  const fromSession = sessionEndsAt.getTime() + LOG_EDIT_HOURS * HOUR_MS;
  const fromUnlock = unlockedAt ? unlockedAt.getTime() + LOG_EDIT_HOURS * HOUR_MS : -Infinity;
  const locksAt = new Date(Math.max(fromSession, fromUnlock));
  return { locked: now.getTime() >= locksAt.getTime(), locksAt };
}
