import { describe, expect, it } from "vitest";
import { alignLogs, dailySeries, sessionUse, weeklyTotals } from "@/lib/load/series";
import { PROFILE, SETTINGS, log, session } from "./fixtures";

const TODAY = "2026-03-11"; // Wednesday

const a = session("2026-03-09", { plannedRpe: 5 }); // logged
const b = session("2026-03-10"); // published, no log, past → missing
const c = session("2026-03-08", { status: "draft" }); // draft, past, no log → nothing, not missing
const d = session("2026-03-11", { plannedRpe: 5, durationMin: 60 }); // today, unlogged
const e = session("2026-03-12", { status: "draft", plannedRpe: 4, durationMin: 50 }); // future draft
const f = session("2026-03-13", { status: "cancelled" }); // cancelled
const g = session("2026-03-07"); // logged "no"
const sessions = [a, b, c, d, e, f, g];
const logs = [log(a.id, { rpe: 6, minutes: 60 }), log(g.id, { completion: "no" })];

const series = (view: "actual" | "projected", settings = SETTINGS) =>
  dailySeries({ from: "2026-03-07", to: "2026-03-13", sessions, logs, profile: PROFILE, settings, view, today: TODAY });
const EXCLUDE = { ...SETTINGS, missingLogs: "exclude" as const };

describe("dailySeries", () => {
  // Missing logs (lib/load/README.md §11.3): the default counts the plan of an unlogged published past session as an
  // estimate (b: planned RPE 5 × 60 min = 300 AU, Foster 2001) and marks the day; "exclude" leaves it at 0, marked.
  it("actual: only logged work up to today; a past published session without a log is missing, not a rest day", () => {
    const s = series("actual");
    expect(s.dates).toEqual([
      "2026-03-07",
      "2026-03-08",
      "2026-03-09",
      "2026-03-10",
      "2026-03-11",
      "2026-03-12",
      "2026-03-13",
    ]);
    expect(Array.from(s.values.srpe)).toEqual([0, 0, 360, 300, 0, 0, 0]);
    expect(Array.from(s.logged)).toEqual([1, 0, 1, 0, 0, 0, 0]);
    expect(Array.from(s.missing)).toEqual([0, 0, 0, 1, 0, 0, 0]);
    expect(Array.from(series("actual", EXCLUDE).values.srpe)).toEqual([0, 0, 360, 0, 0, 0, 0]);
    expect(Array.from(series("actual", EXCLUDE).missing)).toEqual([0, 0, 0, 1, 0, 0, 0]);
  });

  it("projected: actual up to today plus the plan from today on (drafts in, cancelled out)", () => {
    const s = series("projected");
    expect(Array.from(s.values.srpe)).toEqual([0, 0, 360, 300, 300, 200, 0]);
    expect(Array.from(s.missing)).toEqual([0, 0, 0, 1, 0, 0, 0]);
    expect(Array.from(series("projected", EXCLUDE).values.srpe)).toEqual([0, 0, 360, 0, 300, 200, 0]);
  });

  it("S1: RPE 7 × 60 (420 AU) and RPE 5 × 45 (225 AU) on one day give 645 AU (Foster et al. 2001; lib/load/README.md §3 [C])", () => {
    const am = session("2026-03-09");
    const pm = session("2026-03-09", { startTime: "17:00" });
    const s = dailySeries({
      from: "2026-03-09",
      to: "2026-03-09",
      sessions: [am, pm],
      logs: [log(am.id, { rpe: 7, minutes: 60 }), log(pm.id, { rpe: 5, minutes: 45 })],
      profile: PROFILE,
      settings: SETTINGS,
      view: "actual",
      today: TODAY,
    });
    expect(s.values.srpe[0]).toBe(645);
  });

  it("a log counts whatever the session's status; in actual only up to today", () => {
    const future = session("2026-03-14", { status: "cancelled" });
    const args = {
      from: "2026-03-14",
      to: "2026-03-14",
      sessions: [future],
      logs: [log(future.id, { rpe: 5, minutes: 10 })],
    };
    const common = { profile: PROFILE, settings: SETTINGS, today: TODAY };
    expect(dailySeries({ ...args, ...common, view: "actual" }).values.srpe[0]).toBe(0);
    expect(dailySeries({ ...args, ...common, view: "projected" }).values.srpe[0]).toBe(50);
  });

  it("sessionUse table", () => {
    expect(sessionUse("published", false, 9, 10, "actual")).toBe("missing");
    expect(sessionUse("draft", false, 9, 10, "projected")).toBe("none");
    expect(sessionUse("draft", false, 10, 10, "projected")).toBe("planned");
    expect(sessionUse("cancelled", false, 11, 10, "projected")).toBe("none");
    expect(sessionUse("published", false, 10, 10, "actual")).toBe("none");
    expect(sessionUse("published", true, 11, 10, "actual")).toBe("none");
    expect(sessionUse("published", true, 11, 10, "projected")).toBe("logged");
  });
});

describe("weeklyTotals", () => {
  it("sums into weeks starting Monday (default) or Sunday; edge weeks are partial", () => {
    const s = series("projected", EXCLUDE);
    const mon = weeklyTotals(s.dates, s.values);
    expect(mon.weekStarts).toEqual(["2026-03-02", "2026-03-09"]);
    expect(Array.from(mon.days)).toEqual([2, 5]);
    expect(Array.from(mon.totals.srpe)).toEqual([0, 860]);
    const sun = weeklyTotals(s.dates, s.values, 7); // ISO 7 = Sunday
    expect(sun.weekStarts).toEqual(["2026-03-01", "2026-03-08"]);
    expect(Array.from(sun.totals.srpe)).toEqual([0, 860]);
    expect(Array.from(sun.days)).toEqual([1, 6]);
  });

  it("handles an empty series", () => {
    expect(
      weeklyTotals([], { hsrM: [], nearMaxM: [], sprintM: [], sprintSteps: [], contacts: [], srpe: [] }).weekStarts,
    ).toEqual([]);
  });
});

describe("alignLogs", () => {
  const s1 = session("2026-03-09");
  const s2 = session("2026-03-10");
  const s3 = session("2026-03-11");

  it("pairs logs given in session order in one pass, skipping unlogged sessions", () => {
    const l1 = log(s1.id);
    const l3 = log(s3.id);
    expect(alignLogs([s1, s2, s3], [l1, l3])).toEqual([l1, undefined, l3]);
  });

  it("falls back to matching by id for any other order; a later log for a session wins", () => {
    const l3 = log(s3.id);
    const l1a = log(s1.id, { rpe: 4 });
    const l1b = log(s1.id, { rpe: 6 });
    expect(alignLogs([s1, s2, s3], [l3, l1a])).toEqual([l1a, undefined, l3]);
    expect(alignLogs([s1, s2, s3], [l1a, l1b])).toEqual([l1b, undefined, undefined]);
    expect(alignLogs([s1], [log("elsewhere"), log(s1.id)])[0]?.sessionId).toBe(s1.id);
  });
});
