import "server-only";
import { Op, type Transaction } from "sequelize";
import type { BodyRegion } from "@/lib/domain/wellbeing";
import { latestDayWhere } from "./latest-day";
import { db, type PainReport } from "@/models";

/** A pain or discomfort report as screens and notices read it. */
export type PainReportDto = {
  id: number;
  athleteId: number;
  sessionId: number | null;
  date: string;
  region: BodyRegion;
  severity: number;
  stoppedSession: boolean;
  alertId: number | null;
  createdAt: string;
  updatedAt: string;
};

export type PainReportValues = Pick<PainReportDto, "region" | "severity" | "stoppedSession">;

const FIELDS = [
  "id",
  "athleteId",
  "sessionId",
  "date",
  "region",
  "severity",
  "stoppedSession",
  "alertId",
  "createdAt",
  "updatedAt",
] as const;

function toDto(r: PainReport): PainReportDto {
  return {
    id: r.id,
    athleteId: r.athleteId,
    sessionId: r.sessionId,
    date: String(r.date).slice(0, 10),
    region: r.region,
    severity: r.severity,
    stoppedSession: Boolean(r.stoppedSession),
    alertId: r.alertId,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
  };
}

/**
 * Each athlete's most recent report (latest day, then the last written that day), for the squad's status.
 * Without athleteIds, every athlete of the team who ever reported one; athletes with none are absent.
 */
export async function latestPainReportByAthlete({
  teamId,
  athleteIds,
  transaction,
}: {
  teamId: number;
  athleteIds?: readonly number[];
  transaction?: Transaction;
}): Promise<Map<number, PainReportDto>> {
  const { PainReport } = await db();
  const where = latestDayWhere({ teamId, athleteIds, table: "pain_reports", model: PainReport });
  const rows = await PainReport.findAll({ where, attributes: [...FIELDS], order: [["id", "ASC"]], transaction });
  const out = new Map<number, PainReportDto>();
  for (const r of rows) out.set(r.athleteId, toDto(r));
  return out;
}

/** The team's reports (or one athlete's) between two days (inclusive), newest first. */
export async function listPainReports({
  teamId,
  athleteId,
  from,
  to,
}: {
  teamId: number;
  athleteId?: number;
  from: string;
  to: string;
}): Promise<PainReportDto[]> {
  const { PainReport } = await db();
  const rows = await PainReport.findAll({
    where: { teamId, ...(athleteId === undefined ? {} : { athleteId }), date: { [Op.between]: [from, to] } },
    attributes: [...FIELDS],
    order: [
      ["date", "DESC"],
      ["id", "DESC"],
    ],
  });
  return rows.map(toDto);
}

/** The reports written with these sessions' logs, by session id. */
export async function painReportsBySession({
  sessionIds,
  transaction,
}: {
  sessionIds: readonly number[];
  transaction?: Transaction;
}): Promise<Map<number, PainReportDto>> {
  if (sessionIds.length === 0) return new Map();
  const { PainReport } = await db();
  const rows = await PainReport.findAll({
    where: { sessionId: { [Op.in]: [...sessionIds] } },
    attributes: [...FIELDS],
    transaction,
  });
  return new Map(rows.map((r) => [r.sessionId!, toDto(r)]));
}

/** Creates or replaces the report of one session's log. */
export async function writePainReport({
  target,
  values,
  transaction,
}: {
  target: { id: number; teamId: number; athleteId: number; date: string };
  values: PainReportValues;
  transaction: Transaction;
}): Promise<PainReportDto> {
  const { PainReport } = await db();
  const existing = await PainReport.findOne({ where: { sessionId: target.id }, transaction });
  if (existing) return toDto(await existing.update({ ...values, date: target.date }, { transaction }));
  const row = await PainReport.create(
    {
      teamId: target.teamId,
      athleteId: target.athleteId,
      sessionId: target.id,
      date: target.date,
      alertId: null,
      ...values,
    },
    { transaction },
  );
  return toDto(row);
}

/** Removes a session's report (the athlete cleared it from the log); false when there was none. */
export async function destroyPainReport({
  sessionId,
  transaction,
}: {
  sessionId: number;
  transaction: Transaction;
}): Promise<boolean> {
  const { PainReport } = await db();
  return (await PainReport.destroy({ where: { sessionId }, transaction })) > 0;
}

/** Links the report to the alert it raised, so editing the log never raises a second one. */
export async function linkPainReportAlert({
  id,
  alertId,
  transaction,
}: {
  id: number;
  alertId: number;
  transaction: Transaction;
}): Promise<void> {
  const { PainReport } = await db();
  await PainReport.update({ alertId }, { where: { id }, transaction });
}

/**
 * Files a pain alert for one report: one unresolved alert per athlete × kind × week (a database rule), so a second
 * report that week joins the open alert (its text appended, the worst level kept). Returns the alert's id.
 */
export async function addPainAlert({
  transaction,
  teamId,
  athleteId,
  date,
  weekStart,
  severity,
  threshold,
  level,
  region,
  text,
}: {
  transaction: Transaction;
  teamId: number;
  athleteId: number;
  date: string;
  weekStart: string;
  severity: number;
  threshold: number;
  level: "alert" | "caution";
  region: BodyRegion;
  text: string;
}): Promise<number> {
  const { Alert } = await db();
  const open = await Alert.findOne({
    where: { athleteId, kind: "pain", weekStart, status: ["open", "acknowledged"] },
    transaction,
  });
  if (open) {
    const worse = severity >= open.value;
    await open.update(
      {
        reason: `${open.reason}\n${text}`,
        value: Math.max(open.value, severity),
        level: open.level === "alert" || level === "alert" ? "alert" : "caution",
        ...(worse ? { date, metric: region } : {}),
        flagged: true,
      },
      { transaction },
    );
    return open.id;
  }
  const row = await Alert.create(
    {
      teamId,
      athleteId,
      kind: "pain",
      level,
      metric: region,
      value: severity,
      threshold,
      date,
      weekStart,
      basis: "actual",
      reason: text,
      provisional: false,
      flagged: true,
      status: "open",
      note: null,
      acknowledgedBy: null,
      acknowledgedAt: null,
      resolvedBy: null,
      resolvedAt: null,
    },
    { transaction },
  );
  return row.id;
}
