import { z } from "zod";
import { AppError } from "@/lib/errors";
import { parseParams, route } from "@/lib/http";
import { mailFromParams, requireMailbox } from "@/lib/notices/mailbox-access";

export const runtime = "nodejs";

const indexSchema = z.object({ index: z.coerce.number().int().min(0).max(100) });

function safeName(name: string | null, index: number, contentType: string): string {
  const fallback = /calendar|ics/i.test(contentType) ? `invite-${index + 1}.ics` : `attachment-${index + 1}`;
  return (name ?? fallback).replace(/[^\w.\- ]+/g, "_").slice(0, 100) || fallback;
}

/** One attachment of a stored mail, e.g. the invitation's .ics, as a download. */
export const GET = route<{ mailId: string; index: string }>(async (_req, { params }) => {
  const viewer = await requireMailbox();
  const p = await params;
  const { index } = parseParams(p, indexSchema);
  const mail = await mailFromParams(viewer, Promise.resolve({ mailId: p.mailId }));
  const attachment = mail.attachments[index];
  if (!attachment) throw new AppError("not_found", "No such attachment");
  const body =
    attachment.encoding === "base64"
      ? Buffer.from(attachment.content, "base64")
      : Buffer.from(attachment.content, "utf8");
  return new Response(new Uint8Array(body), {
    headers: {
      // Only calendar parts keep their type; anything else (an HTML part, say) must never render on our origin.
      "content-type": /^(text\/calendar|application\/ics)\b/i.test(attachment.contentType)
        ? "text/calendar; charset=utf-8"
        : "application/octet-stream",
      "content-disposition": `attachment; filename="${safeName(attachment.filename, index, attachment.contentType)}"`,
      "x-content-type-options": "nosniff",
      "cache-control": "private, no-store",
    },
  });
});
