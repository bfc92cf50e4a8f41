import { requireAthlete } from "@/lib/auth/access";
import { scopeOf } from "@/lib/auth/permissions";
import { teamToday } from "@/lib/dates/zoned";
import { getLogTarget } from "@/lib/data/logs";
import { deleteSessionLog, saveSessionLog } from "@/lib/services/session-logs";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, route } from "@/lib/http";
import { sessionLogSchema } from "@/lib/validations/log";
import { sessionParamsSchema } from "@/lib/validations/plan";

export const runtime = "nodejs";

type Params = { sessionId: string };

/**
 * The session and a viewer allowed to log it (an athlete only their own published or cancelled sessions).
 * A draft answers an athlete exactly like a missing id, so nobody learns which ids are the coach's drafts.
 */
async function authorized(params: Promise<Params>) {
  const { sessionId } = parseParams(await params, sessionParamsSchema);
  const target = await getLogTarget({ sessionId });
  if (!target) throw new AppError("not_found", "Not found");
  const viewer = await requireAthlete({ athleteId: target.athleteId, can: "log:write" });
  if (target.status === "draft" && scopeOf(viewer.role, "plan:view") !== "team")
    throw new AppError("not_found", "Not found");
  return { target, viewer };
}

export const PUT = route<Params>(async (req, { params }) => {
  const { target, viewer } = await authorized(params);
  const input = await parseJson(req, sessionLogSchema);
  const log = await saveSessionLog({
    target,
    input,
    actorUserId: viewer.userId,
    today: teamToday({ timeZone: viewer.timeZone, now: new Date() }),
  });
  return Response.json({ log });
});

export const DELETE = route<Params>(async (_req, { params }) => {
  const { target, viewer } = await authorized(params);
  const deleted = await deleteSessionLog({ target, actorUserId: viewer.userId });
  return Response.json({ deleted });
});
