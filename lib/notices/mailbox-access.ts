import "server-only";
import { z } from "zod";
import { requireViewer, type Viewer } from "@/lib/auth/access";
import { AppError } from "@/lib/errors";
import { parseParams } from "@/lib/http";
import { isMailId, readMail, type StoredMail } from "@/lib/mail/mailbox";
import { isFakeMailbox } from "@/lib/mail/transport";

/**
 * The local mailbox exists only while mail goes to the fake SMTP server; otherwise its routes are 404.
 * Any signed-in member may read it (a development tool: it shows every mail the app sent on this machine).
 */
export async function requireMailbox(): Promise<Viewer> {
  if (!isFakeMailbox()) throw new AppError("not_found", "Not found");
  return requireViewer();
}

const mailParams = z.object({ mailId: z.string().refine(isMailId) });

export async function mailFromParams(params: Promise<{ mailId: string }>): Promise<StoredMail> {
  const { mailId } = parseParams(await params, mailParams);
  const mail = await readMail({ id: mailId });
  if (!mail) throw new AppError("not_found", "No such mail");
  return mail;
}
