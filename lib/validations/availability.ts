import { z } from "zod";
import { AVAILABILITY_LEVELS } from "@/lib/availability/levels";
import { localDateSchema } from "./dates";
import { noteText } from "./text";

/** POST /api/athletes/[athleteId]/availability, and the physio's form (zodResolver). */
export const availabilitySchema = z
  .object({
    level: z.enum(AVAILABILITY_LEVELS, { error: "Choose full training, modified or unavailable" }),
    startsOn: localDateSchema,
    // Expected first day back at full training; the form sends null for an empty date field.
    returnOn: localDateSchema.nullable().optional(),
    note: noteText({ error: "Write a short note" }).max(500, "Keep the note under 500 characters").default(""),
  })
  .strict()
  .refine((a) => !a.returnOn || a.returnOn > a.startsOn, {
    path: ["returnOn"],
    message: "The return date must be after the first day",
  })
  .refine((a) => a.level === "full" || a.note.length >= 3, {
    path: ["note"],
    message: "Say why, and what is still fine (at least 3 characters)",
  });
export type AvailabilityInput = z.infer<typeof availabilitySchema>;
export type AvailabilityFormValues = z.input<typeof availabilitySchema>;
