import { z } from "zod";
import {
  BODY_REGIONS,
  CHECK_IN_ITEMS,
  CHECK_IN_MAX,
  CHECK_IN_MIN,
  CHECK_IN_SCALE,
  PAIN_MAX,
  PAIN_MIN,
  type CheckInItem,
} from "@/lib/domain/wellbeing";
import "./jitless";

/** Pain or discomfort reported with a session log (part of PUT /api/sessions/[sessionId]/log). */
export const painReportSchema = z
  .object({
    region: z.enum(BODY_REGIONS, { error: "Choose where it hurts" }),
    severity: z
      .number({ error: "Say how bad, 0 to 10" })
      .int("A whole number from 0 to 10")
      .min(PAIN_MIN, "0 to 10")
      .max(PAIN_MAX, "0 to 10"),
    stoppedSession: z.boolean({ error: "Say whether it stopped the session" }),
  })
  .strict();
export type PainReportInput = z.infer<typeof painReportSchema>;

const item = (name: CheckInItem) =>
  z
    .number({ error: `Rate ${CHECK_IN_SCALE[name].label.toLowerCase()} from 1 to 5` })
    .int("A whole number from 1 to 5")
    .min(CHECK_IN_MIN, "1 to 5")
    .max(CHECK_IN_MAX, "1 to 5");

/** PUT /api/athletes/[athleteId]/check-ins: today's check-in (the server decides the day, in the team's zone). */
export const checkInSchema = z
  .object(Object.fromEntries(CHECK_IN_ITEMS.map((k) => [k, item(k)])) as Record<CheckInItem, ReturnType<typeof item>>)
  .strict();
export type CheckInInput = z.infer<typeof checkInSchema>;

/** GET /api/athletes/[athleteId]/check-ins?days=N: the last N days (the trend). */
export const checkInQuerySchema = z.object({
  days: z.coerce.number().int("Whole days").min(1, "At least 1 day").max(365, "At most 365 days").default(28),
});

/** PATCH /api/teams/[teamId]/athlete-reports: the head coach's pain line and the daily check-in switch. */
export const athleteReportSettingsSchema = z
  .object({
    painAlertAbove: z
      .number({ error: "Enter a pain level from 0 to 9" })
      .int("A whole number")
      .min(0, "0 to 9")
      .max(PAIN_MAX - 1, "0 to 9 (a report above it alerts the physio)")
      .optional(),
    checkInsEnabled: z.boolean({ error: "On or off" }).optional(),
  })
  .strict()
  .refine((v) => v.painAlertAbove !== undefined || v.checkInsEnabled !== undefined, {
    message: "Send painAlertAbove or checkInsEnabled",
    path: ["painAlertAbove"],
  });
export type AthleteReportSettingsInput = z.infer<typeof athleteReportSettingsSchema>;
