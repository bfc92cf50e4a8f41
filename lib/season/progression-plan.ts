// Which sessions a progression replaces and which drafts it writes, from the sessions already planned. Pure: the
// server's write (lib/services/season.ts) and the browser's forecast preview (forecast-preview.ts) both call it,
// so the preview shows exactly the weeks the write produces.
import { addDays, diffDays, shiftWeek } from "@/lib/dates/plain-date";
import type { PlanSession } from "@/lib/plan/types";
import { generateWeeks, type GeneratedSession } from "./generate";
import type { ProgressionRule } from "./progression";
import type { DraftSession, ScalableBlock } from "./scale-session";

/** A planned session as the plan knows it, with blocks of any shape scaling reads. */
export type PlannedSession<B extends ScalableBlock = ScalableBlock> = Pick<
  PlanSession,
  "id" | "athleteId" | "date" | "startTime" | "durationMin" | "title" | "plannedRpe" | "notes" | "status" | "logged"
> & { blocks: B[] };

export type ProgressionRequest = {
  /** First day of the source week (a team week start). */
  sourceWeekStart: string;
  /** First day of the first generated week. */
  firstWeekStart: string;
  weeks: number;
  rule: ProgressionRule;
  athleteIds?: readonly number[];
};

export type ProgressionPlan<B extends ScalableBlock> = {
  athleteIds: number[];
  /** Drafts (never logged) of those athletes in the generated weeks: generating again replaces rather than doubles. */
  replacedIds: number[];
  /** In write order: athlete by athlete (first seen in the source week), week by week. */
  drafts: (GeneratedSession<B> & { athleteId: number })[];
  weeks: { weekStart: string; factor: number }[];
  /** Last day of the last generated week. */
  lastDay: string;
};

function draftOf<B extends ScalableBlock>(s: PlannedSession<B>, weekStart: string): DraftSession<B> {
  return {
    dayOffset: diffDays(s.date, weekStart),
    startTime: s.startTime,
    durationMin: s.durationMin,
    title: s.title,
    plannedRpe: s.plannedRpe,
    notes: s.notes,
    blocks: s.blocks,
  };
}

/**
 * `source`: the sessions of the source week; `target`: the sessions of the generated weeks (more do no harm).
 * Cancelled source sessions are not copied; published and logged sessions in the generated weeks stay.
 */
export function planProgression<B extends ScalableBlock>(input: {
  source: readonly PlannedSession<B>[];
  target: readonly Pick<PlannedSession, "id" | "athleteId" | "date" | "status" | "logged">[];
  request: ProgressionRequest;
}): ProgressionPlan<B> {
  const { request } = input;
  const only = request.athleteIds ? new Set(request.athleteIds) : null;
  const sourceEnd = addDays(request.sourceWeekStart, 6);
  const inSource = input.source.filter(
    (s) =>
      (!only || only.has(s.athleteId)) &&
      s.status !== "cancelled" &&
      s.date >= request.sourceWeekStart &&
      s.date <= sourceEnd,
  );
  const athleteIds = [...new Set(inSource.map((s) => s.athleteId))];
  const athletes = new Set(athleteIds);
  const lastDay = addDays(shiftWeek(request.firstWeekStart, request.weeks - 1), 6);
  const replacedIds = input.target
    .filter(
      (s) =>
        athletes.has(s.athleteId) &&
        s.status === "draft" &&
        !s.logged &&
        s.date >= request.firstWeekStart &&
        s.date <= lastDay,
    )
    .map((s) => s.id);
  const drafts: ProgressionPlan<B>["drafts"] = [];
  let weeks: ProgressionPlan<B>["weeks"] = [];
  for (const athleteId of athleteIds) {
    const generated = generateWeeks({
      source: inSource.filter((s) => s.athleteId === athleteId).map((s) => draftOf(s, request.sourceWeekStart)),
      firstWeekStart: request.firstWeekStart,
      weeks: request.weeks,
      rule: request.rule,
    });
    weeks = generated.map(({ weekStart, factor }) => ({ weekStart, factor }));
    for (const week of generated) drafts.push(...week.sessions.map((session) => ({ athleteId, ...session })));
  }
  return { athleteIds, replacedIds, drafts, weeks, lastDay };
}
