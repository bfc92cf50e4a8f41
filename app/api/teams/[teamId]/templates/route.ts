import { requireMember } from "@/lib/auth/access";
import { createTemplate, listTemplates } from "@/lib/data/templates";
import { parseJson, parseParams, route } from "@/lib/http";
import { teamParamsSchema } from "@/lib/validations/plan";
import { templateSchema } from "@/lib/validations/template";

export const runtime = "nodejs";

type Params = { teamId: string };

export const GET = route<Params>(async (_req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  await requireMember({ teamId, can: "plan:view" });
  return Response.json({ templates: await listTemplates({ teamId }) });
});

export const POST = route<Params>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  await requireMember({ teamId, can: "plan:edit" });
  const input = await parseJson(req, templateSchema);
  return Response.json({ template: await createTemplate({ teamId, input }) }, { status: 201 });
});
