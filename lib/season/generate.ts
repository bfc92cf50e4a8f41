// Draft weeks generated from one source week and a progression rule. The drafts are ordinary plan sessions once
// saved: the coach drags and edits them like any other. Pure.
import { addDays, shiftWeek } from "@/lib/dates/plain-date";
import { progressionFactors, type ProgressionRule } from "./progression";
import { scaleSession, type DraftSession, type ScalableBlock } from "./scale-session";

export type GeneratedSession<B extends ScalableBlock = ScalableBlock> = Omit<DraftSession<B>, "dayOffset"> & {
  date: string;
};

export type GeneratedWeek<B extends ScalableBlock = ScalableBlock> = {
  weekStart: string;
  /** Volume factor against the source week (1.08 = 8 % more). */
  factor: number;
  sessions: GeneratedSession<B>[];
};

export function generateWeeks<B extends ScalableBlock>(input: {
  source: DraftSession<B>[];
  /** First day of the first generated week (a team week start). */
  firstWeekStart: string;
  weeks: number;
  rule: ProgressionRule;
}): GeneratedWeek<B>[] {
  return progressionFactors(input.rule, input.weeks).map((factor, i) => {
    const weekStart = shiftWeek(input.firstWeekStart, i);
    const sessions = input.source.map((s) => {
      const { dayOffset, ...rest } = scaleSession(s, factor);
      return { ...rest, date: addDays(weekStart, dayOffset) };
    });
    return { weekStart, factor, sessions };
  });
}
