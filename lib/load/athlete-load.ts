import { acwrFromFirstDay, markProvisional, type AcwrColumns } from "./acwr";
import { resolveProfile, type ResolvedProfile } from "./accumulate";
import { dateFromDayIndex, dayIndex, startOfWeek } from "@/lib/dates/plain-date";
import { computeFlags, type Flag } from "./flags";
import {
  alignLogs,
  buildDailyColumns,
  effectiveSessions,
  recoveryLookBackDays,
  firstDayOnRecord,
  sessionDayNumbers,
  type AlignedLogs,
  type DailyColumns,
} from "./series";
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
import { metricRecord } from "./metric-record";
import { weekExtras } from "./week-extras";
import { summariseWeek, type WeekSummary } from "./week-summary";
import { reserve, type EngineWorkspace } from "./workspace";

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
  /** ISO weekday: 1 = Monday … 7 = Sunday. */
  weekStartDay?: number;
}

export interface AthleteColumns extends DailyColumns {
  /** ACWR per metric with the team's method; ratio NaN = none. */
  acwr: Record<Metric, AcwrColumns>;
  /** 1 while fewer than 28 days on record stand behind the day's ratio. */
  provisional: Uint8Array;
  firstDate: string;
  /** Day number of each input session (same order), parsed once. */
  sessionDays: Int32Array;
  rp: ResolvedProfile;
}

export interface ColumnsRequest {
  profile: AthleteProfile;
  settings: TeamLoadSettings;
  sessions: readonly SessionInput[];
  /** alignLogs(sessions, logs). */
  logFor: AlignedLogs;
  view: LoadView;
  todayDay: number;
  /**
   * The columns cover [min(first day on record, fromDay), toDay]; the series itself (EWMA seed, provisional
   * count) starts on the first day on record, whatever fromDay is. The sessions must reach back to it.
   */
  fromDay: number;
  toDay: number;
}

/**
 * The columnar engine: daily values and ACWR for every metric from the athlete's first day on record
 * (lib/load/README.md §5). With a workspace the columns are views into it (no allocation per athlete) and the
 * next call overwrites them.
 */
export function computeAthleteColumns(req: ColumnsRequest, ws?: EngineWorkspace): AthleteColumns {
  const sessionDays = sessionDayNumbers(req.sessions);
  const first = firstDayOnRecord(
    { sessions: req.sessions, sessionDays, logFor: req.logFor },
    req.view,
    req.todayDay,
    req.toDay,
  );
  const startDay = first === null ? req.fromDay : Math.min(first, req.fromDay);
  const n = Math.max(0, req.toDay - startDay + 1);
  const nm = METRICS.length;
  // Doubles: values (6n) | acute, chronic, ratio per metric (18n) | prefix sums (n + 1). Bytes: logged, missing, provisional.
  const f64Size = 4 * nm * n + n + 1;
  if (ws) reserve(ws, f64Size, 3 * n);
  const f64 = ws ? ws.f64 : new Float64Array(f64Size);
  const u8 = ws ? ws.u8 : new Uint8Array(3 * n);
  if (ws) {
    f64.fill(0, 0, nm * n);
    u8.fill(0, 0, 2 * n);
  }
  const rp = resolveProfile(req.profile, req.settings);
  const cols = buildDailyColumns({
    startDay,
    length: n,
    sessions: req.sessions,
    sessionDays,
    logFor: req.logFor,
    rp,
    view: req.view,
    todayDay: req.todayDay,
    scratch: { f64, u8 },
  });
  const prefix = f64.subarray(4 * nm * n, f64Size);
  const acwr = {} as Record<Metric, AcwrColumns>;
  METRICS.forEach((m, k) => {
    const at = (j: number) => f64.subarray((nm + 3 * k + j) * n, (nm + 3 * k + j + 1) * n);
    acwr[m] = { acute: at(0), chronic: at(1), ratio: at(2) };
    acwrFromFirstDay(
      cols.values[m],
      req.settings.acwrMethod,
      acwr[m],
      cols.firstDataIndex,
      prefix,
      rp.estimateMissing ? undefined : cols.missing,
    );
  });
  const provisional = u8.subarray(2 * n, 3 * n);
  markProvisional(provisional, cols.firstDataIndex);
  const { length, values, logged, missing, firstDataIndex } = cols;
  return {
    startDay,
    length,
    values,
    logged,
    missing,
    firstDataIndex,
    acwr,
    provisional,
    firstDate: dateFromDayIndex(startDay),
    sessionDays,
    rp,
  };
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
  const lookBack = recoveryLookBackDays(req.settings);
  const sessions = effectiveSessions(
    req.sessions,
    req.logFor,
    cols.rp,
    req.view,
    req.todayDay,
    weekStartDay - lookBack,
    weekStartDay + 6,
    cols.sessionDays,
  );
  const flags = computeFlags({
    firstDate: cols.firstDate,
    values: cols.values,
    ratio,
    provisional: cols.provisional,
    missing: cols.missing,
    sessions,
    profile: req.profile,
    settings: req.settings,
    weekStart,
  });
  return { week: { ...week, ...weekExtras(sessions, weekStartDay) }, flags };
}

interface AthleteLoadDay {
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
function prepareAthleteLoad(input: AthleteLoadInput): {
  req: ColumnsRequest;
  cols: AthleteColumns;
  weekStartDay: number;
} {
  const weekStartDay = normaliseWeekStart(input.weekStart, input.weekStartDay);
  const req: ColumnsRequest = {
    profile: input.profile,
    settings: input.settings,
    sessions: input.sessions,
    logFor: alignLogs(input.sessions, input.logs),
    view: input.view,
    todayDay: dayIndex(input.today),
    fromDay: Math.min(dayIndex(input.from), weekStartDay - 7),
    toDay: Math.max(dayIndex(input.to), weekStartDay + 6),
  };
  return { req, cols: computeAthleteColumns(req), weekStartDay };
}

/** The orchestrator for one athlete: daily rows for [from, to], the chosen week's summary and its flags. */
export function computeAthleteLoad(input: AthleteLoadInput): AthleteLoad {
  const { req, cols, weekStartDay } = prepareAthleteLoad(input);
  const { week, flags } = weekFromColumns(cols, req, weekStartDay);
  const from = dayIndex(input.from) - cols.startDay;
  const to = dayIndex(input.to) - cols.startDay;
  const days: AthleteLoadDay[] = [];
  for (let i = from; i <= to; i++) {
    days.push({
      date: dateFromDayIndex(cols.startDay + i),
      values: metricRecord((m) => cols.values[m][i]),
      acute: metricRecord((m) => cols.acwr[m].acute[i]),
      chronic: metricRecord((m) => cols.acwr[m].chronic[i]),
      ratio: metricRecord((m) => {
        const r = cols.acwr[m].ratio[i];
        return Number.isFinite(r) ? r : null;
      }),
      provisional: cols.provisional[i] === 1,
      logged: cols.logged[i] === 1,
      missing: cols.missing[i] === 1,
    });
  }
  return { days, week, flags, historyStart: cols.firstDate };
}
