import type { FlagKind } from "./flags";

/** The signed-in page that explains every figure ("How figures are worked out"). */
const FIGURES_PATH = "/figures";

/** Sections of the explanation page; each is an anchor id on it. */
export type FiguresTopic =
  | "running"
  | "contacts"
  | "srpe"
  | "logs"
  | "series"
  | "acwr"
  | "provisional"
  | "zones"
  | "weekly-change"
  | "monotony"
  | "recovery"
  | "plan-vs-actual"
  | "spikes-ahead"
  | "thresholds"
  | "caution";

/** Where a flag of each kind is explained. */
export const FLAG_TOPIC: Record<FlagKind, FiguresTopic> = {
  spike: "zones",
  rising: "zones",
  low: "zones",
  weekly_jump: "weekly-change",
  monotony: "monotony",
  plyo_volume: "contacts",
  recovery: "recovery",
};

/** Link to the explanation page, at a section when given; `base` makes it absolute (e-mails). */
export function figuresHref(topic?: FiguresTopic, base = ""): string {
  return `${base.replace(/\/$/, "")}${FIGURES_PATH}${topic ? `#${topic}` : ""}`;
}
