import "server-only";
import { refreshLedger } from "@/lib/data/ledger";
import type { Transaction } from "sequelize";
import type { Loaded } from "@/lib/data/plan-rows";
import { AppError } from "@/lib/errors";
import { afterPlanChange } from "@/lib/notices/hooks";
import type { Override, SessionChange } from "@/lib/plan/changes";
import { toSnapshot } from "@/lib/plan/dto";
import { newPlausibilityChecks, plausibilityFields, plausibilityQuestion } from "@/lib/plan/plausibility";
import type { PlanSession, PlanWriteResult, Touched } from "@/lib/plan/types";
import { guardRestrictions } from "./restriction-guard";

// What a plan write changed, and the one step every plan write ends in (notify).

export function notCancelled(s: PlanSession) {
  if (s.status === "cancelled")
    throw new AppError("conflict", "This session is cancelled. Bring it back before changing it.");
}

/** Every write bumps version; a write to a session athletes were sent also bumps the iCalendar SEQUENCE. */
export function bumped(s: Pick<PlanSession, "version" | "sequence" | "status">) {
  return { version: s.version + 1, sequence: s.status === "draft" ? s.sequence : s.sequence + 1 };
}

function snapshotOf(l: Loaded | undefined | null) {
  return l ? toSnapshot(l.dto, l.updatedAt) : null;
}

export function change(kind: SessionChange["kind"], before: Loaded | null, after: Loaded | null): SessionChange {
  const ref = (after ?? before)!.dto;
  return { kind, athleteId: ref.athleteId, sessionId: ref.id, before: snapshotOf(before), after: snapshotOf(after) };
}

/**
 * A change that goes past a plausibility limit it did not already go past is refused (422 "implausible", the
 * checks with their numbers, each field named with its limit) unless the body said `confirmed: true`.
 */
function guardPlausibility(changes: readonly SessionChange[], confirmed: boolean | undefined) {
  if (confirmed) return;
  const checks = changes.flatMap((c) =>
    newPlausibilityChecks(c.before, c.after).map((check) => ({ ...check, sessionId: c.sessionId })),
  );
  if (checks.length === 0) return;
  throw new AppError("implausible", plausibilityQuestion(checks), {
    fields: plausibilityFields(checks),
    details: { checks },
  });
}

/**
 * Every plan write ends here, inside its transaction: plausibility limits first (asked before anything else,
 * as they are most likely a typo), then physio restrictions are checked first (a write that
 * breaks one without a reason throws and rolls back), then the load ledger is brought up to date, then notices
 * are recorded, so a notice and the ledger's new rows exist exactly when the change commits.
 */
export async function notify({
  transaction,
  teamId,
  actorUserId,
  changes,
  override,
  confirmed,
}: {
  transaction: Transaction;
  teamId: number;
  actorUserId: number;
  changes: SessionChange[];
  override?: Override | null;
  /** The coach confirmed the numbers past a plausibility limit ("Are you sure?"). */
  confirmed?: boolean;
}) {
  if (changes.length === 0) return;
  guardPlausibility(changes, confirmed);
  const overridden = await guardRestrictions({ transaction, teamId, actorUserId, changes, override });
  // The load ledger takes the change in before anything reads a figure, and commits with it (README §12).
  await refreshLedger({ transaction });
  const overrides = override && overridden.length > 0 ? { hits: overridden, reason: override.reason } : null;
  await afterPlanChange({ transaction, teamId, actorUserId, changes, overrides });
}

/** The athletes' days a list of changes touched, each once. */
function touchedBy(changes: readonly SessionChange[]): Touched[] {
  const seen = new Map<string, Touched>();
  for (const c of changes) {
    for (const s of [c.before, c.after])
      if (s) seen.set(`${s.athleteId}:${s.date}`, { athleteId: s.athleteId, date: s.date });
  }
  return [...seen.values()];
}

export function writeResult(
  after: Iterable<Loaded>,
  changes: readonly SessionChange[],
  removedIds: number[] = [],
): PlanWriteResult {
  return { sessions: [...after].map((l) => l.dto), removedIds, touched: touchedBy(changes) };
}
