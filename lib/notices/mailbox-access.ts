import "server-only";
import { z } from "zod";
import { requireMember, requireViewer, type Viewer } from "@/lib/auth/access";
import { can } from "@/lib/auth/permissions";
import { AppError } from "@/lib/errors";
import { parseParams } from "@/lib/http";
import { isDeliveredTo, isMailId, listMail, readMail, type MailSummary, type StoredMail } from "@/lib/mail/mailbox";
import { isFakeMailbox } from "@/lib/mail/transport";

/**
 * The local mailbox exists only while mail goes to the fake SMTP server; otherwise its routes are 404.
 * It holds everyone's mail (password-reset links included), so each member reads only what was delivered
 * to their own address.
 */
export async function requireMailbox(): Promise<Viewer> {
  if (!isFakeMailbox()) throw new AppError("not_found", "Not found");
  const viewer = await requireViewer();
  return requireMember({ teamId: viewer.teamId, can: "mailbox:view", scope: "own" });
}

/** Whether this member may see the team's delivery queue (recipients, kinds, states; no bodies). */
export function canSeeDeliveryQueue(viewer: Viewer): boolean {
  return can(viewer.role, "mailbox:queue", "team");
}

export async function listViewerMail({ viewer, limit }: { viewer: Viewer; limit: number }): Promise<MailSummary[]> {
  return listMail({ to: viewer.email, limit });
}

/** One message delivered to the viewer, else null: someone else's mail looks exactly like a missing one. */
export async function readViewerMail({ viewer, id }: { viewer: Viewer; id: string }): Promise<StoredMail | null> {
  if (!isMailId(id)) return null;
  const mail = await readMail({ id });
  return mail && isDeliveredTo(mail, viewer.email) ? mail : null;
}

const mailParams = z.object({ mailId: z.string().refine(isMailId) });

export async function mailFromParams(viewer: Viewer, params: Promise<{ mailId: string }>): Promise<StoredMail> {
  const { mailId } = parseParams(await params, mailParams);
  const mail = await readViewerMail({ viewer, id: mailId });
  if (!mail) throw new AppError("not_found", "No such mail");
  return mail;
}
