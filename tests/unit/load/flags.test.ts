import { describe, expect, it } from "vitest";
import { FLAG_DISPLAY, LOAD_CAUTION, flagClasses } from "@/lib/load/flag-display";
import { computeFlags, topFlagLevel, type FlagInput, type FlagSession } from "@/lib/load/flags";
import { emptyMetricColumns } from "@/lib/load/series";
import type { Metric } from "@/lib/load/types";
import { SETTINGS } from "./fixtures";

// Zones after Gabbett 2016, BJSM 50:273 ("0.8–1.3 … sweet spot", "≥1.5 … danger zone"); the 1.3–1.5 band is
// unnamed in the paper, so "climbing" is our own word. Weekly change: Harrison & Johnston 2017 (strictly > 15%).

const FIRST = "2026-02-09"; // Monday, 28 days before the week
const WEEK = "2026-03-09";
const W = 28;

type TestInput = FlagInput & { values: Record<Metric, Float64Array> };

function input(overrides: Partial<FlagInput> & { peak?: [number, number]; provisionalAll?: boolean } = {}): TestInput {
  const ratio = new Float64Array(35).fill(Number.NaN);
  for (let i = W; i < 35; i++) ratio[i] = 1.0;
  if (overrides.peak) ratio[W + overrides.peak[0]] = overrides.peak[1];
  return {
    firstDate: FIRST,
    values: emptyMetricColumns(35),
    ratio,
    provisional: new Uint8Array(35).fill(overrides.provisionalAll ? 1 : 0),
    sessions: [],
    profile: { plyoLevel: "intermediate" },
    settings: SETTINGS,
    weekStart: WEEK,
    ...overrides,
  } as TestInput;
}

describe("ACWR flags use the week's peak ratio", () => {
  it("≥ 1.5 is a spike, an alert with a readable reason", () => {
    const flags = computeFlags(input({ peak: [3, 1.62] }));
    expect(flags).toHaveLength(1);
    expect(flags[0]).toMatchObject({
      kind: "spike",
      level: "alert",
      date: "2026-03-12",
      metric: "srpe",
      value: 1.62,
      threshold: 1.5,
    });
    expect(flags[0].reason).toBe("ACWR (sRPE, EWMA) 1.62 on Thu 12 Mar is at or above the spike threshold 1.50.");
  });

  it("exactly 1.50 is a spike (≥, Gabbett's own sign), 1.4999 is climbing", () => {
    expect(computeFlags(input({ peak: [0, 1.5] }))[0].kind).toBe("spike");
    expect(computeFlags(input({ peak: [0, 1.4999] }))[0].kind).toBe("rising");
  });

  it("[1.3, 1.5) is climbing, a caution", () => {
    const [f] = computeFlags(input({ peak: [1, 1.3] }));
    expect(f).toMatchObject({ kind: "rising", level: "caution", date: "2026-03-10" });
    expect(f.reason).toBe(
      "ACWR (sRPE, EWMA) peaks at 1.30 on Tue 10 Mar, at or above the climbing threshold 1.30 and below the spike threshold 1.50.",
    );
  });

  it("a peak below 0.8 means the whole week is underloaded (info); 0.8 itself is fine", () => {
    const low = input();
    const ratio = low.ratio as Float64Array;
    for (let i = W; i < 35; i++) ratio[i] = 0.5 + (i - W) * 0.01;
    const [f] = computeFlags(low);
    expect(f).toMatchObject({ kind: "low", level: "info", value: 0.56, threshold: 0.8, date: "2026-03-15" });
    expect(f.reason).toContain("stays below 0.80 all week (highest 0.56 on Sun 15 Mar)");
    ratio.fill(0.8, W);
    expect(computeFlags(low)).toEqual([]);
  });

  it("a provisional spike is marked, explained and lowered to a caution", () => {
    const [f] = computeFlags(input({ peak: [3, 2.4], provisionalAll: true }));
    expect(f).toMatchObject({ kind: "spike", level: "caution", provisional: true });
    expect(f.reason).toContain("Provisional: fewer than 28 days on record");
  });

  // Zones are judged on the days with a full history (lib/load/README.md §7); early days give their own caution.
  it("a provisional peak does not hide a later settled spike: the settled day decides, as an alert", () => {
    const t = input({ peak: [5, 2.96] });
    const prov = t.provisional as Uint8Array;
    prov.fill(1, 0, W + 6); // only Sunday has 28 days on record
    (t.ratio as Float64Array)[W + 6] = 2.38;
    const [f] = computeFlags(t);
    expect(f).toMatchObject({ kind: "spike", level: "alert", provisional: false, value: 2.38, date: "2026-03-15" });
  });

  it("early days give a caution when the settled days say less, never an underloaded note", () => {
    const t = input({ peak: [0, 1.7] });
    const prov = t.provisional as Uint8Array;
    prov.fill(1, 0, W + 3);
    const [f] = computeFlags(t);
    expect(f).toMatchObject({ kind: "spike", level: "caution", provisional: true, value: 1.7 });
    const low = input({ provisionalAll: true });
    (low.ratio as Float64Array).fill(0.4, W);
    expect(computeFlags(low)).toEqual([]);
    // Underloaded needs a whole week of settled days: a week whose only settled day is its Sunday gets none.
    const part = input();
    (part.ratio as Float64Array).fill(0.4, W);
    (part.provisional as Uint8Array).fill(1, 0, W + 6);
    expect(computeFlags(part)).toEqual([]);
  });

  it("names the method and metric in use", () => {
    const settings = { ...SETTINGS, acwrMethod: "rolling_uncoupled" as const, acwrMetric: "hsrM" as const };
    const [f] = computeFlags(input({ peak: [3, 1.62], settings }));
    expect(f.reason).toMatch(/^ACWR \(HSR, rolling, uncoupled\) 1\.62/);
    expect(f.metric).toBe("hsrM");
  });

  it("no ratio in the week → no ACWR flag", () => {
    const none = input();
    (none.ratio as Float64Array).fill(Number.NaN);
    expect(computeFlags(none)).toEqual([]);
  });
});

describe("weekly jump: strictly more than the limit", () => {
  function withWeeks(prev: number, cur: number) {
    const i = input();
    i.values.srpe[W - 7] = prev;
    i.values.srpe[W + 2] = cur;
    return computeFlags(i).filter((f) => f.kind === "weekly_jump");
  }

  it("+15% exactly passes, +25% is flagged with a reason", () => {
    expect(withWeeks(2000, 2300)).toEqual([]);
    const [f] = withWeeks(2000, 2500);
    expect(f).toMatchObject({ level: "caution", metric: "srpe", value: 25, threshold: 15, date: WEEK });
    expect(f.reason).toBe(
      "sRPE load: 2,500 AU this week, up 25.0% on last week's 2,000 AU, more than the 15.0% limit.",
    );
  });

  it("last week 0 → no flag (change undefined)", () => {
    expect(withWeeks(0, 2500)).toEqual([]);
  });

  it("checks HSR, near-max and contacts too, but not sprint steps (they move with sprint metres)", () => {
    const i = input();
    for (const m of ["hsrM", "nearMaxM", "sprintM", "sprintSteps", "contacts"] as const) {
      i.values[m][W - 1] = 100;
      i.values[m][W] = 200;
    }
    expect(computeFlags(i).map((f) => f.metric)).toEqual(["hsrM", "nearMaxM", "contacts"]);
  });
});

describe("plyometric volume per session (NSCA bands [from memory])", () => {
  const s = (id: string, date: string, total: number): FlagSession => ({
    id,
    date,
    startTime: "10:00",
    contactsByIntensity: { total },
    highIntensity: false,
  });

  it("flags contacts above the band's top only, for sessions inside the week", () => {
    const flags = computeFlags(
      input({ sessions: [s("a", "2026-03-10", 120), s("b", "2026-03-11", 150), s("c", "2026-03-08", 200)] }),
    );
    expect(flags).toHaveLength(1);
    expect(flags[0]).toMatchObject({
      kind: "plyo_volume",
      sessionId: "b",
      value: 150,
      threshold: 120,
      metric: "contacts",
    });
    expect(flags[0].reason).toBe(
      // The week's total sits next to the band (lib/load/README.md §11.5): 120 + 150 = 270 (the 8 Mar session is
      // before the week).
      "The session on Wed 11 Mar has 150 ground contacts, above 120, the top of the intermediate range " +
        "(100–120 per session, the NSCA's off-season guidance). This week: 270 contacts in all.",
    );
  });
});

describe("ordering, levels and display", () => {
  it("orders by date then kind and reports the top level", () => {
    const hard = (id: string, date: string, time: string): FlagSession => ({
      id,
      date,
      startTime: time,
      contactsByIntensity: { total: 130 },
      highIntensity: true,
    });
    const flags = computeFlags(
      input({ peak: [1, 1.7], sessions: [hard("x", "2026-03-09", "09:00"), hard("y", "2026-03-10", "09:00")] }),
    );
    expect(flags.map((f) => `${f.date} ${f.kind}`)).toEqual([
      "2026-03-09 plyo_volume",
      "2026-03-10 spike",
      "2026-03-10 plyo_volume",
      "2026-03-10 recovery",
    ]);
    expect(topFlagLevel(flags)).toBe("alert");
    expect(topFlagLevel([])).toBeNull();
  });

  it("every kind has our own name, a colour and classes; the caution defers to medical staff", () => {
    expect(FLAG_DISPLAY.spike.label).toBe("Spike");
    expect(FLAG_DISPLAY.rising.label).toBe("Climbing");
    expect(FLAG_DISPLAY.low.label).toBe("Underloaded");
    expect(FLAG_DISPLAY.weekly_jump.label).toBe("Weekly jump");
    expect(FLAG_DISPLAY.plyo_volume.label).toBe("Contact overload");
    expect(FLAG_DISPLAY.recovery.label).toBe("Short recovery");
    for (const kind of Object.keys(FLAG_DISPLAY) as (keyof typeof FLAG_DISPLAY)[]) {
      expect(flagClasses(kind).badge).toMatch(/^bg-flag-(\w+)-soft text-flag-\1 border-flag-\1\/30$/);
    }
    expect(LOAD_CAUTION).toMatch(/not diagnoses/);
    expect(LOAD_CAUTION).toMatch(/medical staff/);
  });
});
