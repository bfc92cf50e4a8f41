import { describe, expect, it } from "vitest";
import { acwrSeries } from "@/lib/load/acwr";
import { computeAthleteLoad } from "@/lib/load/athlete-load";
import { addDays } from "@/lib/dates/plain-date";
import { dailySeries } from "@/lib/load/series";
import { computeSquadWeek } from "@/lib/load/squad";
import { METRICS, type AcwrMethod, type SessionInput } from "@/lib/load/types";
import { buildWeekPreviewContext, computeWeekPreview } from "@/lib/load/week-preview";
import { PROFILE, SETTINGS, log, plyoBlock, drill, runBlock, session } from "./fixtures";
import { synthAthlete } from "./synth";

const START = "2025-01-06";
const TODAY = "2025-12-10"; // a Wednesday
const WEEK = "2025-12-08";
const ath = synthAthlete(7, START, 400, TODAY);

describe("computeAthleteLoad", () => {
  const base = {
    profile: ath.profile,
    settings: SETTINGS,
    sessions: ath.sessions,
    logs: ath.logs,
    today: TODAY,
    weekStart: WEEK,
  };

  it.each(["actual", "projected"] as const)(
    "%s: day rows equal dailySeries + acwrSeries over the full history",
    (view) => {
      const res = computeAthleteLoad({ ...base, from: "2025-11-01", to: "2025-12-31", view });
      expect(res.days).toHaveLength(61);
      expect(res.historyStart).toBe(ath.sessions[0].date);
      const full = dailySeries({ ...base, from: res.historyStart, to: "2025-12-31", view });
      const off = full.dates.indexOf("2025-11-01");
      for (const m of METRICS) {
        const acwr = acwrSeries(full.values[m], SETTINGS.acwrMethod, { firstDataIndex: full.firstDataIndex });
        res.days.forEach((day, k) => {
          expect(day.values[m]).toBe(full.values[m][off + k]);
          expect(day.acute[m]).toBe(acwr.acute[off + k]);
          expect(day.ratio[m]).toBe(acwr.ratio[off + k]);
        });
      }
      res.days.forEach((day, k) => {
        expect(day.date).toBe(full.dates[off + k]);
        expect(day.logged).toBe(full.logged[off + k] === 1);
        expect(day.missing).toBe(full.missing[off + k] === 1);
      });
    },
  );

  it("uses history before `from` for the chronic load", () => {
    const old = session("2025-09-01", { plannedRpe: 8, durationMin: 90 });
    const recent = session("2025-11-03", { plannedRpe: 5, durationMin: 60 });
    const input = {
      profile: PROFILE,
      settings: SETTINGS,
      logs: [log(old.id), log(recent.id)],
      from: "2025-11-01",
      to: "2025-11-10",
      today: TODAY,
      view: "actual" as const,
      weekStart: "2025-11-03",
    };
    const withOld = computeAthleteLoad({ ...input, sessions: [old, recent] });
    const without = computeAthleteLoad({ ...input, sessions: [recent] });
    expect(withOld.days[0].chronic.srpe).toBeGreaterThan(0);
    expect(without.days[0].chronic.srpe).toBe(0);
    expect(withOld.historyStart).toBe("2025-09-01");
  });

  it("summarises the week: totals, previous week, change, monotony, peak ratio", () => {
    const res = computeAthleteLoad({ ...base, from: WEEK, to: addDays(WEEK, 6), view: "projected" });
    const sum = (m: (typeof METRICS)[number]) => res.days.reduce((s, d) => s + d.values[m], 0);
    for (const m of METRICS) expect(res.week.totals[m]).toBeCloseTo(sum(m), 9);
    const peak = Math.max(...res.days.map((d) => d.ratio.srpe ?? -1));
    expect(res.week.peakRatio).toBe(peak);
    expect(res.week.weekEnd).toBe("2025-12-14");
    expect(res.week.ratioProvisional).toBe(false);
  });

  it("a constant month then a doubled week raises a spike with a readable reason", () => {
    const sessions: SessionInput[] = [];
    for (let d = 0; d < 56; d++)
      sessions.push(session(addDays("2026-01-05", d), { plannedRpe: 5, durationMin: d >= 49 ? 120 : 60 }));
    const res = computeAthleteLoad({
      profile: PROFILE,
      settings: { ...SETTINGS, acwrMethod: "rolling_coupled" },
      sessions,
      logs: [],
      from: "2026-02-23",
      to: "2026-03-01",
      today: "2026-01-01",
      view: "projected",
      weekStart: "2026-02-23",
    });
    // Coupled: acute 600, chronic (21·300 + 7·600)/28 = 375 → 1.6 on the Sunday (as R3, lib/load/README.md §6 [C]).
    const spike = res.flags.find((f) => f.kind === "spike");
    expect(spike?.value).toBeCloseTo(1.6, 9);
    expect(spike?.reason).toBe(
      "ACWR (sRPE, rolling, coupled) 1.60 on Sun 1 Mar is at or above the spike threshold 1.50.",
    );
    expect(res.flags.find((f) => f.kind === "weekly_jump" && f.metric === "srpe")?.value).toBe(100);
  });

  it("snaps weekStart to weekStartDay when given", () => {
    const res = computeAthleteLoad({
      ...base,
      from: WEEK,
      to: WEEK,
      view: "actual",
      weekStart: "2025-12-11",
      weekStartDay: 1,
    });
    expect(res.week.weekStart).toBe(WEEK);
  });
});

describe("computeWeekPreview (drag preview fast path)", () => {
  const weekEnd = addDays(WEEK, 6);
  const inWeek = (s: SessionInput) => s.date >= WEEK && s.date <= weekEnd;

  it.each(["ewma", "rolling_coupled", "rolling_uncoupled"] as AcwrMethod[])(
    "%s: with the full history it equals computeAthleteLoad's week and flags exactly",
    (acwrMethod) => {
      const settings = { ...SETTINGS, acwrMethod };
      // A high-intensity week so the recovery and contact rules have something to say.
      const extra = [
        session(TODAY, {
          id: "x1",
          startTime: "17:00",
          blocks: [runBlock("max_velocity", { reps: 6, start: "flying", runInM: 20 })],
        }),
        session(addDays(TODAY, 1), { id: "x2", startTime: "09:00", blocks: [plyoBlock([drill(5, 10, 3, "high")])] }),
      ];
      const sessions = [...ath.sessions, ...extra];
      const full = computeAthleteLoad({
        profile: ath.profile,
        settings,
        sessions,
        logs: ath.logs,
        from: WEEK,
        to: weekEnd,
        today: TODAY,
        view: "projected",
        weekStart: WEEK,
      });
      const ctx = buildWeekPreviewContext({
        profile: ath.profile,
        settings,
        sessions,
        logs: ath.logs,
        weekStart: WEEK,
        today: TODAY,
      });
      const weekSessions = sessions.filter(inWeek);
      const ids = new Set(weekSessions.map((s) => s.id));
      const preview = computeWeekPreview({
        ...ctx,
        weekSessions,
        weekLogs: ath.logs.filter((l) => ids.has(l.sessionId)),
        profile: ath.profile,
        settings,
        weekStart: WEEK,
        today: TODAY,
      });
      expect(preview.week).toEqual(full.week);
      expect(preview.flags).toEqual(full.flags);
      expect(full.flags.some((f) => f.kind === "recovery")).toBe(true);
      expect(full.flags.some((f) => f.kind === "plyo_volume")).toBe(true);
    },
  );

  it("context survives JSON and a dragged session changes the preview", () => {
    const ctx = JSON.parse(
      JSON.stringify(
        buildWeekPreviewContext({
          profile: ath.profile,
          settings: SETTINGS,
          sessions: ath.sessions,
          logs: ath.logs,
          weekStart: WEEK,
          today: TODAY,
        }),
      ),
    );
    const weekSessions = ath.sessions.filter(inWeek);
    const args = { ...ctx, weekLogs: [], profile: ath.profile, settings: SETTINGS, weekStart: WEEK, today: TODAY };
    const before = computeWeekPreview({ ...args, weekSessions });
    const moved = weekSessions.map((s) => (s.date > TODAY ? { ...s, date: weekEnd, startTime: "08:00" } : s));
    const after = computeWeekPreview({ ...args, weekSessions: moved });
    expect(after.week.totals.srpe).toBeCloseTo(before.week.totals.srpe, 9);
    expect(after.week.monotony.srpe).not.toBe(before.week.monotony.srpe);
  });

  // Its speed (target < 1 ms per athlete with two years of history) is measured by npm run bench:load, which
  // times this same call; here only what it computes.
  it("with two years of history it equals computeAthleteLoad's week and flags", () => {
    const big = synthAthlete(11, "2024-01-01", 730, "2025-12-10");
    const ctx = buildWeekPreviewContext({
      profile: big.profile,
      settings: SETTINGS,
      sessions: big.sessions,
      logs: big.logs,
      weekStart: WEEK,
      today: TODAY,
    });
    const weekSessions = big.sessions.filter(inWeek);
    const ids = new Set(weekSessions.map((s) => s.id));
    const preview = computeWeekPreview({
      ...ctx,
      weekSessions,
      weekLogs: big.logs.filter((l) => ids.has(l.sessionId)),
      profile: big.profile,
      settings: SETTINGS,
      weekStart: WEEK,
      today: TODAY,
    });
    const full = computeAthleteLoad({
      profile: big.profile,
      settings: SETTINGS,
      sessions: big.sessions,
      logs: big.logs,
      from: WEEK,
      to: weekEnd,
      today: TODAY,
      view: "projected",
      weekStart: WEEK,
    });
    expect(weekSessions.length).toBeGreaterThan(0);
    expect(preview.week).toEqual(full.week);
    expect(preview.flags).toEqual(full.flags);
  });
});

describe("computeSquadWeek", () => {
  it("returns one row per athlete with the same week as computeAthleteLoad", () => {
    const squad = [ath, synthAthlete(8, START, 400, TODAY), synthAthlete(9, "2025-11-20", 40, TODAY)];
    const rows = computeSquadWeek(squad, SETTINGS, WEEK, TODAY, "actual");
    expect(rows.map((r) => r.id)).toEqual(squad.map((a) => a.id));
    squad.forEach((a, i) => {
      const single = computeAthleteLoad({
        profile: a.profile,
        settings: SETTINGS,
        sessions: a.sessions,
        logs: a.logs,
        from: WEEK,
        to: WEEK,
        today: TODAY,
        view: "actual",
        weekStart: WEEK,
      });
      expect(rows[i].week).toEqual(single.week);
      expect(rows[i].flags).toEqual(single.flags);
      expect(rows[i].peakRatios.srpe).toBe(single.week.peakRatio);
    });
    expect(rows[2].week.ratioProvisional).toBe(true);
  });
});

describe("computeWeekPreview with a shortened history", () => {
  it("a first-data date before the history sent still counts as long history (not provisional)", () => {
    const ctx = buildWeekPreviewContext({
      profile: ath.profile,
      settings: SETTINGS,
      sessions: ath.sessions,
      logs: ath.logs,
      weekStart: WEEK,
      today: TODAY,
      historyDays: 84,
    });
    expect(ctx.historyDates).toHaveLength(84);
    expect(ctx.firstDataDate! < ctx.historyDates[0]).toBe(true);
    const weekSessions = ath.sessions.filter((s) => s.date >= WEEK && s.date <= addDays(WEEK, 6));
    const ids = new Set(weekSessions.map((s) => s.id));
    const weekLogs = ath.logs.filter((l) => ids.has(l.sessionId));
    const preview = computeWeekPreview({
      ...ctx,
      weekSessions,
      weekLogs,
      profile: ath.profile,
      settings: SETTINGS,
      weekStart: WEEK,
      today: TODAY,
    });
    const full = computeAthleteLoad({
      profile: ath.profile,
      settings: SETTINGS,
      sessions: ath.sessions,
      logs: ath.logs,
      from: WEEK,
      to: WEEK,
      today: TODAY,
      view: "projected",
      weekStart: WEEK,
    });
    expect(preview.week.ratioProvisional).toBe(false);
    // 84 days of history leave (27/29)^84 ≈ 0.25% of the chronic seed error (lib/load/README.md §6): close, not equal.
    expect(preview.week.peakRatio!).toBeCloseTo(full.week.peakRatio!, 2);
  });

  it("no history and no data: everything provisional, no ratio", () => {
    const preview = computeWeekPreview({
      historyDates: [],
      historyValues: { hsrM: [], nearMaxM: [], sprintM: [], sprintSteps: [], contacts: [], srpe: [] },
      weekSessions: [],
      weekLogs: [],
      profile: PROFILE,
      settings: SETTINGS,
      weekStart: WEEK,
      today: TODAY,
    });
    expect(preview.week.peakRatio).toBeNull();
    expect(preview.week.ratioProvisional).toBe(true);
    expect(preview.flags).toEqual([]);
  });
});
