// The week's summary and flags from a ledger window (lib/load/README.md §12): the same week summary, flags and
// judged peaks as computeSquadWeek, over the window's columns and only the sessions of the week and the recovery
// look-back before it.
import { resolveProfile } from "./accumulate";
import { weekFromColumns, type AthleteColumns, type ColumnsRequest } from "./athlete-load";
import { topFlagLevel, type Flag, type FlagLevel } from "./flags";
import { ledgerWindow, type LedgerMethod, type LedgerRow, type LedgerWindow } from "./ledger";
import { metricRecord } from "./metric-record";
import { alignLogs, priorRecoverySessions, sessionDayNumbers } from "./series";
import {
  METRICS,
  type AthleteProfile,
  type LoadView,
  type LogInput,
  type Metric,
  type SessionInput,
  type TeamLoadSettings,
} from "./types";
import { previewSeedFrom, type WeekPreviewContext } from "./week-preview";
import { judgedPeak, type WeekSummary } from "./week-summary";
import { dateFromDayIndex, dayIndex } from "@/lib/dates/plain-date";

export interface LedgerWeekInput {
  /** A window from at least weekStartDay − 7 to weekStartDay + 6. */
  window: LedgerWindow;
  /** The athlete's sessions (and their logs) of [weekStartDay − recoveryLookBackDays, weekStartDay + 6]; more do no harm. */
  sessions: readonly SessionInput[];
  logs: readonly LogInput[];
  profile: AthleteProfile;
  settings: TeamLoadSettings;
  view: LoadView;
  todayDay: number;
  weekStartDay: number;
}

export interface LedgerWeek {
  week: WeekSummary;
  flags: Flag[];
  topLevel: FlagLevel | null;
  /** The week's judged ACWR of every metric (team method). */
  peakRatios: Record<Metric, number | null>;
}

export function weekFromLedger(input: LedgerWeekInput): LedgerWeek {
  return weekOf(columnsOf(input), input.weekStartDay);
}

type WeekColumns = { cols: AthleteColumns; req: ColumnsRequest; win: LedgerWindow };

/** What every week of one window shares: the columns and the sessions with their logs lined up, worked out once. */
function columnsOf(input: Omit<LedgerWeekInput, "weekStartDay">): WeekColumns {
  const { window: win, sessions, settings } = input;
  const cols: AthleteColumns = {
    ...win,
    sessionDays: sessionDayNumbers(sessions),
    rp: resolveProfile(input.profile, settings),
  };
  const req: ColumnsRequest = {
    profile: input.profile,
    settings,
    sessions,
    logFor: alignLogs(sessions, input.logs),
    view: input.view,
    todayDay: input.todayDay,
    fromDay: win.startDay,
    toDay: win.startDay + win.length - 1,
  };
  return { cols, req, win };
}

function weekOf({ cols, req, win }: WeekColumns, weekStartDay: number): LedgerWeek {
  const { week, flags } = weekFromColumns(cols, req, weekStartDay);
  const w = weekStartDay - win.startDay;
  const peakRatios = metricRecord((m) => judgedPeak(win.acwr[m].ratio, win.provisional, w, w + 7)?.value ?? null);
  return { week, flags, topLevel: topFlagLevel(flags), peakRatios };
}

/**
 * Several weeks of one athlete from the stored rows the weeks need (ledgerReadRange of [fromDay, toDay]) and the
 * sessions from the recovery look-back before the first week: each week's summary and flags as weekFromLedger
 * answers it. The server's season view and the browser's progression preview both call it.
 */
export function ledgerWeeks(input: {
  rows: readonly LedgerRow[];
  sessions: readonly SessionInput[];
  logs: readonly LogInput[];
  profile: AthleteProfile;
  settings: TeamLoadSettings;
  /** Week starts, ascending; the window runs from the week before the first to `toDay`. */
  starts: readonly string[];
  toDay: number;
  todayDay: number;
  view: LoadView;
  method: LedgerMethod;
}): Map<string, LedgerWeek> {
  const { rows, starts, toDay, todayDay, view, method } = input;
  const fromDay = dayIndex(starts[0]) - 7;
  const window = ledgerWindow({ rows, fromDay, toDay, todayDay, view, method });
  const shared = columnsOf({ ...input, window });
  return new Map(starts.map((weekStart) => [weekStart, weekOf(shared, dayIndex(weekStart))]));
}

/**
 * The drag preview's context from a ledger window reaching at least 28 days before the week: last week's daily
 * values, the team metric's series state on the 28 days before the week, and the high-intensity sessions of the
 * recovery look-back. A few hundred numbers per athlete, whatever the history; computeWeekPreview continues the
 * series from the seed exactly as the server does (tests/unit/load/ledger-preview.test.ts).
 */
export function ledgerPreviewContext(
  win: LedgerWindow,
  input: Omit<LedgerWeekInput, "window" | "weekStartDay" | "view"> & { weekStart: string },
): WeekPreviewContext {
  const ws = dayIndex(input.weekStart);
  const end = ws - win.startDay; // index of the week's first day
  const from = Math.max(0, end - 7);
  const historyDates: string[] = [];
  for (let i = from; i < end; i++) historyDates.push(dateFromDayIndex(win.startDay + i));
  const historyValues = metricRecord((m) => Array.from(win.values[m].subarray(from, end)));
  const before = win.states.slice(0, end);
  const last = before[before.length - 1];
  const rp = resolveProfile(input.profile, input.settings);
  const logFor = alignLogs(input.sessions, input.logs);
  const priorSessions = priorRecoverySessions(
    input.sessions,
    logFor,
    rp,
    "projected",
    input.todayDay,
    ws,
    input.settings,
  );
  return {
    historyDates,
    historyValues,
    firstDataDate: last && last.onRecord > 0 ? dateFromDayIndex(ws - last.onRecord) : null,
    priorSessions,
    seed: previewSeedFrom(before, METRICS.indexOf(input.settings.acwrMetric)),
  };
}
