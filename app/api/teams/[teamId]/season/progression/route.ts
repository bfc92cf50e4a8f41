import { requireMember } from "@/lib/auth/access";
import { parseJson, parseParams, route } from "@/lib/http";
import { generateProgression } from "@/lib/services/season";
import { teamParamsSchema } from "@/lib/validations/plan";
import { progressionSchema } from "@/lib/validations/season";

export const runtime = "nodejs";

/** Draft weeks from a source week by a progression rule (lib/season/README.md); replaces earlier drafts there. */
export const POST = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  const viewer = await requireMember({ teamId, can: "plan:edit" });
  const input = await parseJson(req, progressionSchema);
  return Response.json(await generateProgression({ teamId, actorUserId: viewer.userId, input }), { status: 201 });
});
