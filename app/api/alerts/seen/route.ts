import { requireMember, requireViewer } from "@/lib/auth/access";
import { markAlertsSeen } from "@/lib/data/notification-settings";
import { route } from "@/lib/http";

export const runtime = "nodejs";

/** POST: the member opened the inbox; the unread badge starts from zero again. */
export const POST = route(async () => {
  const me = await requireViewer();
  const viewer = await requireMember({ teamId: me.teamId, can: "alerts:view" });
  await markAlertsSeen({ userId: viewer.userId, teamId: viewer.teamId, role: viewer.role });
  return Response.json({ unread: 0 });
});
