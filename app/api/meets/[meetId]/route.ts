import { requireMember, requireViewer } from "@/lib/auth/access";
import { destroyMeet, meetTeam } from "@/lib/data/season";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, route } from "@/lib/http";
import { updateMeet } from "@/lib/services/season";
import { meetInputSchema, meetParamsSchema } from "@/lib/validations/season";

export const runtime = "nodejs";

type Params = { meetId: string };

async function editor(params: Promise<Params>) {
  const { meetId } = parseParams(await params, meetParamsSchema);
  await requireViewer();
  const owner = await meetTeam({ meetId });
  if (!owner) throw new AppError("not_found", "That meet was not found");
  await requireMember({ teamId: owner.teamId, can: "plan:edit" });
  return { meetId, teamId: owner.teamId };
}

export const PATCH = route<Params>(async (req, { params }) => {
  const { meetId, teamId } = await editor(params);
  const input = await parseJson(req, meetInputSchema);
  return Response.json({ meet: await updateMeet({ teamId, meetId, input }) });
});

export const DELETE = route<Params>(async (_req, { params }) => {
  const { meetId, teamId } = await editor(params);
  await destroyMeet({ teamId, meetId });
  return Response.json({ ok: true });
});
