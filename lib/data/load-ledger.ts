import "server-only";
import type { Transaction } from "sequelize";
import { addDays, dateFromDayIndex, dayIndex } from "@/lib/dates/plain-date";
import {
  ledgerDayValues,
  ledgerMethod,
  ledgerReadRange,
  ledgerWindow,
  withDayValues,
  type LedgerRow,
  type LedgerWindow,
} from "@/lib/load/ledger";
import { ledgerWeeks, weekFromLedger, type LedgerWeek } from "@/lib/load/ledger-week";
import { recoveryLookBackDays } from "@/lib/load/series";
import type { LoadView } from "@/lib/load/types";
import { AppError } from "@/lib/errors";
import { ensureLedgerFresh, readLedgerRows } from "./ledger";
import { getLoadSeriesInputs, type LoadAthleteInputs, type LoadInputs } from "./load";

/** The most days before a week the recovery rule can look back (recoveryHours is at most 120 h). */
export const MAX_LOOK_BACK_DAYS = 6;

type SpanRequest = {
  transaction?: Transaction;
  teamId: number;
  athleteIds?: readonly number[];
  /** The days the caller shows (day numbers); rows are read for them and the 28 before. */
  fromDay: number;
  toDay: number;
  todayDay: number;
  /** Sessions are read from this day to toDay (the recovery look-back of the weeks summarised). */
  sessionsFrom: number;
  /** false: the athlete's own view, where a coach's drafts do not exist. */
  withDrafts?: boolean;
  /** Also the week grid's form of the sessions from this day on (getLoadSeriesInputs `gridFrom`). */
  gridFrom?: string;
};

export type LedgerSpan = Omit<LoadInputs, "athletes"> & {
  athletes: (LoadAthleteInputs & { rows: LedgerRow[] })[];
};

/**
 * Each athlete's stored ledger rows for the days shown and the 28 before (lib/load/README.md §12), with the
 * sessions of [sessionsFrom, toDay] only, so the cost follows the athletes and days shown, not the length of
 * their history. Without drafts, the day values from the first day that can differ (today, or fromDay when
 * later) are recomputed from the sessions without them; the stored states before today never count a draft.
 */
export async function readLedgerSpan(req: SpanRequest): Promise<LedgerSpan> {
  const { teamId, athleteIds, fromDay, toDay, todayDay, transaction, gridFrom } = req;
  const withDrafts = req.withDrafts ?? true;
  // From today on the window steps with each day's values; the plan line shows them from fromDay.
  const ownFrom = Math.min(fromDay, todayDay);
  const sessionsFrom = withDrafts ? req.sessionsFrom : Math.min(req.sessionsFrom, ownFrom);
  await ensureLedgerFresh({ transaction, athleteIds });
  const inputs = await getLoadSeriesInputs({
    teamId,
    athleteIds,
    from: dateFromDayIndex(sessionsFrom),
    through: dateFromDayIndex(toDay),
    transaction,
    gridFrom,
  });
  const ids = inputs.athletes.map((a) => a.id);
  const rows = await readLedgerRows({ athleteIds: ids, ...ledgerReadRange(fromDay, toDay, todayDay), transaction });
  return {
    ...inputs,
    athletes: inputs.athletes.map((a) => {
      const stored = rows.get(a.id) ?? [];
      if (withDrafts) return { ...a, rows: stored };
      const sessions = a.sessions.filter((s) => s.status !== "draft");
      const own = { sessions, logs: a.logs, profile: a.profile, settings: inputs.settings };
      const span = sessions.filter((s) => s.date >= dateFromDayIndex(ownFrom));
      return {
        ...a,
        sessions,
        rows: withDayValues(stored, ledgerDayValues({ ...own, sessions: span }, ownFrom, toDay)),
      };
    }),
  };
}

export type LedgerAthleteWeek = LoadAthleteInputs & { window: LedgerWindow; load: LedgerWeek; rows: LedgerRow[] };

/**
 * Every load figure of a week read from the ledger (lib/load/README.md §12): for each athlete (the team's, or
 * `athleteIds`) the window [from, to] (default the week before and the week) and the week's summary and flags.
 * Sessions are read for the week and the recovery look-back only; the ledger rows for the days shown and the 28
 * before, so the cost follows the athletes and days shown, not the length of their history.
 */
export async function getLedgerWeek({
  weekStart,
  from,
  to,
  today,
  view,
  ...rest
}: {
  transaction?: Transaction;
  teamId: number;
  athleteIds?: readonly number[];
  weekStart: string;
  from?: string;
  to?: string;
  today: string;
  view: LoadView;
  withDrafts?: boolean;
  gridFrom?: string;
}): Promise<Omit<LoadInputs, "athletes"> & { athletes: LedgerAthleteWeek[] }> {
  const ws = dayIndex(weekStart);
  const fromDay = from ? Math.min(dayIndex(from), ws - 7) : ws - 7;
  const toDay = to ? Math.max(dayIndex(to), ws + 6) : ws + 6;
  const todayDay = dayIndex(today);
  const span = await readLedgerSpan({ ...rest, fromDay, toDay, todayDay, sessionsFrom: ws - MAX_LOOK_BACK_DAYS });
  const method = ledgerMethod(span.settings);
  const first = addDays(weekStart, -recoveryLookBackDays(span.settings));
  return {
    ...span,
    athletes: span.athletes.map((a) => {
      const window = ledgerWindow({ rows: a.rows, fromDay, toDay, todayDay, view, method });
      const load = weekFromLedger({
        window,
        sessions: a.sessions.filter((s) => s.date >= first),
        logs: a.logs,
        profile: a.profile,
        settings: span.settings,
        view,
        todayDay,
        weekStartDay: ws,
      });
      return { ...a, window, load };
    }),
  };
}

/**
 * Several weeks of the athletes (the team's, or `athleteIds`) from one read of the ledger and of the sessions
 * across them: each week's summary and flags exactly as getLedgerWeek answers that week. The season view and the
 * alert check after a squad-wide write (a generated progression) read their weeks this way, one query per table.
 */
export async function getLedgerWeeks({
  teamId,
  athleteIds,
  starts,
  today,
  view,
  transaction,
}: {
  transaction?: Transaction;
  teamId: number;
  athleteIds?: readonly number[];
  /** Week starts (YYYY-MM-DD), in any order. */
  starts: readonly string[];
  today: string;
  view: LoadView;
}): Promise<Omit<LoadInputs, "athletes"> & { athletes: (LoadAthleteInputs & { weeks: Map<string, LedgerWeek> })[] }> {
  const sorted = [...new Set(starts)].sort();
  const first = sorted[0];
  const last = addDays(sorted[sorted.length - 1], 6);
  await ensureLedgerFresh({ transaction });
  const inputs = await getLoadSeriesInputs({
    teamId,
    athleteIds,
    from: addDays(first, -MAX_LOOK_BACK_DAYS),
    through: last,
    transaction,
  });
  const todayDay = dayIndex(today);
  const fromDay = dayIndex(first) - 7;
  const toDay = dayIndex(last);
  const ids = inputs.athletes.map((a) => a.id);
  const rows = await readLedgerRows({ athleteIds: ids, ...ledgerReadRange(fromDay, toDay, todayDay), transaction });
  const method = ledgerMethod(inputs.settings);
  return {
    ...inputs,
    athletes: inputs.athletes.map((a) => {
      const weeks = ledgerWeeks({
        rows: rows.get(a.id) ?? [],
        sessions: a.sessions,
        logs: a.logs,
        profile: a.profile,
        settings: inputs.settings,
        starts: sorted,
        toDay,
        todayDay,
        view,
        method,
      });
      return { ...a, weeks };
    }),
  };
}

/** One athlete of the team from the ledger; 404 when the athlete is not in the team. */
export async function getAthleteLedgerWeek(
  args: Omit<Parameters<typeof getLedgerWeek>[0], "athleteIds"> & { athleteId: number },
): Promise<{ settings: LoadInputs["settings"]; athlete: LedgerAthleteWeek }> {
  const { athleteId, ...rest } = args;
  const read = await getLedgerWeek({ ...rest, athleteIds: [athleteId] });
  const athlete = read.athletes[0];
  if (!athlete) throw new AppError("not_found", "Not found");
  return { settings: read.settings, athlete };
}
