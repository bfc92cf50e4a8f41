import { PageHeader } from "@/components/ui/card";
import { SeasonView } from "@/components/season/season-view";
import { pageViewer } from "@/lib/auth/page-access";
import { scopeOf } from "@/lib/auth/permissions";
import { viewerClock } from "@/lib/dates/zoned";
import { getSeasonView } from "@/lib/data/season-view";
import { seasonQuerySchema } from "@/lib/validations/season";

export const metadata = { title: "Season" };

/** The staff's season across weeks: phases, meets, each athlete's weeks against target and the forecast (?from=). */
export default async function SeasonPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const viewer = await pageViewer("plan:view");
  const query = seasonQuerySchema.safeParse({ from: (await searchParams).from });
  const from = query.success ? query.data.from : undefined;
  const initial = await getSeasonView({ teamId: viewer.teamId, from, weeks: 16, clock: viewerClock(viewer) });
  return (
    <>
      <div className="print:hidden">
        <PageHeader
          title="Season"
          lead={
            "Weeks across, athletes down: what each week holds against its phase's target, and where every ratio will " +
            "stand if the plan is kept. Past weeks show what was logged, later weeks the plan."
          }
        />
      </div>
      <SeasonView teamId={viewer.teamId} initial={initial} canEdit={scopeOf(viewer.role, "plan:edit") === "team"} />
    </>
  );
}
