import "server-only";
import { requireMember } from "@/lib/auth/access";
import { findSessionRef } from "@/lib/data/plan";
import { AppError } from "@/lib/errors";
import { parseParams } from "@/lib/http";
import { sessionParamsSchema } from "@/lib/validations/plan";

/** A plan writer for the session's team; 404 for a session of another team (nothing is revealed). */
export async function sessionEditor(params: Promise<{ sessionId: string }>) {
  const { sessionId } = parseParams(await params, sessionParamsSchema);
  const ref = await findSessionRef({ sessionId });
  if (!ref) throw new AppError("not_found", "Not found");
  const viewer = await requireMember({ teamId: ref.teamId, can: "plan:edit" });
  return { sessionId, teamId: ref.teamId, actorUserId: viewer.userId };
}
