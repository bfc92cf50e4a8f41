import { requireMember } from "@/lib/auth/access";
import { viewerClock } from "@/lib/dates/zoned";
import { getSquadWeekLoad } from "@/lib/data/load-views";
import { parseParams, parseQuery, route } from "@/lib/http";
import { squadLoadQuerySchema } from "@/lib/validations/load";
import { teamParamsSchema } from "@/lib/validations/plan";

export const runtime = "nodejs";

/** The squad's week: totals, ACWR and flags per athlete (staff with squad-wide load access). */
export const GET = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  const viewer = await requireMember({ teamId, can: "load:view" });
  const query = parseQuery(req, squadLoadQuerySchema);
  return Response.json(await getSquadWeekLoad({ teamId, ...query, clock: viewerClock(viewer) }));
});
