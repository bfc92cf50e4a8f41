import { formatDayLong } from "@/lib/format/dates";
import { plural } from "@/lib/format/number";
import { renderEmail, type RenderedEmail } from "./layout";

export interface RestrictionConflictsEmailInput {
  recipientName?: string | null;
  teamName: string;
  athleteName: string;
  setByName: string;
  /** The restriction (or availability level) in words, with its dates. */
  rule: string;
  note: string;
  /** The sessions that break it: day, title and what in it breaks the rule. */
  sessions: ReadonlyArray<{ date: string; title: string; detail: string }>;
  planUrl: string;
}

/** To the coaches: the medical staff set a restriction that sessions already planned break. */
export function restrictionConflictsEmail(input: RestrictionConflictsEmailInput): RenderedEmail {
  const count = plural(input.sessions.length, "planned session");
  return renderEmail({
    subject: `Plan to change: ${input.athleteName} · ${count} against a new restriction`,
    preheader: `${input.setByName} set "${input.rule}".`,
    heading: `${input.athleteName}: ${count} to look at`,
    parts: [
      { kind: "paragraph", text: input.recipientName?.trim() ? `Hello ${input.recipientName.trim()},` : "Hello," },
      {
        kind: "paragraph",
        text: `${input.setByName} set a restriction for ${input.athleteName} after these sessions were planned. They break it:`,
      },
      {
        kind: "facts",
        rows: [
          ["Restriction", input.rule],
          ["Medical staff's note", input.note],
        ],
      },
      { kind: "list", items: input.sessions.map((s) => `${formatDayLong(s.date)} · ${s.title} · ${s.detail}`) },
      { kind: "button", label: "Open the week plan", url: input.planUrl },
      {
        kind: "caution",
        text:
          "The athlete sees these sessions marked as changed by the medical staff until you change them " +
          "or plan them anyway with a reason.",
      },
    ],
    footer: `You get this because you coach in ${input.teamName} in Sprintwright.`,
  });
}
