import { plural } from "@/lib/format/number";
import { byStart, sessionLine, type SessionLineInput } from "@/lib/format/session-line";
import { renderEmail, type RenderedEmail } from "./layout";
import { medicalParts } from "./medical-notes";

export interface SessionUpdatedEmailInput {
  athleteName: string;
  teamName: string;
  coachName?: string | null;
  /** The sessions as they are now. */
  sessions: readonly SessionLineInput[];
  planUrl: string;
  /** Sessions the coach planned past a restriction from the medical staff, in words (./medical-notes.ts). */
  medicalNotes?: readonly string[];
}

/** A published session moved or changed: the attached REQUEST (higher SEQUENCE) updates the calendar entry. */
export function sessionUpdatedEmail(input: SessionUpdatedEmailInput): RenderedEmail {
  if (input.sessions.length === 0) throw new RangeError("An update mail needs at least one session");
  const sessions = [...input.sessions].sort(byStart);
  const single = sessions.length === 1 ? sessions[0] : undefined;
  const who = input.coachName?.trim() || "Your coach";
  return renderEmail({
    subject: single
      ? `Changed: ${single.title} · ${input.teamName}`
      : `${plural(sessions.length, "session")} changed · ${input.teamName}`,
    preheader: single ? sessionLine(single) : `${plural(sessions.length, "session")} in your plan changed.`,
    heading: single ? "A session changed" : "Sessions changed",
    parts: [
      { kind: "paragraph", text: `Hello ${input.athleteName},` },
      {
        kind: "paragraph",
        text: `${who} changed ${single ? "a session" : "sessions"} in your plan. This is how ${single ? "it looks" : "they look"} now:`,
      },
      { kind: "list", items: sessions.map(sessionLine) },
      ...medicalParts(input.medicalNotes),
      { kind: "paragraph", text: "The attached calendar update changes the entry in your phone's calendar." },
      { kind: "button", label: "Open my week", url: input.planUrl },
    ],
    footer: `You get this e-mail because you are an athlete in ${input.teamName}.`,
  });
}
