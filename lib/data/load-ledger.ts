import "server-only";
import type { Transaction } from "sequelize";
import { addDays, dayIndex } from "@/lib/dates/plain-date";
import { ledgerMethod, ledgerReadRange, ledgerWindow, type LedgerWindow } from "@/lib/load/ledger";
import { weekFromLedger, type LedgerWeek } from "@/lib/load/ledger-week";
import { recoveryLookBackDays } from "@/lib/load/series";
import type { LoadView } from "@/lib/load/types";
import { ensureLedgerFresh, readLedgerRows } from "./ledger";
import { getLoadSeriesInputs, type LoadAthleteInputs, type LoadInputs } from "./load";

/** The most days before a week the recovery rule can look back (recoveryHours is at most 120 h). */
const MAX_LOOK_BACK_DAYS = 6;

export type LedgerAthleteWeek = LoadAthleteInputs & { window: LedgerWindow; load: LedgerWeek };

/**
 * Every load figure of a week read from the ledger (lib/load/README.md §12): for each athlete (the team's, or
 * `athleteIds`) the window [from, to] (default the week before and the week) and the week's summary and flags.
 * Sessions are read for the week and the recovery look-back only; the ledger rows for the days shown and the 28
 * before, so the cost follows the athletes and days shown, not the length of their history.
 */
export async function getLedgerWeek({
  teamId,
  athleteIds,
  weekStart,
  from,
  to,
  today,
  view,
  transaction,
}: {
  transaction?: Transaction;
  teamId: number;
  athleteIds?: readonly number[];
  weekStart: string;
  from?: string;
  to?: string;
  today: string;
  view: LoadView;
}): Promise<Omit<LoadInputs, "athletes"> & { athletes: LedgerAthleteWeek[] }> {
  const ws = dayIndex(weekStart);
  const fromDay = from ? Math.min(dayIndex(from), ws - 7) : ws - 7;
  const toDay = to ? Math.max(dayIndex(to), ws + 6) : ws + 6;
  await ensureLedgerFresh({ transaction });
  const inputs = await getLoadSeriesInputs({
    teamId,
    athleteIds,
    from: addDays(weekStart, -MAX_LOOK_BACK_DAYS),
    through: addDays(weekStart, 6),
    transaction,
  });
  const todayDay = dayIndex(today);
  const ids = inputs.athletes.map((a) => a.id);
  const rows = await readLedgerRows({ athleteIds: ids, ...ledgerReadRange(fromDay, toDay, todayDay), transaction });
  const method = ledgerMethod(inputs.settings);
  const lookBack = recoveryLookBackDays(inputs.settings);
  return {
    ...inputs,
    athletes: inputs.athletes.map((a) => {
      const window = ledgerWindow({ rows: rows.get(a.id) ?? [], fromDay, toDay, todayDay, view, method });
      const first = addDays(weekStart, -lookBack);
      const sessions = a.sessions.filter((s) => s.date >= first);
      const load = weekFromLedger({
        window,
        sessions,
        logs: a.logs,
        profile: a.profile,
        settings: inputs.settings,
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
      const window = ledgerWindow({ rows: rows.get(a.id) ?? [], fromDay, toDay, todayDay, view, method });
      const weeks = new Map(
        sorted.map((weekStart) => [
          weekStart,
          weekFromLedger({
            window,
            sessions: a.sessions,
            logs: a.logs,
            profile: a.profile,
            settings: inputs.settings,
            view,
            todayDay,
            weekStartDay: dayIndex(weekStart),
          }),
        ]),
      );
      return { ...a, weeks };
    }),
  };
}
