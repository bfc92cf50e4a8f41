import { requireMember } from "@/lib/auth/access";
import { getTeamLoadSettings } from "@/lib/data/team-settings";
import { updateTeamLoadSettings } from "@/lib/services/team-settings";
import { parseJson, parseParams, route } from "@/lib/http";
import { teamParamsSchema } from "@/lib/validations/plan";
import { teamSettingsPatchSchema } from "@/lib/validations/team-settings";

export const runtime = "nodejs";

/** The team's load thresholds: any member may read them (they explain the flags); the head coach edits. */
export const GET = route<{ teamId: string }>(async (_req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  await requireMember({ teamId, can: "team:view" });
  return Response.json({ settings: await getTeamLoadSettings({ teamId }) });
});

export const PATCH = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  await requireMember({ teamId, can: "settings:edit" });
  const input = await parseJson(req, teamSettingsPatchSchema);
  return Response.json({ settings: await updateTeamLoadSettings({ teamId, input }) });
});
