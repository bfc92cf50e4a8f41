import { requireMember, requireViewer } from "@/lib/auth/access";
import { teamToday } from "@/lib/dates/zoned";
import { restrictionTeam } from "@/lib/data/restrictions";
import { liftRestriction } from "@/lib/services/restrictions";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, route } from "@/lib/http";
import { restrictionActionSchema, restrictionParamsSchema } from "@/lib/validations/restrictions";

export const runtime = "nodejs";

type Params = { restrictionId: string };

/** PATCH { action: "lift" }: the restriction stops applying from the team's today. */
export const PATCH = route<Params>(async (req, { params }) => {
  const { restrictionId } = parseParams(await params, restrictionParamsSchema);
  await requireViewer(); // signed-out callers get 401 before anything about the id is looked up
  const owner = await restrictionTeam({ restrictionId });
  if (!owner) throw new AppError("not_found", "No such restriction");
  const viewer = await requireMember({ teamId: owner.teamId, can: "restrictions:edit" });
  await parseJson(req, restrictionActionSchema);
  const restriction = await liftRestriction({
    teamId: viewer.teamId,
    restrictionId,
    actorUserId: viewer.userId,
    today: teamToday({ timeZone: viewer.timeZone, now: new Date() }),
  });
  return Response.json({ restriction });
});
