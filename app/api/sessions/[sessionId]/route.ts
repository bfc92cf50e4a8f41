import { requireAthlete } from "@/lib/auth/access";
import { scopeOf } from "@/lib/auth/permissions";
import { findSessionRef, getSession } from "@/lib/data/plan";
import { deleteSession, updateSession } from "@/lib/services/plan-sessions";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, parseQuery, route } from "@/lib/http";
import { sessionParamsSchema, updateSessionSchema, versionQuerySchema } from "@/lib/validations/plan";
import { answer, sessionEditor } from "./session-access";

export const runtime = "nodejs";

type Params = { sessionId: string };

/** Staff read any session of their team; an athlete only their own, and never a draft. */
export const GET = route<Params>(async (_req, { params }) => {
  const { sessionId } = parseParams(await params, sessionParamsSchema);
  const ref = await findSessionRef({ sessionId });
  if (!ref) throw new AppError("not_found", "Not found");
  const viewer = await requireAthlete({ athleteId: ref.athleteId, can: "plan:view" });
  if (scopeOf(viewer.role, "plan:view") !== "team" && ref.status === "draft")
    throw new AppError("not_found", "Not found");
  return Response.json({ session: await getSession({ teamId: ref.teamId, sessionId }) });
});

/** Any subset of the session with the `version` read; 409 "stale" with the current session when it changed. */
export const PATCH = route<Params>(async (req, { params }) => {
  const ctx = await sessionEditor(params);
  const input = await parseJson(req, updateSessionSchema);
  return answer(ctx, await updateSession({ ...ctx, input }));
});

/** DELETE ?version=: a draft is removed; a published session is kept as cancelled. */
export const DELETE = route<Params>(async (req, { params }) => {
  const ctx = await sessionEditor(params);
  const { version } = parseQuery(req, versionQuerySchema);
  return answer(ctx, await deleteSession({ ...ctx, version }));
});
