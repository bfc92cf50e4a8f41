import { computeAthleteColumns, weekFromColumns, type ColumnsRequest } from "./athlete-load";
import { dayIndex } from "@/lib/dates/plain-date";
import { topFlagLevel, type Flag, type FlagLevel } from "./flags";
import { metricRecord } from "./metric-record";
import { alignLogs } from "./series";
import { createWorkspace } from "./workspace";
import type { AthleteProfile, LoadView, LogInput, Metric, SessionInput, TeamLoadSettings } from "./types";
import { judgedPeak, type WeekSummary } from "./week-summary";

export interface SquadAthleteInput {
  id: string;
  name: string;
  group: string | null;
  profile: AthleteProfile;
  sessions: readonly SessionInput[];
  logs: readonly LogInput[];
}

export interface SquadWeekRow {
  id: string;
  name: string;
  group: string | null;
  week: WeekSummary;
  /** The week's judged ACWR for every metric (judgedPeak, team method); week.peakRatio is the team metric's. */
  peakRatios: Record<Metric, number | null>;
  flags: Flag[];
  topLevel: FlagLevel | null;
}

/** One row per athlete for the squad table, in input order. weekStart is used as given. */
export function computeSquadWeek(
  athletes: readonly SquadAthleteInput[],
  settings: TeamLoadSettings,
  weekStart: string,
  today: string,
  view: LoadView,
): SquadWeekRow[] {
  const ws = dayIndex(weekStart);
  const todayDay = dayIndex(today);
  // Each athlete's columns are read into plain row values before the next athlete reuses the memory.
  const scratch = createWorkspace();
  return athletes.map((a) => {
    const req: ColumnsRequest = {
      profile: a.profile,
      settings,
      sessions: a.sessions,
      logFor: alignLogs(a.sessions, a.logs),
      view,
      todayDay,
      fromDay: ws - 7,
      toDay: ws + 6,
    };
    const cols = computeAthleteColumns(req, scratch);
    const { week, flags } = weekFromColumns(cols, req, ws);
    const w = ws - cols.startDay;
    const peakRatios = metricRecord((m) => judgedPeak(cols.acwr[m].ratio, cols.provisional, w, w + 7)?.value ?? null);
    return { id: a.id, name: a.name, group: a.group, week, peakRatios, flags, topLevel: topFlagLevel(flags) };
  });
}
