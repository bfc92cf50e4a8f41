import { SquadStatusTable } from "@/components/status/squad-status-table";
import { PageHeader } from "@/components/ui/card";
import { pageViewer } from "@/lib/auth/page-access";
import { teamToday } from "@/lib/dates/zoned";
import { getSquadStatus } from "@/lib/data/squad-status";

export const metadata = { title: "Squad status" };

export default async function SquadStatusPage() {
  const viewer = await pageViewer("status:view");
  const rows = await getSquadStatus({
    teamId: viewer.teamId,
    today: teamToday({ timeZone: viewer.timeZone, now: new Date() }),
  });
  return (
    <>
      <PageHeader
        title="Squad status"
        lead="Availability, restrictions, open alerts, the latest log note and this week's ratio for every athlete."
      />
      <SquadStatusTable rows={rows} />
    </>
  );
}
