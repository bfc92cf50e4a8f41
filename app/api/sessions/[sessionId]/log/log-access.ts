import "server-only";
import { requireAthlete } from "@/lib/auth/access";
import { scopeOf, type Action } from "@/lib/auth/permissions";
import { getLogTarget } from "@/lib/data/logs";
import { AppError } from "@/lib/errors";
import { parseParams } from "@/lib/http";
import { sessionParamsSchema } from "@/lib/validations/plan";

/**
 * The session and a viewer allowed `can` on it (an athlete only their own published or cancelled sessions).
 * A draft answers an athlete exactly like a missing id, so nobody learns which ids are the coach's drafts.
 */
export async function logAccess(params: Promise<{ sessionId: string }>, can: Action) {
  const { sessionId } = parseParams(await params, sessionParamsSchema);
  const target = await getLogTarget({ sessionId });
  if (!target) throw new AppError("not_found", "Not found");
  const viewer = await requireAthlete({ athleteId: target.athleteId, can });
  if (target.status === "draft" && scopeOf(viewer.role, "plan:view") !== "team")
    throw new AppError("not_found", "Not found");
  // The 48-hour lock binds the athlete on their own log; staff who log for them can also reopen it.
  const lock = scopeOf(viewer.role, "log:write") === "own" ? { now: new Date(), timeZone: viewer.timeZone } : undefined;
  return { target, viewer, lock };
}
