import { unlockSessionLog } from "@/lib/services/session-logs";
import { route } from "@/lib/http";
import { logAccess } from "../log-access";

export const runtime = "nodejs";

/** A coach reopens an athlete's locked log for another 48 hours (kept in the log's history). */
export const POST = route<{ sessionId: string }>(async (_req, { params }) => {
  const { target, viewer } = await logAccess(params, "log:unlock");
  const lock = await unlockSessionLog({
    target,
    actorUserId: viewer.userId,
    clock: { now: new Date(), timeZone: viewer.timeZone },
  });
  return Response.json({ lock: { locked: lock.locked, locksAt: lock.locksAt.toISOString() } });
});
