import { FigureSection } from "@/components/figures/figure-section";
import {
  MissingLogFigures,
  MonotonyFlagFigures,
  PlyoDoseFigures,
  RecoveryWorkFigures,
  SpeedZoneFigures,
  StartFigures,
} from "@/components/figures/model-figures";
import { AcwrFigures, ProvisionalFigures, SeriesFigures, ZoneFigures } from "@/components/figures/ratio-figures";
import { PlanVersusActualFigures, SpikesAheadFigures } from "@/components/figures/plan-figures";
import { TeamThresholds } from "@/components/figures/team-thresholds";
import {
  ContactFigures,
  LogFigures,
  MonotonyFigures,
  RecoveryFigures,
  RunningFigures,
  SrpeFigures,
  WeeklyChangeFigures,
} from "@/components/figures/volume-figures";
import { PageHeader } from "@/components/ui/card";
import { LoadCaution } from "@/components/ui/caution";
import { pageViewer } from "@/lib/auth/page-access";
import { getTeamLoadSettings } from "@/lib/data/team-settings";

export const metadata = { title: "How figures are worked out" };

export default async function FiguresPage() {
  const viewer = await pageViewer();
  const settings = await getTeamLoadSettings({ teamId: viewer.teamId });
  return (
    <>
      <PageHeader
        title="How figures are worked out"
        lead={
          "What every load number and flag means, how it is computed, " +
          "where the formula comes from, and the choices we made where the research leaves one open."
        }
      />
      <div className="space-y-4">
        <FigureSection id="caution" title="Read this first">
          <LoadCaution />
        </FigureSection>
        <FigureSection id="thresholds" title={`${viewer.teamName}'s current lines`}>
          <TeamThresholds settings={settings} />
        </FigureSection>
        <SeriesFigures />
        <AcwrFigures />
        <ProvisionalFigures />
        <ZoneFigures settings={settings} />
        <RunningFigures settings={settings} />
        <SpeedZoneFigures settings={settings} />
        <StartFigures />
        <ContactFigures />
        <PlyoDoseFigures />
        <SrpeFigures />
        <LogFigures />
        <MissingLogFigures settings={settings} />
        <WeeklyChangeFigures settings={settings} />
        <MonotonyFigures />
        <PlanVersusActualFigures />
        <SpikesAheadFigures settings={settings} />
        <MonotonyFlagFigures settings={settings} />
        <RecoveryFigures settings={settings} />
        <RecoveryWorkFigures settings={settings} />
      </div>
    </>
  );
}
