import { formatDayLong } from "@/lib/format/dates";
import { renderEmail, type RenderedEmail } from "./layout";

export interface SessionMessageEmailInput {
  recipientName?: string | null;
  authorName: string;
  teamName: string;
  athleteName: string;
  /** The session's day, YYYY-MM-DD. */
  date: string;
  title: string;
  body: string;
  url: string;
}

/** A new message in a session's thread, to everyone else in it. */
export function sessionMessageEmail(input: SessionMessageEmailInput): RenderedEmail {
  const day = formatDayLong(input.date);
  return renderEmail({
    subject: `${input.authorName} on ${input.athleteName}'s session · ${day}`,
    preheader: input.body.slice(0, 120),
    heading: `${input.title} · ${day}`,
    parts: [
      { kind: "paragraph", text: input.recipientName?.trim() ? `Hello ${input.recipientName.trim()},` : "Hello," },
      { kind: "paragraph", text: `${input.authorName} wrote about ${input.athleteName}'s session on ${day}:` },
      { kind: "paragraph", text: input.body },
      { kind: "button", label: "Open the session and answer", url: input.url },
    ],
    footer: `You get this because you are in this session's thread in ${input.teamName}.`,
  });
}
