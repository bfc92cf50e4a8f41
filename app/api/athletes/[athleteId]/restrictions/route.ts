import { requireAthlete } from "@/lib/auth/access";
import { teamToday } from "@/lib/dates/zoned";
import { listAthleteRestrictions, listOverrides } from "@/lib/data/restrictions";
import { createRestriction } from "@/lib/services/restrictions";
import { parseJson, parseParams, route } from "@/lib/http";
import { athleteParamsSchema, createRestrictionSchema } from "@/lib/validations/restrictions";

export const runtime = "nodejs";

type Params = { athleteId: string };

/** Every restriction ever set for the athlete (newest start first) and the coaches' overrides of them. */
export const GET = route<Params>(async (_req, { params }) => {
  const { athleteId } = parseParams(await params, athleteParamsSchema);
  const viewer = await requireAthlete({ athleteId, can: "athletes:view" });
  const [restrictions, overrides] = await Promise.all([
    listAthleteRestrictions({ teamId: viewer.teamId, athleteId }),
    listOverrides({ teamId: viewer.teamId, athleteId }),
  ]);
  return Response.json({ restrictions, overrides });
});

/** The medical staff set a new restriction; `conflicts` lists the sessions already planned that break it. */
export const POST = route<Params>(async (req, { params }) => {
  const { athleteId } = parseParams(await params, athleteParamsSchema);
  const viewer = await requireAthlete({ athleteId, can: "restrictions:edit" });
  const input = await parseJson(req, createRestrictionSchema);
  const today = teamToday({ timeZone: viewer.timeZone, now: new Date() });
  const { restriction, conflicts } = await createRestriction({
    teamId: viewer.teamId,
    athleteId,
    actorUserId: viewer.userId,
    input,
    today,
  });
  return Response.json({ restriction, conflicts }, { status: 201 });
});
