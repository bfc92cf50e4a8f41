import Link from "next/link";
import { AthletePlanActual } from "@/components/coach/athlete-plan-actual";
import { AthleteLoadView } from "@/components/load/athlete-load-view";
import { PlanMeasuredList } from "@/components/speed/plan-measured-list";
import { PageHeader } from "@/components/ui/card";
import { pageAthlete } from "@/lib/auth/page-access";
import { scopeOf } from "@/lib/auth/permissions";
import { getAthleteLoad } from "@/lib/data/load-views";
import { listPlanMeasured } from "@/lib/data/measured-load";
import { getPlanVersusActual } from "@/lib/data/plan-vs-actual";
import { addDays } from "@/lib/dates/plain-date";
import { teamToday, viewerClock } from "@/lib/dates/zoned";
import { PLYO_LEVEL_LABEL, formatSpeed } from "@/lib/format/athlete";

export const metadata = { title: "Athlete load" };

export default async function AthleteLoadPage({ params }: { params: Promise<{ athleteId: string }> }) {
  const { athleteId } = await params;
  // An athlete reaches only their own page; anyone else's id is "not found".
  const viewer = await pageAthlete(Number(athleteId), "load:view");
  const initial = await getAthleteLoad({
    teamId: viewer.athlete.teamId,
    athleteId: viewer.athlete.id,
    view: "projected",
    withDrafts: viewer.role !== "athlete",
  });
  const p = initial.athlete.profile;
  const staff = viewer.role !== "athlete";
  // Staff see what was prescribed against what was done, the squad screen's figures for this athlete alone.
  const planActual = staff
    ? await getPlanVersusActual({
        teamId: viewer.athlete.teamId,
        athleteIds: [viewer.athlete.id],
        weeks: 8,
        clock: viewerClock(viewer),
      })
    : null;
  // The last 8 weeks' sessions a speed trace measured, next to their plan (lib/speed/README.md §8).
  const measured =
    staff && scopeOf(viewer.role, "speed:view") === "team"
      ? await listPlanMeasured({
          teamId: viewer.athlete.teamId,
          athleteId: viewer.athlete.id,
          from: addDays(teamToday({ timeZone: viewer.timeZone, now: new Date() }), -55),
        })
      : [];
  return (
    <>
      <PageHeader
        title={viewer.role === "athlete" ? "My load" : initial.athlete.name}
        lead={
          <>
            {initial.athlete.groupName ? `${initial.athlete.groupName} · ` : ""}
            vmax {formatSpeed(p.vmax)}
            {p.vmax === null ? " (team default used)" : ""} · plyometrics {PLYO_LEVEL_LABEL[p.plyoLevel]}
          </>
        }
        actions={
          staff ? (
            <Link href="/load" className="text-sm font-medium text-lane-700 underline">
              Back to squad load
            </Link>
          ) : null
        }
      />
      <AthleteLoadView initial={initial} />
      {measured.length ? <PlanMeasuredList items={measured} /> : null}
      {planActual?.athletes[0] ? (
        <div className="mt-8">
          <AthletePlanActual weeks={planActual.athletes[0].weeks} athleteName={initial.athlete.name} />
        </div>
      ) : null}
    </>
  );
}
