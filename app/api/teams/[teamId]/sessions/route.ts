import { requireMember } from "@/lib/auth/access";
import { createSessions } from "@/lib/services/plan-sessions";
import { parseJson, parseParams, route } from "@/lib/http";
import { answer } from "@/app/api/sessions/[sessionId]/session-access";
import { createSessionSchema, teamParamsSchema } from "@/lib/validations/plan";

export const runtime = "nodejs";

/** New sessions: { from: "blank" | "template" | "copy", ... } (see createSessionSchema). */
export const POST = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  const viewer = await requireMember({ teamId, can: "plan:edit" });
  const input = await parseJson(req, createSessionSchema);
  return answer(
    { teamId, timeZone: viewer.timeZone },
    await createSessions({ teamId, actorUserId: viewer.userId, input }),
    201,
  );
});
