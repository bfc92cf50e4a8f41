import "server-only";
import { Op } from "sequelize";
import { levelOn, type Availability, type AvailabilityLevel } from "@/lib/availability/levels";
import type { Flag, FlagLevel } from "@/lib/load";
import { describeRestriction, isCurrent } from "@/lib/restrictions/rules";
import { db } from "@/models";
import { currentAvailability } from "./availability";
import { latestCheckInByAthlete, type CheckInDto } from "./check-ins";
import { latestPainReportByAthlete, type PainReportDto } from "./pain-reports";
import { getSquadWeekLoad } from "./load-views";
import { recentLogNotes, type LogNote } from "./log-notes";
import { listRestrictions } from "./restrictions";
import { listSessionConflicts } from "./session-conflicts";

export type SquadStatusRow = {
  id: number;
  name: string;
  groupName: string | null;
  /** The level today (full training before a setting starts and from its return date). */
  level: AvailabilityLevel;
  availability: Pick<Availability, "level" | "startsOn" | "returnOn" | "note"> | null;
  restrictions: string[];
  openAlerts: number;
  /** Planned or published sessions from today that break a restriction (none planned past with a reason). */
  conflicts: number;
  latestNote: Pick<LogNote, "sessionId" | "date" | "title" | "note"> | null;
  latestPain: Pick<PainReportDto, "date" | "region" | "severity" | "stoppedSession"> | null;
  latestCheckIn: Pick<CheckInDto, "date" | "total"> | null;
  /** This week's judged ACWR of the team metric and its flags, from the load ledger (logged + plan). */
  ratio: number | null;
  ratioProvisional: boolean;
  flags: Flag[];
  topLevel: FlagLevel | null;
};

/** One row per athlete for the physio's squad status: availability, restrictions, alerts, notes and this week's load. */
export async function getSquadStatus({ teamId, today }: { teamId: number; today: string }): Promise<SquadStatusRow[]> {
  const { Alert } = await db();
  const [load, availability, restrictions, conflicts, notes, alerts, pains, checkIns] = await Promise.all([
    getSquadWeekLoad({ teamId, view: "projected", today }),
    currentAvailability({ teamId }),
    listRestrictions({ teamId, from: today }),
    listSessionConflicts({ teamId, from: today }),
    recentLogNotes({ teamId, limit: 200 }),
    Alert.findAll({
      where: { teamId, status: { [Op.in]: ["open", "acknowledged"] } },
      attributes: ["athleteId"],
    }),
    latestPainReportByAthlete({ teamId }),
    latestCheckInByAthlete({ teamId }),
  ]);
  const count = <T extends { athleteId: number }>(list: readonly T[]) => {
    const out = new Map<number, number>();
    for (const x of list) out.set(x.athleteId, (out.get(x.athleteId) ?? 0) + 1);
    return out;
  };
  const openAlerts = count(alerts);
  const conflictCount = count(conflicts);
  return load.rows.map((r) => {
    const a = availability.get(r.id) ?? null;
    const note = notes.find((n) => n.athleteId === r.id) ?? null;
    const pain = pains.get(r.id);
    const checkIn = checkIns.get(r.id);
    return {
      id: r.id,
      name: r.name,
      groupName: r.groupName,
      level: levelOn(a, today),
      availability: a ? { level: a.level, startsOn: a.startsOn, returnOn: a.returnOn, note: a.note } : null,
      restrictions: restrictions
        .filter((x) => x.athleteId === r.id && isCurrent(x, today))
        .map((x) => describeRestriction(x)),
      openAlerts: openAlerts.get(r.id) ?? 0,
      conflicts: conflictCount.get(r.id) ?? 0,
      latestNote: note ? { sessionId: note.sessionId, date: note.date, title: note.title, note: note.note } : null,
      latestPain: pain
        ? { date: pain.date, region: pain.region, severity: pain.severity, stoppedSession: pain.stoppedSession }
        : null,
      latestCheckIn: checkIn ? { date: checkIn.date, total: checkIn.total } : null,
      ratio: r.ratio,
      ratioProvisional: r.ratioProvisional,
      flags: r.flags,
      topLevel: r.topLevel,
    };
  });
}
