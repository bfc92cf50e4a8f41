import { requireMember, requireViewer } from "@/lib/auth/access";
import { phaseTeam } from "@/lib/data/season";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, route } from "@/lib/http";
import { copyPhase } from "@/lib/services/season";
import { copyPhaseSchema, phaseParamsSchema } from "@/lib/validations/season";

export const runtime = "nodejs";

/** Copies the phase and its sessions (as drafts) `weeksLater` weeks on, 52 by default: next season. */
export const POST = route<{ phaseId: string }>(async (req, { params }) => {
  const { phaseId } = parseParams(await params, phaseParamsSchema);
  await requireViewer();
  const owner = await phaseTeam({ phaseId });
  if (!owner) throw new AppError("not_found", "That phase was not found");
  const viewer = await requireMember({ teamId: owner.teamId, can: "plan:edit" });
  const { weeksLater } = await parseJson(req, copyPhaseSchema);
  const copied = await copyPhase({ teamId: owner.teamId, actorUserId: viewer.userId, phaseId, weeksLater });
  return Response.json(copied, { status: 201 });
});
