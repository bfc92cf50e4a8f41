import { requireAthlete } from "@/lib/auth/access";
import { scopeOf } from "@/lib/auth/permissions";
import { getSessionLog } from "@/lib/data/logs";
import { getThreadTarget, listSessionMessages } from "@/lib/data/session-messages";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, route } from "@/lib/http";
import { postSessionMessage } from "@/lib/services/session-thread";
import { sessionParamsSchema } from "@/lib/validations/plan";
import { sessionMessageSchema } from "@/lib/validations/session-messages";

export const runtime = "nodejs";

type Params = { sessionId: string };

/** The session and a viewer of its thread; an athlete only their own sessions, and a draft answers like a missing id. */
async function authorized(params: Promise<Params>) {
  const { sessionId } = parseParams(await params, sessionParamsSchema);
  const target = await getThreadTarget({ sessionId });
  if (!target) throw new AppError("not_found", "Not found");
  const viewer = await requireAthlete({ athleteId: target.athleteId, can: "sessions:discuss" });
  if (target.status === "draft" && scopeOf(viewer.role, "plan:view") !== "team")
    throw new AppError("not_found", "Not found");
  return { target, viewer };
}

/** The athlete's log note of the session (with what they logged) and the thread under it, oldest first. */
export const GET = route<Params>(async (_req, { params }) => {
  const { target } = await authorized(params);
  const [log, messages] = await Promise.all([
    getSessionLog({ sessionId: target.id }),
    listSessionMessages({ sessionId: target.id }),
  ]);
  const session = { id: target.id, athleteId: target.athleteId, athleteName: target.athleteName, date: target.date };
  return Response.json({ session: { ...session, title: target.title, status: target.status }, log, messages });
});

/** A message in the thread; it is e-mailed to the other people in it. */
export const POST = route<Params>(async (req, { params }) => {
  const { target, viewer } = await authorized(params);
  const { body } = await parseJson(req, sessionMessageSchema);
  const messages = await postSessionMessage({ target, actorUserId: viewer.userId, body });
  return Response.json({ messages }, { status: 201 });
});
