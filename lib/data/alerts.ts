import "server-only";
import { Op, type Transaction, type WhereOptions } from "sequelize";
import { AppError } from "@/lib/errors";
import type { AlertActionInput, AlertListQuery } from "@/lib/validations/alerts";
import { db, type Alert } from "@/models";
import type { AlertBasis, AlertKind, AlertStatus } from "@/lib/domain/alerts";
import { getAlertsSeenAt } from "./notification-settings";
import { userNames } from "./users";

/** One flag the engine raised, reduced to what an alert stores (the strongest flag per kind and week). */
export type AlertCandidate = {
  kind: AlertKind;
  level: "alert" | "caution" | "info";
  metric: string | null;
  value: number;
  threshold: number;
  date: string;
  reason: string;
  provisional: boolean;
};

export type AlertRow = AlertCandidate & {
  id: number;
  athleteId: number;
  athleteName: string;
  weekStart: string;
  basis: AlertBasis;
  flagged: boolean;
  status: AlertStatus;
  note: string | null;
  acknowledgedByName: string | null;
  acknowledgedAt: string | null;
  resolvedByName: string | null;
  resolvedAt: string | null;
  createdAt: string;
  unread: boolean;
};

const FIELDS = [
  "id",
  "athleteId",
  "kind",
  "level",
  "metric",
  "value",
  "threshold",
  "date",
  "weekStart",
  "basis",
  "reason",
  "provisional",
  "flagged",
  "status",
  "note",
  "acknowledgedBy",
  "acknowledgedAt",
  "resolvedBy",
  "resolvedAt",
  "createdAt",
] as const;

/** A new alert: raised, and not yet seen to. */
const NEW_ALERT = {
  flagged: true,
  status: "open",
  note: null,
  acknowledgedBy: null,
  acknowledgedAt: null,
  resolvedBy: null,
  resolvedAt: null,
} as const;

/** What the engine raised for one athlete in one week, and the kinds it judged there. */
export type WeekAlertCheck = {
  athleteId: number;
  /** Kinds the caller evaluated for this week; kinds not listed are left alone. */
  kinds: readonly AlertKind[];
  candidates: readonly AlertCandidate[];
};

/**
 * Brings the stored alerts of one week in line with what the engine raises now for each athlete checked, and
 * returns the alerts that are new. A flag is new when no alert of its kind and week is unresolved and the last
 * one (if any) was not still flagged: dragging a session back and forth, or re-evaluating, never adds a second
 * alert. One read covers the week for every athlete, so a write touching a squad costs one query per week.
 */
export async function syncWeekAlerts(args: {
  transaction: Transaction;
  teamId: number;
  weekStart: string;
  basis: AlertBasis;
  athletes: readonly WeekAlertCheck[];
}): Promise<Array<{ id: number; athleteId: number } & AlertCandidate>> {
  const { Alert } = await db();
  const { transaction, teamId, weekStart, basis } = args;
  const created: Array<{ id: number; athleteId: number } & AlertCandidate> = [];
  if (args.athletes.length === 0) return created;
  // The newest row of each athlete and kind decides.
  const rows = await Alert.findAll({
    where: {
      athleteId: { [Op.in]: args.athletes.map((a) => a.athleteId) },
      weekStart,
      kind: { [Op.in]: [...new Set(args.athletes.flatMap((a) => a.kinds))] },
    },
    order: [["id", "DESC"]],
    transaction,
  });
  for (const { athleteId, kinds, candidates } of args.athletes) {
    for (const kind of kinds) {
      const candidate = candidates.find((c) => c.kind === kind);
      const latest = rows.find((r) => r.athleteId === athleteId && r.kind === kind) ?? null;
      if (!candidate) {
        if (latest?.flagged) await latest.update({ flagged: false }, { transaction });
        continue;
      }
      const facts = {
        level: candidate.level,
        metric: candidate.metric,
        value: candidate.value,
        threshold: candidate.threshold,
        date: candidate.date,
        reason: candidate.reason,
        provisional: candidate.provisional,
      };
      if (latest && latest.status !== "resolved") {
        await latest.update({ ...facts, flagged: true }, { transaction });
        continue;
      }
      // Resolved while the flag stayed up: the physio has dealt with this one.
      if (latest?.flagged) continue;
      const row = await Alert.create(
        {
          teamId,
          athleteId,
          kind,
          weekStart,
          basis,
          ...facts,
          ...NEW_ALERT,
        },
        { transaction },
      );
      created.push({ id: row.id, athleteId, ...candidate });
    }
  }
  return created;
}

function statusWhere(status: AlertListQuery["status"]): WhereOptions {
  if (status === "all") return {};
  if (status === "unresolved") return { status: { [Op.in]: ["open", "acknowledged"] } };
  return { status };
}

async function toRows(rows: Alert[], seenAt: Date | null): Promise<AlertRow[]> {
  const { Athlete } = await db();
  const athletes = await Athlete.findAll({
    where: { id: { [Op.in]: [...new Set(rows.map((r) => r.athleteId))] } },
    attributes: ["id", "name"],
  });
  const athleteName = new Map(athletes.map((a) => [a.id, a.name]));
  const people = await userNames(rows.flatMap((r) => [r.acknowledgedBy, r.resolvedBy]));
  return rows.map((r) => ({
    id: r.id,
    athleteId: r.athleteId,
    athleteName: athleteName.get(r.athleteId) ?? "Athlete",
    kind: r.kind,
    level: r.level,
    metric: r.metric,
    value: r.value,
    threshold: r.threshold,
    date: r.date,
    weekStart: r.weekStart,
    basis: r.basis,
    reason: r.reason,
    provisional: Boolean(r.provisional),
    flagged: Boolean(r.flagged),
    status: r.status,
    note: r.note,
    acknowledgedByName: r.acknowledgedBy ? (people.get(r.acknowledgedBy) ?? null) : null,
    acknowledgedAt: r.acknowledgedAt ? r.acknowledgedAt.toISOString() : null,
    resolvedByName: r.resolvedBy ? (people.get(r.resolvedBy) ?? null) : null,
    resolvedAt: r.resolvedAt ? r.resolvedAt.toISOString() : null,
    createdAt: r.createdAt.toISOString(),
    unread: r.status !== "resolved" && (seenAt === null || r.createdAt > seenAt),
  }));
}

/** The team's alerts, newest first; `unread` is relative to when this member last opened the inbox. */
export async function listAlerts({
  teamId,
  userId,
  query,
}: {
  teamId: number;
  userId: number;
  query: AlertListQuery;
}): Promise<AlertRow[]> {
  const { Alert } = await db();
  const rows = await Alert.findAll({
    where: { teamId, ...statusWhere(query.status), ...(query.athleteId ? { athleteId: query.athleteId } : {}) },
    attributes: [...FIELDS],
    order: [
      ["createdAt", "DESC"],
      ["id", "DESC"],
    ],
    limit: query.limit,
  });
  return toRows(rows, await getAlertsSeenAt({ userId, teamId }));
}

export async function getAlert({
  teamId,
  alertId,
  userId,
}: {
  teamId: number;
  alertId: number;
  userId: number;
}): Promise<AlertRow | null> {
  const { Alert } = await db();
  const row = await Alert.findOne({ where: { id: alertId, teamId }, attributes: [...FIELDS] });
  if (!row) return null;
  const [out] = await toRows([row], await getAlertsSeenAt({ userId, teamId }));
  return out ?? null;
}

/** Unresolved alerts created since the member last opened the inbox (the navigation badge). */
export async function countUnreadAlerts({ teamId, userId }: { teamId: number; userId: number }): Promise<number> {
  const { Alert } = await db();
  const seenAt = await getAlertsSeenAt({ userId, teamId });
  return Alert.count({
    where: {
      teamId,
      status: { [Op.in]: ["open", "acknowledged"] },
      ...(seenAt ? { createdAt: { [Op.gt]: seenAt } } : {}),
    },
  });
}

const NEXT_STATUS: Record<AlertActionInput["action"], { to: AlertStatus; from: AlertStatus[] }> = {
  acknowledge: { to: "acknowledged", from: ["open"] },
  resolve: { to: "resolved", from: ["open", "acknowledged"] },
  reopen: { to: "open", from: ["acknowledged", "resolved"] },
};

/** Moves an alert along open → acknowledged → resolved (or back to open); resolving needs a note. */
export async function updateAlertStatus({
  teamId,
  alertId,
  userId,
  input,
  now = new Date(),
}: {
  teamId: number;
  alertId: number;
  userId: number;
  input: AlertActionInput;
  now?: Date;
}): Promise<AlertRow> {
  const { sequelize, Alert } = await db();
  await sequelize.transaction(async (transaction) => {
    const alert = await Alert.findOne({ where: { id: alertId, teamId }, transaction });
    if (!alert) throw new AppError("not_found", "No such alert");
    const step = NEXT_STATUS[input.action];
    if (!step.from.includes(alert.status)) {
      throw new AppError("conflict", `This alert is ${alert.status}; it cannot be changed that way`, {
        fields: { action: [`Not possible while ${alert.status}`] },
      });
    }
    if (input.action === "reopen" && alert.status === "resolved") {
      // The partial unique index allows one unresolved alert per athlete × kind × week.
      const other = await Alert.count({
        where: {
          athleteId: alert.athleteId,
          kind: alert.kind,
          weekStart: alert.weekStart,
          status: { [Op.ne]: "resolved" },
        },
        transaction,
      });
      if (other > 0)
        throw new AppError("conflict", "A newer alert for this athlete, kind and week is still open", {
          fields: { action: ["A newer alert is open"] },
        });
    }
    const note = input.note?.trim() ? input.note.trim() : alert.note;
    const changes: Partial<
      Pick<Alert, "status" | "note" | "acknowledgedBy" | "acknowledgedAt" | "resolvedBy" | "resolvedAt">
    > = { status: step.to, note };
    if (input.action === "acknowledge") Object.assign(changes, { acknowledgedBy: userId, acknowledgedAt: now });
    if (input.action === "resolve") Object.assign(changes, { resolvedBy: userId, resolvedAt: now });
    if (input.action === "reopen") Object.assign(changes, { resolvedBy: null, resolvedAt: null });
    await alert.update(changes, { transaction });
  });
  const row = await getAlert({ teamId, alertId, userId });
  if (!row) throw new AppError("not_found", "No such alert");
  return row;
}

/** Alerts a digest covers: created in (after, until]. */
export async function listAlertsCreatedBetween({
  teamId,
  after,
  until,
}: {
  teamId: number;
  after: Date;
  until: Date;
}): Promise<AlertRow[]> {
  const { Alert } = await db();
  const rows = await Alert.findAll({
    where: { teamId, createdAt: { [Op.gt]: after, [Op.lte]: until } },
    attributes: [...FIELDS],
    order: [
      ["createdAt", "ASC"],
      ["id", "ASC"],
    ],
  });
  return toRows(rows, null);
}

/** The date of one of the athlete's sessions (the week a log re-checks), or null. */
export async function getAthleteSessionDate({
  athleteId,
  sessionId,
  transaction,
}: {
  athleteId: number;
  sessionId: number;
  transaction?: Transaction;
}): Promise<string | null> {
  const { PlannedSession } = await db();
  const row = await PlannedSession.findOne({ where: { id: sessionId, athleteId }, attributes: ["date"], transaction });
  return row ? String(row.date).slice(0, 10) : null;
}

/**
 * Adds one override (or, with kind "restriction_conflict", one new restriction's conflicts) to the athlete's week:
 * one unresolved alert per athlete × kind × week (a database rule), so a second one that week joins the open
 * alert (its text appended, its count raised) instead of adding one.
 */
export async function addOverrideAlert({
  transaction,
  teamId,
  athleteId,
  date,
  weekStart,
  text,
  kind = "restriction_override",
  count = 1,
}: {
  transaction: Transaction;
  teamId: number;
  athleteId: number;
  date: string;
  weekStart: string;
  text: string;
  kind?: Extract<AlertKind, "restriction_override" | "restriction_conflict">;
  count?: number;
}): Promise<void> {
  const { Alert } = await db();
  const open = await Alert.findOne({
    where: { athleteId, kind, weekStart, status: ["open", "acknowledged"] },
    transaction,
  });
  if (open) {
    await open.update(
      { reason: `${open.reason}\n${text}`, value: open.value + count, date, flagged: true },
      { transaction },
    );
    return;
  }
  await Alert.create(
    {
      teamId,
      athleteId,
      kind,
      level: "caution",
      metric: null,
      value: count,
      threshold: 0,
      date,
      weekStart,
      basis: "planned",
      reason: text,
      provisional: false,
      ...NEW_ALERT,
    },
    { transaction },
  );
}
