import { requireMember } from "@/lib/auth/access";
import { scopeOf } from "@/lib/auth/permissions";
import { teamToday } from "@/lib/dates/zoned";
import { getPlanWeek } from "@/lib/data/plan";
import { parseParams, parseQuery, route } from "@/lib/http";
import { teamParamsSchema, weekQuerySchema } from "@/lib/validations/plan";

export const runtime = "nodejs";

/** The week grid: staff see the squad; an athlete sees only their own row. */
export const GET = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  const viewer = await requireMember({ teamId, can: "plan:view", scope: "own" });
  const { week } = parseQuery(req, weekQuerySchema);
  const today = teamToday({ timeZone: viewer.timeZone, now: new Date() });
  const scope = scopeOf(viewer.role, "plan:view") === "team" ? "team" : "own";
  const audience = {
    scope,
    canEdit: scopeOf(viewer.role, "plan:edit") === "team",
    ownAthleteId: viewer.athleteId,
  } as const;
  return Response.json(await getPlanWeek({ teamId, date: week ?? today, today, audience }));
});
