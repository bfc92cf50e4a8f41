import { acwrInto, allocAcwrColumns, isProvisional, type AcwrColumns } from "./acwr";
import { resolveProfile } from "./block-metrics";
import { dateFromDayIndex, dayIndex, startOfWeek } from "./dates";
import { computeFlags, type Flag } from "./flags";
import { buildDailyColumns, effectiveSessions, indexLogs, type DailyColumns } from "./series";
import {
  METRICS,
  type AthleteProfile,
  type LoadView,
  type LogInput,
  type Metric,
  type MetricValues,
  type SessionInput,
  type TeamLoadSettings,
} from "./types";
import { summariseWeek, type WeekSummary } from "./week-summary";

/** Days of history before the range that the ACWR always sees (two chronic windows). */
export const HISTORY_LEAD_DAYS = 56;

export interface AthleteLoadInput {
  profile: AthleteProfile;
  settings: TeamLoadSettings;
  sessions: readonly SessionInput[];
  logs: readonly LogInput[];
  from: string;
  to: string;
  today: string;
  view: LoadView;
  /** The week to summarise ("YYYY-MM-DD"); snapped back to weekStartDay when that is given. */
  weekStart: string;
  /** 0 = Sunday, 1 = Monday … 6 = Saturday. */
  weekStartDay?: number;
}

export interface AthleteColumns extends DailyColumns {
  /** ACWR per metric with the team's method; ratio NaN = none. */
  acwr: Record<Metric, AcwrColumns>;
  /** 1 while fewer than 28 days of history stand behind the day's ratio. */
  provisional: Uint8Array;
  firstDate: string;
}

/** Earliest session date as a day number, or +Infinity when there are none. */
function earliestSessionDay(sessions: readonly SessionInput[]): number {
  let min = Number.POSITIVE_INFINITY;
  for (const s of sessions) {
    const d = dayIndex(s.date);
    if (d < min) min = d;
  }
  return min;
}

export interface ColumnsRequest {
  profile: AthleteProfile;
  settings: TeamLoadSettings;
  sessions: readonly SessionInput[];
  logsById: ReadonlyMap<string, LogInput>;
  view: LoadView;
  todayDay: number;
  /** The series covers [min(earliest session, fromDay − 56), toDay]. */
  fromDay: number;
  toDay: number;
}

/** The columnar engine: daily values and ACWR for every metric from the athlete's first session. */
export function computeAthleteColumns(req: ColumnsRequest): AthleteColumns {
  const startDay = Math.min(earliestSessionDay(req.sessions), req.fromDay - HISTORY_LEAD_DAYS);
  const length = Math.max(0, req.toDay - startDay + 1);
  const cols = buildDailyColumns({
    startDay,
    length,
    sessions: req.sessions,
    logsById: req.logsById,
    rp: resolveProfile(req.profile, req.settings),
    view: req.view,
    todayDay: req.todayDay,
  });
  const acwr = {} as Record<Metric, AcwrColumns>;
  const prefix = new Float64Array(length + 1);
  for (const m of METRICS) {
    acwr[m] = allocAcwrColumns(length);
    acwrInto(cols.values[m], req.settings.acwrMethod, acwr[m], "first", prefix);
  }
  const provisional = new Uint8Array(length);
  for (let i = 0; i < length; i++) provisional[i] = isProvisional(i, cols.firstDataIndex) ? 1 : 0;
  return { ...cols, acwr, provisional, firstDate: dateFromDayIndex(startDay) };
}

/** Week summary and flags for the week starting at weekStartDay (a day number) from precomputed columns. */
export function weekFromColumns(
  cols: AthleteColumns,
  req: ColumnsRequest,
  weekStartDay: number,
): { week: WeekSummary; flags: Flag[] } {
  const weekStart = dateFromDayIndex(weekStartDay);
  const metric = req.settings.acwrMetric;
  const ratio = cols.acwr[metric].ratio;
  const week = summariseWeek({
    firstDate: cols.firstDate,
    values: cols.values,
    ratio,
    provisional: cols.provisional,
    missing: cols.missing,
    settings: req.settings,
    weekStart,
  });
  const lookBack = Math.ceil(req.settings.recoveryHours / 24) + 1;
  const rp = resolveProfile(req.profile, req.settings);
  const sessions = effectiveSessions(
    req.sessions,
    req.logsById,
    rp,
    req.view,
    req.todayDay,
    weekStartDay - lookBack,
    weekStartDay + 6,
  );
  const flags = computeFlags({
    firstDate: cols.firstDate,
    values: cols.values,
    ratio,
    provisional: cols.provisional,
    sessions,
    profile: req.profile,
    settings: req.settings,
    weekStart,
  });
  return { week, flags };
}

export interface AthleteLoadDay {
  date: string;
  values: MetricValues;
  acute: MetricValues;
  chronic: MetricValues;
  ratio: Record<Metric, number | null>;
  provisional: boolean;
  logged: boolean;
  missing: boolean;
}

export interface AthleteLoad {
  days: AthleteLoadDay[];
  week: WeekSummary;
  flags: Flag[];
  /** First day of the series the ACWR was computed over. */
  historyStart: string;
}

function normaliseWeekStart(weekStart: string, weekStartDay?: number): number {
  return dayIndex(weekStartDay === undefined ? weekStart : startOfWeek(weekStart, weekStartDay));
}

/** Request + columns covering [from, to] and the summarised week: the shared first half of the orchestrators. */
export function prepareAthleteLoad(input: AthleteLoadInput): {
  req: ColumnsRequest;
  cols: AthleteColumns;
  weekStartDay: number;
} {
  const weekStartDay = normaliseWeekStart(input.weekStart, input.weekStartDay);
  const req: ColumnsRequest = {
    profile: input.profile,
    settings: input.settings,
    sessions: input.sessions,
    logsById: indexLogs(input.logs),
    view: input.view,
    todayDay: dayIndex(input.today),
    fromDay: Math.min(dayIndex(input.from), weekStartDay - 7),
    toDay: Math.max(dayIndex(input.to), weekStartDay + 6),
  };
  return { req, cols: computeAthleteColumns(req), weekStartDay };
}

function record(fn: (m: Metric) => number): MetricValues {
  const out = {} as MetricValues;
  for (const m of METRICS) out[m] = fn(m);
  return out;
}

/** The orchestrator for one athlete: daily rows for [from, to], the chosen week's summary and its flags. */
export function computeAthleteLoad(input: AthleteLoadInput): AthleteLoad {
  const { req, cols, weekStartDay } = prepareAthleteLoad(input);
  const { week, flags } = weekFromColumns(cols, req, weekStartDay);
  const from = dayIndex(input.from) - cols.startDay;
  const to = dayIndex(input.to) - cols.startDay;
  const days: AthleteLoadDay[] = [];
  for (let i = from; i <= to; i++) {
    const ratio = {} as Record<Metric, number | null>;
    for (const m of METRICS) {
      const r = cols.acwr[m].ratio[i];
      ratio[m] = Number.isFinite(r) ? r : null;
    }
    days.push({
      date: dateFromDayIndex(cols.startDay + i),
      values: record((m) => cols.values[m][i]),
      acute: record((m) => cols.acwr[m].acute[i]),
      chronic: record((m) => cols.acwr[m].chronic[i]),
      ratio,
      provisional: cols.provisional[i] === 1,
      logged: cols.logged[i] === 1,
      missing: cols.missing[i] === 1,
    });
  }
  return { days, week, flags, historyStart: cols.firstDate };
}
