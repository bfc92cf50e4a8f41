import { z } from "zod";
import "./jitless";
import { ACWR_METHODS, METRICS, MISSING_LOGS, RECOVERY_WORK, SPEED_ZONES } from "@/lib/load/types";

// Ranges wide enough for any squad, narrow enough that a typo (55 instead of 5.5) is caught.
const fields = {
  /** m/s; 5.5 m/s = 19.8 km/h (Bradley et al. 2009). */
  hsrSpeedMs: z.coerce.number({ message: "Enter a speed in m/s" }).min(3, "At least 3 m/s").max(10, "At most 10 m/s"),
  nearMaxPct: z.coerce.number({ message: "Enter a percentage" }).min(70, "At least 70%").max(100, "At most 100%"),
  acwrMethod: z.enum(ACWR_METHODS, { message: "Choose a method" }),
  acwrMetric: z.enum(METRICS, { message: "Choose a metric" }),
  spikeRatio: z.coerce.number({ message: "Enter a ratio" }).min(1, "At least 1.00").max(3, "At most 3.00"),
  risingRatio: z.coerce.number({ message: "Enter a ratio" }).min(1, "At least 1.00").max(3, "At most 3.00"),
  lowRatio: z.coerce.number({ message: "Enter a ratio" }).min(0.3, "At least 0.30").max(1, "At most 1.00"),
  weeklyChangeLimitPct: z.coerce
    .number({ message: "Enter a percentage" })
    .min(1, "At least 1%")
    .max(100, "At most 100%"),
  recoveryHours: z.coerce.number({ message: "Enter hours" }).min(12, "At least 12 h").max(120, "At most 120 h"),
  speedZones: z.enum(SPEED_ZONES, { message: "Choose absolute or relative speed zones" }),
  hsrPct: z.coerce.number({ message: "Enter a percentage" }).min(50, "At least 50%").max(95, "At most 95%"),
  sprintSpeedMs: z.coerce
    .number({ message: "Enter a speed in m/s" })
    .min(5, "At least 5 m/s")
    .max(11, "At most 11 m/s"),
  maximalPct: z.coerce.number({ message: "Enter a percentage" }).min(85, "At least 85%").max(100, "At most 100%"),
  recoveryWork: z
    .array(z.enum(RECOVERY_WORK, { message: "Unknown kind of work" }), {
      message: "Choose the work that needs recovery",
    })
    .refine((v) => new Set(v).size === v.length, "Each kind once"),
  missingLogs: z.enum(MISSING_LOGS, { message: "Choose estimate or exclude" }),
  monotonyLimit: z.coerce.number({ message: "Enter a monotony" }).min(1, "At least 1.0").max(5, "At most 5.0"),
};

const base = z.object(fields);

/** The whole settings record, with the ratio thresholds in order (low < climbing < spike). */
export const teamSettingsSchema = base.superRefine((s, ctx) => {
  if (s.risingRatio >= s.spikeRatio) {
    ctx.addIssue({ code: "custom", path: ["risingRatio"], message: "Must be below the spike threshold" });
  }
  if (s.lowRatio >= s.risingRatio) {
    ctx.addIssue({ code: "custom", path: ["lowRatio"], message: "Must be below the climbing threshold" });
  }
});
export type TeamSettingsInput = z.infer<typeof teamSettingsSchema>;

/** PATCH body: any subset; the merged record is checked with teamSettingsSchema. */
export const teamSettingsPatchSchema = base.partial().strict();
export type TeamSettingsPatch = z.infer<typeof teamSettingsPatchSchema>;

/** What the thresholds form holds before parsing (inputs give strings; the schema coerces). */
export type TeamSettingsFormValues = z.input<typeof teamSettingsSchema>;
