import { z } from "zod";
import { lineText, noteText } from "./text";
import { DRILL_KINDS, RUNNING_KINDS } from "@/lib/load/block-kinds";
import { BLOCK_KINDS } from "@/lib/load/types";

// One schema per input, parsed by the handlers and used by the template editor through zodResolver.
// Ranges are wide enough for any sprint group and narrow enough to catch a typo (300 reps, 950%).

const count = (what: string, max: number) =>
  z
    .number({ error: `Enter the ${what}` })
    .int(`Whole ${what} only`)
    .min(1, `At least 1`)
    .max(max, `At most ${max}`);

const startTypeSchema = z.enum(["standing", "crouch", "blocks", "flying"], { error: "Choose a start" });
const plyoIntensitySchema = z.enum(["low", "moderate", "high"], { error: "Choose an intensity" });
const blockKindSchema = z.enum(BLOCK_KINDS, { error: "Choose a kind" });

const runningSchema = z
  .object({
    sets: count("sets", 10),
    reps: count("reps", 30),
    distanceM: z.number({ error: "Enter a distance in m" }).min(5, "At least 5 m").max(600, "At most 600 m"),
    intensityPct: z.number({ error: "Enter a % of max velocity" }).min(50, "At least 50%").max(100, "At most 100%"),
    start: startTypeSchema,
    runInM: z.number({ error: "Enter a run-in in m" }).min(0, "Not negative").max(60, "At most 60 m"),
    restSec: z
      .number({ error: "Enter rest in seconds" })
      .int("Whole seconds")
      .min(0, "Not negative")
      .max(1800, "At most 30 min"),
  })
  .superRefine((r, ctx) => {
    if (r.start !== "flying" && r.runInM > 0) {
      ctx.addIssue({ code: "custom", path: ["runInM"], message: "Only a flying start has a run-in" });
    }
    if (r.start === "flying" && r.runInM < 5) {
      ctx.addIssue({ code: "custom", path: ["runInM"], message: "A flying start needs a run-in of at least 5 m" });
    }
  });

const drillSchema = z.object({
  name: lineText({ error: "Name the drill" }).min(1, "Name the drill").max(80, "Keep it under 80 characters"),
  sets: count("sets", 10),
  reps: count("reps", 30),
  contactsPerRep: count("contacts per rep", 10),
  intensity: plyoIntensitySchema,
});

const title = lineText({ error: "Give it a title" })
  .min(1, "Give it a title")
  .max(120, "Keep the title under 120 characters");
const notes = noteText().max(1000, "Keep notes under 1000 characters").nullable();

const blockFields = {
  kind: blockKindSchema,
  title,
  running: runningSchema.nullable(),
  drills: z.array(drillSchema).max(12, "At most 12 drills").nullable(),
  notes,
};

type BlockShape = { kind: (typeof BLOCK_KINDS)[number]; running: unknown; drills: unknown[] | null };

/** A running kind needs its prescription and a plyometric block needs drills; the other kinds need neither. */
function requirePrescription(b: BlockShape, ctx: z.RefinementCtx) {
  if (RUNNING_KINDS.includes(b.kind) && !b.running) {
    ctx.addIssue({ code: "custom", path: ["running"], message: "A running block needs sets, reps and a distance" });
  }
  if (DRILL_KINDS.includes(b.kind) && !(b.drills && b.drills.length > 0)) {
    ctx.addIssue({ code: "custom", path: ["drills"], message: "Add at least one drill" });
  }
}

/** One block as a coach writes it (template content, or a block inside a session). */
export const blockSchema = z.object(blockFields).superRefine(requirePrescription);
export type BlockBody = z.infer<typeof blockSchema>;

export const templateSchema = z
  .object({
    ...blockFields,
    durationMin: z
      .number({ error: "Enter minutes" })
      .int("Whole minutes")
      .min(5, "At least 5 min")
      .max(300, "At most 300 min"),
    plannedRpe: z.number({ error: "Enter an RPE from 0 to 10" }).min(0, "CR-10: 0 to 10").max(10, "CR-10: 0 to 10"),
  })
  .superRefine(requirePrescription);
export type TemplateInput = z.infer<typeof templateSchema>;

/** PUT /api/templates/[id]: the whole form and the version it was read at (409 "stale" when it moved on). */
export const updateTemplateSchema = templateSchema.and(
  z.object({ version: z.number({ error: "Send the version you read" }).int().min(1, "Send the version you read") }),
);
