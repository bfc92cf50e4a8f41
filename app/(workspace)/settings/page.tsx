import { ThresholdsForm } from "@/components/load/thresholds-form";
import { Card, PageHeader } from "@/components/ui/card";
import { LoadCaution } from "@/components/ui/caution";
import { pageViewer } from "@/lib/auth/page-access";
import { getTeamLoadSettings } from "@/lib/data/team-settings";

export const metadata = { title: "Thresholds" };

export default async function ThresholdsPage() {
  const viewer = await pageViewer("settings:edit");
  const settings = await getTeamLoadSettings({ teamId: viewer.teamId });
  return (
    <>
      <PageHeader
        title="Thresholds"
        lead={
          "The lines the load engine draws for the whole team: what counts as high-speed and near-max running, " +
          "how the acute:chronic ratio is worked out, and when a week earns a flag."
        }
      />
      <Card className="p-5">
        <ThresholdsForm teamId={viewer.teamId} initial={settings} />
      </Card>
      <LoadCaution className="mt-4" />
    </>
  );
}
