import { formatInstant } from "@/lib/format/instant";
import { renderEmail, type RenderedEmail } from "./layout";

export interface PasswordResetEmailInput {
  name?: string | null;
  resetUrl: string;
  expiresAt: Date;
  timeZone?: string;
}

export function passwordResetEmail(input: PasswordResetEmailInput): RenderedEmail {
  const greeting = input.name?.trim() ? `Hello ${input.name.trim()},` : "Hello,";
  return renderEmail({
    subject: "Reset your Sprintwright password",
    preheader: "Choose a new password with the link inside.",
    heading: "Choose a new password",
    parts: [
      { kind: "paragraph", text: greeting },
      { kind: "paragraph", text: "Someone asked to reset the password of your Sprintwright account." },
      { kind: "button", label: "Choose a new password", url: input.resetUrl },
      { kind: "paragraph", text: `The link works once, until ${formatInstant(input.expiresAt, input.timeZone)}.` },
      {
        kind: "paragraph",
        text: "If it was not you, ignore this e-mail: your password stays the same.",
      },
    ],
    footer: "You get this e-mail because a password reset was requested for your account.",
  });
}
