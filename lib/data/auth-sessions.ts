import "server-only";
import { Op, type Transaction } from "sequelize";
import { hashToken, newToken } from "@/lib/auth/tokens";
import { sessionPolicy } from "@/lib/auth/session-policy";
import { db } from "@/models";

/** Opens a session row for a fresh sign-in; returns the random id the JWT carries. */
export async function startSession({ userId, now = new Date() }: { userId: number; now?: Date }): Promise<string> {
  const { AuthSession } = await db();
  const { maxMs, idleMs } = sessionPolicy();
  const { token, hash } = newToken();
  await AuthSession.create({ userId, tokenHash: hash, lastSeenAt: now, expiresAt: new Date(now.getTime() + maxMs) });
  // Dead rows of this account would otherwise stay until its next password reset.
  const dead = [{ expiresAt: { [Op.lte]: now } }, { lastSeenAt: { [Op.lte]: new Date(now.getTime() - idleMs) } }];
  await AuthSession.destroy({ where: { userId, [Op.or]: dead } });
  return token;
}

// Recording activity must never hold up or fail the request that shows it: while another process holds the
// write lock, a page read would otherwise wait for it and then fail. So the write runs in the background, one
// per session at a time, and a session whose write failed is not retried before the next touch is due.
const pending = new Map<number, Promise<void>>();
const quietUntil = new Map<number, number>();

function inBackground(id: number, write: () => Promise<unknown>, retryAt: number) {
  if (pending.has(id) || (quietUntil.get(id) ?? 0) > Date.now()) return;
  const run = write()
    .then(() => void quietUntil.delete(id))
    .catch(() => void quietUntil.set(id, retryAt))
    .finally(() => pending.delete(id));
  pending.set(id, run);
}

/** Resolves once the background session writes started so far have finished (tests, shutdown). */
export async function sessionWritesSettled(): Promise<void> {
  await Promise.all([...pending.values()]);
}

/**
 * True while the session is alive: its row exists, the absolute lifetime has not run out and it was used within
 * the idle timeout. Records the activity (at most once per `touchMs`). A dead session's row is removed.
 */
export async function touchSession({
  sid,
  userId,
  now = new Date(),
}: {
  sid: string;
  userId: number;
  now?: Date;
}): Promise<boolean> {
  const { AuthSession } = await db();
  const { idleMs, touchMs } = sessionPolicy();
  const row = await AuthSession.findOne({
    where: { tokenHash: hashToken(sid) },
    attributes: ["id", "userId", "lastSeenAt", "expiresAt"],
  });
  if (!row || row.userId !== userId) return false;
  const t = now.getTime();
  if (row.expiresAt.getTime() <= t || row.lastSeenAt.getTime() + idleMs <= t) {
    inBackground(row.id, () => AuthSession.destroy({ where: { id: row.id } }), Date.now() + touchMs);
    return false;
  }
  if (t - row.lastSeenAt.getTime() >= touchMs) {
    inBackground(
      row.id,
      () => AuthSession.update({ lastSeenAt: now }, { where: { id: row.id } }),
      Date.now() + touchMs,
    );
  }
  return true;
}

/** Sign-out: the session's row goes, so a copy of its cookie is worthless from now on. */
export async function endSession({ sid }: { sid: string }): Promise<void> {
  const { AuthSession } = await db();
  await AuthSession.destroy({ where: { tokenHash: hashToken(sid) } });
}

/** Every browser of the account is signed out (after a password reset). */
export async function endAllSessions({
  userId,
  transaction,
}: {
  userId: number;
  transaction?: Transaction;
}): Promise<void> {
  const { AuthSession } = await db();
  await AuthSession.destroy({ where: { userId }, transaction });
}
