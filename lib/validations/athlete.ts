import { z } from "zod";
import { PLYO_LEVELS, SEXES } from "@/lib/domain/athletes";
import { pastDateSchema } from "./dates";
import { lineText } from "./text";

const optionalNumber = (min: number, max: number, label: string) =>
  z.preprocess(
    (v) => (v === "" || v === null || v === undefined ? null : v),
    z.coerce
      .number({ message: `${label} must be a number` })
      .min(min, `${label} must be at least ${min}`)
      .max(max, `${label} must be at most ${max}`)
      .nullable(),
  );

const optionalDate = z.preprocess((v) => (v === "" || v === undefined ? null : v), pastDateSchema.nullable());

/** An athlete's profile and test values; ranges are generous bounds for sprinting humans, not norms. */
export const athleteSchema = z
  .object({
    name: lineText().min(2, "Enter the athlete's name").max(120),
    groupId: z.preprocess(
      (v) => (v === "" || v === undefined ? null : v),
      z.coerce.number().int().positive().nullable(),
    ),
    sex: z.preprocess((v) => (v === "" || v === undefined ? null : v), z.enum(SEXES).nullable()),
    birthDate: optionalDate,
    bodyMassKg: optionalNumber(25, 200, "Body mass"),
    vmaxMs: optionalNumber(4, 13, "Max velocity"),
    vmaxTestedOn: optionalDate,
    tauS: optionalNumber(0.4, 3, "τ"),
    stepLengthM: optionalNumber(1, 3.2, "Step length"),
    plyoLevel: z.enum(PLYO_LEVELS, { message: "Choose an experience level" }),
  })
  .superRefine((a, ctx) => {
    // Dates after today are refused by pastDateSchema; a test before the athlete was born is as impossible.
    if (a.birthDate && a.vmaxTestedOn && a.vmaxTestedOn < a.birthDate)
      ctx.addIssue({ code: "custom", path: ["vmaxTestedOn"], message: "The test cannot be before the date of birth" });
  });

export type AthleteInput = z.infer<typeof athleteSchema>;
export type AthleteFormValues = z.input<typeof athleteSchema>;
