import { formatDayLong, formatDayShort } from "@/lib/format/dates";
import { plural } from "@/lib/format/number";
import { byStart, sessionLine, type SessionLineInput } from "@/lib/format/session-line";
import { renderEmail, type EmailPart, type RenderedEmail } from "./layout";
import { medicalParts } from "./medical-notes";

export interface SessionInvitationsEmailInput {
  athleteName: string;
  teamName: string;
  coachName?: string | null;
  /** Monday (or the team's first day) of the week, YYYY-MM-DD. */
  weekStart: string;
  sessions: readonly SessionLineInput[];
  /** The athlete's week in the app. */
  planUrl: string;
  /** The athlete's personal calendar feed, offered as an always-current alternative. */
  feedUrl?: string | null;
  /** Sessions the coach planned past a restriction from the medical staff, in words (./medical-notes.ts). */
  medicalNotes?: readonly string[];
}

export function sessionInvitationsEmail(input: SessionInvitationsEmailInput): RenderedEmail {
  const sessions = [...input.sessions].sort(byStart);
  const count = plural(sessions.length, "session");
  const from = input.coachName?.trim() ? `${input.coachName.trim()} published` : "Your coach published";
  const feed: EmailPart[] = input.feedUrl
    ? [
        { kind: "paragraph", text: "Prefer a calendar that updates itself? Subscribe to your personal feed instead:" },
        { kind: "link", label: "Subscribe to my Sprintwright calendar", url: input.feedUrl },
      ]
    : [];
  return renderEmail({
    subject: `Your sessions for the week of ${formatDayShort(input.weekStart)} · ${input.teamName}`,
    preheader: `${count} for the week of ${formatDayLong(input.weekStart)}.`,
    heading: `Your week from ${formatDayLong(input.weekStart)}`,
    parts: [
      { kind: "paragraph", text: `Hello ${input.athleteName},` },
      { kind: "paragraph", text: `${from} ${count} for you in ${input.teamName}:` },
      { kind: "list", items: sessions.map(sessionLine) },
      ...medicalParts(input.medicalNotes),
      {
        kind: "paragraph",
        text: "The attached calendar invitation adds them to your phone's calendar. Changes arrive as updates.",
      },
      { kind: "button", label: "Open my week", url: input.planUrl },
      ...feed,
    ],
    footer: `You get this e-mail because you are an athlete in ${input.teamName}.`,
  });
}
