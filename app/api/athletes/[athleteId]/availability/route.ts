import { requireAthlete } from "@/lib/auth/access";
import { teamToday } from "@/lib/dates/zoned";
import { parseJson, parseParams, route } from "@/lib/http";
import { setAvailability } from "@/lib/services/availability";
import { availabilitySchema } from "@/lib/validations/availability";
import { athleteParamsSchema } from "@/lib/validations/restrictions";

export const runtime = "nodejs";

type Params = { athleteId: string };

/** The medical staff set the athlete's availability; `conflicts` lists the sessions already planned that break it. */
export const POST = route<Params>(async (req, { params }) => {
  const { athleteId } = parseParams(await params, athleteParamsSchema);
  const viewer = await requireAthlete({ athleteId, can: "availability:edit" });
  const input = await parseJson(req, availabilitySchema);
  const result = await setAvailability({
    teamId: viewer.teamId,
    athleteId,
    actorUserId: viewer.userId,
    input,
    today: teamToday({ timeZone: viewer.timeZone, now: new Date() }),
  });
  return Response.json(result, { status: 201 });
});
