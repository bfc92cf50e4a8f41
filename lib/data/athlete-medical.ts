import "server-only";
import { Op } from "sequelize";
import type { Completion, SessionStatus } from "@/lib/domain/sessions";
import { blockSummary } from "@/lib/format/block-summary";
import { addDays } from "@/lib/dates/plain-date";
import { toBlockInput } from "@/lib/plan/blocks";
import { db } from "@/models";
import { painReportsBySession, type PainReportDto } from "./pain-reports";
import { loadSessions } from "./plan-rows";
import { countSessionMessages } from "./session-messages";

export type MedicalLogRow = {
  sessionId: number;
  date: string;
  startTime: string;
  durationMin: number;
  title: string;
  completion: Completion;
  rpe: number | null;
  minutes: number | null;
  note: string | null;
  messages: number;
  pain: Pick<PainReportDto, "region" | "severity" | "stoppedSession"> | null;
};

/** The athlete's logs of the last `days` days up to today, newest first (the physio's athlete page). */
export async function recentAthleteLogs({
  teamId,
  athleteId,
  today,
  days = 21,
}: {
  teamId: number;
  athleteId: number;
  today: string;
  days?: number;
}): Promise<MedicalLogRow[]> {
  const { SessionLog, PlannedSession } = await db();
  const rows = await SessionLog.findAll({
    where: { athleteId },
    attributes: ["sessionId", "completion", "rpe", "minutes", "notes"],
    include: [
      {
        model: PlannedSession,
        as: "session",
        attributes: ["id", "date", "startTime", "durationMin", "title"],
        where: { teamId, date: { [Op.between]: [addDays(today, -days), today] } },
        required: true,
      },
    ],
    order: [[{ model: PlannedSession, as: "session" }, "date", "DESC"]],
  });
  const ids = rows.map((r) => r.sessionId);
  const [counts, pains] = await Promise.all([
    countSessionMessages({ sessionIds: ids }),
    painReportsBySession({ sessionIds: ids }),
  ]);
  return rows.map((r) => ({
    sessionId: r.sessionId,
    date: String(r.session!.date).slice(0, 10),
    startTime: r.session!.startTime,
    durationMin: r.session!.durationMin,
    title: r.session!.title,
    completion: r.completion,
    rpe: r.rpe,
    minutes: r.minutes,
    note: r.notes?.trim() ? r.notes : null,
    messages: counts.get(r.sessionId) ?? 0,
    pain: pains.get(r.sessionId) ?? null,
  }));
}

export type PlannedDayRow = {
  sessionId: number;
  date: string;
  startTime: string;
  title: string;
  status: SessionStatus;
  blocks: string[];
};

/** The athlete's planned and published sessions of the next 7 days from today (drafts included: staff see them). */
export async function nextPlannedDays({
  teamId,
  athleteId,
  today,
}: {
  teamId: number;
  athleteId: number;
  today: string;
}): Promise<PlannedDayRow[]> {
  const sessions = await loadSessions({
    teamId,
    athleteId,
    date: { [Op.between]: [today, addDays(today, 6)] },
    status: { [Op.ne]: "cancelled" },
  });
  return sessions.map(({ dto }) => ({
    sessionId: dto.id,
    date: dto.date,
    startTime: dto.startTime,
    title: dto.title,
    status: dto.status,
    blocks: dto.blocks.map((b) => blockSummary(toBlockInput(b))),
  }));
}
