import { formatDayLong } from "@/lib/format/dates";
import { renderEmail, type RenderedEmail } from "./layout";

export interface PainReportEmailInput {
  recipientName?: string | null;
  teamName: string;
  athleteName: string;
  /** The session's day, YYYY-MM-DD. */
  date: string;
  sessionTitle: string;
  region: string;
  severity: number;
  threshold: number;
  stoppedSession: boolean;
  note: string | null;
  athleteUrl: string;
}

/** To the medical staff: an athlete reported pain above the team's line with a session log. */
export function painReportEmail(input: PainReportEmailInput): RenderedEmail {
  const day = formatDayLong(input.date);
  return renderEmail({
    subject: `Pain reported: ${input.athleteName} · ${input.region} ${input.severity}/10`,
    preheader: `${input.athleteName} reported ${input.region.toLowerCase()} pain of ${input.severity} of 10 on ${day}.`,
    heading: `${input.athleteName}: pain reported`,
    parts: [
      { kind: "paragraph", text: input.recipientName?.trim() ? `Hello ${input.recipientName.trim()},` : "Hello," },
      {
        kind: "paragraph",
        text: `${input.athleteName} logged "${input.sessionTitle}" on ${day} and reported pain or discomfort.`,
      },
      {
        kind: "facts",
        rows: [
          ["Where", input.region],
          ["How bad", `${input.severity} of 10 (the team's line is above ${input.threshold})`],
          ["Stopped the session", input.stoppedSession ? "Yes" : "No"],
          ["Day", day],
          ...(input.note?.trim() ? [["Athlete's note", input.note.trim()] as const] : []),
        ],
      },
      { kind: "button", label: "Open the athlete", url: input.athleteUrl },
      {
        kind: "caution",
        text: "This is the athlete's own report, not a diagnosis. Check in with them before the next session.",
      },
    ],
    footer: `You get this because you are medical staff of ${input.teamName} in Sprintwright.`,
  });
}
