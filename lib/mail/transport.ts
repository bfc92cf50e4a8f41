import nodemailer, { type Transporter } from "nodemailer";
import type SMTPTransport from "nodemailer/lib/smtp-transport";
import { readMailConfig, type MailConfig } from "./mail-config";

interface MailAttachment {
  filename: string;
  content: string | Buffer;
  contentType?: string;
}

export interface OutgoingMail {
  to: string | string[];
  subject: string;
  html: string;
  text: string;
  /** An iTIP invite (RFC 6047): sent as a text/calendar alternative plus an .ics attachment. */
  icalEvent?: { method: "REQUEST" | "CANCEL" | "PUBLISH"; content: string; filename?: string };
  attachments?: MailAttachment[];
  /** Extra headers, e.g. a stable Message-ID chosen by the outbox. */
  headers?: Record<string, string>;
}

let cached: { key: string; transport: Transporter<SMTPTransport.SentMessageInfo> } | null = null;

/** The nodemailer transport for the configured SMTP server (cached while the settings stay the same). */
function getMailTransport(config: MailConfig = readMailConfig()): Transporter<SMTPTransport.SentMessageInfo> {
  const options: SMTPTransport.Options = {
    host: config.host,
    port: config.port,
    secure: config.secure,
    auth: config.auth ?? undefined,
    // The local fake speaks plain SMTP only (stack.md pitfall 17).
    ignoreTLS: config.loopback && !config.secure,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  };
  const key = JSON.stringify(options);
  if (cached?.key !== key) {
    cached?.transport.close();
    cached = { key, transport: nodemailer.createTransport(options) };
  }
  return cached.transport;
}

/** Sends one mail and returns its Message-ID; throws when the server refuses it (the outbox retries). */
export async function sendMail(message: OutgoingMail, config: MailConfig = readMailConfig()): Promise<string> {
  const info = await getMailTransport(config).sendMail({
    from: config.from,
    to: message.to,
    subject: message.subject,
    html: message.html,
    text: message.text,
    icalEvent: message.icalEvent
      ? {
          method: message.icalEvent.method,
          content: message.icalEvent.content,
          filename: message.icalEvent.filename ?? "invite.ics",
        }
      : undefined,
    attachments: message.attachments,
    // RFC 3834: marks automatic mail so auto-responders stay quiet.
    headers: { "Auto-Submitted": "auto-generated", ...message.headers },
  });
  if (info.accepted.length === 0) {
    throw new Error(`SMTP server accepted no recipient (rejected: ${info.rejected.join(", ") || "all"})`);
  }
  return info.messageId;
}

/**
 * True when mail goes to the local fake, so the app may show its mailbox screen:
 * a loopback SMTP host, and MAIL_FAKE not "0" in development/test (production needs MAIL_FAKE=1).
 */
export function isFakeMailbox(given?: MailConfig): boolean {
  let config: MailConfig;
  try {
    config = given ?? readMailConfig();
  } catch {
    return false; // broken settings: sendMail reports them, the mailbox screen just stays hidden
  }
  if (!config.loopback) return false;
  if (config.nodeEnv === "production") return config.fakeFlag === true;
  return config.fakeFlag !== false;
}
