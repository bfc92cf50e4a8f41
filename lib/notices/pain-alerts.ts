import "server-only";
import type { Transaction } from "sequelize";
import { painReportEmail } from "@/emails/pain-report";
import { athleteNames } from "@/lib/data/athletes";
import { getNoticeTeam, listAlertRecipients } from "@/lib/data/notification-settings";
import { enqueueMail } from "@/lib/data/outbox";
import { addPainAlert, linkPainReportAlert, type PainReportDto } from "@/lib/data/pain-reports";
import { startOfWeek } from "@/lib/dates/plain-date";
import { BODY_REGION_LABEL } from "@/lib/domain/wellbeing";
import { appUrl } from "@/lib/env";
import { kickOutbox } from "./outbox-worker";

/** A report this bad, or one that stopped the session, is an "alert"; others above the line a "caution". */
const ALERT_LEVEL_FROM = 7;

/**
 * A pain report above the team's line: one physio alert (in-app) and one e-mail to each physio who takes alert
 * e-mails one by one, queued in the caller's transaction. Once per report: a report already linked to an alert
 * (the athlete edits the log) raises nothing again.
 */
export async function raisePainAlert({
  transaction,
  teamId,
  report,
  threshold,
  sessionTitle,
  note,
}: {
  transaction: Transaction;
  teamId: number;
  report: PainReportDto;
  threshold: number;
  sessionTitle: string;
  note: string | null;
}): Promise<number | null> {
  if (report.alertId !== null || report.severity <= threshold) return null;
  const team = await getNoticeTeam({ teamId, transaction });
  const athleteName = (await athleteNames({ athleteIds: [report.athleteId], transaction })).get(report.athleteId);
  const region = BODY_REGION_LABEL[report.region];
  const stopped = report.stoppedSession ? ", stopped the session" : "";
  const alertId = await addPainAlert({
    transaction,
    teamId,
    athleteId: report.athleteId,
    date: report.date,
    weekStart: startOfWeek(report.date, team?.weekStartDay ?? 1),
    severity: report.severity,
    threshold,
    level: report.stoppedSession || report.severity >= ALERT_LEVEL_FROM ? "alert" : "caution",
    region: report.region,
    text: `${region}: ${report.severity} of 10 after "${sessionTitle}"${stopped}.`,
  });
  await linkPainReportAlert({ id: report.id, alertId, transaction });
  const physios = (await listAlertRecipients({ teamId, transaction })).filter(
    (r) => r.role === "physio" && r.alertEmail === "each",
  );
  for (const r of physios) {
    await enqueueMail({
      transaction,
      teamId,
      kind: "alert",
      to: r.email,
      mail: painReportEmail({
        recipientName: r.name,
        teamName: team?.name ?? "your team",
        athleteName: athleteName ?? "An athlete",
        date: report.date,
        sessionTitle,
        region,
        severity: report.severity,
        threshold,
        stoppedSession: report.stoppedSession,
        note,
        athleteUrl: `${appUrl().replace(/\/+$/, "")}/squad/${report.athleteId}`,
      }),
      dedupeKey: `pain:${report.id}:user:${r.userId}`,
    });
  }
  if (physios.length > 0) transaction.afterCommit(() => kickOutbox());
  return alertId;
}
