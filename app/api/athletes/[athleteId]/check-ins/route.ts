import { requireAthlete } from "@/lib/auth/access";
import { addDays } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { listCheckIns } from "@/lib/data/check-ins";
import { saveCheckIn } from "@/lib/services/check-ins";
import { parseJson, parseParams, parseQuery, route } from "@/lib/http";
import { checkInQuerySchema, checkInSchema } from "@/lib/validations/athlete-reports";
import { athleteParamsSchema } from "@/lib/validations/load";

export const runtime = "nodejs";

type Params = { athleteId: string };

/** The athlete's check-ins of the last `days` days, oldest first; an athlete reads only their own. */
export const GET = route<Params>(async (req, { params }) => {
  const { athleteId } = parseParams(await params, athleteParamsSchema);
  const viewer = await requireAthlete({ athleteId, can: "athletes:view" });
  const { days } = parseQuery(req, checkInQuerySchema);
  const today = teamToday({ timeZone: viewer.timeZone, now: new Date() });
  return Response.json({ checkIns: await listCheckIns({ athleteId, from: addDays(today, 1 - days), to: today }) });
});

/** Today's check-in (team zone); only the athlete themself writes it. */
export const PUT = route<Params>(async (req, { params }) => {
  const { athleteId } = parseParams(await params, athleteParamsSchema);
  const viewer = await requireAthlete({ athleteId, can: "checkin:write" });
  const input = await parseJson(req, checkInSchema);
  const checkIn = await saveCheckIn({
    teamId: viewer.athlete.teamId,
    athleteId,
    today: teamToday({ timeZone: viewer.timeZone, now: new Date() }),
    input,
  });
  return Response.json({ checkIn });
});
