import { AppError } from "@/lib/errors";
import { route } from "@/lib/http";
import { readRawMail } from "@/lib/mail/mailbox";
import { mailFromParams, requireMailbox } from "@/lib/notices/mailbox-access";

export const runtime = "nodejs";

/** The message as it arrived (RFC 5322), for opening in a mail program; only the member it was delivered to. */
export const GET = route<{ mailId: string }>(async (_req, { params }) => {
  const viewer = await requireMailbox();
  const mail = await mailFromParams(viewer, params);
  const raw = await readRawMail({ id: mail.id });
  if (!raw) throw new AppError("not_found", "No such mail");
  return new Response(new Uint8Array(raw), {
    headers: {
      "content-type": "message/rfc822",
      "content-disposition": `attachment; filename="${mail.id}.eml"`,
      "cache-control": "private, no-store",
    },
  });
});
