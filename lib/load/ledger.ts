// The load ledger (lib/load/README.md §12): per athlete × day, the day's metrics in every way the day can count
// and the running state of the ratios, so a read needs only the days it shows (plus 28 before them) instead of
// the whole history. Pure: rows in, rows out; the data layer stores them (lib/data/ledger.ts).
//
// What a day's value is depends on "today" only through whether the day lies before today, is today, or lies
// after it (series.ts sessionUse). So each row keeps one value set per case, none of which depends on the date
// the row was written:
//   past    the day once it is over: logs, and published unlogged sessions as missing (estimated or left out);
//   today   the day as today in the actual view: logs only;
//   ahead   the day as today or later in the projected view: logs and the plan (drafts in, cancelled out);
//   planned the plan alone, logs ignored (the athlete page's plan line).
// The running state (days on record, EWMA, prefix sums) is that of the settled series, every day up to the row
// taken as past. A read for today T uses the stored state up to T − 1 and steps the days from T on with the
// today/ahead values (ledgerWindow), so a day rolling over never leaves a stale ledger behind.
import {
  ACUTE_DAYS,
  ACWR_MIN_HISTORY_DAYS,
  allocAcwrColumns,
  CHRONIC_DAYS,
  ewmaLambda,
  type AcwrColumns,
} from "./acwr";
import { resolveProfile, type ResolvedProfile } from "./accumulate";
import { alignLogs, type AlignedLogs } from "./align-logs";
import { dateFromDayIndex } from "@/lib/dates/plain-date";
import { buildDailyColumns, metricColumns, sessionDayNumbers } from "./series";
import {
  METRICS,
  type AcwrMethod,
  type AthleteProfile,
  type LoadView,
  type LogInput,
  type Metric,
  type SessionInput,
  type TeamLoadSettings,
} from "./types";

const NM = METRICS.length;

/** Row flags. */
export const LEDGER_LOGGED = 1;
const LEDGER_MISSING = 2;
/** A session counts on the day when it is today or later in the projected view (logged, or planned and not cancelled). */
const LEDGER_AHEAD_HAS = 4;

/** The running state of the settled series at the end of one day. */
export interface LedgerState {
  /** Days on record up to and including this day (0 before the first day on record, lib/load/README.md §5). */
  onRecord: number;
  /** Days kept since the first day on record (a missing day is left out under missingLogs "exclude"). */
  kept: number;
  /** Per metric (METRICS order): prefix sum of the kept values since the first day, acute, chronic, ratio (NaN = none). */
  cum: number[];
  acute: number[];
  chronic: number[];
  ratio: number[];
}

export interface LedgerDayValues {
  day: number;
  flags: number;
  past: number[];
  today: number[];
  ahead: number[];
  planned: number[];
}

export type LedgerRow = LedgerDayValues & LedgerState;

/** How the ratios are run: the team's method and whether missing days are left out. */
export interface LedgerMethod {
  method: AcwrMethod;
  exclude: boolean;
}

export function ledgerMethod(settings: TeamLoadSettings): LedgerMethod {
  return { method: settings.acwrMethod, exclude: settings.missingLogs === "exclude" };
}

function zeros(): number[] {
  return new Array<number>(NM).fill(0);
}

const EMPTY_STATE: LedgerState = {
  onRecord: 0,
  kept: 0,
  cum: zeros(),
  acute: zeros(),
  chronic: zeros(),
  ratio: zeros().fill(Number.NaN),
};

export interface LedgerSource {
  sessions: readonly SessionInput[];
  logs: readonly LogInput[];
  profile: AthleteProfile;
  settings: TeamLoadSettings;
}

/** The day values of [fromDay, toDay] from an athlete's sessions and logs (every session of those days must be given). */
export function ledgerDayValues(src: LedgerSource, fromDay: number, toDay: number): LedgerDayValues[] {
  const length = Math.max(0, toDay - fromDay + 1);
  if (length === 0) return [];
  const rp = resolveProfile(src.profile, src.settings);
  const logFor: AlignedLogs = alignLogs(src.sessions, src.logs);
  const sessionDays = sessionDayNumbers(src.sessions);
  const columns = (view: LoadView, todayDay: number, o: { rp?: ResolvedProfile; noLogs?: boolean } = {}) =>
    buildDailyColumns({
      startDay: fromDay,
      length,
      sessions: src.sessions,
      sessionDays,
      logFor: o.noLogs ? new Array<undefined>(src.sessions.length) : logFor,
      rp: o.rp ?? rp,
      view,
      todayDay,
    });
  // Every day before today: logs, and missing sessions (series.ts sessionUse).
  const past = columns("projected", toDay + 1);
  // Logs only: the actual view up to today with missing days not estimated.
  const today = columns("actual", toDay + 1, { rp: { ...rp, estimateMissing: false } });
  // Every day today or later: logs and the plan.
  const ahead = columns("projected", fromDay);
  const planned = columns("projected", fromDay, { noLogs: true });
  const aheadHas = new Uint8Array(length);
  for (let k = 0; k < sessionDays.length; k++) {
    const i = sessionDays[k] - fromDay;
    if (i < 0 || i >= length) continue;
    if (logFor[k] !== undefined || src.sessions[k].status !== "cancelled") aheadHas[i] = 1;
  }
  const out: LedgerDayValues[] = new Array(length);
  for (let i = 0; i < length; i++) {
    const pick = (c: typeof past) => METRICS.map((m) => c.values[m][i]);
    out[i] = {
      day: fromDay + i,
      flags:
        (past.logged[i] ? LEDGER_LOGGED : 0) |
        (past.missing[i] ? LEDGER_MISSING : 0) |
        (aheadHas[i] ? LEDGER_AHEAD_HAS : 0),
      past: pick(past),
      today: pick(today),
      ahead: pick(ahead),
      planned: pick(planned),
    };
  }
  return out;
}

/** The value set a day counts with and whether it is on record, for a read on `todayDay` in `view`. */
function dayAs(
  row: LedgerDayValues,
  todayDay: number,
  view: LoadView,
): { values: readonly number[]; has: boolean; missing: boolean; logged: boolean } {
  const logged = (row.flags & LEDGER_LOGGED) !== 0;
  if (row.day < todayDay) {
    const missing = (row.flags & LEDGER_MISSING) !== 0;
    return { values: row.past, has: logged || missing, missing, logged };
  }
  if (view === "projected")
    return { values: row.ahead, has: (row.flags & LEDGER_AHEAD_HAS) !== 0, missing: false, logged };
  if (row.day === todayDay) return { values: row.today, has: logged, missing: false, logged };
  return { values: ZERO_VALUES, has: false, missing: false, logged: false };
}

const ZERO_VALUES: readonly number[] = zeros();

const LA = ewmaLambda(ACUTE_DAYS);
const LC = ewmaLambda(CHRONIC_DAYS);

/**
 * One day of the series from the states before it: `back(k)` is the state k days earlier (k = 1, 7, 28; null when
 * the day has no state, i.e. lies before the first day on record). The same operations in the same order as
 * acwr.ts (acwrInto / acwrSkipping over the series from the first day on record), so the numbers are identical.
 */
function stepLedger(
  back: (k: number) => LedgerState | null,
  day: { values: readonly number[]; has: boolean; missing: boolean },
  m: LedgerMethod,
): LedgerState {
  const prev = back(1) ?? EMPTY_STATE;
  if (prev.onRecord === 0 && !day.has) return EMPTY_STATE;
  const i = prev.onRecord; // index of this day in the series from the first day on record
  const skip = m.exclude && day.missing;
  const keptBit = skip ? 0 : 1;
  const kept = (i === 0 ? 0 : prev.kept) + keptBit;
  const cum = zeros();
  const acute = zeros();
  const chronic = zeros();
  const ratio = zeros();
  const w7 = i + 1 > ACUTE_DAYS ? back(ACUTE_DAYS) : null;
  const w28 = i + 1 > CHRONIC_DAYS ? back(CHRONIC_DAYS) : null;
  for (let k = 0; k < NM; k++) {
    const x = day.values[k];
    const s0 = i === 0 ? 0 : prev.cum[k];
    cum[k] = m.exclude ? s0 + keptBit * x : s0 + x;
    if (m.method === "ewma") {
      let a: number;
      let c: number;
      if (m.exclude) {
        a = i === 0 ? 0 : prev.acute[k];
        c = i === 0 ? 0 : prev.chronic[k];
        if (!skip) {
          if (kept === 1) {
            a = x;
            c = x;
          } else {
            a = LA * x + (1 - LA) * a;
            c = LC * x + (1 - LC) * c;
          }
        }
        ratio[k] = kept > 0 && c > 0 ? a / c : Number.NaN;
      } else {
        a = i === 0 ? x : LA * x + (1 - LA) * prev.acute[k];
        c = i === 0 ? x : LC * x + (1 - LC) * prev.chronic[k];
        ratio[k] = c > 0 ? a / c : Number.NaN;
      }
      acute[k] = a;
      chronic[k] = c;
      continue;
    }
    // Rolling means from prefix sums: s[j] of acwr.ts is the cum of the day j − 1 days after the first.
    const coupled = m.method === "rolling_coupled";
    const sA = w7 ? w7.cum[k] : 0; // s[a0]
    const sC = w28 ? w28.cum[k] : 0; // s[c0]
    const a0 = i + 1 > ACUTE_DAYS ? i + 1 - ACUTE_DAYS : 0;
    const c0 = i + 1 > CHRONIC_DAYS ? i + 1 - CHRONIC_DAYS : 0;
    const end = i - ACUTE_DAYS + 1;
    if (!m.exclude) {
      const a = (cum[k] - sA) / (i + 1 - a0);
      const c = coupled ? (cum[k] - sC) / (i + 1 - c0) : end > c0 ? (sA - sC) / (end - c0) : 0;
      acute[k] = a;
      chronic[k] = c;
      ratio[k] = c > 0 ? a / c : Number.NaN;
      continue;
    }
    const kA = w7 ? w7.kept : 0;
    const kC = w28 ? w28.kept : 0;
    const mean = (s1: number, s2: number, k1: number, k2: number) => (k2 - k1 > 0 ? (s2 - s1) / (k2 - k1) : Number.NaN);
    const a = mean(sA, cum[k], kA, kept);
    const c = coupled ? mean(sC, cum[k], kC, kept) : end > c0 ? mean(sC, sA, kC, kA) : 0;
    acute[k] = Number.isFinite(a) ? a : 0;
    chronic[k] = Number.isFinite(c) ? c : 0;
    ratio[k] = Number.isFinite(a) && c > 0 ? a / c : Number.NaN;
  }
  return { onRecord: i + 1, kept, cum, acute, chronic, ratio };
}

/**
 * Runs the series over consecutive days. `before` holds the states of the days just before days[0] (oldest first,
 * up to 28 of them; fewer when the athlete's record starts later). Each day counts as `countAs(day)` says.
 */
export function runLedger<D extends { day: number }>(
  before: readonly LedgerState[],
  days: readonly D[],
  countAs: (d: D) => { values: readonly number[]; has: boolean; missing: boolean },
  m: LedgerMethod,
): LedgerState[] {
  const states: LedgerState[] = [...before];
  const offset = before.length;
  for (let j = 0; j < days.length; j++) {
    const at = offset + j;
    states.push(stepLedger((k) => states[at - k] ?? null, countAs(days[j]), m));
  }
  return states.slice(offset);
}

/** Ledger rows of [fromDay, toDay] from the day values, continuing from the stored states of the 28 days before. */
export function recomputeLedger(
  values: readonly LedgerDayValues[],
  before: readonly LedgerState[],
  m: LedgerMethod,
): LedgerRow[] {
  const states = runLedger(before, values, (d) => dayAs(d, Number.POSITIVE_INFINITY, "projected"), m);
  return values.map((v, j) => {
    const s = states[j];
    return {
      day: v.day,
      flags: v.flags,
      past: v.past,
      today: v.today,
      ahead: v.ahead,
      planned: v.planned,
      onRecord: s.onRecord,
      kept: s.kept,
      cum: s.cum,
      acute: s.acute,
      chronic: s.chronic,
      ratio: s.ratio,
    };
  });
}

/** An athlete's whole ledger from scratch: rows from the first to the last day holding a session. */
export function buildLedger(src: LedgerSource): LedgerRow[] {
  const days = sessionDayNumbers(src.sessions);
  if (days.length === 0) return [];
  let first = days[0];
  let last = days[0];
  for (let k = 1; k < days.length; k++) {
    if (days[k] < first) first = days[k];
    if (days[k] > last) last = days[k];
  }
  return recomputeLedger(ledgerDayValues(src, first, last), [], ledgerMethod(src.settings));
}

/** Daily columns and ratios of [fromDay, toDay] for a read on `todayDay`, in the shape the week summary and flags read. */
export interface LedgerWindow {
  startDay: number;
  length: number;
  values: Record<Metric, Float64Array>;
  logged: Uint8Array;
  missing: Uint8Array;
  /** Index (relative to startDay) of the first day on record; negative when it lies before the window, null when none. */
  firstDataIndex: number | null;
  acwr: Record<Metric, AcwrColumns>;
  provisional: Uint8Array;
  firstDate: string;
  /** The series state at the end of each day of the window (what a drag preview continues from). */
  states: LedgerState[];
}

export interface LedgerWindowInput {
  /**
   * One athlete's stored rows, ascending by day: every row of [min(fromDay, todayDay) − 28, toDay] and the 28 rows
   * up to the last one before that range (ledgerReadRange). Missing days hold no session.
   */
  rows: readonly LedgerRow[];
  fromDay: number;
  toDay: number;
  todayDay: number;
  view: LoadView;
  method: LedgerMethod;
}

/** The stored rows a window needs: [from, toDay] plus the 28 rows up to the last stored day before `from`. */
export function ledgerReadRange(fromDay: number, toDay: number, todayDay: number): { from: number; to: number } {
  return { from: Math.min(fromDay, todayDay) - CHRONIC_DAYS, to: toDay };
}

const NO_SESSIONS: Omit<LedgerDayValues, "day"> = {
  flags: 0,
  past: zeros(),
  today: zeros(),
  ahead: zeros(),
  planned: zeros(),
};

/**
 * The window from stored rows: days before today keep their stored state; from today on (and across days with no
 * row) the series is stepped with the values the day counts with on `todayDay`. The work grows with the days
 * shown and the days between today and the window, never with the length of the history.
 */
export function ledgerWindow(input: LedgerWindowInput): LedgerWindow {
  const { rows, fromDay, toDay, todayDay, view, method } = input;
  const length = Math.max(0, toDay - fromDay + 1);
  const { values } = metricColumns(length);
  const logged = new Uint8Array(length);
  const missing = new Uint8Array(length);
  const provisional = new Uint8Array(length);
  const acwr = {} as Record<Metric, AcwrColumns>;
  for (const m of METRICS) acwr[m] = allocAcwrColumns(length);
  const startDay = rows.length > 0 ? Math.min(rows[0].day, fromDay) : fromDay;
  const states: LedgerState[] = [];
  let r = 0;
  let last: LedgerState = EMPTY_STATE;
  const shown: LedgerState[] = [];
  for (let d = startDay; d <= toDay; d++) {
    while (r < rows.length && rows[r].day < d) r++;
    const row = r < rows.length && rows[r].day === d ? rows[r] : null;
    const at = states.length;
    const counted = dayAs(row ?? { day: d, ...NO_SESSIONS }, todayDay, view);
    const state = row && d < todayDay ? row : stepLedger((k) => states[at - k] ?? null, counted, method);
    states.push(state);
    last = state;
    const i = d - fromDay;
    if (i < 0) continue;
    shown.push(state);
    logged[i] = counted.logged ? 1 : 0;
    missing[i] = counted.missing ? 1 : 0;
    provisional[i] = state.onRecord < ACWR_MIN_HISTORY_DAYS ? 1 : 0;
    METRICS.forEach((m, k) => {
      values[m][i] = counted.values[k];
      acwr[m].acute[i] = state.acute[k];
      acwr[m].chronic[i] = state.chronic[k];
      acwr[m].ratio[i] = state.ratio[k];
    });
  }
  const firstDataIndex = last.onRecord > 0 ? toDay - last.onRecord + 1 - fromDay : null;
  return {
    startDay: fromDay,
    length,
    values,
    logged,
    missing,
    firstDataIndex,
    acwr,
    provisional,
    firstDate: dateFromDayIndex(fromDay),
    states: shown,
  };
}

/**
 * Rows whose day values are replaced by `values` where the days match (states kept): a view that leaves some
 * sessions out (an athlete's own view has no drafts) over the days it recomputes. Sound where the stored
 * state does not depend on the sessions left out: drafts never count before today (sessionUse; a draft cannot
 * be logged), so their rows before today hold the same values and states either way.
 */
export function withDayValues(rows: readonly LedgerRow[], values: readonly LedgerDayValues[]): LedgerRow[] {
  if (values.length === 0) return [...rows];
  const first = values[0].day;
  return rows.map((r) => {
    const v = values[r.day - first];
    return v && v.day === r.day ? { ...r, ...v } : r;
  });
}
