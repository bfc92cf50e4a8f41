import { formatInstant } from "@/lib/format/instant";
import { renderEmail, type RenderedEmail } from "./layout";

export interface MemberInvitationEmailInput {
  inviteeName?: string | null;
  teamName: string;
  /** Team role as stored, e.g. "coach", "athlete", "physio". */
  role: string;
  inviterName: string;
  acceptUrl: string;
  expiresAt: Date;
  /** Zone used to show the expiry time (the team's zone). */
  timeZone?: string;
  /** The address has an account already: its owner signs in to accept (no new password). */
  existingAccount?: boolean;
}

function withArticle(word: string): string {
  return `${/^[aeiou]/i.test(word) ? "an" : "a"} ${word}`;
}

export function memberInvitationEmail(input: MemberInvitationEmailInput): RenderedEmail {
  const role = input.role.trim().toLowerCase().replace(/_/g, " ");
  const expires = formatInstant(input.expiresAt, input.timeZone);
  const greeting = input.inviteeName?.trim() ? `Hello ${input.inviteeName.trim()},` : "Hello,";
  return renderEmail({
    subject: `${input.inviterName} invited you to ${input.teamName} on Sprintwright`,
    preheader: `Join ${input.teamName} as ${withArticle(role)}.`,
    heading: `Join ${input.teamName}`,
    parts: [
      { kind: "paragraph", text: greeting },
      {
        kind: "paragraph",
        text: `${input.inviterName} invited you to join ${input.teamName} on Sprintwright as ${withArticle(role)}.`,
      },
      ...(input.existingAccount
        ? [
            {
              kind: "paragraph" as const,
              text:
                "You already have a Sprintwright account with this address: sign in with it to accept. " +
                "Nothing is shared with the team until you do.",
            },
          ]
        : []),
      { kind: "button", label: "Accept the invitation", url: input.acceptUrl },
      {
        kind: "paragraph",
        text: `The link works until ${expires}. After that, ask ${input.inviterName} for a new one.`,
      },
      { kind: "paragraph", text: "If you did not expect this invitation, you can ignore this e-mail." },
    ],
    footer: `Sent on behalf of ${input.teamName}.`,
  });
}
