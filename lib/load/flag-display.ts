import type { FlagKind } from "./flags";

/** Shown wherever flags are shown. */
export const LOAD_CAUTION =
  "Load flags are monitoring aids, not diagnoses. They describe training numbers only; decide with the athlete's " +
  "medical staff and follow your local rules.";

type FlagColour = "rose" | "amber" | "sky" | "orange" | "violet" | "teal";

export interface FlagClasses {
  /** Badge background + text + border, e.g. for a pill. */
  badge: string;
  /** Small status dot. */
  dot: string;
  /** Text only. */
  text: string;
}

export interface FlagDisplay {
  label: string;
  /** One line for a tooltip or legend. */
  hint: string;
  colour: FlagColour;
}

// Full class strings (not built by concatenation) so Tailwind's source scan finds them.
const FLAG_COLOUR_CLASSES: Record<FlagColour, FlagClasses> = {
  rose: { badge: "bg-rose-50 text-rose-800 border-rose-200", dot: "bg-rose-500", text: "text-rose-700" },
  amber: { badge: "bg-amber-50 text-amber-800 border-amber-200", dot: "bg-amber-500", text: "text-amber-700" },
  sky: { badge: "bg-sky-50 text-sky-800 border-sky-200", dot: "bg-sky-500", text: "text-sky-700" },
  orange: { badge: "bg-orange-50 text-orange-800 border-orange-200", dot: "bg-orange-500", text: "text-orange-700" },
  violet: { badge: "bg-violet-50 text-violet-800 border-violet-200", dot: "bg-violet-500", text: "text-violet-700" },
  teal: { badge: "bg-teal-50 text-teal-800 border-teal-200", dot: "bg-teal-500", text: "text-teal-700" },
};

export const FLAG_DISPLAY: Record<FlagKind, FlagDisplay> = {
  spike: {
    label: "Spike",
    hint: "Acute load well above the recent norm (ACWR at or above the spike threshold).",
    colour: "rose",
  },
  rising: { label: "Climbing", hint: "ACWR above the comfortable range but below a spike.", colour: "amber" },
  low: {
    label: "Underloaded",
    hint: "ACWR below the comfortable range: a light week compared with recent training.",
    colour: "sky",
  },
  weekly_jump: { label: "Weekly jump", hint: "Week-on-week increase above the team's limit.", colour: "orange" },
  monotony: {
    label: "Monotony",
    hint: "Daily sRPE loads too alike over the week (Foster's monotony above the limit); strain shown.",
    colour: "orange",
  },
  plyo_volume: {
    label: "Contact overload",
    hint: "More ground contacts in one session than the athlete's experience range.",
    colour: "violet",
  },
  recovery: {
    label: "Short recovery",
    hint: "Two high-intensity sessions closer together than the recovery window.",
    colour: "teal",
  },
};

export function flagClasses(kind: FlagKind): FlagClasses {
  return FLAG_COLOUR_CLASSES[FLAG_DISPLAY[kind].colour];
}
