import Link from "next/link";
import { PlanActualView } from "@/components/coach/plan-actual-view";
import { PageHeader } from "@/components/ui/card";
import { pageViewer } from "@/lib/auth/page-access";
import { formatDayLabel, weekRangeLabel } from "@/lib/dates/plain-date";
import { viewerClock } from "@/lib/dates/zoned";
import { getPlanVersusActual } from "@/lib/data/plan-vs-actual";
import { planActualQuerySchema } from "@/lib/validations/plan-vs-actual";

export const metadata = { title: "Plan versus actual" };

const link = "rounded-lg px-3 py-1.5 text-sm font-medium text-lane-700 ring-1 ring-ink-200 hover:bg-paper-sunk";

/** Prescribed against done for the squad's week and the weeks before it (staff with squad load access). */
export default async function PlanVersusActualPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const viewer = await pageViewer("load:view");
  const query = planActualQuerySchema.safeParse({ week: (await searchParams).week });
  const data = await getPlanVersusActual({
    teamId: viewer.teamId,
    week: query.success ? query.data.week : undefined,
    weeks: 8,
    clock: viewerClock(viewer),
  });
  return (
    <>
      <PageHeader
        title="Plan versus actual"
        lead={`What was prescribed against what the logs say was done · ${weekRangeLabel(data.weekStart)}`}
      />
      <nav aria-label="Weeks" className="mb-4 flex flex-wrap gap-2">
        <Link className={link} href={`/plan-vs-actual?week=${data.previousWeek}`} data-testid="pva-previous">
          ← Previous week
        </Link>
        <Link className={link} href="/plan-vs-actual">
          This week
        </Link>
        <Link className={link} href={`/plan-vs-actual?week=${data.nextWeek}`}>
          Next week →
        </Link>
        <Link className={link} href={`/plan?week=${data.weekStart}`}>
          Open the week plan
        </Link>
      </nav>
      <PlanActualView data={data} />
      <p className="mt-4 text-xs text-ink-500">Figures as of {formatDayLabel(data.today)}.</p>
    </>
  );
}
