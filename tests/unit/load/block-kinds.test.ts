import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  ACC_SIZE,
  SLOT_HIGH,
  SLOT_HIGH_INTENSITY,
  SLOT_HSR,
  SLOT_LOW,
  SLOT_MODERATE,
  SLOT_NEAR_MAX,
  SLOT_RUN,
  SLOT_SPRINT,
  SLOT_STEPS,
  evaluateSessionInto,
  resolveProfile,
} from "@/lib/load/accumulate";
import { BLOCK_KIND_RULES } from "@/lib/load/block-kinds";
import {
  BLOCK_KINDS,
  DEFAULT_TEAM_LOAD_SETTINGS,
  RECOVERY_WORK,
  SPEED_ZONES,
  type BlockInput,
  type BlockKind,
  type LogInput,
  type SessionInput,
} from "@/lib/load/types";

// One rule table drives the engine (lib/load/block-kinds.ts): for every kind in it, random blocks of that kind
// (with any leftover running or drill data a form may hold) count only what the kind's row says, planned and
// logged.

const kinds = Object.keys(BLOCK_KIND_RULES) as BlockKind[];

const num = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const running = fc.record({
  sets: fc.integer({ min: 0, max: 6 }),
  reps: fc.integer({ min: 0, max: 8 }),
  distanceM: fc.oneof(fc.constant(0), num(5, 300)),
  intensityPct: fc.oneof(
    fc.constant(0),
    fc.integer({ min: 0, max: 200 }).map((x) => x / 2),
    num(40, 105),
  ),
  start: fc.constantFrom("standing", "crouch", "blocks", "flying" as const),
  runInM: fc.oneof(fc.constant(0), num(1, 40)),
  restSec: fc.integer({ min: 0, max: 600 }),
});
const drill = fc.record({
  name: fc.constant("Drill"),
  sets: fc.integer({ min: 0, max: 5 }),
  reps: fc.integer({ min: 0, max: 12 }),
  contactsPerRep: fc.integer({ min: 0, max: 2 }),
  intensity: fc.constantFrom("low", "moderate", "high" as const),
});
const blockOf = (kind: fc.Arbitrary<BlockKind>, id: number): fc.Arbitrary<BlockInput> =>
  fc.record({
    id: fc.constant(`b${id}`),
    kind,
    title: fc.constant("Block"),
    running: fc.option(running, { nil: null }),
    drills: fc.option(fc.array(drill, { maxLength: 4 }), { nil: null }),
  });

/** A session of 1–4 blocks, the first always of `kind`, the others of any kind. */
const sessionWith = (kind: BlockKind): fc.Arbitrary<SessionInput> =>
  fc
    .tuple(
      blockOf(fc.constant(kind), 0),
      fc.array(fc.nat(), { maxLength: 3 }),
      fc.tuple(blockOf(fc.constantFrom(...BLOCK_KINDS), 1), blockOf(fc.constantFrom(...BLOCK_KINDS), 2)),
      fc.integer({ min: 0, max: 10 }),
      fc.integer({ min: 0, max: 150 }),
    )
    .map(([first, extra, more, plannedRpe, durationMin]) => ({
      id: "s",
      date: "2026-03-02",
      startTime: "17:00",
      durationMin,
      plannedRpe,
      status: "published" as const,
      blocks: [first, ...more.slice(0, extra.length)],
    }));

const logFor = (session: SessionInput): fc.Arbitrary<LogInput | undefined> =>
  fc.option(
    fc.record({
      sessionId: fc.constant(session.id),
      completion: fc.constantFrom("yes", "partly", "no" as const),
      rpe: fc.option(fc.integer({ min: 0, max: 10 }), { nil: null }),
      minutes: fc.option(fc.integer({ min: 0, max: 150 }), { nil: null }),
      completedReps: fc.option(
        fc.dictionary(fc.constantFrom(...session.blocks.map((b) => b.id!)), fc.integer({ min: 0, max: 60 })),
        { nil: null },
      ),
    }),
    { nil: undefined },
  );

const settings = fc.record({
  speedZones: fc.constantFrom(...SPEED_ZONES),
  recoveryWork: fc.subarray([...RECOVERY_WORK]),
  maximalPct: fc.integer({ min: 85, max: 100 }),
});
const profile = fc.record({
  vmax: fc.option(num(7, 11.5), { nil: null }),
  tau: fc.option(num(0.8, 1.6), { nil: null }),
  stepLengthM: fc.option(num(1.6, 2.6), { nil: null }),
  plyoLevel: fc.constantFrom("beginner", "intermediate", "advanced" as const),
});

const case_ = (kind: BlockKind) =>
  sessionWith(kind).chain((session) =>
    fc.record({ session: fc.constant(session), log: logFor(session), settings, profile }),
  );

describe("the engine follows the block-kind table", () => {
  it("has a row for every block kind", () => {
    expect([...kinds].sort()).toEqual([...BLOCK_KINDS].sort());
  });

  for (const kind of kinds) {
    it(`${kind}: a block of this kind alone counts only what its row says`, () => {
      const rules = BLOCK_KIND_RULES[kind];
      fc.assert(
        fc.property(case_(kind), ({ session, settings: chosen, profile: p }) => {
          const team = { ...DEFAULT_TEAM_LOAD_SETTINGS, ...chosen };
          const alone = { ...session, blocks: session.blocks.slice(0, 1) };
          const acc = new Float64Array(ACC_SIZE);
          evaluateSessionInto(acc, alone, undefined, resolveProfile(p, team));
          if (rules.carries !== "running") expect(acc[SLOT_RUN] + acc[SLOT_HSR] + acc[SLOT_NEAR_MAX]).toBe(0);
          if (rules.carries !== "running" || !rules.sprintMetres) expect(acc[SLOT_SPRINT] + acc[SLOT_STEPS]).toBe(0);
          if (rules.carries !== "drills") expect(acc[SLOT_LOW] + acc[SLOT_MODERATE] + acc[SLOT_HIGH]).toBe(0);
          if (acc[SLOT_HIGH_INTENSITY] === 1) {
            expect(rules.recoveryWork).not.toBeNull();
            expect(team.recoveryWork).toContain(rules.recoveryWork);
          }
        }),
        { numRuns: 200 },
      );
    });
  }
});
