// The medical staff's three availability levels, our own: what each means for the planner. Pure and isomorphic.
import { addDays } from "@/lib/dates/plain-date";
import type { RestrictionRule } from "@/lib/restrictions/rules";

export const AVAILABILITY_LEVELS = ["full", "modified", "unavailable"] as const;
export type AvailabilityLevel = (typeof AVAILABILITY_LEVELS)[number];

export const AVAILABILITY_LABEL: Record<AvailabilityLevel, string> = {
  full: "Full training",
  modified: "Modified training",
  unavailable: "Unavailable",
};

/**
 * Running intensity a modified athlete may be planned at, as a share of vmax. Our choice: submaximal running
 * only (no sprinting near top speed) until the medical staff say otherwise; they add specific restrictions on top.
 */
export const MODIFIED_MAX_PCT = 85;

/**
 * The restriction each level puts on the plan, checked by the one guard like any restriction: full training
 * none, modified running capped at MODIFIED_MAX_PCT of vmax, unavailable no training at all.
 */
export function availabilityRule(level: AvailabilityLevel): RestrictionRule | null {
  if (level === "modified") return { rule: "max_intensity", maxPct: MODIFIED_MAX_PCT };
  if (level === "unavailable") return { rule: "no_training" };
  return null;
}

export type Availability = {
  id: number;
  athleteId: number;
  level: AvailabilityLevel;
  startsOn: string;
  /** First day back at full training; null = not known yet. */
  returnOn: string | null;
  note: string;
  setByName: string;
  createdAt: string;
};

/** The last day the level applies (the day before the return date), or null while open-ended. */
export function availabilityLastDay(a: Pick<Availability, "returnOn">): string | null {
  return a.returnOn ? addDays(a.returnOn, -1) : null;
}

/** The level on `date`: the newest setting, or full training before it starts and from its return date. */
export function levelOn(
  a: Pick<Availability, "level" | "startsOn" | "returnOn"> | null,
  date: string,
): AvailabilityLevel {
  if (!a || date < a.startsOn) return "full";
  if (a.returnOn && date >= a.returnOn) return "full";
  return a.level;
}
