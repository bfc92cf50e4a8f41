import { requireMember, requireViewer } from "@/lib/auth/access";
import { countUnreadAlerts, listAlerts } from "@/lib/data/alerts";
import { parseQuery, route } from "@/lib/http";
import { alertListQuerySchema } from "@/lib/validations/alerts";

export const runtime = "nodejs";

/** GET /api/alerts?status=unresolved|open|acknowledged|resolved|all&athleteId=: the team's alert inbox. */
export const GET = route(async (req) => {
  const me = await requireViewer();
  const viewer = await requireMember({ teamId: me.teamId, can: "alerts:view" });
  const query = parseQuery(req, alertListQuerySchema);
  const [alerts, unread] = await Promise.all([
    listAlerts({ teamId: viewer.teamId, userId: viewer.userId, query }),
    countUnreadAlerts({ teamId: viewer.teamId, userId: viewer.userId }),
  ]);
  return Response.json({ alerts, unread });
});
