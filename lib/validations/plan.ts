import { z } from "zod";
import { lineText, noteText } from "./text";
import { localDateSchema } from "./dates";
import { blockSchema } from "./template";

export const idSchema = z.coerce.number().int().positive();
// Kept exported from here for the schemas that import it alongside idSchema.
export { localDateSchema };
export const startTimeSchema = z
  .string({ error: "Enter a time as HH:MM" })
  .regex(/^([01]\d|2[0-3]):[0-5]\d$/, "Enter a time as HH:MM");
const versionSchema = z.number({ error: "Send the version you read" }).int().min(1, "Send the version you read");
const durationSchema = z
  .number({ error: "Enter minutes" })
  .int("Whole minutes")
  .min(5, "At least 5 min")
  .max(300, "At most 300 min");
const rpeSchema = z.number({ error: "Enter an RPE from 0 to 10" }).min(0, "CR-10: 0 to 10").max(10, "CR-10: 0 to 10");
const titleSchema = lineText({ error: "Give it a title" })
  .min(1, "Give it a title")
  .max(120, "Keep the title under 120 characters");
const notesSchema = noteText().max(2000, "Keep notes under 2000 characters").nullable();

/** A coach's reason to plan past a physio restriction; recorded and sent to the medical staff. */
export const overrideSchema = z.object({
  reason: noteText({ error: "Say why the session should go ahead" })
    .min(3, "Say why the session should go ahead (3 characters or more)")
    .max(500, "Keep the reason under 500 characters"),
});
export type OverrideInput = z.infer<typeof overrideSchema>;
/**
 * What a write may carry after a second look: a reason to go past a restriction, and `confirmed: true` for
 * numbers past a plausibility limit (lib/plan/plausibility.ts; without it the server answers 422 "implausible").
 */
const goAheadFields = {
  override: overrideSchema.optional(),
  confirmed: z.literal(true, { error: "confirmed is true or left out" }).optional(),
};

export const teamParamsSchema = z.object({ teamId: idSchema });
export const sessionParamsSchema = z.object({ sessionId: idSchema });
export const blockParamsSchema = z.object({ sessionId: idSchema, blockId: idSchema });
export const templateParamsSchema = z.object({ templateId: idSchema });

/** GET /api/teams/[teamId]/plan?week=: any date inside the wanted week; the team's current week when absent. */
export const weekQuerySchema = z.object({ week: localDateSchema.optional() });

/** Body of the week tools (copy to next, clear, publish). */
export const weekToolSchema = z.object({ week: localDateSchema, ...goAheadFields });

/** A block inside a session; `templateId` says which shelf template it was copied from (JSON body: a number). */
const sessionBlockSchema = blockSchema.and(z.object({ templateId: z.number().int().positive().nullable().optional() }));
export type SessionBlockBody = z.infer<typeof sessionBlockSchema>;

/** POST /api/teams/[teamId]/sessions: what the grid or the editor asks for. */
export const createSessionSchema = z
  .discriminatedUnion(
    "from",
    [
      /** A session written out in full (the editor, or undoing a delete). */
      z.object({
        from: z.literal("blank"),
        athleteId: idSchema,
        date: localDateSchema,
        startTime: startTimeSchema.default("16:00"),
        durationMin: durationSchema,
        title: titleSchema,
        plannedRpe: rpeSchema,
        notes: notesSchema.default(null),
        blocks: z.array(sessionBlockSchema).max(20, "At most 20 blocks"),
        ...goAheadFields,
      }),
      /** A template dropped on an athlete's day or on a group's day. */
      z.object({
        from: z.literal("template"),
        templateId: idSchema,
        date: localDateSchema,
        athleteId: idSchema.optional(),
        groupId: idSchema.optional(),
        ...goAheadFields,
      }),
      /** A copy of an existing session onto another day or athlete (always a new draft). */
      z.object({
        from: z.literal("copy"),
        sessionId: idSchema,
        athleteId: idSchema,
        date: localDateSchema,
        ...goAheadFields,
      }),
    ],
    { error: 'Say where the session comes from: "blank", "template" or "copy"' },
  )
  .superRefine((v, ctx) => {
    if (v.from === "template" && (v.athleteId === undefined) === (v.groupId === undefined)) {
      ctx.addIssue({ code: "custom", path: ["athleteId"], message: "Give either an athlete or a group" });
    }
  });
export type CreateSessionInput = z.infer<typeof createSessionSchema>;

/** What the session editor edits (the form and the PATCH share it). */
export const sessionEditSchema = z.object({
  title: titleSchema,
  startTime: startTimeSchema,
  durationMin: durationSchema,
  plannedRpe: rpeSchema,
  notes: notesSchema,
  blocks: z.array(sessionBlockSchema).max(20, "At most 20 blocks"),
});
export type SessionEditValues = z.infer<typeof sessionEditSchema>;

/** PATCH /api/sessions/[id]: any subset of the session; `blocks` replaces the whole list. */
export const updateSessionSchema = sessionEditSchema
  .partial()
  .extend({
    version: versionSchema,
    athleteId: idSchema.optional(),
    date: localDateSchema.optional(),
    /** Only "published": publishes a draft, or brings back a cancelled session. */
    status: z
      .literal("published", { error: "Only published can be set here; delete a session to cancel it" })
      .optional(),
    ...goAheadFields,
  })
  .strict();
export type UpdateSessionInput = z.infer<typeof updateSessionSchema>;

/** DELETE /api/sessions/[id]?version= */
export const versionQuerySchema = z.object({
  version: z.coerce.number({ error: "Send the version you read" }).int().min(1, "Send the version you read"),
});

/** POST /api/sessions/[id]/blocks: append a template's content or a written block. */
export const addBlockSchema = z
  .object({
    version: versionSchema,
    templateId: idSchema.optional(),
    block: sessionBlockSchema.optional(),
    ...goAheadFields,
  })
  .strict()
  .superRefine((v, ctx) => {
    if ((v.templateId === undefined) === (v.block === undefined)) {
      ctx.addIssue({ code: "custom", path: ["templateId"], message: "Give either a template or a block" });
    }
  });
export type AddBlockInput = z.infer<typeof addBlockSchema>;

/** PATCH /api/sessions/[id]/blocks/[blockId] */
export const updateBlockSchema = z.object({ version: versionSchema, block: sessionBlockSchema, ...goAheadFields });
