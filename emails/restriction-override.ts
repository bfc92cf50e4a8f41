import { formatDayLong } from "@/lib/format/dates";
import { renderEmail, type RenderedEmail } from "./layout";

export interface RestrictionOverrideEmailInput {
  recipientName?: string | null;
  teamName: string;
  athleteName: string;
  coachName: string;
  /** The session's day, YYYY-MM-DD. */
  date: string;
  /** The restriction in words, with its dates. */
  rule: string;
  /** What in the session breaks it. */
  detail: string;
  reason: string;
  athleteUrl: string;
}

/** To the medical staff: a coach planned a session against one of their restrictions, and said why. */
export function restrictionOverrideEmail(input: RestrictionOverrideEmailInput): RenderedEmail {
  const day = formatDayLong(input.date);
  return renderEmail({
    subject: `Restriction overridden: ${input.athleteName} · ${day}`,
    preheader: `${input.coachName} planned ${input.detail} against "${input.rule}".`,
    heading: `${input.athleteName}: a restriction was overridden`,
    parts: [
      { kind: "paragraph", text: input.recipientName?.trim() ? `Hello ${input.recipientName.trim()},` : "Hello," },
      {
        kind: "paragraph",
        text: `${input.coachName} planned a session for ${input.athleteName} on ${day} that goes past a restriction the medical staff set.`,
      },
      {
        kind: "facts",
        rows: [
          ["Restriction", input.rule],
          ["In the session", input.detail],
          ["Coach's reason", input.reason],
          ["Day", day],
        ],
      },
      { kind: "button", label: "Open the athlete", url: input.athleteUrl },
      {
        kind: "caution",
        text: "The plan can still be changed. Talk it through with the coach if the session should not go ahead.",
      },
    ],
    footer: `You get this because you are medical staff of ${input.teamName} in Sprintwright.`,
  });
}
