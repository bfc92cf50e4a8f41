import { describe, expect, it } from "vitest";
import type { z } from "zod";
import { alertActionSchema } from "@/lib/validations/alerts";
import { athleteSchema } from "@/lib/validations/athlete";
import { forgotPasswordSchema, signInSchema } from "@/lib/validations/auth";
import { loadPreviewSchema } from "@/lib/validations/load";
import { sessionLogSchema } from "@/lib/validations/log";
import { addMemberSchema } from "@/lib/validations/members";
import { createSessionSchema, overrideSchema } from "@/lib/validations/plan";
import { createRestrictionSchema } from "@/lib/validations/restrictions";
import { templateSchema } from "@/lib/validations/template";
import { lineText, noteText } from "@/lib/validations/text";
import { availabilitySchema } from "@/lib/validations/availability";
import { sessionMessageSchema } from "@/lib/validations/session-messages";

// Control characters are Unicode category Cc (U+0000–U+001F, U+007F–U+009F), Unicode 15 §4.5 / UAX #44.
const CONTROLS = ["\u0000", "\u0001", "\u0008", "\u000b", "\u001b", "\u007f", "\u0085", "\u009f"];

describe("lineText / noteText", () => {
  const line = lineText().max(50);
  const note = noteText().max(50);
  it("refuses every control character inside the text", () => {
    for (const c of [...CONTROLS, "\t", "\n", "\r", "\u2028", "\ud800"])
      expect(line.safeParse(`a${c}b`).success, JSON.stringify(c)).toBe(false);
    for (const c of CONTROLS) expect(note.safeParse(`a${c}b`).success, JSON.stringify(c)).toBe(false);
    expect(note.safeParse("a\ud800b").success).toBe(false);
  });
  it("keeps ordinary text, tabs and line breaks in notes, and trims both", () => {
    expect(line.parse("  Flying 30s – 95 % · Ærø 走る 🏃 ")).toBe("Flying 30s – 95 % · Ærø 走る 🏃");
    expect(line.parse("Starts\n")).toBe("Starts");
    expect(note.parse("Warm-up:\r\n\t2 × 30 m\nthen rest\r")).toBe("Warm-up:\r\n\t2 × 30 m\nthen rest");
  });
});

// Every text field of every input schema, each with a valid body: a NUL at that path must be refused there.
const block = { kind: "recovery", title: "Jog", running: null, drills: null, notes: "easy" };
const plyo = {
  kind: "plyometric",
  title: "Hops",
  running: null,
  drills: [{ name: "Pogo", sets: 1, reps: 10, contactsPerRep: 2, intensity: "low" }],
  notes: null,
};
const cases: [string, z.ZodType, unknown, (string | number)[]][] = [
  ["alert note", alertActionSchema, { action: "resolve", note: "done" }, ["note"]],
  ["athlete name", athleteSchema, { name: "Ada", plyoLevel: "beginner" }, ["name"]],
  ["sign-in e-mail", signInSchema, { email: "a@b.test", password: "x" }, ["email"]],
  ["forgotten-password e-mail", forgotPasswordSchema, { email: "a@b.test" }, ["email"]],
  [
    "preview session id",
    loadPreviewSchema,
    {
      teamId: 1,
      athleteId: 1,
      week: "2026-03-02",
      sessions: [{ id: "new-1", date: "2026-03-02", durationMin: 30, plannedRpe: 4, blocks: [] }],
    },
    ["sessions", 0, "id"],
  ],
  ["log notes", sessionLogSchema, { completion: "yes", notes: "fine" }, ["notes"]],
  ["member name", addMemberSchema, { name: "Pia", email: "p@b.test", role: "physio" }, ["name"]],
  ["member e-mail", addMemberSchema, { name: "Pia", email: "p@b.test", role: "physio" }, ["email"]],
  [
    "session title",
    createSessionSchema,
    {
      from: "blank",
      athleteId: 1,
      date: "2026-03-02",
      durationMin: 30,
      title: "Speed",
      plannedRpe: 4,
      notes: "n",
      blocks: [block],
    },
    ["title"],
  ],
  [
    "session notes",
    createSessionSchema,
    {
      from: "blank",
      athleteId: 1,
      date: "2026-03-02",
      durationMin: 30,
      title: "Speed",
      plannedRpe: 4,
      notes: "n",
      blocks: [block],
    },
    ["notes"],
  ],
  [
    "block title",
    createSessionSchema,
    {
      from: "blank",
      athleteId: 1,
      date: "2026-03-02",
      durationMin: 30,
      title: "Speed",
      plannedRpe: 4,
      blocks: [block],
    },
    ["blocks", 0, "title"],
  ],
  [
    "block notes",
    createSessionSchema,
    {
      from: "blank",
      athleteId: 1,
      date: "2026-03-02",
      durationMin: 30,
      title: "Speed",
      plannedRpe: 4,
      blocks: [block],
    },
    ["blocks", 0, "notes"],
  ],
  ["override reason", overrideSchema, { reason: "race prep" }, ["reason"]],
  [
    "restriction note",
    createRestrictionSchema,
    { rule: "contact_cap", maxContacts: 50, startsOn: "2026-03-02", note: "ankle" },
    ["note"],
  ],
  ["availability note", availabilitySchema, { level: "modified", startsOn: "2026-03-02", note: "ankle" }, ["note"]],
  ["session message", sessionMessageSchema, { body: "see you at 9" }, ["body"]],
  ["template title", templateSchema, { ...plyo, durationMin: 20, plannedRpe: 4 }, ["title"]],
  ["drill name", templateSchema, { ...plyo, durationMin: 20, plannedRpe: 4 }, ["drills", 0, "name"]],
];

function withNul(value: unknown, path: (string | number)[]): unknown {
  const copy = structuredClone(value) as Record<string | number, unknown>;
  let at = copy;
  for (const key of path.slice(0, -1)) at = at[key] as Record<string | number, unknown>;
  const last = path[path.length - 1];
  at[last] = `${String(at[last]).slice(0, 1)}\u0000${String(at[last]).slice(1)}`;
  return copy;
}

describe("every text field refuses a NUL at the schema", () => {
  it.each(cases)("%s", (_name, schema, valid, path) => {
    expect(schema.safeParse(valid).success).toBe(true);
    const parsed = schema.safeParse(withNul(valid, path));
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues.map((i) => i.path.join("."))).toContain(path.join("."));
  });
});
