// A real SMTP server for development and tests: every accepted message lands in the mailbox folder.
import type { AddressInfo } from "node:net";
import path from "node:path";
import { simpleParser, type AddressObject, type Attachment, type ParsedMail } from "mailparser";
import { SMTPServer, type SMTPServerEnvelope } from "smtp-server";
import { defaultMailboxDir } from "./mail-config";
import { newMailId, saveMail, type StoredAttachment, type StoredMail } from "./mailbox";

export interface FakeSmtpOptions {
  host?: string;
  /** 0 picks a free port. */
  port?: number;
  /** Mailbox folder; defaults to MAILBOX_DIR or data/mailbox. */
  dir?: string;
  onMessage?: (mail: StoredMail) => void;
}

export interface FakeSmtp {
  host: string;
  port: number;
  dir: string;
  close(): Promise<void>;
}

const MAX_MESSAGE_BYTES = 25 * 1024 * 1024;

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const objects = field === undefined ? [] : Array.isArray(field) ? field : [field];
  const flat = objects.flatMap((o) => o.value).flatMap((a) => (a.group ? a.group : [a]));
  return flat.map((a) => a.address ?? "").filter(Boolean);
}

function storedAttachment(a: Attachment): StoredAttachment {
  // Calendar parts stay readable in the JSON; nodemailer sends an invite as text/calendar and application/ics.
  const text = /^(text\/calendar|application\/ics)\b/i.test(a.contentType);
  return {
    filename: a.filename ?? null,
    contentType: a.contentType,
    size: a.size,
    content: a.content.toString(text ? "utf8" : "base64"),
    encoding: text ? "utf-8" : "base64",
  };
}

function toStoredMail(id: string, parsed: ParsedMail, envelope: SMTPServerEnvelope): StoredMail {
  return {
    id,
    receivedAt: new Date().toISOString(),
    messageId: parsed.messageId ?? null,
    from: parsed.from?.text ?? (envelope.mailFrom ? envelope.mailFrom.address : ""),
    to: addresses(parsed.to),
    subject: parsed.subject ?? "",
    text: parsed.text ?? "",
    html: parsed.html || null,
    attachments: parsed.attachments.map(storedAttachment),
    envelope: {
      mailFrom: envelope.mailFrom ? envelope.mailFrom.address : null,
      rcptTo: envelope.rcptTo.map((r) => r.address),
    },
  };
}

export async function startFakeSmtp(options: FakeSmtpOptions = {}): Promise<FakeSmtp> {
  const host = options.host ?? "127.0.0.1";
  const dir = options.dir ? path.resolve(/*turbopackIgnore: true*/ options.dir) : defaultMailboxDir();

  const server = new SMTPServer({
    name: "sprintwright-mailbox",
    banner: "Sprintwright local mailbox",
    // No TLS and any (or no) login: this only ever listens on the developer's own machine.
    disabledCommands: ["STARTTLS"],
    authOptional: true,
    allowInsecureAuth: true,
    size: MAX_MESSAGE_BYTES,
    logger: false,
    disableReverseLookup: true, // no DNS round trip per connection
    onAuth(auth, _session, callback) {
      callback(null, { user: auth.username ?? "local" });
    },
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (chunk: Buffer) => chunks.push(chunk));
      stream.on("error", callback);
      stream.on("end", () => {
        if (stream.sizeExceeded) {
          callback(Object.assign(new Error("Message too large for the local mailbox"), { responseCode: 552 }));
          return;
        }
        const raw = Buffer.concat(chunks);
        const id = newMailId();
        simpleParser(raw)
          .then(async (parsed) => {
            const mail = toStoredMail(id, parsed, session.envelope);
            await saveMail({ dir, raw, mail });
            options.onMessage?.(mail);
            callback(null, `Stored as ${id}`);
          })
          .catch((err: unknown) => callback(err instanceof Error ? err : new Error(String(err))));
      });
    },
  });

  await new Promise<void>((resolve, reject) => {
    const onError = (err: Error) => reject(err);
    server.once("error", onError);
    server.listen(options.port ?? 0, host, () => {
      server.off("error", onError);
      resolve();
    });
  });
  // Later errors (a client resetting its socket) must not crash the dev process.
  server.on("error", () => {});

  const { port } = server.server.address() as AddressInfo;
  return {
    host,
    port,
    dir,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
