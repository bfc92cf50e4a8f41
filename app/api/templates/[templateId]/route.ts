import { requireMember } from "@/lib/auth/access";
import { deleteTemplate, findTemplateTeam, getTemplate, updateTemplate } from "@/lib/data/templates";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, route } from "@/lib/http";
import type { Action } from "@/lib/auth/permissions";
import { templateParamsSchema } from "@/lib/validations/plan";
import { updateTemplateSchema } from "@/lib/validations/template";

export const runtime = "nodejs";

type Params = { templateId: string };

async function authorized(params: Promise<Params>, can: Action) {
  const { templateId } = parseParams(await params, templateParamsSchema);
  const teamId = await findTemplateTeam({ templateId });
  if (teamId === null) throw new AppError("not_found", "Not found");
  await requireMember({ teamId, can });
  return { teamId, templateId };
}

export const GET = route<Params>(async (_req, { params }) => {
  const ids = await authorized(params, "plan:view");
  return Response.json({ template: await getTemplate(ids) });
});

/** Replaces the template's content (the editor sends the whole form) with the `version` read; 409 "stale" when it moved on. */
export const PUT = route<Params>(async (req, { params }) => {
  const ids = await authorized(params, "plan:edit");
  const { version, ...input } = await parseJson(req, updateTemplateSchema);
  return Response.json({ template: await updateTemplate({ ...ids, version, input }) });
});

export const DELETE = route<Params>(async (_req, { params }) => {
  const ids = await authorized(params, "plan:edit");
  await deleteTemplate(ids);
  return Response.json({ deleted: true });
});
