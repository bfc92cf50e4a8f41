import "server-only";
import { randomUUID } from "node:crypto";
import { Op, literal, type Transaction, type WhereOptions } from "sequelize";
import type { RenderedEmail } from "@/emails/layout";
import { db, type OutboxMessage } from "@/models";
import type { OutboxKind, OutboxStatus } from "@/lib/domain/outbox";

export type EnqueueMailInput = {
  /** Required on purpose: a notice is written in the same transaction as the change that causes it. */
  transaction: Transaction;
  teamId: number | null;
  kind: OutboxKind;
  to: string;
  mail: RenderedEmail;
  icalEvent?: { method: "REQUEST" | "CANCEL"; content: string } | null;
  /** A second message with the same key is not queued (e.g. one digest per member and day). */
  dedupeKey?: string | null;
  maxAttempts?: number;
  now?: Date;
};

/** Queues one e-mail; returns its id, or null when a message with the same dedupeKey exists already. */
export async function enqueueMail(input: EnqueueMailInput): Promise<number | null> {
  const { OutboxMessage } = await db();
  const { transaction } = input;
  if (input.dedupeKey) {
    const existing = await OutboxMessage.findOne({
      where: { dedupeKey: input.dedupeKey },
      attributes: ["id"],
      transaction,
    });
    if (existing) return null;
  }
  const row = await OutboxMessage.create(
    {
      teamId: input.teamId,
      kind: input.kind,
      toEmail: input.to.trim().toLowerCase(),
      subject: input.mail.subject,
      html: input.mail.html,
      text: input.mail.text,
      icalMethod: input.icalEvent?.method ?? null,
      icalContent: input.icalEvent?.content ?? null,
      dedupeKey: input.dedupeKey ?? null,
      maxAttempts: input.maxAttempts,
      nextAttemptAt: input.now ?? new Date(),
      leaseToken: null,
      leaseUntil: null,
      lastError: null,
      messageId: null,
      sentAt: null,
    },
    { transaction },
  );
  return row.id;
}

export type ClaimedMessage = {
  id: number;
  teamId: number | null;
  kind: OutboxKind;
  leaseToken: string;
  attempts: number;
  maxAttempts: number;
  toEmail: string;
  subject: string;
  html: string;
  text: string;
  icalMethod: "REQUEST" | "CANCEL" | null;
  icalContent: string | null;
  createdAt: Date;
};

function dueWhere(now: Date): WhereOptions {
  return {
    [Op.or]: [
      { status: "pending", nextAttemptAt: { [Op.lte]: now } },
      // A worker that died mid-send left its lease behind; take the row over once the lease ran out.
      { status: "sending", leaseUntil: { [Op.lt]: now } },
    ],
  };
}

/**
 * Claims up to `limit` due messages for one worker. Each row is taken with a conditional UPDATE
 * (status and lease re-checked in the WHERE), so two workers never hold the same row at once.
 */
export async function claimDueMessages({
  now,
  limit,
  leaseMs,
}: {
  now: Date;
  limit: number;
  leaseMs: number;
}): Promise<ClaimedMessage[]> {
  const { OutboxMessage } = await db();
  const candidates = await OutboxMessage.findAll({
    where: dueWhere(now),
    attributes: ["id"],
    order: [
      ["nextAttemptAt", "ASC"],
      ["id", "ASC"],
    ],
    limit,
  });
  const claimed: ClaimedMessage[] = [];
  for (const { id } of candidates) {
    const leaseToken = randomUUID();
    const [count] = await OutboxMessage.update(
      {
        status: "sending",
        leaseToken,
        leaseUntil: new Date(now.getTime() + leaseMs),
        attempts: literal("attempts + 1"),
      },
      { where: { [Op.and]: [{ id }, dueWhere(now)] } },
    );
    if (count !== 1) continue; // another worker was faster
    const row = await OutboxMessage.findByPk(id);
    if (row && row.leaseToken === leaseToken) claimed.push(toClaimed(row, leaseToken));
  }
  return claimed;
}

function toClaimed(row: OutboxMessage, leaseToken: string): ClaimedMessage {
  return {
    id: row.id,
    teamId: row.teamId ?? null,
    kind: row.kind,
    leaseToken,
    attempts: row.attempts,
    maxAttempts: row.maxAttempts,
    toEmail: row.toEmail,
    subject: row.subject,
    html: row.html,
    text: row.text,
    icalMethod: row.icalMethod,
    icalContent: row.icalContent,
    createdAt: row.createdAt,
  };
}

/** Records a delivery; only the worker holding the lease may. */
export async function markMessageSent({
  id,
  leaseToken,
  messageId,
  now,
}: {
  id: number;
  leaseToken: string;
  messageId: string;
  now: Date;
}): Promise<boolean> {
  const { OutboxMessage } = await db();
  const [count] = await OutboxMessage.update(
    { status: "sent", sentAt: now, messageId, leaseToken: null, leaseUntil: null, lastError: null },
    { where: { id, leaseToken, status: "sending" } },
  );
  return count === 1;
}

/** Records a failed try: back to pending at `retryAt`, or failed for good when `retryAt` is null. */
export async function markMessageAttemptFailed({
  id,
  leaseToken,
  error,
  retryAt,
}: {
  id: number;
  leaseToken: string;
  error: string;
  retryAt: Date | null;
}): Promise<boolean> {
  const { OutboxMessage } = await db();
  const [count] = await OutboxMessage.update(
    retryAt
      ? {
          status: "pending",
          nextAttemptAt: retryAt,
          lastError: error.slice(0, 2000),
          leaseToken: null,
          leaseUntil: null,
        }
      : { status: "failed", lastError: error.slice(0, 2000), leaseToken: null, leaseUntil: null },
    { where: { id, leaseToken, status: "sending" } },
  );
  return count === 1;
}

/** Earliest moment a pending or leased message becomes due, or null when nothing waits. */
export async function nextOutboxDueAt(): Promise<Date | null> {
  const { OutboxMessage } = await db();
  const [pending, leased] = await Promise.all([
    OutboxMessage.min("nextAttemptAt", { where: { status: "pending" } }),
    OutboxMessage.min("leaseUntil", { where: { status: "sending" } }),
  ]);
  const times = [pending, leased]
    .filter((v): v is Date | string => v !== null && v !== undefined)
    .map((v) => new Date(v).getTime());
  return times.length ? new Date(Math.min(...times)) : null;
}

export type OutboxRow = {
  id: number;
  kind: OutboxKind;
  toEmail: string;
  subject: string;
  status: OutboxStatus;
  attempts: number;
  nextAttemptAt: string;
  lastError: string | null;
  sentAt: string | null;
  createdAt: string;
};

/** Recent outbox rows (newest first), for the mailbox screen's delivery list and for tests. */
export async function listOutbox({
  teamId,
  limit = 50,
  status,
}: { teamId?: number; limit?: number; status?: OutboxStatus } = {}): Promise<OutboxRow[]> {
  const { OutboxMessage } = await db();
  const where: WhereOptions = {};
  if (teamId !== undefined) Object.assign(where, { teamId });
  if (status) Object.assign(where, { status });
  const rows = await OutboxMessage.findAll({
    where,
    attributes: [
      "id",
      "kind",
      "toEmail",
      "subject",
      "status",
      "attempts",
      "nextAttemptAt",
      "lastError",
      "sentAt",
      "createdAt",
    ],
    order: [["id", "DESC"]],
    limit,
  });
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    toEmail: r.toEmail,
    subject: r.subject,
    status: r.status,
    attempts: r.attempts,
    nextAttemptAt: r.nextAttemptAt.toISOString(),
    lastError: r.lastError,
    sentAt: r.sentAt ? r.sentAt.toISOString() : null,
    createdAt: r.createdAt.toISOString(),
  }));
}

/** One line of the team's delivery queue: who, what kind, how far it got. No subject, body or link. */
export type DeliveryRow = Pick<
  OutboxRow,
  "id" | "kind" | "toEmail" | "status" | "attempts" | "nextAttemptAt" | "sentAt" | "createdAt"
>;

/** The team's recent outbox rows for the head coach's mailbox screen; only the team's own rows. */
export async function listDeliveryQueue({
  teamId,
  limit = 30,
}: {
  teamId: number;
  limit?: number;
}): Promise<DeliveryRow[]> {
  const rows = await listOutbox({ teamId, limit });
  return rows.map(({ id, kind, toEmail, status, attempts, nextAttemptAt, sentAt, createdAt }) => ({
    id,
    kind,
    toEmail,
    status,
    attempts,
    nextAttemptAt,
    sentAt,
    createdAt,
  }));
}

/** Puts a message that failed for good back in the queue (one more round of attempts). */
export async function retryFailedMessage({
  id,
  teamId,
  now = new Date(),
}: {
  id: number;
  teamId?: number;
  now?: Date;
}): Promise<boolean> {
  const { OutboxMessage } = await db();
  const [count] = await OutboxMessage.update(
    { status: "pending", nextAttemptAt: now, attempts: 0 },
    { where: { id, status: "failed", ...(teamId !== undefined ? { teamId } : {}) } },
  );
  return count === 1;
}
