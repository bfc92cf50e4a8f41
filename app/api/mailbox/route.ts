import { z } from "zod";
import { clearMailbox, listMail } from "@/lib/mail/mailbox";
import { parseQuery, route } from "@/lib/http";
import { requireMailbox } from "@/lib/notices/mailbox-access";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

const querySchema = z.object({
  to: z.email({ error: "Give an e-mail address" }).optional(),
  limit: z.coerce.number().int().min(1).max(500).default(200),
});

/** GET /api/mailbox?to=: what the app sent to the local fake SMTP server, newest first. */
export const GET = route(async (req) => {
  await requireMailbox();
  const { to, limit } = parseQuery(req, querySchema);
  return Response.json({ mails: await listMail({ to, limit }) });
});

/** DELETE: empties the local mailbox. */
export const DELETE = route(async () => {
  await requireMailbox();
  return Response.json({ deleted: await clearMailbox() });
});
