import { z } from "zod";
import { requireMember } from "@/lib/auth/access";
import { clearWeek, copyWeekToNext, publishWeek } from "@/lib/services/plan-week";
import { parseJson, parseParams, route } from "@/lib/http";
import { idSchema, weekToolSchema } from "@/lib/validations/plan";

export const runtime = "nodejs";

const TOOLS = { "copy-to-next": copyWeekToNext, clear: clearWeek, publish: publishWeek } as const;
const paramsSchema = z.object({ teamId: idSchema, tool: z.enum(["copy-to-next", "clear", "publish"]) });

/** Week tools: POST /plan/copy-to-next, /plan/clear, /plan/publish with { week } (any date in the week). */
export const POST = route<{ teamId: string; tool: string }>(async (req, { params }) => {
  const { teamId, tool } = parseParams(await params, paramsSchema);
  const viewer = await requireMember({ teamId, can: "plan:edit" });
  const { week, override, confirmed } = await parseJson(req, weekToolSchema);
  return Response.json(await TOOLS[tool]({ teamId, actorUserId: viewer.userId, date: week, override, confirmed }));
});
