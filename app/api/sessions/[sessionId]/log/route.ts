import { teamToday } from "@/lib/dates/zoned";
import { listLogChanges } from "@/lib/data/log-changes";
import { getSessionLog } from "@/lib/data/logs";
import { painReportsBySession } from "@/lib/data/pain-reports";
import { deleteSessionLog, saveSessionLog, sessionLogLock } from "@/lib/services/session-logs";
import { parseJson, route } from "@/lib/http";
import { sessionLogSchema } from "@/lib/validations/log";
import { logAccess } from "./log-access";

export const runtime = "nodejs";

type Params = { sessionId: string };

/** The session's log, its pain report, whether it is still open to the athlete and every change (who, when). */
export const GET = route<Params>(async (_req, { params }) => {
  const { target, viewer } = await logAccess(params, "plan:view");
  const [log, pain, history, lock] = await Promise.all([
    getSessionLog({ sessionId: target.id }),
    painReportsBySession({ sessionIds: [target.id] }),
    listLogChanges({ sessionId: target.id }),
    sessionLogLock({ target, clock: { now: new Date(), timeZone: viewer.timeZone } }),
  ]);
  return Response.json({
    log,
    pain: pain.get(target.id) ?? null,
    lock: { locked: lock.locked, locksAt: lock.locksAt.toISOString() },
    history,
  });
});

export const PUT = route<Params>(async (req, { params }) => {
  const { target, viewer, lock } = await logAccess(params, "log:write");
  const input = await parseJson(req, sessionLogSchema);
  const log = await saveSessionLog({
    target,
    input,
    actorUserId: viewer.userId,
    today: teamToday({ timeZone: viewer.timeZone, now: new Date() }),
    lock,
  });
  return Response.json({ log });
});

export const DELETE = route<Params>(async (_req, { params }) => {
  const { target, viewer, lock } = await logAccess(params, "log:write");
  const deleted = await deleteSessionLog({ target, actorUserId: viewer.userId, lock });
  return Response.json({ deleted });
});
