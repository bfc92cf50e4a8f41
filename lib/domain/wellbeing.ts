// Value sets of the athlete's own reports: pain or discomfort (with a session log) and the daily check-in.

/** Where it hurts: a short list of our own, coarse enough to tap on a phone. */
export const BODY_REGIONS = [
  "head_neck",
  "shoulder_arm",
  "back",
  "hip_groin",
  "front_thigh",
  "back_thigh",
  "knee",
  "calf",
  "achilles",
  "ankle_foot",
  "other",
] as const;
export type BodyRegion = (typeof BODY_REGIONS)[number];

export const BODY_REGION_LABEL: Record<BodyRegion, string> = {
  head_neck: "Head or neck",
  shoulder_arm: "Shoulder or arm",
  back: "Back",
  hip_groin: "Hip or groin",
  front_thigh: "Front of thigh",
  back_thigh: "Back of thigh",
  knee: "Knee",
  calf: "Calf",
  achilles: "Achilles",
  ankle_foot: "Ankle or foot",
  other: "Somewhere else",
};

/**
 * Words that make a log note the physio's business even without a pain report: our own short list of how athletes
 * describe a niggle ("Felt a twinge in the left hamstring", "calf a bit tight").
 */
const PAIN_WORDS = new Set([
  ...["pain", "painful", "hurt", "hurts", "hurting", "sore", "soreness", "twinge", "twinged", "tight", "tightness"],
  ...["ache", "aches", "aching", "strain", "strained", "pulled", "niggle", "cramp", "cramped", "injury", "injured"],
  ...["swollen", "swelling", "stiff", "tender"],
]);

/** A note that speaks of pain: one of the words above as a whole word, in any case. */
export function mentionsPain(note: string): boolean {
  return (note.toLowerCase().match(/\p{L}+/gu) ?? []).some((w) => PAIN_WORDS.has(w));
}

/** How bad, 0 (none) to 10 (worst imaginable): an 11-point numeric rating scale (common practice). */
export const PAIN_MIN = 0;
export const PAIN_MAX = 10;
/** A report above this raises a physio alert unless the head coach sets another line. */
export const DEFAULT_PAIN_ALERT_ABOVE = 3;

/**
 * The daily check-in's five items, each 1–5 with 5 the best, after the wellness questionnaire of McLean et al.
 * 2010 (Int J Sports Physiol Perform 5:367–383; item wording from memory). The sum (5–25) is the day's score.
 */
export const CHECK_IN_ITEMS = ["sleep", "fatigue", "soreness", "stress", "mood"] as const;
export type CheckInItem = (typeof CHECK_IN_ITEMS)[number];
export const CHECK_IN_MIN = 1;
export const CHECK_IN_MAX = 5;

/** Each item's question and its five anchors, from 1 (worst) to 5 (best). */
export const CHECK_IN_SCALE: Record<
  CheckInItem,
  { label: string; anchors: readonly [string, string, string, string, string] }
> = {
  sleep: {
    label: "Sleep",
    anchors: ["Could not sleep", "Restless", "Hard to fall asleep", "Good", "Very restful"],
  },
  fatigue: { label: "Energy", anchors: ["Always tired", "More tired than normal", "Normal", "Fresh", "Very fresh"] },
  soreness: {
    label: "Muscles",
    anchors: ["Very sore", "More sore or tight", "Normal", "Feeling good", "Feeling great"],
  },
  stress: { label: "Stress", anchors: ["Highly stressed", "Stressed", "Normal", "Relaxed", "Very relaxed"] },
  mood: {
    label: "Mood",
    anchors: ["Down or irritable", "Snappy with others", "Less interested than usual", "Good", "Very positive"],
  },
};

/** Who changed a session log, for its history (every create, edit, removal and coach unlock is kept). */
export type LogChangeAction = "created" | "updated" | "deleted" | "unlocked";

/** An athlete's log stays open this long after the session ends, then only a coach can reopen it. */
export const LOG_EDIT_HOURS = 48;
