import { describe, expect, it } from "vitest";
import { computeFlags, type FlagInput } from "@/lib/load/flags";
import { emptyMetricColumns } from "@/lib/load/series";
import type { Metric } from "@/lib/load/types";
import { SETTINGS } from "./fixtures";

const FIRST = "2026-02-09"; // Monday, 28 days before the week
const WEEK = "2026-03-09";
const W = 28;

function input(srpeWeek: number[], ratioValue = 1, overrides: Partial<FlagInput> = {}): FlagInput {
  const values = emptyMetricColumns(35) as Record<Metric, Float64Array>;
  srpeWeek.forEach((v, i) => (values.srpe[W + i] = v));
  const ratio = new Float64Array(35).fill(Number.NaN);
  for (let i = W; i < 35; i++) ratio[i] = ratioValue;
  return {
    firstDate: FIRST,
    values,
    ratio,
    provisional: new Uint8Array(35),
    sessions: [],
    profile: { plyoLevel: "intermediate" },
    settings: SETTINGS,
    weekStart: WEEK,
    ...overrides,
  };
}

describe("monotony flag (Foster 1998, MSSE 30:1164: monotony = mean ÷ SD, strain = weekly load × monotony)", () => {
  // Six days of a and one rest day, population SD (lib/load/README.md): mean 6a/7, SD a·√6/7, so monotony = √6 =
  // 2.449490 for any a > 0, above Foster's 2.0. With a = 300: weekly load 1800 AU, strain 1800 × √6 = 4409.08.
  it("six equal days and a rest day: monotony √6 = 2.449 > 2.0 is a caution with the strain", () => {
    const flags = computeFlags(input([300, 300, 300, 300, 300, 300, 0]));
    const f = flags.find((x) => x.kind === "monotony");
    expect(f).toMatchObject({ kind: "monotony", level: "caution", date: WEEK, metric: "srpe", threshold: 2 });
    expect(f!.value).toBeCloseTo(2.44949, 5);
    expect(f!.reason).toContain("2.45");
    expect(f!.reason).toContain("strain 4,409");
  });

  // Five days of a and two rest days: mean 5a/7, SD a·√10/7, monotony 5/√10 = 1.581139: no flag.
  it("five equal days and two rest days: monotony 1.581 is no flag; a limit of 1.5 flags it", () => {
    const week = [300, 300, 300, 300, 300, 0, 0];
    expect(computeFlags(input(week)).some((f) => f.kind === "monotony")).toBe(false);
    const strict = computeFlags(input(week, 1, { settings: { ...SETTINGS, monotonyLimit: 1.5 } }));
    expect(strict.find((f) => f.kind === "monotony")!.value).toBeCloseTo(1.581139, 5);
  });

  it("identical loads every day (SD 0) have no monotony and raise no flag (methods S4 edge case)", () => {
    expect(computeFlags(input([300, 300, 300, 300, 300, 300, 300])).some((f) => f.kind === "monotony")).toBe(false);
  });
});

describe("a light week is never raised from missing logs alone", () => {
  it("ratio 0.5 all week is underloaded, unless the week has an unlogged published session", () => {
    expect(computeFlags(input([100, 0, 0, 0, 0, 0, 0], 0.5)).map((f) => f.kind)).toContain("low");
    const missing = new Uint8Array(35);
    missing[W + 2] = 1;
    expect(computeFlags(input([100, 0, 0, 0, 0, 0, 0], 0.5, { missing })).map((f) => f.kind)).not.toContain("low");
    // A missing day outside the week does not hide this week's light week.
    const before = new Uint8Array(35);
    before[W - 3] = 1;
    expect(computeFlags(input([100, 0, 0, 0, 0, 0, 0], 0.5, { missing: before })).map((f) => f.kind)).toContain("low");
  });
});
