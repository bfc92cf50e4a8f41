import { formatDayLong, formatDayShort } from "@/lib/format/dates";
import { plural } from "@/lib/format/number";
import { MEDICAL_CHANGE_NOTICE } from "@/lib/restrictions/conflicts";
import { renderEmail, type RenderedEmail } from "./layout";

export interface MedicalChangeEmailInput {
  athleteName: string;
  teamName: string;
  /** The restriction (or availability level) in words, with its dates. */
  rule: string;
  /** The athlete's published sessions that break it: day, title and what in it breaks the rule. */
  sessions: ReadonlyArray<{ date: string; title: string; detail: string }>;
  /** The athlete's week, at the first of these sessions. */
  planUrl: string;
}

/**
 * To the athlete: the medical staff set a limit after sessions were sent, and these no longer fit it. The mail says
 * what the athlete's screens say on them, so nobody trains on a plan the coach has not looked at again.
 */
export function medicalChangeEmail(input: MedicalChangeEmailInput): RenderedEmail {
  if (input.sessions.length === 0) throw new RangeError("A medical change mail needs at least one session");
  const sessions = [...input.sessions].sort((a, b) => a.date.localeCompare(b.date));
  const single = sessions.length === 1 ? sessions[0] : undefined;
  return renderEmail({
    subject: single
      ? `Changed by your medical staff: ${single.title} on ${formatDayShort(single.date)}`
      : `${plural(sessions.length, "session")} changed by your medical staff · ${input.teamName}`,
    preheader: `${MEDICAL_CHANGE_NOTICE}.`,
    heading: single ? "A session changed by your medical staff" : "Sessions changed by your medical staff",
    parts: [
      { kind: "paragraph", text: `Hello ${input.athleteName},` },
      {
        kind: "paragraph",
        text:
          `Your medical staff set a limit after ${single ? "this session was" : "these sessions were"} sent to you, ` +
          `and ${single ? "it does" : "they do"} not fit it:`,
      },
      { kind: "facts", rows: [["Limit", input.rule]] },
      { kind: "list", items: sessions.map((s) => `${formatDayLong(s.date)} · ${s.title} · ${s.detail}`) },
      { kind: "caution", text: `${MEDICAL_CHANGE_NOTICE} before you train.` },
      { kind: "button", label: "Open my week", url: input.planUrl },
    ],
    footer: `You get this e-mail because you are an athlete in ${input.teamName}.`,
  });
}
