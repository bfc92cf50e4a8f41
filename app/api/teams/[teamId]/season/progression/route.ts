import { requireMember } from "@/lib/auth/access";
import { getProgressionBase } from "@/lib/data/season-preview";
import { viewerClock } from "@/lib/dates/zoned";
import { parseJson, parseParams, parseQuery, route } from "@/lib/http";
import { generateProgression } from "@/lib/services/season";
import { teamParamsSchema } from "@/lib/validations/plan";
import { progressionBaseQuerySchema, progressionSchema } from "@/lib/validations/season";

export const runtime = "nodejs";

/** Draft weeks from a source week by a progression rule (lib/season/README.md); replaces earlier drafts there. */
export const POST = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  const viewer = await requireMember({ teamId, can: "plan:edit" });
  const input = await parseJson(req, progressionSchema);
  return Response.json(await generateProgression({ teamId, actorUserId: viewer.userId, input }), { status: 201 });
});

/**
 * What the season screen previews a progression from (?sourceWeek&firstWeek&to): the browser then works out the
 * forecast of any rule itself (lib/season/forecast-preview.ts), with the numbers the write will give.
 */
export const GET = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  const viewer = await requireMember({ teamId, can: "plan:edit" });
  const { sourceWeek, firstWeek, to } = parseQuery(req, progressionBaseQuerySchema);
  return Response.json(
    await getProgressionBase({ teamId, sourceWeek, firstWeek, through: to, clock: viewerClock(viewer) }),
  );
});
