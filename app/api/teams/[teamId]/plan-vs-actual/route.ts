import { requireMember } from "@/lib/auth/access";
import { viewerClock } from "@/lib/dates/zoned";
import { getPlanVersusActual } from "@/lib/data/plan-vs-actual";
import { parseParams, parseQuery, route } from "@/lib/http";
import { planActualQuerySchema } from "@/lib/validations/plan-vs-actual";
import { teamParamsSchema } from "@/lib/validations/plan";

export const runtime = "nodejs";

/** Prescribed against done, per athlete and for the squad, over the weeks asked for (staff with squad load access). */
export const GET = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  const viewer = await requireMember({ teamId, can: "load:view" });
  const query = parseQuery(req, planActualQuerySchema);
  return Response.json(await getPlanVersusActual({ teamId, ...query, clock: viewerClock(viewer) }));
});
