import { describe, expect, it } from "vitest";
import type { BlockInput, RunningPrescription } from "@/lib/load/types";
import {
  newPlausibilityChecks,
  PLAUSIBILITY_LIMITS,
  plausibilityChecks,
  plausibilityFields,
  plausibilityQuestion,
} from "@/lib/plan/plausibility";

// Invented sessions. The limits and their sources are in lib/plan/plausibility.ts (common practice / from memory);
// the arithmetic checked here is sets × reps × (distance + run-in) and sets × reps × contacts per rep (NSCA count).

const run = (r: Partial<RunningPrescription>, kind: BlockInput["kind"] = "speed_endurance"): BlockInput => ({
  kind,
  title: "Reps",
  running: { sets: 1, reps: 4, distanceM: 30, intensityPct: 95, start: "crouch", runInM: 0, restSec: 180, ...r },
  drills: null,
});
const hops = (sets: number, reps: number, contactsPerRep: number): BlockInput => ({
  kind: "plyometric",
  title: "Hops",
  running: null,
  drills: [{ name: "Pogo", sets, reps, contactsPerRep, intensity: "low" }],
});
const limitsOf = (blocks: BlockInput[]) => plausibilityChecks({ blocks }).map((c) => c.limit);

describe("plausibilityChecks", () => {
  it("a normal speed session (4 × 30 m flying, 3 × 10 pogo × 2) passes every limit", () => {
    expect(limitsOf([run({ start: "flying", runInM: 20 }, "max_velocity"), hops(3, 10, 2)])).toEqual([]);
  });

  it("the issue's 10 × 30 × 600 m at 100 % goes past every running limit with its numbers", () => {
    const checks = plausibilityChecks({ blocks: [run({ sets: 10, reps: 30, distanceM: 600, intensityPct: 100 })] });
    expect(checks.map((c) => [c.limit, c.field, c.value, c.max])).toEqual([
      ["fastRepM", "blocks.0.running.distanceM", 600, 150],
      ["blockReps", "blocks.0.running.reps", 300, 40],
      ["blockMetres", "blocks.0.running.sets", 180_000, 3000],
      ["sessionMetres", "blocks", 180_000, 4000],
      ["sessionFastMetres", "blocks", 180_000, 1200],
    ]);
    expect(checks[2]!.message).toBe("10 × 30 × 600 m = 180,000 m is more than 3,000 m in one block.");
    expect(plausibilityQuestion(checks)).toMatch(/^Are you sure\? Reps: 600 m a rep at 100 %/);
  });

  it("each limit sits on its bound: the bound passes, one more asks", () => {
    const L = PLAUSIBILITY_LIMITS;
    expect(limitsOf([run({ distanceM: 150, intensityPct: 90 })])).toEqual([]);
    expect(limitsOf([run({ distanceM: 151, intensityPct: 90 })])).toEqual(["fastRepM"]);
    // A long rep below 90 % is tempo work, not a typo.
    expect(limitsOf([run({ distanceM: 300, intensityPct: 89 })])).toEqual([]);
    expect(limitsOf([run({ sets: 4, reps: 10, intensityPct: 70 })])).toEqual([]);
    expect(limitsOf([run({ sets: 1, reps: 41, intensityPct: 70 })])).toEqual(["blockReps"]);
    // 3,000 m in one block passes; the run-in is run too: 10 × 3 × (95 + 5) = 3,000, with 6 m it is 3,030.
    expect(limitsOf([run({ sets: 10, reps: 3, distanceM: 95, start: "flying", runInM: 5, intensityPct: 70 })])).toEqual(
      [],
    );
    expect(limitsOf([run({ sets: 10, reps: 3, distanceM: 95, start: "flying", runInM: 6, intensityPct: 70 })])).toEqual(
      ["blockMetres"],
    );
    expect(limitsOf([hops(5, 10, 6)])).toEqual([]); // 300 contacts
    expect(limitsOf([hops(1, 301, 1)])).toEqual(["blockContacts"]);
    expect(L.sessionContacts.value).toBe(400);
    expect(limitsOf([hops(5, 10, 6), hops(1, 100, 1)])).toEqual([]); // 400 in the session
    expect(limitsOf([hops(5, 10, 6), hops(1, 101, 1)])).toEqual(["sessionContacts"]);
  });

  it("session totals add the blocks: two 2,500 m tempo blocks, 1,300 m fast over three blocks", () => {
    const tempo = run({ sets: 5, reps: 5, distanceM: 100, intensityPct: 70 });
    expect(limitsOf([tempo, tempo])).toEqual(["sessionMetres"]);
    const fast = run({ sets: 1, reps: 4, distanceM: 120, intensityPct: 92 }); // 480 m
    expect(limitsOf([fast, fast])).toEqual([]);
    const checks = plausibilityChecks({ blocks: [fast, fast, fast] });
    expect(checks.map((c) => [c.limit, c.value])).toEqual([["sessionFastMetres", 1440]]);
  });
});

describe("newPlausibilityChecks", () => {
  const absurd = { blocks: [run({ sets: 2, reps: 25, intensityPct: 70 })] };
  it("asks about a new session, not again when the same numbers move, again when they change", () => {
    expect(newPlausibilityChecks(null, absurd).map((c) => c.limit)).toEqual(["blockReps"]);
    expect(newPlausibilityChecks(absurd, absurd)).toEqual([]);
    expect(newPlausibilityChecks(absurd, { blocks: [run({ sets: 2, reps: 26, intensityPct: 70 })] })).toHaveLength(1);
    expect(newPlausibilityChecks(absurd, null)).toEqual([]);
  });

  it("names each field with its limit for the refusal", () => {
    expect(plausibilityFields(plausibilityChecks(absurd))).toEqual({
      "blocks.0.running.reps": [
        "2 × 25 = 50 reps is more than 40 in one block. Send confirmed: true to save it anyway.",
      ],
    });
  });
});
