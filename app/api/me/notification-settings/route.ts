import { requireMember, requireViewer } from "@/lib/auth/access";
import { getNotificationSettings, updateNotificationSettings } from "@/lib/data/notification-settings";
import { parseJson, route } from "@/lib/http";
import { notificationSettingsSchema } from "@/lib/validations/notifications";

export const runtime = "nodejs";

// Alert e-mail is for the staff who see alerts; an athlete gets 403 here.
async function staff() {
  const me = await requireViewer();
  return requireMember({ teamId: me.teamId, can: "alerts:view" });
}

export const GET = route(async () => {
  const viewer = await staff();
  return Response.json(
    await getNotificationSettings({ userId: viewer.userId, teamId: viewer.teamId, role: viewer.role }),
  );
});

/** PUT { alertEmail: "each" | "digest" | "off" } */
export const PUT = route(async (req) => {
  const viewer = await staff();
  const input = await parseJson(req, notificationSettingsSchema);
  return Response.json(
    await updateNotificationSettings({ userId: viewer.userId, teamId: viewer.teamId, alertEmail: input.alertEmail }),
  );
});
