import type { FlagKind } from "./flags";

/** Shown wherever flags are shown. */
export const LOAD_CAUTION =
  "Load flags are monitoring aids, not diagnoses. They describe training numbers only; decide with the athlete's " +
  "medical staff and follow your local rules.";

/** A flag's own colour token (tailwind.config.ts `flag.*`); each is used for that flag kind only. */
type FlagTone = "spike" | "climb" | "under" | "jump" | "monotony" | "contacts" | "recovery";

/** The shape drawn beside a flag's label (components/ui/flag-mark.tsx), so no flag is told apart by colour alone. */
export type FlagShape =
  "triangle-up" | "arrow-up" | "triangle-down" | "double-chevron" | "bars" | "diamond" | "hourglass";

export interface FlagClasses {
  /** Badge background + text + border, e.g. for a pill. */
  badge: string;
  /** Small status dot or the shape's fill. */
  dot: string;
  /** Text only. */
  text: string;
}

export interface FlagDisplay {
  label: string;
  /** One line for a tooltip or legend. */
  hint: string;
  colour: FlagTone;
  shape: FlagShape;
}

// Full class strings (not built by concatenation) so Tailwind's source scan finds them.
const FLAG_COLOUR_CLASSES: Record<FlagTone, FlagClasses> = {
  spike: {
    badge: "bg-flag-spike-soft text-flag-spike border-flag-spike/30",
    dot: "bg-flag-spike",
    text: "text-flag-spike",
  },
  climb: {
    badge: "bg-flag-climb-soft text-flag-climb border-flag-climb/30",
    dot: "bg-flag-climb",
    text: "text-flag-climb",
  },
  under: {
    badge: "bg-flag-under-soft text-flag-under border-flag-under/30",
    dot: "bg-flag-under",
    text: "text-flag-under",
  },
  jump: { badge: "bg-flag-jump-soft text-flag-jump border-flag-jump/30", dot: "bg-flag-jump", text: "text-flag-jump" },
  monotony: {
    badge: "bg-flag-monotony-soft text-flag-monotony border-flag-monotony/30",
    dot: "bg-flag-monotony",
    text: "text-flag-monotony",
  },
  contacts: {
    badge: "bg-flag-contacts-soft text-flag-contacts border-flag-contacts/30",
    dot: "bg-flag-contacts",
    text: "text-flag-contacts",
  },
  recovery: {
    badge: "bg-flag-recovery-soft text-flag-recovery border-flag-recovery/30",
    dot: "bg-flag-recovery",
    text: "text-flag-recovery",
  },
};

export const FLAG_DISPLAY: Record<FlagKind, FlagDisplay> = {
  spike: {
    label: "Spike",
    hint: "Acute load well above the recent norm (ACWR at or above the spike threshold).",
    colour: "spike",
    shape: "triangle-up",
  },
  rising: {
    label: "Climbing",
    hint: "ACWR above the comfortable range but below a spike.",
    colour: "climb",
    shape: "arrow-up",
  },
  low: {
    label: "Underloaded",
    hint: "ACWR below the comfortable range: a light week compared with recent training.",
    colour: "under",
    shape: "triangle-down",
  },
  weekly_jump: {
    label: "Weekly jump",
    hint: "Week-on-week increase above the team's limit.",
    colour: "jump",
    shape: "double-chevron",
  },
  monotony: {
    label: "Monotony",
    hint: "Daily sRPE loads too alike over the week (Foster's monotony above the limit); strain shown.",
    colour: "monotony",
    shape: "bars",
  },
  plyo_volume: {
    label: "Contact overload",
    hint: "More ground contacts in one session than the athlete's experience range.",
    colour: "contacts",
    shape: "diamond",
  },
  recovery: {
    label: "Short recovery",
    hint: "Two high-intensity sessions closer together than the recovery window.",
    colour: "recovery",
    shape: "hourglass",
  },
};

export function flagClasses(kind: FlagKind): FlagClasses {
  return FLAG_COLOUR_CLASSES[FLAG_DISPLAY[kind].colour];
}
