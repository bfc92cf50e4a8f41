import { requireMember, requireViewer } from "@/lib/auth/access";
import { previewAthleteWeek } from "@/lib/data/load-views";
import { parseJson, route } from "@/lib/http";
import { loadPreviewSchema } from "@/lib/validations/load";

export const runtime = "nodejs";

/** Projected totals and flags for a proposed week; nothing is saved. */
export const POST = route(async (req) => {
  await requireViewer(); // signed-out callers get 401 before any body check
  const input = await parseJson(req, loadPreviewSchema);
  await requireMember({ teamId: input.teamId, can: "plan:edit" });
  return Response.json(await previewAthleteWeek({ input }));
});
