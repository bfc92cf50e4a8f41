import { z } from "zod";
import { AppError } from "@/lib/errors";
import { clearMailbox } from "@/lib/mail/mailbox";
import { parseQuery, route } from "@/lib/http";
import { listViewerMail, requireMailbox } from "@/lib/notices/mailbox-access";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

const querySchema = z.object({
  to: z
    .string()
    .trim()
    .toLowerCase()
    .pipe(z.email({ error: "Give an e-mail address" }))
    .optional(),
  limit: z.coerce.number().int().min(1).max(500).default(200),
});

/** GET /api/mailbox: the mail the local fake SMTP server holds for the signed-in member, newest first. */
export const GET = route(async (req) => {
  const viewer = await requireMailbox();
  const { to, limit } = parseQuery(req, querySchema);
  if (to !== undefined && to !== viewer.email.toLowerCase()) {
    throw new AppError("forbidden", "You can read only the mail sent to your own address", {
      fields: { to: ["Only your own address"] },
    });
  }
  return Response.json({ mails: await listViewerMail({ viewer, limit }) });
});

/** DELETE: removes the signed-in member's own mail from the local mailbox (nobody else's). */
export const DELETE = route(async () => {
  const viewer = await requireMailbox();
  return Response.json({ deleted: await clearMailbox({ to: viewer.email }) });
});
