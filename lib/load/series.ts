import { ACC_SIZE, addAccToColumns, evaluateSessionInto, resolveProfile, type ResolvedProfile } from "./accumulate";
import { alignLogs, type AlignedLogs } from "./align-logs";
import type { FlagSession } from "./flags";
import { dateFromDayIndex, dayIndex, weekStartOfDay } from "@/lib/dates/plain-date";
import { toSessionMetrics, type SessionMetrics } from "./session-metrics";
import {
  METRICS,
  type AthleteProfile,
  type LoadView,
  type LogInput,
  type Metric,
  type SessionInput,
  type TeamLoadSettings,
} from "./types";

// Local bindings for the per-session loops: CommonJS transpilation (tsx, vitest) turns each imported name
// into a property getter on the module object, which costs more than the call itself in a hot loop.
const parseDay = dayIndex;
const evaluate = evaluateSessionInto;
const addToColumns = addAccToColumns;

/** How one session enters a view. */
export type SessionUse = "logged" | "planned" | "missing" | "none";

/**
 * - a logged session counts as logged (in "actual" only up to today); logs count whatever the session status;
 * - unlogged, before today: 0; "missing" when it was published (drafts and cancelled ones were never asked for);
 * - unlogged, today or later: the plan in "projected" (drafts included, so the coach sees the week being
 *   written; cancelled excluded), nothing in "actual".
 */
export function sessionUse(
  status: SessionInput["status"],
  hasLog: boolean,
  day: number,
  todayDay: number,
  view: LoadView,
): SessionUse {
  if (hasLog) return view === "actual" && day > todayDay ? "none" : "logged";
  if (day < todayDay) return status === "published" ? "missing" : "none";
  return view === "projected" && status !== "cancelled" ? "planned" : "none";
}

export { alignLogs, indexLogs, type AlignedLogs } from "./align-logs";

/** Daily columns over [startDay, startDay + length): one Float64Array per metric, views of one buffer. */
export interface DailyColumns {
  startDay: number;
  length: number;
  values: Record<Metric, Float64Array>;
  logged: Uint8Array;
  missing: Uint8Array;
  /** Index of the first day on record in the view (a session that is logged, planned or missing); null when none. */
  firstDataIndex: number | null;
}

/**
 * The athlete's first day on record in the view, up to toDay: the first day holding a session that counts
 * (logged, planned or missing; lib/load/README.md §5). The daily series starts here; null when none.
 */
export function firstDayOnRecord(
  input: { sessions: readonly SessionInput[]; sessionDays: Int32Array; logFor: AlignedLogs },
  view: LoadView,
  todayDay: number,
  toDay: number,
): number | null {
  let first: number | null = null;
  for (let k = 0; k < input.sessions.length; k++) {
    const day = input.sessionDays[k];
    if (day > toDay || (first !== null && day >= first)) continue;
    const use = sessionUse(input.sessions[k].status, input.logFor[k] !== undefined, day, todayDay, view);
    if (use !== "none") first = day;
  }
  return first;
}

/** One Float64Array per metric (METRICS order), all views of one buffer (a zeroed `into` is used when given). */
export function metricColumns(
  length: number,
  into?: Float64Array,
): { buffer: Float64Array; values: Record<Metric, Float64Array> } {
  const buffer = into ? into.subarray(0, length * METRICS.length) : new Float64Array(length * METRICS.length);
  const values = {} as Record<Metric, Float64Array>;
  METRICS.forEach((m, i) => {
    values[m] = buffer.subarray(i * length, (i + 1) * length);
  });
  return { buffer, values };
}

export function emptyMetricColumns(length: number): Record<Metric, Float64Array> {
  return metricColumns(length).values;
}

/** Day number of every session, parsed once per computation. */
export function sessionDayNumbers(sessions: readonly SessionInput[]): Int32Array {
  const days = new Int32Array(sessions.length);
  for (let i = 0; i < sessions.length; i++) days[i] = parseDay(sessions[i].date);
  return days;
}

export interface ColumnsInput {
  startDay: number;
  length: number;
  sessions: readonly SessionInput[];
  /** sessionDayNumbers(sessions), when the caller already has it. */
  sessionDays?: Int32Array;
  /** alignLogs(sessions, logs). */
  logFor: AlignedLogs;
  rp: ResolvedProfile;
  view: LoadView;
  todayDay: number;
  /** Zeroed scratch to use instead of allocating: ≥ 6·length doubles and ≥ 2·length bytes. */
  scratch?: { f64: Float64Array; u8: Uint8Array };
}

/** Hot path: no per-day or per-session allocation; one scratch accumulator for all sessions. */
export function buildDailyColumns(input: ColumnsInput): DailyColumns {
  const { startDay, length, sessions, logFor, rp, view, todayDay } = input;
  const { buffer, values } = metricColumns(length, input.scratch?.f64);
  const logged = input.scratch ? input.scratch.u8.subarray(0, length) : new Uint8Array(length);
  const missing = input.scratch ? input.scratch.u8.subarray(length, 2 * length) : new Uint8Array(length);
  const days = input.sessionDays ?? sessionDayNumbers(sessions);
  const acc = new Float64Array(ACC_SIZE);
  let firstDataIndex: number | null = null;
  for (let k = 0; k < sessions.length; k++) {
    const i = days[k] - startDay;
    if (i < 0 || i >= length) continue;
    const session = sessions[k];
    const log = logFor[k];
    const use = sessionUse(session.status, log !== undefined, days[k], todayDay, view);
    if (use === "none") continue;
    if (firstDataIndex === null || i < firstDataIndex) firstDataIndex = i;
    if (use === "missing") {
      missing[i] = 1;
      // Missing logs (lib/load/README.md): by default the plan stands in as an estimate.
      if (!rp.estimateMissing) continue;
    }
    evaluate(acc, session, use === "logged" ? log : undefined, rp);
    if (use === "logged") logged[i] = 1;
    addToColumns(acc, buffer, length, i);
  }
  return { startDay, length, values, logged, missing, firstDataIndex };
}

/** A session as it enters a view, with its numbers: what the flags look at. */
export interface EffectiveSession extends SessionMetrics {
  id: string;
  date: string;
  startTime: string;
  /** "estimated": a published past session without a log, counted at its plan (settings.missingLogs "estimate"). */
  use: "logged" | "planned" | "estimated";
}

/** Sessions dated in [fromDay, toDay] that count in the view, with their metrics. */
export function effectiveSessions(
  sessions: readonly SessionInput[],
  logFor: AlignedLogs,
  rp: ResolvedProfile,
  view: LoadView,
  todayDay: number,
  fromDay: number,
  toDay: number,
  sessionDays?: Int32Array,
): EffectiveSession[] {
  const out: EffectiveSession[] = [];
  const acc = new Float64Array(ACC_SIZE);
  for (let k = 0; k < sessions.length; k++) {
    const s = sessions[k];
    const day = sessionDays ? sessionDays[k] : parseDay(s.date);
    if (day < fromDay || day > toDay) continue;
    const log = logFor[k];
    const found = sessionUse(s.status, log !== undefined, day, todayDay, view);
    const use = found === "missing" ? (rp.estimateMissing ? "estimated" : "none") : found;
    if (use === "none") continue;
    evaluate(acc, s, use === "logged" ? log : undefined, rp);
    out.push({ id: s.id, date: s.date, startTime: s.startTime, use, ...toSessionMetrics(acc) });
  }
  return out;
}

export interface DailySeriesInput {
  from: string;
  to: string;
  sessions: readonly SessionInput[];
  logs: readonly LogInput[];
  profile: AthleteProfile;
  settings: TeamLoadSettings;
  view: LoadView;
  today: string;
}

export interface DailySeries {
  dates: string[];
  values: Record<Metric, Float64Array>;
  /** 1 when the day's value came from at least one log. */
  logged: Uint8Array;
  /**
   * 1 where a published session before today has no log: unknown, not a rest day (its plan stands in as an
   * estimate, or 0 with the day left out).
   */
  missing: Uint8Array;
  /** First day on record in the view (for acwrSeries' firstDataIndex); null when none. */
  firstDataIndex: number | null;
}

/** Daily load per metric from `from` to `to` inclusive; rest days are 0. */
export function dailySeries(input: DailySeriesInput): DailySeries {
  const startDay = dayIndex(input.from);
  const length = Math.max(0, dayIndex(input.to) - startDay + 1);
  const cols = buildDailyColumns({
    startDay,
    length,
    sessions: input.sessions,
    logFor: alignLogs(input.sessions, input.logs),
    rp: resolveProfile(input.profile, input.settings),
    view: input.view,
    todayDay: dayIndex(input.today),
  });
  const dates: string[] = new Array(length);
  for (let i = 0; i < length; i++) dates[i] = dateFromDayIndex(startDay + i);
  return {
    dates,
    values: cols.values,
    logged: cols.logged,
    missing: cols.missing,
    firstDataIndex: cols.firstDataIndex,
  };
}

export interface WeeklyTotals {
  weekStarts: string[];
  totals: Record<Metric, Float64Array>;
  /** Days of each week that fall inside the series (7 except at the edges). */
  days: Uint8Array;
}

/** Sums daily values into weeks starting on weekStartDay (ISO: 1 = Monday … 7 = Sunday); edge weeks may be partial. */
export function weeklyTotals(
  dates: readonly string[],
  values: Record<Metric, ArrayLike<number>>,
  weekStartDay = 1,
): WeeklyTotals {
  const n = dates.length;
  if (n === 0) return { weekStarts: [], totals: emptyMetricColumns(0), days: new Uint8Array(0) };
  const first = dayIndex(dates[0]);
  const lead = first - weekStartOfDay(first, weekStartDay);
  const weeks = Math.ceil((n + lead) / 7);
  const totals = emptyMetricColumns(weeks);
  const days = new Uint8Array(weeks);
  for (let i = 0; i < n; i++) days[Math.floor((i + lead) / 7)]++;
  for (const m of METRICS) {
    const src = values[m];
    const dst = totals[m];
    for (let i = 0; i < n; i++) dst[Math.floor((i + lead) / 7)] += src[i];
  }
  const weekStarts: string[] = [];
  for (let w = 0; w < weeks; w++) weekStarts.push(dateFromDayIndex(first - lead + w * 7));
  return { weekStarts, totals, days };
}

/** Days before the week whose sessions the recovery rule looks at (lib/load/README.md §8). */
export function recoveryLookBackDays(settings: Pick<TeamLoadSettings, "recoveryHours">): number {
  return Math.ceil(settings.recoveryHours / 24) + 1;
}

/**
 * The high-intensity sessions in the recovery look-back before a week, shaped for computeFlags: the
 * short-recovery flag of the week's first day needs them.
 */
export function priorRecoverySessions(
  sessions: readonly SessionInput[],
  logFor: AlignedLogs,
  rp: ResolvedProfile,
  view: LoadView,
  todayDay: number,
  weekStartDay: number,
  settings: Pick<TeamLoadSettings, "recoveryHours">,
): FlagSession[] {
  const lookBack = recoveryLookBackDays(settings);
  return effectiveSessions(sessions, logFor, rp, view, todayDay, weekStartDay - lookBack, weekStartDay - 1)
    .filter((s) => s.highIntensity)
    .map((s) => ({
      id: s.id,
      date: s.date,
      startTime: s.startTime,
      contactsByIntensity: s.contactsByIntensity,
      highIntensity: true,
    }));
}
