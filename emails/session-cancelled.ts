import { formatDayShort } from "@/lib/format/dates";
import { plural } from "@/lib/format/number";
import { byStart, sessionLine, type SessionLineInput } from "@/lib/format/session-line";
import { renderEmail, type EmailPart, type RenderedEmail } from "./layout";

export interface SessionCancelledEmailInput {
  athleteName: string;
  teamName: string;
  sessions: readonly SessionLineInput[];
  reason?: string | null;
  planUrl: string;
}

export function sessionCancelledEmail(input: SessionCancelledEmailInput): RenderedEmail {
  if (input.sessions.length === 0) throw new RangeError("A cancellation mail needs at least one session");
  const sessions = [...input.sessions].sort(byStart);
  const [first] = sessions;
  const single = sessions.length === 1 && first;
  const reason: EmailPart[] = input.reason?.trim()
    ? [{ kind: "paragraph", text: `Reason: ${input.reason.trim()}` }]
    : [];
  return renderEmail({
    subject: single
      ? `Cancelled: ${first.title} on ${formatDayShort(first.date)}`
      : `${plural(sessions.length, "session")} cancelled · ${input.teamName}`,
    preheader: single ? sessionLine(first) : `${plural(sessions.length, "session")} no longer take place.`,
    heading: single ? "Session cancelled" : "Sessions cancelled",
    parts: [
      { kind: "paragraph", text: `Hello ${input.athleteName},` },
      {
        kind: "paragraph",
        text: single ? "This session no longer takes place:" : "These sessions no longer take place:",
      },
      { kind: "list", items: sessions.map(sessionLine) },
      ...reason,
      { kind: "paragraph", text: `The attached calendar update removes ${single ? "it" : "them"} from your calendar.` },
      { kind: "button", label: "Open my week", url: input.planUrl },
    ],
    footer: `You get this e-mail because you are an athlete in ${input.teamName}.`,
  });
}
