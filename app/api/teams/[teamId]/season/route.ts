import { requireMember } from "@/lib/auth/access";
import { viewerClock } from "@/lib/dates/zoned";
import { getSeasonView } from "@/lib/data/season-view";
import { parseParams, parseQuery, route } from "@/lib/http";
import { teamParamsSchema } from "@/lib/validations/plan";
import { seasonQuerySchema } from "@/lib/validations/season";

export const runtime = "nodejs";

/** The season view (?from=date&weeks=n): phases, meets and each athlete's weeks with targets and forecast warnings. */
export const GET = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  const viewer = await requireMember({ teamId, can: "plan:view" });
  const query = parseQuery(req, seasonQuerySchema);
  return Response.json(await getSeasonView({ teamId, ...query, clock: viewerClock(viewer) }));
});
