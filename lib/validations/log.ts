import { z } from "zod";
import { COMPLETIONS } from "@/lib/domain/sessions";
import { painReportSchema } from "./athlete-reports";
import { noteText } from "./text";

// From lib/domain (isomorphic), never from models/, so the browser bundle never pulls in Sequelize.
export const LOG_COMPLETIONS = COMPLETIONS;

/** PUT /api/sessions/[sessionId]/log: what the athlete did. Block ids are checked against the session on the server. */
export const sessionLogSchema = z
  .object({
    completion: z.enum(LOG_COMPLETIONS, { error: 'Choose "yes", "partly" or "no"' }),
    /** Session RPE, CR-10 (Foster et al. 2001). */
    rpe: z
      .number({ error: "Enter an RPE from 0 to 10" })
      .min(0, "CR-10: 0 to 10")
      .max(10, "CR-10: 0 to 10")
      .nullable()
      .default(null),
    minutes: z
      .number({ error: "Enter minutes" })
      .int("Whole minutes")
      .min(1, "At least 1 min")
      .max(600, "At most 600 min")
      .nullable()
      .default(null),
    completedReps: z
      .record(
        z.string().regex(/^\d+$/, "Use the session's block ids"),
        z.number({ error: "Enter reps done" }).int("Whole reps").min(0, "Not negative").max(500, "At most 500"),
      )
      .nullable()
      .default(null),
    notes: noteText().max(2000, "Keep notes under 2000 characters").nullable().default(null),
    /** Pain or discomfort during the session; null (or left out) for none. */
    pain: painReportSchema.nullable().default(null),
  })
  .strict();
export type SessionLogInput = z.infer<typeof sessionLogSchema>;
