// Node-only (tests and scripts import it too, so no "server-only" marker): the fake SMTP server's store.
import { randomBytes } from "node:crypto";
import { promises as fs } from "node:fs";
import path from "node:path";
import { defaultMailboxDir } from "./mail-config";

export interface StoredAttachment {
  filename: string | null;
  contentType: string;
  size: number;
  /** UTF-8 text for calendar parts, base64 for everything else. */
  content: string;
  encoding: "utf-8" | "base64";
}

export interface StoredMail {
  id: string;
  receivedAt: string;
  messageId: string | null;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  attachments: StoredAttachment[];
  envelope: { mailFrom: string | null; rcptTo: string[] };
}

export type MailSummary = Pick<StoredMail, "id" | "receivedAt" | "from" | "to" | "subject"> & {
  attachmentCount: number;
  hasCalendar: boolean;
};

// <UTC timestamp to the millisecond>-<8 hex>: sorts by arrival and never contains a path separator.
const MAIL_ID = /^\d{8}T\d{9}Z-[0-9a-f]{8}$/;
let lastStamp = 0;

class InvalidMailIdError extends RangeError {
  constructor(id: string) {
    super(`Not a mailbox id: "${id.slice(0, 80)}"`);
    this.name = "InvalidMailIdError";
  }
}

export function isMailId(id: string): boolean {
  return MAIL_ID.test(id);
}

export function newMailId(now = Date.now()): string {
  // Strictly increasing within this process, so two mails in one millisecond keep their order.
  lastStamp = Math.max(now, lastStamp + 1);
  const stamp = new Date(lastStamp).toISOString().replace(/[-:.]/g, "");
  return `${stamp}-${randomBytes(4).toString("hex")}`;
}

function resolveDir(dir?: string): string {
  return dir ? path.resolve(/*turbopackIgnore: true*/ dir) : defaultMailboxDir();
}

async function writeAtomically(file: string, data: string | Buffer): Promise<void> {
  const tmp = path.join(path.dirname(file), `.${path.basename(file)}.${randomBytes(4).toString("hex")}.tmp`);
  await fs.writeFile(tmp, data);
  await fs.rename(tmp, file);
}

/** Stores one message: the raw .eml first, then the .json that makes it visible to readers. */
export async function saveMail({ dir, raw, mail }: { dir?: string; raw: Buffer; mail: StoredMail }): Promise<void> {
  if (!isMailId(mail.id)) throw new InvalidMailIdError(mail.id);
  const base = resolveDir(dir);
  await fs.mkdir(base, { recursive: true });
  await writeAtomically(path.join(base, `${mail.id}.eml`), raw);
  await writeAtomically(path.join(base, `${mail.id}.json`), JSON.stringify(mail, null, 2));
}

async function storedIds(base: string): Promise<string[]> {
  let names: string[];
  try {
    names = await fs.readdir(base);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === "ENOENT") return [];
    throw err;
  }
  return names
    .filter((n) => n.endsWith(".json"))
    .map((n) => n.slice(0, -".json".length))
    .filter(isMailId);
}

function isCalendar(a: StoredAttachment): boolean {
  return /^(text\/calendar|application\/ics)\b/i.test(a.contentType);
}

/**
 * Whether the message was delivered to this address. Only the SMTP envelope counts: the To header is
 * whatever the sender wrote, the envelope is where the server actually put the message.
 */
export function isDeliveredTo(mail: Pick<StoredMail, "envelope">, address: string): boolean {
  const wanted = address.trim().toLowerCase();
  return wanted !== "" && mail.envelope.rcptTo.some((addr) => addr.trim().toLowerCase() === wanted);
}

/** Newest first; `to` keeps only mail delivered to that address. */
export async function listMail({ dir, to, limit }: { dir?: string; to?: string; limit?: number } = {}): Promise<
  MailSummary[]
> {
  const base = resolveDir(dir);
  const ids = (await storedIds(base)).sort().reverse();
  const out: MailSummary[] = [];
  for (const id of ids) {
    if (limit !== undefined && out.length >= limit) break;
    const mail = await readStored(base, id);
    if (!mail || (to !== undefined && !isDeliveredTo(mail, to))) continue;
    out.push({
      id: mail.id,
      receivedAt: mail.receivedAt,
      from: mail.from,
      to: mail.to,
      subject: mail.subject,
      attachmentCount: mail.attachments.length,
      hasCalendar: mail.attachments.some(isCalendar),
    });
  }
  return out;
}

async function readStored(base: string, id: string): Promise<StoredMail | null> {
  try {
    return JSON.parse(await fs.readFile(path.join(base, `${id}.json`), "utf8")) as StoredMail;
  } catch (err) {
    // Cleared between listing and reading: treat as gone.
    if ((err as NodeJS.ErrnoException).code === "ENOENT") return null;
    throw err;
  }
}

/** One message, or null when there is none with that id. Throws InvalidMailIdError for a malformed id. */
export async function readMail({ dir, id }: { dir?: string; id: string }): Promise<StoredMail | null> {
  if (!isMailId(id)) throw new InvalidMailIdError(id);
  return readStored(resolveDir(dir), id);
}

/** The raw RFC 5322 message, for a "download .eml" link. */
export async function readRawMail({ dir, id }: { dir?: string; id: string }): Promise<Buffer | null> {
  if (!isMailId(id)) throw new InvalidMailIdError(id);
  try {
    return await fs.readFile(path.join(resolveDir(dir), `${id}.eml`));
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === "ENOENT") return null;
    throw err;
  }
}

/**
 * Deletes the stored messages (only files this store wrote, never the folder itself); returns how many.
 * With `to`, only the messages delivered to that address go.
 */
export async function clearMailbox({ dir, to }: { dir?: string; to?: string } = {}): Promise<number> {
  const base = resolveDir(dir);
  if (to !== undefined) {
    const mine = (await listMail({ dir: base, to })).map((m) => m.id);
    await Promise.all(
      mine.flatMap((id) =>
        [".json", ".eml"].map((ext) =>
          fs.rm(path.join(/*turbopackIgnore: true*/ base, `${id}${ext}`), { force: true }),
        ),
      ),
    );
    return mine.length;
  }
  const ids = await storedIds(base);
  let names: string[] = [];
  try {
    names = await fs.readdir(base);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === "ENOENT") return 0;
    throw err;
  }
  const ours = names.filter((n) => {
    const m = /^(.+)\.(eml|json)$/.exec(n) ?? /^\.(.+)\.(eml|json)\.[0-9a-f]{8}\.tmp$/.exec(n);
    return m !== null && m[1] !== undefined && isMailId(m[1]);
  });
  await Promise.all(ours.map((n) => fs.rm(path.join(/*turbopackIgnore: true*/ base, n), { force: true })));
  return ids.length;
}
