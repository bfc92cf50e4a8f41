import { z } from "zod";
import { noteText } from "./text";
import { DRILL_KINDS, RUNNING_KINDS } from "@/lib/load/block-kinds";
import { BLOCK_KINDS, type BlockKind } from "@/lib/load/types";
import { idSchema, localDateSchema } from "./plan";

/** Kinds a physio can leave out: the running kinds and plyometrics (strength and recovery are not checked). */
export const RESTRICTABLE_KINDS: readonly BlockKind[] = BLOCK_KINDS.filter(
  (k) => RUNNING_KINDS.includes(k) || DRILL_KINDS.includes(k),
);

export const athleteParamsSchema = z.object({ athleteId: idSchema });
export const restrictionParamsSchema = z.object({ restrictionId: idSchema });

const dates = {
  startsOn: localDateSchema,
  // Open-ended ("until lifted") when absent or null; the form sends null for an empty date field.
  endsOn: localDateSchema.nullable().optional(),
  note: noteText({ error: "Say why, and what is still fine" })
    .min(3, "Say why, and what is still fine (at least 3 characters)")
    .max(500, "Keep the note under 500 characters"),
};

/** POST /api/athletes/[athleteId]/restrictions, and the physio's form (zodResolver). */
export const createRestrictionSchema = z
  .discriminatedUnion(
    "rule",
    [
      z.object({
        rule: z.literal("no_kind"),
        blockKinds: z
          .array(
            z.enum(RESTRICTABLE_KINDS as [BlockKind, ...BlockKind[]], { error: "Choose running or plyometric kinds" }),
            { error: "Choose at least one kind" },
          )
          .min(1, "Choose at least one kind")
          .transform((kinds) => [...new Set(kinds)]),
        ...dates,
      }),
      z.object({
        rule: z.literal("max_intensity"),
        maxPct: z
          .number({ error: "Enter a % of vmax from 50 to 100" })
          .min(50, "At least 50% of vmax")
          .max(100, "At most 100% of vmax"),
        ...dates,
      }),
      z.object({
        rule: z.literal("contact_cap"),
        maxContacts: z
          .number({ error: "Enter contacts from 0 to 500" })
          .int("Whole contacts")
          .min(0, "At least 0 contacts")
          .max(500, "At most 500 contacts"),
        ...dates,
      }),
    ],
    { error: "Choose what to limit" },
  )
  .refine((r) => !r.endsOn || r.endsOn >= r.startsOn, {
    path: ["endsOn"],
    message: "The last day cannot be before the first",
  });

export type CreateRestrictionInput = z.infer<typeof createRestrictionSchema>;
/** Form values before parsing. */
export type RestrictionFormValues = z.input<typeof createRestrictionSchema>;

/** PATCH /api/restrictions/[restrictionId]: lift it from today (or before it starts). */
export const restrictionActionSchema = z.object({ action: z.literal("lift", { error: 'Send action "lift"' }) });
