// The plain-language block text used on planner cards and in calendar descriptions.
import { describe, expect, it } from "vitest";
import { BLOCK_KIND_LABEL, blockDescription, blockSummary, mainBlockKind } from "@/lib/format/block-summary";
import type { BlockInput } from "@/lib/load/types";

const flying: BlockInput = {
  kind: "max_velocity",
  title: "Max velocity",
  running: { sets: 1, reps: 4, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
};

const plyo: BlockInput = {
  kind: "plyometric",
  title: "Hops",
  drills: [
    { name: "Pogo jumps", sets: 2, reps: 10, contactsPerRep: 1, intensity: "low" },
    { name: "Hurdle hops", sets: 3, reps: 6, contactsPerRep: 1, intensity: "moderate" },
    { name: "Bounds", sets: 3, reps: 8, contactsPerRep: 2, intensity: "high" },
  ],
};

describe("block wording", () => {
  it("labels every kind in our own words", () => {
    expect(Object.values(BLOCK_KIND_LABEL)).toEqual([
      "Acceleration",
      "Max velocity",
      "Plyometrics",
      "Speed endurance",
      "Tempo",
      "Strength",
      "Recovery",
    ]);
  });

  it("summarises running and plyometric blocks for cards", () => {
    expect(blockSummary(flying)).toBe("4 × 30 m flying (20 m run-in) · 95%");
    // 2·10·1 + 3·6·1 + 3·8·2 = 20 + 18 + 48 = 86 contacts (sets × reps × contacts per rep).
    expect(blockSummary(plyo)).toBe("3 drills · 86 contacts");
    expect(
      blockSummary({
        kind: "acceleration",
        title: "Starts",
        running: { sets: 2, reps: 3, distanceM: 20, intensityPct: 100, start: "blocks", runInM: 0, restSec: 180 },
      }),
    ).toBe("2 sets of 3 × 20 m from blocks · 100%");
    expect(blockSummary({ kind: "strength", title: "Gym", notes: "Squat 4×5\nRDL" })).toBe("Squat 4×5");
    expect(blockSummary({ kind: "recovery", title: "Easy" })).toBe("Recovery");
  });

  it("describes a block in full sentences for phones", () => {
    const twoSets: BlockInput = { ...flying, running: { ...flying.running!, sets: 2, reps: 3 } };
    expect(blockDescription(twoSets)).toEqual([
      "Max velocity: 2 sets of 3 × 30 m from a flying start with a 20 m run-in at 95% of top speed, 4 min rest",
    ]);
    expect(blockDescription(plyo)).toEqual([
      "Plyometrics – Hops: 3 drills, 86 ground contacts in total:",
      "• Pogo jumps: 2 × 10, low intensity, 20 contacts",
      "• Hurdle hops: 3 × 6, moderate intensity, 18 contacts",
      "• Bounds: 3 × 8 (2 contacts each), high intensity, 48 contacts",
    ]);
    expect(
      blockDescription({
        kind: "tempo",
        title: "Tempo",
        notes: "Grass\nBarefoot last 2",
        running: { sets: 1, reps: 6, distanceM: 100, intensityPct: 70.5, start: "standing", runInM: 0, restSec: 90 },
      }),
    ).toEqual([
      "Tempo: 6 × 100 m from a standing start at 70.5% of top speed, 1 min 30 s rest",
      "Note: Grass",
      "Barefoot last 2",
    ]);
  });

  it("names a mixed session after its most demanding sprint quality", () => {
    expect(mainBlockKind([{ kind: "recovery" }, { kind: "plyometric" }, { kind: "acceleration" }])).toBe(
      "acceleration",
    );
    expect(mainBlockKind([])).toBeNull();
  });
});
