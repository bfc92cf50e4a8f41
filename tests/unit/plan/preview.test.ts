import { describe, expect, it } from "vitest";
import { sessionsAfter, tempIdCounter } from "@/lib/plan/apply";
import { previewChange, rowLoad } from "@/lib/plan/preview";
import type { PlanChange } from "@/lib/plan/drop";
import { addDays } from "@/lib/dates/plain-date";
import { WEEK, history, planWeek, serverRow, session } from "./fixtures";

const mon = WEEK;
const tue = addDays(WEEK, 1);
const wed = addDays(WEEK, 2);
const specs = [
  { id: 1, name: "Maya", groupId: 10, past: history(1), sessions: [session(1, mon), session(1, wed)] },
  { id: 2, name: "Jonah", groupId: 10, past: history(2), sessions: [session(2, mon, { blocks: [] })] },
];
const week = planWeek(specs);

/** The preview must be the server's answer for the same sessions: the same engine over the same history. */
function expectPreviewMatchesServer(change: PlanChange) {
  const preview = previewChange(week, change);
  const after = sessionsAfter(week, change, tempIdCounter(-1_000_000));
  expect(preview.length).toBeGreaterThan(0);
  for (const row of preview) {
    const server = serverRow(
      week,
      specs.find((s) => s.id === row.athleteId)!,
      after.get(row.athleteId)!,
    );
    expect(row.after.week).toEqual(server.week);
    expect(row.after.flags).toEqual(server.flags);
  }
  return preview;
}

describe("the drag preview computes what the server will store", () => {
  it("with no change, the browser's numbers are the server's", () => {
    for (const a of week.athletes) {
      const local = rowLoad(week, a);
      expect(local.week).toEqual(a.load.week);
      expect(local.flags).toEqual(a.load.flags);
    }
  });

  it.each<[string, PlanChange]>([
    ["a new session", { kind: "create", templateId: 1, athleteId: 1, date: addDays(WEEK, 4) }],
    [
      "an added block",
      { kind: "add-block", templateId: 2, sessionId: specs[0].sessions[0].id, athleteId: 1, date: mon },
    ],
    [
      "a move to another athlete",
      {
        kind: "move",
        sessionId: specs[0].sessions[1].id,
        athleteId: 2,
        date: addDays(WEEK, 5),
        fromAthleteId: 1,
        fromDate: wed,
      },
    ],
    ["a copy", { kind: "copy", sessionId: specs[0].sessions[0].id, athleteId: 2, date: tue }],
    [
      "a group drop",
      {
        kind: "group",
        templateId: 3,
        groupId: 10,
        date: tue,
        targets: [
          { athleteId: 1, sessionId: null },
          { athleteId: 2, sessionId: null },
        ],
      },
    ],
  ])("%s", (_name, change) => {
    expectPreviewMatchesServer(change);
  });

  it("adds the template's HSR metres and sRPE to the row's totals", () => {
    const [row] = expectPreviewMatchesServer({ kind: "create", templateId: 1, athleteId: 1, date: addDays(WEEK, 4) });
    // sRPE = RPE × minutes (Foster et al. 2001): the template's 7 × 50 = 350 AU.
    expect(row.after.week.totals.srpe - row.before.week.totals.srpe).toBeCloseTo(350, 9);
    expect(row.after.week.totals.hsrM).toBeGreaterThan(row.before.week.totals.hsrM);
  });
});

describe("a drop that raises a flag is marked with the reason", () => {
  it("a big session on a light history is a spike", () => {
    const [row] = previewChange(week, { kind: "create", templateId: 3, athleteId: 2, date: tue });
    expect(row.before.flags.map((f) => f.kind)).not.toContain("spike");
    const spike = row.warnings.find((f) => f.kind === "spike");
    expect(spike?.reason).toMatch(/spike threshold 1\.50/);
    expect(row.after.week.peakRatio!).toBeGreaterThanOrEqual(1.5);
  });

  it("max-velocity work the day after max-velocity work breaks the 48 h rule", () => {
    const base = planWeek([
      {
        id: 1,
        name: "Maya",
        groupId: 10,
        past: history(1),
        sessions: [
          session(1, mon, {
            blocks: [
              {
                id: 5,
                templateId: 1,
                position: 0,
                kind: "max_velocity",
                title: "Fly",
                running: {
                  sets: 1,
                  reps: 3,
                  distanceM: 30,
                  intensityPct: 95,
                  start: "flying",
                  runInM: 20,
                  restSec: 240,
                },
                drills: null,
                notes: null,
              },
            ],
          }),
        ],
      },
    ]);
    const [row] = previewChange(base, { kind: "create", templateId: 1, athleteId: 1, date: tue });
    expect(row.warnings.find((f) => f.kind === "recovery")?.reason).toMatch(/less than the 48 h recovery window/);
  });

  it("160 bounding contacts are above the intermediate range (NSCA 100–120 per session)", () => {
    const heavy = {
      ...week,
      templates: week.templates.map((t) =>
        t.id === 2
          ? { ...t, drills: [{ name: "Bounding", sets: 4, reps: 10, contactsPerRep: 4, intensity: "high" as const }] }
          : t,
      ),
    };
    const [row] = previewChange(heavy, { kind: "create", templateId: 2, athleteId: 1, date: addDays(WEEK, 5) });
    expect(row.warnings.find((f) => f.kind === "plyo_volume")?.reason).toMatch(/160 ground contacts, above 120/);
  });
});
