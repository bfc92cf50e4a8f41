import {
  ACUTE_DAYS,
  ACWR_MIN_HISTORY_DAYS,
  acwrFromFirstDay,
  allocAcwrColumns,
  CHRONIC_DAYS,
  markProvisional,
} from "./acwr";
import { computeAthleteColumns } from "./athlete-load";
import { resolveProfile } from "./accumulate";
import { dateFromDayIndex, dayIndex } from "@/lib/dates/plain-date";
import { computeFlags, type Flag, type FlagSession } from "./flags";
import { ledgerMethod, runLedger, type LedgerMethod, type LedgerState } from "./ledger";
import { alignLogs, buildDailyColumns, effectiveSessions, priorRecoverySessions, sessionUse } from "./series";
import {
  METRICS,
  type AthleteProfile,
  type LoadView,
  type LogInput,
  type Metric,
  type SessionInput,
  type TeamLoadSettings,
} from "./types";
import { metricRecord } from "./metric-record";
import { weekExtras } from "./week-extras";
import { summariseWeek, type WeekSummary } from "./week-summary";

export interface WeekPreviewInput {
  /** Consecutive dates before the week (normally ending the day before weekStart); may be empty. */
  historyDates: readonly string[];
  /** Daily values aligned with historyDates. */
  historyValues: Record<Metric, ArrayLike<number>>;
  weekSessions: readonly SessionInput[];
  weekLogs: readonly LogInput[];
  profile: AthleteProfile;
  settings: TeamLoadSettings;
  weekStart: string;
  today: string;
  /** Default "projected": the planner shows the plan. */
  view?: LoadView;
  /** The athlete's first day on record before the week (the series starts there); null or absent = none. */
  firstDataDate?: string | null;
  /** Sessions counted in the view shortly before the week, for the recovery-window check. */
  priorSessions?: readonly FlagSession[];
  /**
   * The team metric's series state on the days before the week (ledger, lib/load/README.md §12): the week then
   * continues the one series from it, and the history needs only last week's values (weekly change).
   */
  seed?: PreviewSeed | null;
}

/**
 * The team metric's series state before the week, as the week's seven days step it (ledger.ts stepLedger): the
 * state at the end of the day before the week, and the prefix sums and kept-day counts of the days 7 and 28
 * before each day of the week (weekStart − 7 … − 1 and weekStart − 28 … − 22), which the rolling means read.
 * Days before the athlete's first day on record are 0. About thirty numbers per athlete, whatever the history.
 */
export interface PreviewSeed {
  onRecord: number;
  acute: number;
  chronic: number;
  /** weekStart − 7 + i, i = 0 … 6 (the last is the day before the week). */
  cum7: number[];
  kept7: number[];
  /** weekStart − 28 + i, i = 0 … 6. */
  cum28: number[];
  kept28: number[];
}

/** The seed from a ledger window's states of the days before the week (oldest first, ending weekStart − 1). */
export function previewSeedFrom(states: readonly LedgerState[], k: number): PreviewSeed {
  const at = (back: number) => states[states.length - back];
  const last = at(1);
  const days = (from: number) => Array.from({ length: 7 }, (_, i) => at(from - i));
  return {
    onRecord: last?.onRecord ?? 0,
    acute: last?.acute[k] ?? 0,
    chronic: last?.chronic[k] ?? 0,
    cum7: days(ACUTE_DAYS).map((x) => x?.cum[k] ?? 0),
    kept7: days(ACUTE_DAYS).map((x) => x?.kept ?? 0),
    cum28: days(CHRONIC_DAYS).map((x) => x?.cum[k] ?? 0),
    kept28: days(CHRONIC_DAYS).map((x) => x?.kept ?? 0),
  };
}

/** The week's ratio and provisional marks (indices offset … offset + 6) continued from the seed, as the ledger does. */
function seededRatios(
  seed: PreviewSeed,
  k: number,
  week: { values: Record<Metric, Float64Array>; missing: Uint8Array },
  has: Uint8Array,
  method: LedgerMethod,
  out: { ratio: Float64Array; provisional: Uint8Array; offset: number },
): void {
  const expand = (x: number) => METRICS.map((_, j) => (j === k ? x : 0));
  // The 28 states before the week, as stepLedger reads them: back 1 (the day before), back 7 and back 28 of
  // each week day. The days in between are never read; the same state before the first day on record is 0.
  const state = (cum: number, kept: number, onRecord = 0, acute = 0, chronic = 0): LedgerState => ({
    onRecord,
    kept,
    cum: expand(cum),
    acute: expand(acute),
    chronic: expand(chronic),
    ratio: expand(Number.NaN),
  });
  const states: LedgerState[] = Array.from({ length: CHRONIC_DAYS }, (_, i) => {
    if (i < 7) return state(seed.cum28[i], seed.kept28[i]);
    if (i < CHRONIC_DAYS - ACUTE_DAYS) return state(0, 0);
    const j = i - (CHRONIC_DAYS - ACUTE_DAYS);
    return j === 6
      ? state(seed.cum7[j], seed.kept7[j], seed.onRecord, seed.acute, seed.chronic)
      : state(seed.cum7[j], seed.kept7[j]);
  });
  const days = Array.from({ length: 7 }, (_, i) => i);
  const stepped = runLedger(
    states,
    days.map((day) => ({ day })),
    ({ day }) => ({
      values: METRICS.map((m) => week.values[m][day]),
      has: has[day] === 1,
      missing: week.missing[day] === 1,
    }),
    method,
  );
  stepped.forEach((s, i) => {
    out.ratio[out.offset + i] = s.ratio[k];
    out.provisional[out.offset + i] = s.onRecord < ACWR_MIN_HISTORY_DAYS ? 1 : 0;
  });
}

/**
 * Fast path for the drag preview: evaluates only the week's sessions and recomputes the ACWR of the team
 * metric over history + week. With the full history (buildWeekPreviewContext's default) the result equals
 * computeAthleteLoad's week and flags exactly; a shorter history shifts the EWMA seed slightly.
 */
export function computeWeekPreview(input: WeekPreviewInput): { week: WeekSummary; flags: Flag[] } {
  const { settings } = input;
  const view = input.view ?? "projected";
  const ws = dayIndex(input.weekStart);
  const todayDay = dayIndex(input.today);
  const historyStart = input.historyDates.length > 0 ? dayIndex(input.historyDates[0]) : ws;
  const offset = Math.max(0, ws - historyStart);
  const length = offset + 7;
  const rp = resolveProfile(input.profile, settings);
  const logFor = alignLogs(input.weekSessions, input.weekLogs);
  const week = buildDailyColumns({ startDay: ws, length: 7, sessions: input.weekSessions, logFor, rp, view, todayDay });
  const values = {} as Record<Metric, Float64Array>;
  for (const m of METRICS) {
    const col = new Float64Array(length);
    const hist = input.historyValues[m];
    const n = Math.min(offset, hist ? hist.length : 0);
    for (let i = 0; i < n; i++) col[i] = hist[i];
    col.set(week.values[m], offset);
    values[m] = col;
  }
  const missing = new Uint8Array(length);
  missing.set(week.missing, offset);
  // Index of the first day on record (negative when it predates a shortened history); null = none at all.
  let firstData: number | null = input.firstDataDate ? dayIndex(input.firstDataDate) - historyStart : null;
  if (week.firstDataIndex !== null && (firstData === null || offset + week.firstDataIndex < firstData)) {
    firstData = offset + week.firstDataIndex;
  }
  const acwr = allocAcwrColumns(length);
  const provisional = new Uint8Array(length);
  if (input.seed) {
    acwr.ratio.fill(Number.NaN);
    provisional.fill(1);
    const has = new Uint8Array(7);
    weekSessionDays(input.weekSessions, logFor, todayDay, view, ws, has);
    const k = METRICS.indexOf(settings.acwrMetric);
    seededRatios(input.seed, k, week, has, ledgerMethod(settings), { ratio: acwr.ratio, provisional, offset });
  } else {
    acwrFromFirstDay(
      values[settings.acwrMetric],
      settings.acwrMethod,
      acwr,
      firstData,
      undefined,
      rp.estimateMissing ? undefined : missing,
    );
    markProvisional(provisional, firstData);
  }
  const firstDate = dateFromDayIndex(historyStart);
  const summary = summariseWeek({
    firstDate,
    values,
    ratio: acwr.ratio,
    provisional,
    missing,
    settings,
    weekStart: input.weekStart,
  });
  const weekSessions = effectiveSessions(input.weekSessions, logFor, rp, view, todayDay, ws, ws + 6);
  const sessions: FlagSession[] = [...(input.priorSessions ?? []), ...weekSessions];
  const flags = computeFlags({
    firstDate,
    values,
    ratio: acwr.ratio,
    provisional,
    missing,
    sessions,
    profile: input.profile,
    settings,
    weekStart: input.weekStart,
  });
  return { week: { ...summary, ...weekExtras(weekSessions, ws) }, flags };
}

/** has[i] = 1 where a session of week day i counts in the view (the series' "on record" test, series.ts sessionUse). */
function weekSessionDays(
  sessions: readonly SessionInput[],
  logFor: ReturnType<typeof alignLogs>,
  todayDay: number,
  view: LoadView,
  ws: number,
  has: Uint8Array,
): void {
  sessions.forEach((s, k) => {
    const day = dayIndex(s.date);
    if (day < ws || day > ws + 6) return;
    if (sessionUse(s.status, logFor[k] !== undefined, day, todayDay, view) !== "none") has[day - ws] = 1;
  });
}

export interface WeekPreviewContextInput {
  profile: AthleteProfile;
  settings: TeamLoadSettings;
  /** All the athlete's sessions; those inside the week are left out of the history. */
  sessions: readonly SessionInput[];
  logs: readonly LogInput[];
  weekStart: string;
  today: string;
  view?: LoadView;
  /** Keep only this many days of history (smaller payload, slightly different EWMA seed); default all. */
  historyDays?: number;
}

export interface WeekPreviewContext {
  historyDates: string[];
  /** Plain arrays so the context survives JSON. */
  historyValues: Record<Metric, number[]>;
  firstDataDate: string | null;
  priorSessions: FlagSession[];
  /** With a seed (from the ledger) the history holds last week only. */
  seed?: PreviewSeed | null;
}

/** Everything computeWeekPreview needs besides the week itself; build once per athlete, reuse while dragging. */
export function buildWeekPreviewContext(input: WeekPreviewContextInput): WeekPreviewContext {
  const view = input.view ?? "projected";
  const ws = dayIndex(input.weekStart);
  const logFor = alignLogs(input.sessions, input.logs);
  const req = {
    profile: input.profile,
    settings: input.settings,
    sessions: input.sessions,
    logFor,
    view,
    todayDay: dayIndex(input.today),
    fromDay: ws - 7,
    toDay: ws - 1,
  };
  const cols = computeAthleteColumns(req);
  const keep = Math.min(cols.length, input.historyDays ?? cols.length);
  const from = cols.length - keep;
  const historyDates: string[] = [];
  for (let i = from; i < cols.length; i++) historyDates.push(dateFromDayIndex(cols.startDay + i));
  const historyValues = {} as Record<Metric, number[]>;
  for (const m of METRICS) historyValues[m] = Array.from(cols.values[m].subarray(from));
  // History only: the week's own first day on record comes from the sessions being previewed.
  const firstDataDay = cols.firstDataIndex !== null ? cols.startDay + cols.firstDataIndex : null;
  const rp = resolveProfile(input.profile, input.settings);
  const priorSessions = priorRecoverySessions(input.sessions, logFor, rp, view, req.todayDay, ws, input.settings);
  return {
    historyDates,
    historyValues,
    firstDataDate: firstDataDay !== null ? dateFromDayIndex(firstDataDay) : null,
    priorSessions,
  };
}

/** The daily values of a week's sessions (what a proposed week shows per day), in the view the planner uses. */
export function weekDayValues(input: {
  sessions: readonly SessionInput[];
  logs: readonly LogInput[];
  profile: AthleteProfile;
  settings: TeamLoadSettings;
  weekStart: string;
  todayDay: number;
  view?: LoadView;
}): { date: string; values: Record<Metric, number> }[] {
  const ws = dayIndex(input.weekStart);
  const cols = buildDailyColumns({
    startDay: ws,
    length: 7,
    sessions: input.sessions,
    logFor: alignLogs(input.sessions, input.logs),
    rp: resolveProfile(input.profile, input.settings),
    view: input.view ?? "projected",
    todayDay: input.todayDay,
  });
  return Array.from({ length: 7 }, (_, i) => ({
    date: dateFromDayIndex(ws + i),
    values: metricRecord((m) => cols.values[m][i]),
  }));
}
