import "server-only";
import type { Transaction } from "sequelize";
import { getAthleteSessionDate } from "@/lib/data/alerts";
import type { SessionChange } from "@/lib/plan/changes";
import { queueCalendarNotices, type PlannedPast } from "./calendar-notices";
import { evaluateLoadAlerts } from "./load-alerts";
import { splitAthleteMoves } from "./session-changes";
import { kickOutbox } from "./outbox-worker";

/**
 * The seam between plan/log writes and notices (alerts, e-mail, calendar invitations). The services
 * (lib/services) call these inside the same transaction as their change, so a notice is recorded exactly when
 * the change commits (and rolled back with it). Delivery happens later, from the outbox.
 */

function wakeOutboxOnCommit(transaction: Transaction) {
  transaction.afterCommit(() => kickOutbox());
}

/** Alerts for every athlete whose load the change moved, then calendar invitations/updates/cancellations. */
export async function afterPlanChange(args: {
  transaction: Transaction;
  teamId: number;
  actorUserId: number;
  changes: SessionChange[];
  /** Sessions planned past a restriction with the coach's reason: the athlete's mail mentions them. */
  overrides?: PlannedPast | null;
}): Promise<void> {
  const { transaction, teamId, actorUserId, overrides } = args;
  const changes = splitAthleteMoves(args.changes);
  if (changes.length === 0) return;
  const datesByAthlete = new Map<number, Set<string>>();
  for (const c of changes) {
    const dates = datesByAthlete.get(c.athleteId) ?? new Set<string>();
    if (c.before) dates.add(c.before.date);
    if (c.after) dates.add(c.after.date);
    datesByAthlete.set(c.athleteId, dates);
  }
  await evaluateLoadAlerts({
    transaction,
    teamId,
    athletes: [...datesByAthlete].map(([athleteId, dates]) => ({ athleteId, dates: [...dates] })),
    basis: "planned",
  });
  await queueCalendarNotices({ transaction, teamId, actorUserId, changes, overrides });
  wakeOutboxOnCommit(transaction);
}

/** A log changes what the athlete actually did: re-check that session's week (and the next) on logged data. */
export async function afterLogChange(args: {
  transaction: Transaction;
  teamId: number;
  athleteId: number;
  sessionId: number;
  actorUserId: number;
}): Promise<void> {
  const { transaction, teamId, athleteId, sessionId } = args;
  const date = await getAthleteSessionDate({ athleteId, sessionId, transaction });
  if (!date) return;
  await evaluateLoadAlerts({ transaction, teamId, athletes: [{ athleteId, dates: [date] }], basis: "actual" });
  wakeOutboxOnCommit(transaction);
}
