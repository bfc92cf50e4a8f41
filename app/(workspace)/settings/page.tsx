import { ThresholdsForm } from "@/components/load/thresholds-form";
import { AthleteReportsForm } from "@/components/settings/athlete-reports-form";
import { WeekStartForm } from "@/components/settings/week-start-form";
import { Card, PageHeader } from "@/components/ui/card";
import { LoadCaution } from "@/components/ui/caution";
import { pageViewer } from "@/lib/auth/page-access";
import { getAthleteReportSettings } from "@/lib/data/athlete-report-settings";
import { getTeamLoadSettings } from "@/lib/data/team-settings";

export const metadata = { title: "Thresholds" };

export default async function ThresholdsPage() {
  const viewer = await pageViewer("settings:edit");
  const [settings, reports] = await Promise.all([
    getTeamLoadSettings({ teamId: viewer.teamId }),
    getAthleteReportSettings({ teamId: viewer.teamId }),
  ]);
  return (
    <>
      <PageHeader
        title="Thresholds"
        lead={
          "The lines the load engine draws for the whole team: what counts as high-speed and near-max running, " +
          "how the acute:chronic ratio is worked out, and when a week earns a flag."
        }
      />
      <Card className="mb-4 p-5">
        <h2 className="mb-3 text-sm font-semibold text-ink-900">Training week</h2>
        <WeekStartForm teamId={viewer.teamId} initial={{ weekStartDay: viewer.weekStartDay === 7 ? 7 : 1 }} />
      </Card>
      <Card className="mb-4 p-5">
        <h2 className="mb-3 text-sm font-semibold text-ink-900">Athlete reports</h2>
        <AthleteReportsForm teamId={viewer.teamId} initial={reports} />
      </Card>
      <Card className="p-5">
        <ThresholdsForm teamId={viewer.teamId} initial={settings} />
      </Card>
      <LoadCaution className="mt-4" />
    </>
  );
}
