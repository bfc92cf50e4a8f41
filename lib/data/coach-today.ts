import "server-only";
import { Op } from "sequelize";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { teamToday, type TeamClock } from "@/lib/dates/zoned";
import type { AlertKind, AlertStatus } from "@/lib/domain/alerts";
import { projectedSpike, type ProjectedSpike } from "@/lib/load/projected-spikes";
import { describeRestriction, lastDay } from "@/lib/restrictions/rules";
import { listAlerts } from "./alerts";
import { getLedgerWeek } from "./load-ledger";
import { getTeamClock } from "./load";
import { recentLogNotes, type LogNote } from "./log-notes";
import { loadSessions } from "./plan-rows";
import { listRestrictions } from "./restrictions";
import { listRetestsDue, type RetestDue } from "./speed-views";

type Clock = Omit<TeamClock, "teamId">;

export type TodaySession = {
  id: number;
  athleteId: number;
  athleteName: string;
  date: string;
  title: string;
  startTime: string;
  status: "draft" | "published";
  logged: boolean;
};

export type TodayAlert = {
  id: number;
  athleteId: number;
  athleteName: string;
  kind: AlertKind;
  level: "alert" | "caution" | "info";
  reason: string;
  status: AlertStatus;
};

export type TodaySpike = ProjectedSpike & { athleteId: number; athleteName: string; weekStart: string };

export type TodayRestriction = {
  id: number;
  athleteId: number;
  athleteName: string;
  change: "starts" | "ends";
  date: string;
  description: string;
};

export type CoachTodayDto = {
  today: string;
  weekStart: string;
  weekEnd: string;
  /** The team metric the ratios are of, and the spike line. */
  acwrMetric: string;
  spikeRatio: number;
  /** Today's sessions (drafts marked: athletes cannot see them), by start time. */
  sessions: TodaySession[];
  /** Published sessions of this week before today that nobody has logged. */
  unlogged: TodaySession[];
  alerts: TodayAlert[];
  /** Open and acknowledged alerts in all, when more than the few listed. */
  alertCount: number;
  spikes: TodaySpike[];
  restrictions: TodayRestriction[];
  retests: RetestDue[];
  /** The team's re-test interval in weeks (the speed lab's setting). */
  retestWeeks: number;
  /** Log notes of the sessions of the last 7 days, newest session first. */
  notes: LogNote[];
};

const ALERTS_SHOWN = 8;
const NOTES_SHOWN = 6;

/** A coach's day (issue 13): every list reads the same repositories and ledger as the screen that handles it. */
export async function getCoachToday({
  teamId,
  userId,
  today,
  clock,
  alertsFirst = [],
}: {
  teamId: number;
  userId: number;
  today?: string;
  clock?: Clock;
  /** Kinds listed before the others (the physio's day puts pain reports first); newest first within each. */
  alertsFirst?: readonly AlertKind[];
}): Promise<CoachTodayDto> {
  const probe = clock ?? (await getTeamClock({ teamId }));
  const now = today ?? teamToday({ timeZone: probe.timeZone, now: new Date() });
  const weekStart = startOfWeek(now, probe.weekStartDay);
  const weekEnd = addDays(weekStart, 6);
  const nextWeek = addDays(weekStart, 7);
  const [rows, alerts, thisWeek, next, restrictions, retest, notes] = await Promise.all([
    loadSessions({ teamId, date: { [Op.between]: [weekStart, now] }, status: { [Op.ne]: "cancelled" } }),
    listAlerts({ teamId, userId, query: { status: "unresolved", limit: 200 } }),
    getLedgerWeek({ teamId, weekStart, today: now, view: "projected" }),
    // The next 7 days reach into next week unless today is the first day of the week.
    now === weekStart ? null : getLedgerWeek({ teamId, weekStart: nextWeek, today: now, view: "projected" }),
    listRestrictions({ teamId, from: weekStart }),
    listRetestsDue({ teamId, today: now }),
    recentLogNotes({ teamId, since: addDays(now, -6), limit: NOTES_SHOWN }),
  ]);
  // The ledger week reads every athlete of the team, so it names everyone the other lists mention.
  const names = new Map(thisWeek.athletes.map((a) => [a.id, a.name]));
  const nameOf = (id: number) => names.get(id) ?? "Athlete";

  const sessions = rows
    .map(({ dto }) => ({
      id: dto.id,
      athleteId: dto.athleteId,
      athleteName: nameOf(dto.athleteId),
      date: dto.date,
      title: dto.title,
      startTime: dto.startTime,
      status: dto.status === "draft" ? ("draft" as const) : ("published" as const),
      logged: dto.logged,
    }))
    .sort((x, y) => x.startTime.localeCompare(y.startTime) || x.athleteName.localeCompare(y.athleteName));

  const nextById = new Map((next?.athletes ?? []).map((a) => [a.id, a.load.week]));
  const spikes: TodaySpike[] = [];
  for (const a of thisWeek.athletes) {
    const weeks = [a.load.week, nextById.get(a.id)].filter((w) => w !== undefined);
    const spike = projectedSpike({ weeks, from: now, spikeRatio: thisWeek.settings.spikeRatio });
    if (spike)
      spikes.push({
        ...spike,
        athleteId: a.id,
        athleteName: a.name,
        weekStart: startOfWeek(spike.date, probe.weekStartDay),
      });
  }

  const changes: TodayRestriction[] = [];
  for (const r of restrictions) {
    const base = {
      id: r.id,
      athleteId: r.athleteId,
      athleteName: nameOf(r.athleteId),
      description: describeRestriction(r),
    };
    if (r.startsOn >= weekStart && r.startsOn <= weekEnd) changes.push({ ...base, change: "starts", date: r.startsOn });
    const last = lastDay(r);
    if (last !== null && last >= weekStart && last <= weekEnd) changes.push({ ...base, change: "ends", date: last });
  }
  changes.sort((x, y) => x.date.localeCompare(y.date) || x.athleteName.localeCompare(y.athleteName));

  return {
    today: now,
    weekStart,
    weekEnd,
    acwrMetric: thisWeek.settings.acwrMetric,
    spikeRatio: thisWeek.settings.spikeRatio,
    sessions: sessions.filter((s) => s.date === now),
    unlogged: sessions.filter((s) => s.date < now && s.status === "published" && !s.logged),
    alerts: [
      ...alerts.filter((a) => alertsFirst.includes(a.kind)),
      ...alerts.filter((a) => !alertsFirst.includes(a.kind)),
    ]
      .slice(0, ALERTS_SHOWN)
      .map((a) => ({
        id: a.id,
        athleteId: a.athleteId,
        athleteName: a.athleteName,
        kind: a.kind,
        level: a.level,
        reason: a.reason,
        status: a.status,
      })),
    alertCount: alerts.length,
    spikes: spikes.sort((x, y) => x.date.localeCompare(y.date) || y.ratio - x.ratio),
    restrictions: changes,
    retests: retest.due,
    retestWeeks: retest.retestWeeks,
    notes,
  };
}
