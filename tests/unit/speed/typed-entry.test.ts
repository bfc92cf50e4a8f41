import { describe, expect, it } from "vitest";
import { parseMeasureCsv } from "@/lib/speed/measure-csv";
import { parseTimingCsv } from "@/lib/speed/timing-csv";
import { contactRowsCsv, normaliseTypedTrial, timingTrialCsv, typedFieldOf } from "@/lib/speed/typed-entry";
import { timingTrialSchema, typedContactsSchema } from "@/lib/validations/speed";
import { T4_GATES } from "./fixtures";

// Typed-in tests become the canonical CSV of our own layouts (lib/speed/README.md §5, §9), so they pass the very
// checks and storage of an uploaded file; the server's per-line messages land back on the form's fields.
const SQUAD = [{ id: 4, name: "Ada, the Finch" }];

describe("typed-in timing trials", () => {
  it("a trial's canonical CSV reads back as the same trial (a name with a comma is quoted)", () => {
    const text = timingTrialCsv({
      athleteName: SQUAD[0].name,
      testDate: "2026-11-18",
      startType: "standing",
      bodyMassKg: 72,
      gates: T4_GATES.slice(1),
    });
    expect(text.split("\r\n")[0]).toBe("athlete,date,trial,start,distance_m,time_s,body_mass_kg");
    expect(text.split("\r\n")[1]).toBe('"Ada, the Finch",2026-11-18,1,standing,10,1.969,72');
    const r = parseTimingCsv(text, SQUAD);
    expect(r.ok && r.trials).toEqual([
      expect.objectContaining({
        athleteId: 4,
        testDate: "2026-11-18",
        startType: "standing",
        bodyMassKg: 72,
        gates: T4_GATES.slice(1),
        flying: null,
      }),
    ]);
  });

  it("a flying trial is its zone's one row; without body mass the column is empty", () => {
    const trial = normaliseTypedTrial({
      athleteName: SQUAD[0].name,
      testDate: "2026-11-18",
      startType: "flying" as const,
      bodyMassKg: null,
      gates: [{ distanceM: 10, timeS: 1 }],
      flying: { lengthM: 20, timeS: 2.14 },
    });
    expect(trial.gates).toEqual([]);
    const r = parseTimingCsv(timingTrialCsv(trial), SQUAD);
    expect(r.ok && r.trials[0]).toMatchObject({ flying: { lengthM: 20, timeS: 2.14 }, gates: [], bodyMassKg: null });
  });

  it("the form's schema names the gate whose time goes backwards or whose distance repeats", () => {
    const base = { athleteId: 4, testDate: "2026-11-18", startType: "standing" as const, flying: null };
    const back = timingTrialSchema.safeParse({
      ...base,
      gates: [
        { distanceM: 20, timeS: 3.1 },
        { distanceM: 10, timeS: 1.9 },
        { distanceM: 30, timeS: 3.0 },
      ],
    });
    expect(back.success).toBe(false);
    expect(back.error!.issues.map((i) => [i.path.join("."), i.message])).toEqual([
      ["gates.2.timeS", "Times go backwards: 30 m (3 s) is not later than 20 m (3.1 s)"],
    ]);
    const twice = timingTrialSchema.safeParse({
      ...base,
      gates: [
        { distanceM: 10, timeS: 1.9 },
        { distanceM: 10, timeS: 2 },
      ],
    });
    expect(twice.error!.issues.map((i) => i.path.join("."))).toEqual(["gates.1.distanceM"]);
    const blank = timingTrialSchema.safeParse({ ...base, athleteId: null, gates: [{ distanceM: 10, timeS: null }] });
    expect(blank.error!.issues.map((i) => [i.path.join("."), i.message])).toEqual([
      ["athleteId", "Choose the athlete"],
      ["gates.0.timeS", "Time must be a number"],
    ]);
  });

  it("server messages about lines of the canonical CSV land on the typed fields", () => {
    expect(typedFieldOf("timing", "line 3 time_s")).toBe("gates.1.timeS");
    expect(typedFieldOf("timing", "line 2 distance_m")).toBe("gates.0.distanceM");
    expect(typedFieldOf("timing", "line 2 time_s", true)).toBe("flying.timeS");
    expect(typedFieldOf("timing", "line 2 date")).toBe("testDate");
    expect(typedFieldOf("timing", "line 2 athlete")).toBe("athleteId");
    expect(typedFieldOf("timing", "file")).toBeNull();
    expect(typedFieldOf("contacts", "line 4 flight_time_s")).toBe("rows.2.flightTimeS");
    expect(typedFieldOf("contacts", "testDate")).toBe("testDate");
  });
});

describe("typed-in contact measurements", () => {
  it("rows become the contacts layout and read back the same (an empty step length stays empty)", () => {
    const rows = [
      { contactTimeS: 0.086, flightTimeS: 0.145, stepLengthM: 2.3 },
      { contactTimeS: 0.088, flightTimeS: 0.142, stepLengthM: null },
    ];
    const r = parseMeasureCsv("contacts", contactRowsCsv(rows));
    expect(r.ok && r.columns).toEqual({
      contact_time_s: [0.086, 0.088],
      flight_time_s: [0.145, 0.142],
      step_length_m: [2.3, null],
    });
  });

  it("the form's schema holds the file's bounds, by field", () => {
    const bad = typedContactsSchema.safeParse({
      testDate: "2026-11-18",
      rows: [{ contactTimeS: 0.01, flightTimeS: null, stepLengthM: 9 }],
    });
    expect(bad.error!.issues.map((i) => [i.path.join("."), i.message])).toEqual([
      ["rows.0.contactTimeS", "Contact time must be at least 0.02 s"],
      ["rows.0.flightTimeS", "Flight time must be a number"],
      ["rows.0.stepLengthM", "Step length must be at most 4 m"],
    ]);
  });
});
