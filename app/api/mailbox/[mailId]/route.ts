import { route } from "@/lib/http";
import { mailFromParams, requireMailbox } from "@/lib/notices/mailbox-access";

export const runtime = "nodejs";

/** One mail delivered to the signed-in member: headers, HTML and text parts, attachments (calendar parts as text). */
export const GET = route<{ mailId: string }>(async (_req, { params }) => {
  const viewer = await requireMailbox();
  return Response.json({ mail: await mailFromParams(viewer, params) });
});
