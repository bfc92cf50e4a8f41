import type { TeamLoadSettings } from "@/lib/load/types";
import { FigureSection, Formula, Source } from "./figure-section";

// Plan versus actual and the coach's spikes ahead, in the words of lib/load/README.md §13.

export function PlanVersusActualFigures() {
  return (
    <FigureSection id="plan-vs-actual" title="Plan versus actual">
      <p>
        For each athlete and week, the plan (every session that is not cancelled, drafts included) is set against what
        the logs say was done. &quot;Done&quot; counts logged work only, scaled by what the athlete ticked as done; a
        session without a log counts nothing here, whatever the team chose for missing logs elsewhere.
      </p>
      <Formula>difference = done − plan of the days already due · difference % = difference ÷ plan due × 100</Formula>
      <p>
        A day is due once it is over, or today once it holds a log, so a week in progress is judged on what should have
        happened so far. The completion rate is the share of due sessions logged as done in full or in part. The
        squad&apos;s line adds everyone up first, then works out the percentages. More than 10 % either way is marked.
      </p>
      <Source>Our own presentation of the engine&apos;s figures; the 10 % mark is our choice of a visible step.</Source>
    </FigureSection>
  );
}

export function SpikesAheadFigures({ settings }: { settings: TeamLoadSettings }) {
  return (
    <FigureSection id="spikes-ahead" title="Spikes ahead (the coach's Today)">
      <p>
        The squad week&apos;s daily ratios with the plan counted from today on, over the next 7 days, judged as the
        week&apos;s spike flag is: the highest ratio on days with 28 or more days on record (only without any, the
        highest early one, marked early), listed when it is at or above {settings.spikeRatio.toFixed(2)}.
      </p>
      <Source>Zones after Gabbett 2016 (BJSM 50:273); the same ratios as the squad week and the week plan.</Source>
    </FigureSection>
  );
}
