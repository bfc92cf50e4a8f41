import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { addDays, dateFromDayIndex, dayIndex, startOfWeek } from "@/lib/dates/plain-date";
import { computeAthleteLoad } from "@/lib/load/athlete-load";
import { buildLedger, ledgerMethod, ledgerReadRange, ledgerWindow } from "@/lib/load/ledger";
import { ledgerPreviewContext, weekFromLedger } from "@/lib/load/ledger-week";
import { ACWR_METHODS, DEFAULT_TEAM_LOAD_SETTINGS, METRICS, type TeamLoadSettings } from "@/lib/load/types";
import { computeWeekPreview } from "@/lib/load/week-preview";
import { synthAthlete } from "./synth";

// The week read from the ledger and the drag preview continued from the ledger's seed give the numbers the
// whole-history engine gives (lib/load/README.md §12): the preview shows what the server stores.

const START = "2025-01-06";

describe("ledger week and drag preview", () => {
  it("week summary and flags from the ledger, and the seeded preview, equal computeAthleteLoad", () => {
    fc.assert(
      fc.property(
        fc.record({
          seed: fc.integer({ min: 1, max: 10_000 }),
          week: fc.integer({ min: 0, max: 22 }),
          today: fc.integer({ min: -10, max: 180 }),
          method: fc.constantFrom(...ACWR_METHODS),
          missingLogs: fc.constantFrom<TeamLoadSettings["missingLogs"]>("estimate", "exclude"),
          metric: fc.constantFrom(...METRICS),
        }),
        (c) => {
          const a = synthAthlete(c.seed, START, 150, addDays(START, 150));
          const settings: TeamLoadSettings = {
            ...DEFAULT_TEAM_LOAD_SETTINGS,
            acwrMethod: c.method,
            missingLogs: c.missingLogs,
            acwrMetric: c.metric,
          };
          const weekStart = startOfWeek(addDays(START, 7 * c.week), 1);
          const ws = dayIndex(weekStart);
          const today = addDays(START, c.today);
          const todayDay = dayIndex(today);
          const rows = buildLedger({ sessions: a.sessions, logs: a.logs, profile: a.profile, settings });
          const range = ledgerReadRange(ws - 28, ws + 6, todayDay);
          const window = ledgerWindow({
            rows: rows.filter((r) => r.day >= range.from - 28 && r.day <= range.to),
            fromDay: ws - 28,
            toDay: ws + 6,
            todayDay,
            view: "projected",
            method: ledgerMethod(settings),
          });
          const engine = computeAthleteLoad({
            profile: a.profile,
            settings,
            sessions: a.sessions,
            logs: a.logs,
            from: weekStart,
            to: addDays(weekStart, 6),
            today,
            view: "projected",
            weekStart,
          });
          const fromLedger = weekFromLedger({
            window,
            sessions: a.sessions,
            logs: a.logs,
            profile: a.profile,
            settings,
            view: "projected",
            todayDay,
            weekStartDay: ws,
          });
          expect(fromLedger.week).toEqual(engine.week);
          expect(fromLedger.flags).toEqual(engine.flags);
          const ctx = ledgerPreviewContext(window, {
            sessions: a.sessions,
            logs: a.logs,
            profile: a.profile,
            settings,
            todayDay,
            weekStart,
          });
          const inWeek = a.sessions.filter((s) => s.date >= weekStart && s.date <= dateFromDayIndex(ws + 6));
          const preview = computeWeekPreview({
            ...ctx,
            weekSessions: inWeek,
            weekLogs: a.logs.filter((l) => inWeek.some((s) => s.id === l.sessionId)),
            profile: a.profile,
            settings,
            weekStart,
            today,
          });
          expect(preview.week).toEqual(engine.week);
          expect(preview.flags).toEqual(engine.flags);
        },
      ),
      { numRuns: 120 },
    );
  });
});
