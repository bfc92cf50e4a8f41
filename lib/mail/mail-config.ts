import path from "node:path";
import { z } from "zod";

const DEFAULT_SMTP_URL = "smtp://127.0.0.1:2525";
const DEFAULT_MAIL_FROM = "Sprintwright <no-reply@sprintwright.local>";

// Empty strings in .env files mean "not set".
const optional = <T extends z.ZodType>(schema: T) =>
  z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? undefined : v), schema.optional());

const flag = z.enum(["0", "1", "true", "false"]).transform((v) => v === "1" || v === "true");

const schema = z.object({
  NODE_ENV: optional(z.string()),
  SMTP_URL: optional(z.url({ protocol: /^smtps?$/, error: "must look like smtp://host:port or smtps://host:port" })),
  SMTP_HOST: optional(z.string().min(1)),
  SMTP_PORT: optional(z.coerce.number().int().min(1).max(65535)),
  SMTP_USER: optional(z.string()),
  SMTP_PASS: optional(z.string()),
  SMTP_SECURE: optional(flag),
  MAIL_FROM: optional(z.string().min(3)),
  MAIL_FAKE: optional(flag),
  MAILBOX_DIR: optional(z.string().min(1)),
});

export interface MailConfig {
  host: string;
  port: number;
  /** Implicit TLS (smtps / port 465). */
  secure: boolean;
  auth: { user: string; pass: string } | null;
  from: string;
  /** The local fake: loopback host, no TLS at all. */
  loopback: boolean;
  /** MAIL_FAKE as parsed: null when unset. */
  fakeFlag: boolean | null;
  nodeEnv: string;
  mailboxDir: string;
}

const LOOPBACK = new Set(["127.0.0.1", "::1", "[::1]", "localhost"]);

function isLoopbackHost(host: string): boolean {
  return LOOPBACK.has(host.toLowerCase()) || /^127(\.\d{1,3}){3}$/.test(host);
}

/** The mailbox folder the fake writes and the app reads: MAILBOX_DIR, else data/mailbox. */
export function defaultMailboxDir(env: Readonly<Record<string, string | undefined>> = process.env): string {
  const dir = env.MAILBOX_DIR?.trim();
  // A folder chosen at run time: without the hint the build's file tracer cannot tell which files it reads and
  // traces the whole project into the server output.
  return path.resolve(/*turbopackIgnore: true*/ dir || path.join("data", "mailbox"));
}

/** Reads the SMTP settings from the environment; throws naming the wrong variable. */
export function readMailConfig(env: Readonly<Record<string, string | undefined>> = process.env): MailConfig {
  const parsed = schema.safeParse(env);
  if (!parsed.success) {
    const fields = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ");
    throw new Error(`Invalid mail settings: ${fields}`);
  }
  const e = parsed.data;
  const nodeEnv = e.NODE_ENV ?? "development";
  if (!e.SMTP_URL && !e.SMTP_HOST && nodeEnv === "production") {
    // Better a clear error (the outbox keeps the mail and retries) than mail silently sent to a local port.
    throw new Error("Invalid mail settings: SMTP_URL (or SMTP_HOST) must be set in production");
  }

  let host: string;
  let port: number | undefined;
  let secure: boolean;
  let auth: MailConfig["auth"] = null;
  if (e.SMTP_URL || !e.SMTP_HOST) {
    const url = new URL(e.SMTP_URL ?? DEFAULT_SMTP_URL);
    host = url.hostname;
    port = url.port ? Number(url.port) : undefined;
    secure = url.protocol === "smtps:";
    if (url.username) auth = { user: decodeURIComponent(url.username), pass: decodeURIComponent(url.password) };
  } else {
    host = e.SMTP_HOST;
    port = e.SMTP_PORT;
    secure = e.SMTP_SECURE ?? e.SMTP_PORT === 465;
  }
  if (e.SMTP_USER) auth = { user: e.SMTP_USER, pass: e.SMTP_PASS ?? "" };
  if (e.SMTP_SECURE !== undefined) secure = e.SMTP_SECURE;

  return {
    host,
    port: port ?? (secure ? 465 : 587),
    secure,
    auth,
    from: e.MAIL_FROM ?? DEFAULT_MAIL_FROM,
    loopback: isLoopbackHost(host),
    fakeFlag: e.MAIL_FAKE ?? null,
    nodeEnv,
    mailboxDir: defaultMailboxDir(env),
  };
}
