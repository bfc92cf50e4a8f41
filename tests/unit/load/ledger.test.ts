import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { computeAthleteColumns } from "@/lib/load/athlete-load";
import { addDays, dayIndex } from "@/lib/dates/plain-date";
import {
  buildLedger,
  ledgerDayValues,
  ledgerMethod,
  ledgerReadRange,
  ledgerWindow,
  recomputeLedger,
  type LedgerRow,
} from "@/lib/load/ledger";
import { alignLogs } from "@/lib/load/series";
import {
  ACWR_METHODS,
  DEFAULT_TEAM_LOAD_SETTINGS,
  METRICS,
  type LoadView,
  type TeamLoadSettings,
} from "@/lib/load/types";
import { synthAthlete } from "./synth";

// The ledger is a cache of the engine's one series (lib/load/README.md §5, §12): reading a window from stored rows
// must give exactly the numbers computeAthleteColumns gives from the whole history, for any today and view.

const START = "2025-01-06";
const DAYS = 150;

/** What the repository hands over: the rows of the read range and the 28 rows up to the last one before it. */
function storedRowsFor(all: readonly LedgerRow[], fromDay: number, toDay: number, todayDay: number): LedgerRow[] {
  const range = ledgerReadRange(fromDay, toDay, todayDay);
  const before = all.filter((r) => r.day < range.from);
  const last = before.length > 0 ? before[before.length - 1].day : null;
  return all.filter(
    (r) => (r.day >= range.from && r.day <= range.to) || (last !== null && r.day <= last && r.day > last - 28),
  );
}

function same(a: number, b: number): boolean {
  return Object.is(a, b) || (Number.isNaN(a) && Number.isNaN(b));
}

const caseArb = fc.record({
  seed: fc.integer({ min: 1, max: 10_000 }),
  today: fc.integer({ min: -20, max: DAYS + 60 }),
  from: fc.integer({ min: -40, max: DAYS + 80 }),
  span: fc.integer({ min: 0, max: 40 }),
  view: fc.constantFrom<LoadView>("actual", "projected"),
  method: fc.constantFrom(...ACWR_METHODS),
  missingLogs: fc.constantFrom<TeamLoadSettings["missingLogs"]>("estimate", "exclude"),
});

describe("load ledger", () => {
  it("a window read from stored rows equals the engine over the whole history, day by day, bit for bit", () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const today = addDays(START, c.today);
        const a = synthAthlete(c.seed, START, DAYS, addDays(START, DAYS));
        const settings: TeamLoadSettings = {
          ...DEFAULT_TEAM_LOAD_SETTINGS,
          acwrMethod: c.method,
          missingLogs: c.missingLogs,
        };
        const rows = buildLedger({ sessions: a.sessions, logs: a.logs, profile: a.profile, settings });
        const fromDay = dayIndex(START) + c.from;
        const toDay = fromDay + c.span;
        const todayDay = dayIndex(today);
        const win = ledgerWindow({
          rows: storedRowsFor(rows, fromDay, toDay, todayDay),
          fromDay,
          toDay,
          todayDay,
          view: c.view,
          method: ledgerMethod(settings),
        });
        const cols = computeAthleteColumns({
          profile: a.profile,
          settings,
          sessions: a.sessions,
          logFor: alignLogs(a.sessions, a.logs),
          view: c.view,
          todayDay,
          fromDay,
          toDay,
        });
        const off = fromDay - cols.startDay;
        const engineFirst = cols.firstDataIndex === null ? null : cols.firstDataIndex - off;
        expect(win.firstDataIndex).toBe(engineFirst);
        for (let i = 0; i < win.length; i++) {
          expect(win.provisional[i]).toBe(cols.provisional[i + off]);
          expect(win.missing[i]).toBe(cols.missing[i + off]);
          expect(win.logged[i]).toBe(cols.logged[i + off]);
          for (const m of METRICS) {
            const got = [win.values[m][i], win.acwr[m].acute[i], win.acwr[m].chronic[i], win.acwr[m].ratio[i]];
            const want = [
              cols.values[m][i + off],
              cols.acwr[m].acute[i + off],
              cols.acwr[m].chronic[i + off],
              cols.acwr[m].ratio[i + off],
            ];
            got.forEach((g, j) => {
              if (!same(g, want[j])) expect({ m, i, j, g }).toEqual({ m, i, j, g: want[j] });
            });
          }
        }
      }),
      { numRuns: 150 },
    );
  });

  it("recomputing from a changed day onward gives the same rows as a rebuild from scratch", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 10_000 }),
        fc.integer({ min: 0, max: DAYS - 1 }),
        fc.constantFrom(...ACWR_METHODS),
        (seed, cut, method) => {
          const a = synthAthlete(seed, START, DAYS, addDays(START, DAYS));
          const settings = { ...DEFAULT_TEAM_LOAD_SETTINGS, acwrMethod: method };
          const src = { sessions: a.sessions, logs: a.logs, profile: a.profile, settings };
          const full = buildLedger(src);
          if (full.length === 0) return;
          const from = Math.max(full[0].day, dayIndex(START) + cut);
          const last = full[full.length - 1].day;
          const before = full.filter((r) => r.day < from && r.day >= from - 28);
          const tail = recomputeLedger(ledgerDayValues(src, from, last), before, ledgerMethod(settings));
          expect(tail).toEqual(full.filter((r) => r.day >= from));
        },
      ),
      { numRuns: 40 },
    );
  });
});
