import { describe, expect, it } from "vitest";
import { addDays, dayIndex } from "@/lib/dates/plain-date";
import { computeAthleteColumns } from "@/lib/load/athlete-load";
import { ledgerDayValues } from "@/lib/load/ledger";
import { alignLogs } from "@/lib/load/series";
import { sessionMetrics } from "@/lib/load/session-metrics";
import { DEFAULT_TEAM_LOAD_SETTINGS, METRICS, type AthleteProfile } from "@/lib/load/types";
import { synthAthlete } from "./synth";

// The profile in force on each session's date (lib/speed/README.md §4): an accepted speed test changes the
// figures of sessions from its date on and leaves every earlier one as it was.
const START = "2025-01-06";
const DAYS = 200;
const TODAY = addDays(START, 150);
const TEST_DAY = addDays(START, 100);
const a = synthAthlete(77, START, DAYS, TODAY);
const before: AthleteProfile = { ...a.profile, vmax: 9.2, tau: 1.25, stepLengthM: 2.0 };
const after: AthleteProfile = { ...a.profile, vmax: 9.9, tau: 1.05, stepLengthM: 2.3 };
const withHistory: AthleteProfile = {
  ...after,
  earlier: [{ until: TEST_DAY, vmax: before.vmax, tau: before.tau, stepLengthM: before.stepLengthM }],
};
const settings = { ...DEFAULT_TEAM_LOAD_SETTINGS, speedZones: "relative" as const };

describe("speed profile in force by date", () => {
  it("each session's metrics use the profile of its date", () => {
    let changed = 0;
    for (const s of a.sessions) {
      const got = sessionMetrics(s, withHistory, settings);
      const expected = sessionMetrics(s, s.date < TEST_DAY ? before : after, settings);
      expect(got).toEqual(expected);
      if (s.date >= TEST_DAY && JSON.stringify(expected) !== JSON.stringify(sessionMetrics(s, before, settings)))
        changed++;
    }
    expect(changed).toBeGreaterThan(0);
  });

  it("daily columns: days before the test equal the old profile's, later days the new one's, engine and ledger", () => {
    const req = {
      settings,
      sessions: a.sessions,
      logFor: alignLogs(a.sessions, a.logs),
      view: "projected" as const,
      todayDay: dayIndex(TODAY),
      fromDay: dayIndex(START),
      toDay: dayIndex(START) + DAYS - 1,
    };
    const mixed = computeAthleteColumns({ ...req, profile: withHistory });
    const old = computeAthleteColumns({ ...req, profile: before });
    const fresh = computeAthleteColumns({ ...req, profile: after });
    const cut = dayIndex(TEST_DAY) - mixed.startDay;
    for (const m of METRICS) {
      const v = Array.from(mixed.values[m]);
      expect(v.slice(0, cut)).toEqual(Array.from(old.values[m]).slice(0, cut));
      expect(v.slice(cut)).toEqual(Array.from(fresh.values[m]).slice(cut));
    }
    expect(Array.from(mixed.values.hsrM).slice(cut)).not.toEqual(Array.from(old.values.hsrM).slice(cut));
    // The ledger's day values (the one path every whole-history reader now takes) switch on the same day.
    const day = (profile: AthleteProfile) =>
      ledgerDayValues({ sessions: a.sessions, logs: a.logs, profile, settings }, req.fromDay, req.toDay);
    const [ledgerMixed, ledgerOld, ledgerFresh] = [day(withHistory), day(before), day(after)];
    const at = dayIndex(TEST_DAY) - req.fromDay;
    expect(ledgerMixed.slice(0, at)).toEqual(ledgerOld.slice(0, at));
    expect(ledgerMixed.slice(at)).toEqual(ledgerFresh.slice(at));
    expect(ledgerMixed.slice(at)).not.toEqual(ledgerOld.slice(at));
  });

  it("without earlier profiles nothing changes (the current profile applies on every day)", () => {
    for (const s of a.sessions.slice(0, 20)) {
      expect(sessionMetrics(s, { ...after, earlier: [] }, settings)).toEqual(sessionMetrics(s, after, settings));
    }
  });
});
