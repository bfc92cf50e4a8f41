import { requireMember } from "@/lib/auth/access";
import { getAthleteReportSettings, updateAthleteReportSettings } from "@/lib/data/athlete-report-settings";
import { parseJson, parseParams, route } from "@/lib/http";
import { athleteReportSettingsSchema } from "@/lib/validations/athlete-reports";
import { teamParamsSchema } from "@/lib/validations/plan";

export const runtime = "nodejs";

/** The team's pain-alert line and daily check-in switch: any member may read them; the head coach edits. */
export const GET = route<{ teamId: string }>(async (_req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  await requireMember({ teamId, can: "team:view" });
  return Response.json({ settings: await getAthleteReportSettings({ teamId }) });
});

export const PATCH = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  await requireMember({ teamId, can: "settings:edit" });
  const input = await parseJson(req, athleteReportSettingsSchema);
  return Response.json({ settings: await updateAthleteReportSettings({ teamId, input }) });
});
