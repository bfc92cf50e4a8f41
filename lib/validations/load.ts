import { z } from "zod";
import { SESSION_STATUSES } from "@/lib/domain/sessions";
import { lineText } from "./text";
import { dayIndex } from "@/lib/dates/plain-date";
import { METRICS } from "@/lib/load/types";
import { idSchema, localDateSchema, startTimeSchema } from "./plan";
import { blockSchema } from "./template";

/** Longest range one athlete request may cover (two years, the engine's benchmark size). */
const MAX_RANGE_DAYS = 731;

export const athleteParamsSchema = z.object({ athleteId: idSchema });

const loadViewSchema = z.enum(["actual", "projected"], { error: 'Choose "actual" or "projected"' });
const metricSchema = z.enum(METRICS, { error: `Choose one of ${METRICS.join(", ")}` });

/** GET /api/athletes/[athleteId]/load: range defaults are filled in by the data layer around today. */
export const athleteLoadQuerySchema = z
  .object({
    from: localDateSchema.optional(),
    to: localDateSchema.optional(),
    view: loadViewSchema.default("actual"),
    metric: metricSchema.optional(),
  })
  .superRefine((q, ctx) => {
    if (!q.from || !q.to) return;
    const days = dayIndex(q.to) - dayIndex(q.from);
    if (days < 0) ctx.addIssue({ code: "custom", path: ["to"], message: "Must be on or after from" });
    else if (days >= MAX_RANGE_DAYS)
      ctx.addIssue({ code: "custom", path: ["to"], message: `At most ${MAX_RANGE_DAYS} days from from` });
  });

/** GET /api/teams/[teamId]/load: any date inside the wanted week; the team's current week when absent. */
export const squadLoadQuerySchema = z.object({
  week: localDateSchema.optional(),
  view: loadViewSchema.default("projected"),
});

/** A block of a proposed session; id is the saved block's, so reps logged against it still count. */
const previewBlockSchema = z.intersection(blockSchema, z.object({ id: idSchema.optional() }));

/** A session as the planner holds it while dragging; id is the saved session's id when it already exists. */
const previewSessionSchema = z.object({
  id: z.union([idSchema, lineText().min(1).max(40)]).optional(),
  date: localDateSchema,
  startTime: startTimeSchema.default("16:00"),
  durationMin: z
    .number({ error: "Enter minutes" })
    .int("Whole minutes")
    .min(5, "At least 5 min")
    .max(300, "At most 300 min"),
  plannedRpe: z.number({ error: "Enter an RPE from 0 to 10" }).min(0, "CR-10: 0 to 10").max(10, "CR-10: 0 to 10"),
  status: z.enum(SESSION_STATUSES, { error: "Choose draft, published or cancelled" }).default("draft"),
  blocks: z.array(previewBlockSchema).max(20, "At most 20 blocks"),
});

/** POST /api/load/preview: the athlete's week as proposed (not saved); it replaces the saved week. */
export const loadPreviewSchema = z.object({
  teamId: idSchema,
  athleteId: idSchema,
  week: localDateSchema,
  sessions: z.array(previewSessionSchema).max(28, "At most 28 sessions in a week"),
});
export type LoadPreviewInput = z.infer<typeof loadPreviewSchema>;
