import { changeBlock } from "@/lib/services/plan-sessions";
import { parseJson, parseParams, parseQuery, route } from "@/lib/http";
import { blockParamsSchema, updateBlockSchema, versionQuerySchema } from "@/lib/validations/plan";
import { answer, sessionEditor } from "../../session-access";

export const runtime = "nodejs";

type Params = { sessionId: string; blockId: string };

export const PATCH = route<Params>(async (req, { params }) => {
  const { blockId } = parseParams(await params, blockParamsSchema);
  const ctx = await sessionEditor(params);
  const { version, block, override, confirmed } = await parseJson(req, updateBlockSchema);
  return answer(ctx, await changeBlock({ ...ctx, blockId, version, block, override, confirmed }));
});

/** DELETE ?version= */
export const DELETE = route<Params>(async (req, { params }) => {
  const { blockId } = parseParams(await params, blockParamsSchema);
  const ctx = await sessionEditor(params);
  const { version } = parseQuery(req, versionQuerySchema);
  return answer(ctx, await changeBlock({ ...ctx, blockId, version, block: null }));
});
