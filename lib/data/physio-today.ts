import "server-only";
import { AVAILABILITY_LEVELS, levelOn, type AvailabilityLevel } from "@/lib/availability/levels";
import { addDays } from "@/lib/dates/plain-date";
import type { TeamClock } from "@/lib/dates/zoned";
import type { AlertKind } from "@/lib/domain/alerts";
import type { SessionConflict } from "@/lib/restrictions/conflicts";
import { athleteNames } from "./athletes";
import { currentAvailability } from "./availability";
import { getCoachToday, type CoachTodayDto } from "./coach-today";
import { listPainReports, type PainReportDto } from "./pain-reports";
import { listSessionConflicts } from "./session-conflicts";

type Named = { athleteName: string };

export type PhysioTodayDto = {
  /** Alerts (pain and the restriction kinds first), spikes ahead, restrictions of the week and log notes. */
  day: CoachTodayDto;
  /** Pain reports of the last 7 days, newest first. */
  pains: Array<PainReportDto & Named>;
  /** Athletes below full training today, least available first, with the return date. */
  away: Array<{ athleteId: number; level: AvailabilityLevel; returnOn: string | null; note: string } & Named>;
  /** Planned or published sessions from today that break a restriction (none planned past with a reason). */
  conflicts: Array<SessionConflict & Named>;
};

/** The medical kinds the physio handles first. */
const PHYSIO_FIRST: readonly AlertKind[] = ["pain", "restriction_conflict", "restriction_override"];

/**
 * The physio's day (issue 13): what the squad status and the athlete pages hold, as a short list of what needs
 * doing today; every reader is the one those screens use.
 */
export async function getPhysioToday({
  teamId,
  userId,
  today,
  clock,
}: {
  teamId: number;
  userId: number;
  today?: string;
  clock?: Omit<TeamClock, "teamId">;
}): Promise<PhysioTodayDto> {
  const day = await getCoachToday({ teamId, userId, today, clock, alertsFirst: PHYSIO_FIRST });
  const [pains, availability, conflicts] = await Promise.all([
    listPainReports({ teamId, from: addDays(day.today, -6), to: day.today }),
    currentAvailability({ teamId }),
    listSessionConflicts({ teamId, from: day.today }),
  ]);
  const away = [...availability.values()]
    .map((a) => ({ athleteId: a.athleteId, level: levelOn(a, day.today), returnOn: a.returnOn, note: a.note }))
    .filter((a) => a.level !== "full");
  const ids = [...pains, ...away, ...conflicts].map((x) => x.athleteId);
  const names = ids.length > 0 ? await athleteNames({ athleteIds: ids }) : new Map<number, string>();
  const named = <T extends { athleteId: number }>(x: T): T & Named => ({
    ...x,
    athleteName: names.get(x.athleteId) ?? "Athlete",
  });
  const rank = (level: AvailabilityLevel) => AVAILABILITY_LEVELS.indexOf(level);
  return {
    day,
    pains: pains.map(named),
    away: away.map(named).sort((x, y) => rank(y.level) - rank(x.level) || x.athleteName.localeCompare(y.athleteName)),
    conflicts: conflicts.map(named),
  };
}
