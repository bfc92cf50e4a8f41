import { describe, expect, it } from "vitest";
import { blockMetrics } from "@/lib/load/block-metrics";
import { DEFAULT_TEAM_LOAD_SETTINGS, type BlockInput } from "@/lib/load/types";
import { generateWeeks } from "@/lib/season/generate";
import { scaleCounts, scaleMinutes } from "@/lib/season/scale-session";
import type { DraftSession } from "@/lib/season/scale-session";

const flying: BlockInput = {
  kind: "max_velocity",
  title: "Flying 30s",
  running: { sets: 2, reps: 5, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
};
const bounds: BlockInput = {
  kind: "plyometric",
  title: "Bounds",
  drills: [{ name: "Bounds", sets: 3, reps: 4, contactsPerRep: 10, intensity: "high" }],
};
const stretch: BlockInput = { kind: "recovery", title: "Mobility" };
const tuesday: DraftSession<BlockInput> = {
  dayOffset: 1,
  startTime: "17:00",
  durationMin: 90,
  title: "Speed",
  plannedRpe: 7,
  notes: null,
  blocks: [flying, bounds, stretch],
};
const profile = { vmax: 10, tau: 1.1, stepLengthM: 2.2, plyoLevel: "advanced" } as const;

describe("scaled counts", () => {
  it("rounds the total to whole reps and lets the larger count carry the change", () => {
    expect(scaleCounts(3, 4, 1.08)).toEqual({ sets: 3, reps: 4 }); // 12.96 → 13 → 13/3 → 4
    expect(scaleCounts(3, 4, 1.2)).toEqual({ sets: 3, reps: 5 }); // 14.4 → 14 → 14/3 → 5
    expect(scaleCounts(4, 1, 1.1664)).toEqual({ sets: 5, reps: 1 }); // 4.67 → 5 sets
    expect(scaleCounts(1, 1, 0.1)).toEqual({ sets: 1, reps: 1 }); // never below one rep
  });

  it("rounds minutes to 5 and keeps a short session's floor", () => {
    expect(scaleMinutes(90, 1.08)).toBe(95);
    expect(scaleMinutes(90, 0.6)).toBe(55);
    expect(scaleMinutes(30, 0.3)).toBe(20);
    expect(scaleMinutes(15, 0.5)).toBe(15);
  });
});

describe("generated weeks", () => {
  const weeks = generateWeeks({
    source: [tuesday],
    firstWeekStart: "2027-01-04",
    weeks: 4,
    rule: { kind: "build", weeklyIncreasePct: 20, buildWeeks: 2, unloadPct: 50 },
  });

  it("puts each session on the same weekday of each following week", () => {
    expect(weeks.map((w) => w.weekStart)).toEqual(["2027-01-04", "2027-01-11", "2027-01-18", "2027-01-25"]);
    expect(weeks.map((w) => w.sessions[0].date)).toEqual(["2027-01-05", "2027-01-12", "2027-01-19", "2027-01-26"]);
  });

  it("keeps intensity, distance, start and rest; changes only how many", () => {
    for (const w of weeks) {
      const run = w.sessions[0].blocks[0].running!;
      expect({ ...run, sets: 0, reps: 0 }).toEqual({ ...flying.running!, sets: 0, reps: 0 });
      expect(w.sessions[0].plannedRpe).toBe(7);
      expect(w.sessions[0].blocks[2]).toEqual(stretch);
    }
  });

  it("moves the engine's sprint metres and contacts by about the factor", () => {
    // 2 × 5 × 30 m flying at 95 % of 10 m/s: all timed metres are near-max (lib/load/README.md §11).
    const base = blockMetrics(flying, profile, DEFAULT_TEAM_LOAD_SETTINGS);
    const week1 = blockMetrics(weeks[0].sessions[0].blocks[0], profile, DEFAULT_TEAM_LOAD_SETTINGS);
    expect(weeks[0].factor).toBeCloseTo(1.2, 12);
    expect(week1.nearMaxM / base.nearMaxM).toBeCloseTo(1.2, 12); // 10 reps → 12 reps
    const plyo = weeks[2].sessions[0].blocks[1].drills![0];
    expect(plyo.sets * plyo.reps).toBe(Math.round(12 * 1.44 * 0.5)); // week 3 unloads: 12 × 1.44 × 0.5 = 8.64 → 9 reps
  });
});
