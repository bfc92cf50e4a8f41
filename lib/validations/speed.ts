import { z } from "zod";
import "./jitless";
import { SPEED_START_TYPES } from "@/lib/domain/speed";
import { pastDateSchema } from "./dates";
import { idSchema } from "./plan";

// Speed-lab inputs (lib/speed/README.md §1). Ranges are generous bounds for sprinting humans, not norms.

const metres = z.number({ message: "Distance must be a number" }).min(0, "Distance cannot be negative").max(500);
const seconds = z.number({ message: "Time must be a number" }).min(0, "Time cannot be negative").max(120);

export const gateSchema = z.object({ distanceM: metres, timeS: seconds });

/** Times must grow with distance: a gate further out is passed later. */
export const gatesSchema = z
  .array(gateSchema)
  .max(30, "At most 30 gates")
  .superRefine((gates, ctx) => {
    const sorted = [...gates].sort((a, b) => a.distanceM - b.distanceM);
    for (let i = 1; i < sorted.length; i++) {
      if (sorted[i].distanceM === sorted[i - 1].distanceM) {
        ctx.addIssue({ code: "custom", message: `The ${sorted[i].distanceM} m gate is listed twice` });
      } else if (!(sorted[i].timeS > sorted[i - 1].timeS)) {
        ctx.addIssue({
          code: "custom",
          message:
            `Times go backwards: ${sorted[i].distanceM} m (${sorted[i].timeS} s) is not later than ` +
            `${sorted[i - 1].distanceM} m (${sorted[i - 1].timeS} s)`,
        });
      }
    }
  });

export const timingTrialSchema = z
  .object({
    athleteId: z.number().int().positive(),
    testDate: pastDateSchema,
    startType: z.enum(SPEED_START_TYPES, { message: "Choose a start type" }),
    bodyMassKg: z
      .number()
      .min(25, "Body mass must be at least 25")
      .max(200, "Body mass must be at most 200")
      .nullable()
      .optional(),
    gates: gatesSchema,
    flying: z
      .object({
        lengthM: metres.positive("Flying length must be above 0"),
        timeS: seconds.positive("Flying time must be above 0"),
      })
      .nullable()
      .optional(),
  })
  .refine((t) => t.gates.filter((g) => g.distanceM > 0).length > 0 || t.flying, {
    message: "Enter gate times or a flying zone",
    path: ["gates"],
  });

export type TimingTrialInput = z.infer<typeof timingTrialSchema>;

export const timingTrialsSchema = z.object({
  trials: z.array(timingTrialSchema).min(1, "Enter at least one trial").max(200),
});

/** The largest speed-lab file we take: a 40-minute force trace at 1000 Hz as CSV is about 1.5 MB. */
export const SPEED_UPLOAD_MAX_BYTES = 2 * 1024 * 1024;

export const speedUploadSchema = z.object({
  fileName: z
    .string({ message: "Name the file" })
    .trim()
    .min(1, "Name the file")
    .max(200, "The file name is over 200 characters"),
  content: z.string({ message: "The file's text is missing" }),
});

export const speedTestParamsSchema = z.object({ teamId: idSchema, testId: idSchema });

/** Weeks without a timing test before an athlete is due a re-test (lib/speed/README.md §6). */
export const speedLabSettingsSchema = z.object({
  retestWeeks: z
    .number({ message: "Enter a number of weeks" })
    .int("Enter whole weeks")
    .min(1, "At least 1 week")
    .max(52, "At most 52 weeks"),
});
export type SpeedLabSettingsInput = z.infer<typeof speedLabSettingsSchema>;

/** A speed trace, force trace or contact-measurement file for one athlete (lib/speed/README.md §8, §9). */
export const speedMeasureUploadSchema = speedUploadSchema.extend({
  kind: z.enum(["trace", "force", "contacts"], { message: "Choose what the file holds" }),
  athleteId: z.number({ message: "Choose the athlete" }).int().positive("Choose the athlete"),
  testDate: pastDateSchema,
  /** A speed trace of a planned session becomes its measured running load. */
  plannedSessionId: z.number().int().positive().nullable().optional(),
  bodyMassKg: z
    .number({ message: "Body mass must be a number" })
    .min(25, "Body mass must be at least 25")
    .max(200, "Body mass must be at most 200")
    .nullable()
    .optional(),
});
export type SpeedMeasureUploadInput = z.infer<typeof speedMeasureUploadSchema>;
