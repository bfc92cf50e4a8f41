import { z } from "zod";
import "./jitless";

/** The days a team's training week may start on, as ISO weekdays (lib/dates/plain-date.ts). */
export const WEEK_START_CHOICES = [
  { value: 1, label: "Monday" },
  { value: 7, label: "Sunday" },
] as const;

/** PATCH body of the team's week start: Monday (1) or Sunday (7), nothing else. */
export const teamWeekSchema = z
  .object({ weekStartDay: z.literal([1, 7], { message: "Choose Monday or Sunday" }) })
  .strict();
export type TeamWeekInput = z.infer<typeof teamWeekSchema>;
