import { requireAthlete } from "@/lib/auth/access";
import { viewerClock } from "@/lib/dates/zoned";
import { getAthleteLoad } from "@/lib/data/load-views";
import { parseParams, parseQuery, route } from "@/lib/http";
import { athleteLoadQuerySchema, athleteParamsSchema } from "@/lib/validations/load";

export const runtime = "nodejs";

/** One athlete's daily load, ACWR and flags; an athlete may read only their own. */
export const GET = route<{ athleteId: string }>(async (req, { params }) => {
  const { athleteId } = parseParams(await params, athleteParamsSchema);
  const viewer = await requireAthlete({ athleteId, can: "load:view" });
  const query = parseQuery(req, athleteLoadQuerySchema);
  return Response.json(
    await getAthleteLoad({
      teamId: viewer.athlete.teamId,
      athleteId,
      ...query,
      clock: viewerClock(viewer),
      withDrafts: viewer.role !== "athlete",
    }),
  );
});
