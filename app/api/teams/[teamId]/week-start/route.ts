import { requireMember } from "@/lib/auth/access";
import { updateTeamWeekStart } from "@/lib/data/team-settings";
import { parseJson, parseParams, route } from "@/lib/http";
import { teamParamsSchema } from "@/lib/validations/plan";
import { teamWeekSchema } from "@/lib/validations/team-week";

export const runtime = "nodejs";

/** The day the team's week starts on (Monday or Sunday): the head coach decides (settings:edit). */
export const PATCH = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  await requireMember({ teamId, can: "settings:edit" });
  const input = await parseJson(req, teamWeekSchema);
  return Response.json(await updateTeamWeekStart({ teamId, input }));
});
