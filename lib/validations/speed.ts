import { z } from "zod";
import "./jitless";
import { SPEED_START_TYPES } from "@/lib/domain/speed";
import { MEASURE_CSV_LAYOUTS } from "@/lib/speed/measure-csv";
import { pastDateSchema } from "./dates";
import { idSchema } from "./plan";

// Speed-lab inputs (lib/speed/README.md §1). Ranges are generous bounds for sprinting humans, not norms.

const metres = z.number({ message: "Distance must be a number" }).min(0, "Distance cannot be negative").max(500);
const seconds = z.number({ message: "Time must be a number" }).min(0, "Time cannot be negative").max(120);

const gateSchema = z.object({ distanceM: metres, timeS: seconds });

/** Times must grow with distance: a gate further out is passed later. Each message names the gate it is about. */
const gatesSchema = z
  .array(gateSchema)
  .max(30, "At most 30 gates")
  .superRefine((gates, ctx) => {
    const order = gates.map((g, i) => ({ ...g, i })).sort((a, b) => a.distanceM - b.distanceM);
    for (let k = 1; k < order.length; k++) {
      const [near, far] = [order[k - 1], order[k]];
      if (far.distanceM === near.distanceM) {
        ctx.addIssue({
          code: "custom",
          path: [far.i, "distanceM"],
          message: `The ${far.distanceM} m gate is listed twice`,
        });
      } else if (!(far.timeS > near.timeS)) {
        ctx.addIssue({
          code: "custom",
          path: [far.i, "timeS"],
          message:
            `Times go backwards: ${far.distanceM} m (${far.timeS} s) is not later than ` +
            `${near.distanceM} m (${near.timeS} s)`,
        });
      }
    }
  });

export const timingTrialSchema = z
  .object({
    athleteId: z.number({ message: "Choose the athlete" }).int().positive("Choose the athlete"),
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

/** Accepting a result: `replace` takes the place of a result already in use from the same date. */
export const speedAcceptSchema = z.object({
  replace: z.boolean({ message: "replace must be true or false" }).optional(),
});

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

const contactColumn = (name: string, unit: string) => {
  const c = MEASURE_CSV_LAYOUTS.contacts.find((x) => x.name === name)!;
  const what = c.what[0].toUpperCase() + c.what.slice(1);
  return z
    .number({ message: `${what} must be a number` })
    .min(c.min, `${what} must be at least ${c.min} ${unit}`)
    .max(c.max, `${what} must be at most ${c.max} ${unit}`);
};

/** Contact-mat rows typed in on the athlete's speed page: the bounds of the contacts file (lib/speed/README.md §9). */
export const typedContactsSchema = z.object({
  testDate: pastDateSchema,
  rows: z
    .array(
      z.object({
        contactTimeS: contactColumn("contact_time_s", "s"),
        flightTimeS: contactColumn("flight_time_s", "s"),
        stepLengthM: contactColumn("step_length_m", "m").nullable(),
      }),
    )
    .min(1, "Enter at least one contact")
    .max(200, "At most 200 contacts"),
});
export type TypedContactsInput = z.infer<typeof typedContactsSchema>;
