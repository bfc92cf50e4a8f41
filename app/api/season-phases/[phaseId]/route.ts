import { requireMember, requireViewer } from "@/lib/auth/access";
import { destroyPhase, phaseTeam } from "@/lib/data/season";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, route } from "@/lib/http";
import { updatePhase } from "@/lib/services/season";
import { phaseParamsSchema, phaseUpdateSchema } from "@/lib/validations/season";

export const runtime = "nodejs";

type Params = { phaseId: string };

async function editor(params: Promise<Params>) {
  const { phaseId } = parseParams(await params, phaseParamsSchema);
  await requireViewer(); // signed-out callers get 401 before anything about the id is looked up
  const owner = await phaseTeam({ phaseId });
  if (!owner) throw new AppError("not_found", "That phase was not found");
  await requireMember({ teamId: owner.teamId, can: "plan:edit" });
  return { phaseId, teamId: owner.teamId };
}

/** Replaces a phase ({ version, …fields }); 409 when someone changed it since it was read. */
export const PATCH = route<Params>(async (req, { params }) => {
  const { phaseId, teamId } = await editor(params);
  const { version, ...input } = await parseJson(req, phaseUpdateSchema);
  return Response.json({ phase: await updatePhase({ teamId, phaseId, version, input }) });
});

/** Removes the phase; the sessions planned in it stay. */
export const DELETE = route<Params>(async (_req, { params }) => {
  const { phaseId, teamId } = await editor(params);
  await destroyPhase({ teamId, phaseId });
  return Response.json({ ok: true });
});
