import { addBlock } from "@/lib/services/plan-sessions";
import { parseJson, route } from "@/lib/http";
import { addBlockSchema } from "@/lib/validations/plan";
import { answer, sessionEditor } from "../session-access";

export const runtime = "nodejs";

/** Appends a block: { version, templateId } or { version, block }. */
export const POST = route<{ sessionId: string }>(async (req, { params }) => {
  const ctx = await sessionEditor(params);
  const input = await parseJson(req, addBlockSchema);
  return answer(ctx, await addBlock({ ...ctx, input }), 201);
});
