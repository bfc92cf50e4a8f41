// A week's figures against the phase's target ranges. Pure.
import type { TargetMetric } from "@/lib/domain/season";

/** A target range for one weekly measure; either end may be open. */
export type TargetRange = { min: number | null; max: number | null };

export type WeekTargets = Partial<Record<TargetMetric, TargetRange>>;

export type TargetStanding = "below" | "within" | "above";

export type TargetCheck = { metric: TargetMetric; value: number; range: TargetRange; standing: TargetStanding };

export function standingAgainst(value: number, range: TargetRange): TargetStanding {
  if (range.min !== null && value < range.min) return "below";
  if (range.max !== null && value > range.max) return "above";
  return "within";
}

/** One check per metric that has a range, in the targets' own order. */
export function checkTargets(week: Record<TargetMetric, number>, targets: WeekTargets): TargetCheck[] {
  return (Object.keys(targets) as TargetMetric[]).flatMap((metric) => {
    const range = targets[metric];
    if (!range) return [];
    return [{ metric, value: week[metric], range, standing: standingAgainst(week[metric], range) }];
  });
}
