import "server-only";
import { Op } from "sequelize";
import type { Completion } from "@/lib/domain/sessions";
import { mentionsPain } from "@/lib/domain/wellbeing";
import { db } from "@/models";
import { painReportsBySession, type PainReportValues } from "./pain-reports";
import { countSessionMessages } from "./session-messages";

export type LogNote = {
  sessionId: number;
  athleteId: number;
  athleteName: string;
  /** The session's day, YYYY-MM-DD. */
  date: string;
  title: string;
  note: string;
  completion: Completion;
  rpe: number | null;
  /** When the athlete last saved the log (ISO). */
  loggedAt: string;
  /** Messages in the session's thread. */
  messages: number;
  /** The pain report written with the log, if any. */
  pain: PainReportValues | null;
  /** A pain report, or a note that speaks of pain (`mentionsPain`): the physio's screens show these. */
  aboutPain: boolean;
};

/**
 * Notes athletes wrote in their logs, newest session first: what staff screens show so a note such as "felt a
 * twinge in the left hamstring" reaches the coach and the physio. Only logs with a note; `since` is a session day.
 */
export async function recentLogNotes({
  teamId,
  athleteIds,
  since,
  limit = 20,
}: {
  teamId: number;
  athleteIds?: readonly number[];
  since?: string;
  limit?: number;
}): Promise<LogNote[]> {
  const { SessionLog, PlannedSession, Athlete } = await db();
  const rows = await SessionLog.findAll({
    where: {
      notes: { [Op.and]: [{ [Op.ne]: null }, { [Op.ne]: "" }] },
      ...(athleteIds ? { athleteId: { [Op.in]: [...athleteIds] } } : {}),
    },
    attributes: ["sessionId", "athleteId", "notes", "completion", "rpe", "updatedAt"],
    include: [
      {
        model: PlannedSession,
        as: "session",
        attributes: ["id", "date", "title", "teamId"],
        where: { teamId, ...(since ? { date: { [Op.gte]: since } } : {}) },
        required: true,
      },
      { model: Athlete, as: "athlete", attributes: ["id", "name"], required: true },
    ],
    order: [
      [{ model: PlannedSession, as: "session" }, "date", "DESC"],
      ["updatedAt", "DESC"],
    ],
    limit,
  });
  const sessionIds = rows.map((r) => r.sessionId);
  const [counts, pains] = await Promise.all([
    countSessionMessages({ sessionIds }),
    painReportsBySession({ sessionIds }),
  ]);
  return rows.map((r) => {
    const pain = pains.get(r.sessionId);
    return {
      sessionId: r.sessionId,
      athleteId: r.athleteId,
      athleteName: r.athlete!.name,
      date: String(r.session!.date).slice(0, 10),
      title: r.session!.title,
      note: r.notes ?? "",
      completion: r.completion,
      rpe: r.rpe,
      loggedAt: r.updatedAt.toISOString(),
      messages: counts.get(r.sessionId) ?? 0,
      pain: pain ? { region: pain.region, severity: pain.severity, stoppedSession: pain.stoppedSession } : null,
      aboutPain: Boolean(pain) || mentionsPain(r.notes ?? ""),
    };
  });
}
