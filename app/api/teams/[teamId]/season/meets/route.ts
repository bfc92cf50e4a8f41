import { requireMember } from "@/lib/auth/access";
import { parseJson, parseParams, route } from "@/lib/http";
import { createMeet } from "@/lib/services/season";
import { teamParamsSchema } from "@/lib/validations/plan";
import { meetInputSchema } from "@/lib/validations/season";

export const runtime = "nodejs";

/** A meet on the season calendar (coaches). */
export const POST = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  await requireMember({ teamId, can: "plan:edit" });
  const input = await parseJson(req, meetInputSchema);
  return Response.json({ meet: await createMeet({ teamId, input }) }, { status: 201 });
});
