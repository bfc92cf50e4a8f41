import { z } from "zod";
import { localDateSchema } from "./dates";
import "./jitless";

/** GET /api/teams/[teamId]/plan-vs-actual: any date inside the last week wanted (default this week), and how many weeks. */
export const planActualQuerySchema = z.object({
  week: localDateSchema.optional(),
  weeks: z.coerce
    .number({ error: "Enter a number of weeks" })
    .int("Whole weeks")
    .min(1, "At least 1 week")
    .max(12, "At most 12 weeks")
    .default(8),
});
