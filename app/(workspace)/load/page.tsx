import { redirect } from "next/navigation";
import { PageHeader } from "@/components/ui/card";
import { SquadLoadTable } from "@/components/load/squad-load-table";
import { pageViewer } from "@/lib/auth/page-access";
import { getSquadWeekLoad } from "@/lib/data/load-views";

export const metadata = { title: "Squad load" };

export default async function SquadLoadPage() {
  // Athletes hold load:view for themselves only: send them to their own page.
  const me = await pageViewer("load:view", "own");
  if (me.role === "athlete") redirect(me.athleteId ? `/load/${me.athleteId}` : "/not-allowed");
  const viewer = await pageViewer("load:view");
  const initial = await getSquadWeekLoad({ teamId: viewer.teamId, view: "projected" });
  return (
    <>
      <PageHeader
        title="Squad load"
        lead={
          "The week for every athlete: high-speed and near-max metres, sprint steps, plyometric contacts and session RPE load, " +
          "with the acute:chronic ratio and anything worth a second look."
        }
      />
      <SquadLoadTable teamId={viewer.teamId} initial={initial} />
    </>
  );
}
