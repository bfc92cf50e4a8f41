import { requireMember } from "@/lib/auth/access";
import { createSessions } from "@/lib/data/plan";
import { parseJson, parseParams, route } from "@/lib/http";
import { createSessionSchema, teamParamsSchema } from "@/lib/validations/plan";

export const runtime = "nodejs";

/** New sessions: { from: "blank" | "template" | "copy", ... } (see createSessionSchema). */
export const POST = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  const viewer = await requireMember({ teamId, can: "plan:edit" });
  const input = await parseJson(req, createSessionSchema);
  return Response.json(await createSessions({ teamId, actorUserId: viewer.userId, input }), { status: 201 });
});
