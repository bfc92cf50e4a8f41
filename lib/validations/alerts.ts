import { z } from "zod";
import { noteText } from "./text";

const ALERT_STATUS_FILTERS = ["open", "acknowledged", "resolved", "unresolved", "all"] as const;

export const alertListQuerySchema = z.object({
  status: z.enum(ALERT_STATUS_FILTERS).default("unresolved"),
  athleteId: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(200).default(100),
});

export type AlertListQuery = z.infer<typeof alertListQuerySchema>;

export const alertIdParamsSchema = z.object({ alertId: z.coerce.number().int().positive() });

const note = noteText().max(2000, "Keep the note under 2000 characters");

/** acknowledge: "I have seen it"; resolve: handled, with a note saying how; reopen: look again. */
export const alertActionSchema = z.discriminatedUnion("action", [
  z.object({ action: z.literal("acknowledge"), note: note.optional() }),
  z.object({ action: z.literal("resolve"), note: note.min(1, "Say briefly how it was handled") }),
  z.object({ action: z.literal("reopen"), note: note.optional() }),
]);

export type AlertActionInput = z.infer<typeof alertActionSchema>;
/** Form values before parsing (the resolve form requires a note, the others do not). */
export type AlertActionFormValues = z.input<typeof alertActionSchema>;
