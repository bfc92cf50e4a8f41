import { requireMember, requireViewer } from "@/lib/auth/access";
import { getAlert, updateAlertStatus } from "@/lib/data/alerts";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, route } from "@/lib/http";
import { alertActionSchema, alertIdParamsSchema } from "@/lib/validations/alerts";

export const runtime = "nodejs";

type Params = { alertId: string };

export const GET = route<Params>(async (_req, { params }) => {
  const { alertId } = parseParams(await params, alertIdParamsSchema);
  const me = await requireViewer();
  const viewer = await requireMember({ teamId: me.teamId, can: "alerts:view" });
  const alert = await getAlert({ teamId: viewer.teamId, alertId, userId: viewer.userId });
  if (!alert) throw new AppError("not_found", "No such alert");
  return Response.json({ alert });
});

/** PATCH { action: "acknowledge" | "resolve" | "reopen", note }: resolving needs a note. */
export const PATCH = route<Params>(async (req, { params }) => {
  const { alertId } = parseParams(await params, alertIdParamsSchema);
  const me = await requireViewer();
  const viewer = await requireMember({ teamId: me.teamId, can: "alerts:manage" });
  const input = await parseJson(req, alertActionSchema);
  const alert = await updateAlertStatus({ teamId: viewer.teamId, alertId, userId: viewer.userId, input });
  return Response.json({ alert });
});
