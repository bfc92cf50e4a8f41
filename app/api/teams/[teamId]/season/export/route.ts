import { requireMember } from "@/lib/auth/access";
import { viewerClock } from "@/lib/dates/zoned";
import { getSeasonView } from "@/lib/data/season-view";
import { parseParams, parseQuery, route } from "@/lib/http";
import { seasonCsv } from "@/lib/season/season-csv";
import { teamParamsSchema } from "@/lib/validations/plan";
import { seasonQuerySchema } from "@/lib/validations/season";

export const runtime = "nodejs";

/** The season view as CSV (same query as GET …/season), with the load caution on its first line. */
export const GET = route<{ teamId: string }>(async (req, { params }) => {
  const { teamId } = parseParams(await params, teamParamsSchema);
  const viewer = await requireMember({ teamId, can: "plan:view" });
  const query = parseQuery(req, seasonQuerySchema);
  const view = await getSeasonView({ teamId, ...query, clock: viewerClock(viewer) });
  return new Response(seasonCsv(view), {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="season-${view.from}.csv"`,
    },
  });
});
