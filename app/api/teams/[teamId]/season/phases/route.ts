import { requireMember } from "@/lib/auth/access";
import { parseJson, parseParams, route } from "@/lib/http";
import { createPhase } from "@/lib/services/season";
import { teamParamsSchema } from "@/lib/validations/plan";
import { phaseInputSchema } from "@/lib/validations/season";

export const runtime = "nodejs";

/** A new phase of the season (coaches). */
export const POST = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  await requireMember({ teamId, can: "plan:edit" });
  const input = await parseJson(req, phaseInputSchema);
  return Response.json({ phase: await createPhase({ teamId, input }) }, { status: 201 });
});
