import { formatDayLong } from "@/lib/format/dates";
import type { EmailPart } from "./layout";

/** One session the coach planned past a restriction, as the athlete's mail says it. */
export function medicalNote(hit: { date: string; rule: string; detail: string }, reason: string): string {
  return (
    `${formatDayLong(hit.date)}: planned past a restriction from your medical staff ("${hit.rule}"; ${hit.detail}). ` +
    `Your coach's reason: ${reason}`
  );
}

/** The athlete's mail about sessions planned past a restriction says so, and whom to ask. */
export function medicalParts(notes: readonly string[] | undefined): EmailPart[] {
  if (!notes || notes.length === 0) return [];
  return [
    { kind: "subheading", text: "Your medical staff's restriction" },
    { kind: "list", items: notes },
    { kind: "caution", text: "Check with your coach (and your physio) before you train if anything is unclear." },
  ];
}
