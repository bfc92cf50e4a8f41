import { z } from "zod";
import { MEET_PRIORITIES, SEASON_PHASE_KINDS, TARGET_METRICS } from "@/lib/domain/season";
import { diffDays } from "@/lib/dates/plain-date";
import { localDateSchema } from "./dates";
import { idSchema, overrideSchema } from "./plan";
import { lineText, noteText } from "./text";

/** Longest phase and longest season view: a year (plus a week so a season that starts mid-week fits). */
const MAX_SPAN_DAYS = 371;
/** Most weeks one progression writes at once: a training block is rarely longer than 12 weeks (common practice). */
const MAX_PROGRESSION_WEEKS = 12;

const amount = z.number({ error: "Enter a number" }).finite().min(0, "Cannot be negative").max(1e6, "Too large");
const rangeSchema = z
  .object({ min: amount.nullable(), max: amount.nullable() })
  .refine((r) => r.min === null || r.max === null || r.min <= r.max, {
    message: "The lower end is above the upper end",
    path: ["max"],
  });

const targetsSchema = z.partialRecord(z.enum(TARGET_METRICS), rangeSchema).default({});

const phaseFields = z.object({
  kind: z.enum(SEASON_PHASE_KINDS, { error: "Choose a phase kind" }),
  name: lineText({ error: "Enter a name" }).min(1, "Enter a name").max(80, "Keep the name under 80 characters"),
  startsOn: localDateSchema,
  endsOn: localDateSchema,
  groupId: idSchema.nullable().default(null),
  goal: noteText().max(2000, "Keep the goal under 2,000 characters").default(""),
  targets: targetsSchema,
});

function spanRule(v: { startsOn: string; endsOn: string }, ctx: z.RefinementCtx) {
  const days = diffDays(v.endsOn, v.startsOn);
  if (days < 0) ctx.addIssue({ code: "custom", path: ["endsOn"], message: "The phase ends before it starts" });
  else if (days > MAX_SPAN_DAYS)
    ctx.addIssue({ code: "custom", path: ["endsOn"], message: "A phase lasts a year at most" });
}

export const phaseInputSchema = phaseFields.superRefine(spanRule);
export type PhaseInput = z.infer<typeof phaseInputSchema>;

export const phaseUpdateSchema = phaseFields.extend({ version: z.number().int().positive() }).superRefine(spanRule);

export const meetInputSchema = z
  .object({
    name: lineText({ error: "Enter a name" }).min(1, "Enter a name").max(120, "Keep the name under 120 characters"),
    date: localDateSchema,
    priority: z.enum(MEET_PRIORITIES, { error: "Choose A, B or C" }),
    groupId: idSchema.nullable().default(null),
    athleteId: idSchema.nullable().default(null),
  })
  .refine((m) => m.groupId === null || m.athleteId === null, {
    message: "A meet is for the team, one group or one athlete",
    path: ["athleteId"],
  });
export type MeetInput = z.infer<typeof meetInputSchema>;

const pct = (max: number) =>
  z.number({ error: "Enter a percentage" }).finite().min(0, "Cannot be negative").max(max, `At most ${max} %`);

const progressionRuleSchema = z.discriminatedUnion(
  "kind",
  [
    z.object({
      kind: z.literal("build"),
      weeklyIncreasePct: pct(30),
      buildWeeks: z.number().int().min(1, "At least one build week").max(6, "At most six build weeks"),
      unloadPct: pct(80),
    }),
    z.object({ kind: z.literal("taper"), reductionPct: pct(80), shape: z.enum(["linear", "exponential", "step"]) }),
  ],
  { error: "Choose build or taper" },
);

export const progressionSchema = z
  .object({
    /** Any date in the week to copy. */
    sourceWeek: localDateSchema,
    /** Any date in the first week to write. */
    firstWeek: localDateSchema,
    weeks: z
      .number()
      .int()
      .min(1, "At least one week")
      .max(MAX_PROGRESSION_WEEKS, `At most ${MAX_PROGRESSION_WEEKS} weeks`),
    rule: progressionRuleSchema,
    athleteIds: z.array(idSchema).max(500).optional(),
    override: overrideSchema.optional(),
  })
  .refine((p) => diffDays(p.firstWeek, p.sourceWeek) > 0, {
    message: "Generate weeks after the source week",
    path: ["firstWeek"],
  });
export type ProgressionInput = z.infer<typeof progressionSchema>;

/** What a progression preview starts from (GET …/season/progression): the weeks the season view shows. */
export const progressionBaseQuerySchema = z
  .object({
    sourceWeek: localDateSchema,
    firstWeek: localDateSchema,
    /** Last day previewed: the season view's last day. */
    to: localDateSchema,
  })
  .refine((q) => diffDays(q.firstWeek, q.sourceWeek) > 0, {
    message: "Generate weeks after the source week",
    path: ["firstWeek"],
  })
  .refine((q) => diffDays(q.to, q.firstWeek) >= 0 && diffDays(q.to, q.firstWeek) <= 53 * 7, {
    message: "Preview from the first week to at most 53 weeks on",
    path: ["to"],
  });

export const seasonQuerySchema = z.object({
  from: localDateSchema.optional(),
  weeks: z.coerce.number().int().min(1, "At least one week").max(53, "At most 53 weeks").default(16),
});

export const phaseParamsSchema = z.object({ phaseId: idSchema });
export const meetParamsSchema = z.object({ meetId: idSchema });
export const copyPhaseSchema = z.object({
  /** Weeks later the copy starts: 52 keeps the weekdays of next season's calendar (common practice). */
  weeksLater: z.number().int().min(1, "At least one week").max(104, "At most two years").default(52),
});
