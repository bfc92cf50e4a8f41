import { EmptyState } from "@/components/ui/card";
import { Planner } from "@/components/planner/planner";
import { pageViewer } from "@/lib/auth/page-access";
import { scopeOf } from "@/lib/auth/permissions";
import { teamToday } from "@/lib/dates/zoned";
import { getPlanWeek, seedsPlanWeek } from "@/lib/data/plan";
import { startOfWeek } from "@/lib/dates/plain-date";
import { weekQuerySchema } from "@/lib/validations/plan";

export const metadata = { title: "Week plan" };

/** The coach's week grid; physios read it, an athlete sees only their own row. */
export default async function PlanPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const viewer = await pageViewer("plan:view", "own");
  const scope = scopeOf(viewer.role, "plan:view") === "team" ? "team" : "own";
  if (scope === "own" && viewer.athleteId === null) {
    return (
      <EmptyState title="No athlete profile is linked to your account">
        Ask your coach to link it; your sessions will show here.
      </EmptyState>
    );
  }
  const query = weekQuerySchema.safeParse({ week: (await searchParams).week });
  const today = teamToday({ timeZone: viewer.timeZone, now: new Date() });
  const date = (query.success && query.data.week) || today;
  // A large squad's week comes as JSON after the frame (seedsPlanWeek): the page stays small and quick.
  const initial = (await seedsPlanWeek({ teamId: viewer.teamId, scope }))
    ? await getPlanWeek({
        teamId: viewer.teamId,
        date,
        today,
        audience: { scope, canEdit: scopeOf(viewer.role, "plan:edit") === "team", ownAthleteId: viewer.athleteId },
      })
    : null;
  const initialWeek = initial?.weekStart ?? startOfWeek(date, viewer.weekStartDay);
  return <Planner teamId={viewer.teamId} initialWeek={initialWeek} initial={initial} />;
}
