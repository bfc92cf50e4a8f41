import Link from "next/link";
import { AthleteLoadView } from "@/components/load/athlete-load-view";
import { PageHeader } from "@/components/ui/card";
import { pageAthlete } from "@/lib/auth/page-access";
import { getAthleteLoad } from "@/lib/data/load-views";
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
    </>
  );
}
