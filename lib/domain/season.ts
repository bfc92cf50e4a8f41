// Value sets of the season plan, shared by models, validations, the season maths and the screens.

/** Phase names as the trade uses them (classic periodisation: preparation, competition, transition). */
export const SEASON_PHASE_KINDS = [
  "general_preparation",
  "specific_preparation",
  "pre_competition",
  "competition",
  "taper",
  "transition",
] as const;
export type SeasonPhaseKind = (typeof SEASON_PHASE_KINDS)[number];

export const SEASON_PHASE_LABELS: Record<SeasonPhaseKind, string> = {
  general_preparation: "General preparation",
  specific_preparation: "Specific preparation",
  pre_competition: "Pre-competition",
  competition: "Competition",
  taper: "Taper",
  transition: "Transition",
};

/** A meet's weight in the season: A is the one to peak for, C a training race. */
export const MEET_PRIORITIES = ["A", "B", "C"] as const;
export type MeetPriority = (typeof MEET_PRIORITIES)[number];

/** The weekly measures a target range can be set for: the engine's own metric names. */
export const TARGET_METRICS = ["hsrM", "nearMaxM", "contacts", "srpe"] as const;
export type TargetMetric = (typeof TARGET_METRICS)[number];
