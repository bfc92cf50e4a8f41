import { formatRatio } from "@/lib/load/format";
import type { TeamLoadSettings } from "@/lib/load/types";
import { FigureSection, Formula, Source } from "./figure-section";

// Plain-word versions of lib/load/README.md §5–§7; keep the two in step.

export function SeriesFigures() {
  return (
    <FigureSection id="series" title="One daily series per athlete">
      <p>
        Every figure about an athlete (the squad table, the week plan, the athlete&apos;s page, the alerts and their
        e-mails) is read from the same day-by-day series. It starts on the athlete&apos;s first day on record (the first
        logged session, published session without a log, or session planned from today on) and has one value per day;
        days without a session are 0. Nothing before that day is counted as rest, and a ratio for a given day is the
        same on every screen.
      </p>
    </FigureSection>
  );
}

export function AcwrFigures() {
  return (
    <FigureSection id="acwr" title="Acute:chronic ratio">
      <p>The ratio compares the last week or so of load with the last month or so.</p>
      <Formula>
        today&apos;s average = λ × today&apos;s load + (1 − λ) × yesterday&apos;s average, λ = 2 ÷ (N + 1), N = 7
        (acute) and 28 (chronic)
      </Formula>
      <Formula>ratio = acute ÷ chronic (no ratio when chronic is 0)</Formula>
      <p>
        <strong>Where it starts.</strong> On the athlete&apos;s first day on record both averages are set to that
        day&apos;s load. Starting them at 0 instead would make every first day read 3.6 whatever was done. Example: 21
        days of 300 AU then 7 days of 600 AU give 1.34 on day 28.
      </p>
      <p>
        The team can choose rolling averages instead: coupled (the last 7 days ÷ the last 28) or uncoupled (the last 7 ÷
        the 21 days before them).
      </p>
      <Source>
        EWMA: Williams et al. 2017 (Br J Sports Med 51:209). The letter does not state a starting value; ours is the
        first day&apos;s load, the same as pandas ewm(adjust=False). Rolling: Hulin et al. 2016 (Br J Sports Med
        50:231); uncoupled: Lolli et al. 2019 (Br J Sports Med 53:921).
      </Source>
    </FigureSection>
  );
}

export function ProvisionalFigures() {
  return (
    <FigureSection id="provisional" title="Early (provisional) ratios">
      <p>
        A ratio with fewer than 28 days on record behind it is marked early. It is shown, dashed, but a high early ratio
        is only a caution, never an alert: it says more about the short history than about the athlete.
      </p>
      <Source>Our choice; no published rule was found.</Source>
    </FigureSection>
  );
}

export function ZoneFigures({ settings }: { settings: TeamLoadSettings }) {
  return (
    <FigureSection id="zones" title="Spike, climbing and underloaded">
      <p>
        A week is judged on its days with a full history: the highest ratio among them at or above{" "}
        {formatRatio(settings.spikeRatio)} is a spike (an alert); at or above {formatRatio(settings.risingRatio)} it is
        climbing (a caution). Underloaded needs a whole week with a full history and every day below{" "}
        {formatRatio(settings.lowRatio)}. Early days are judged on their own and give at most a caution, marked early,
        never an underloaded note. The ratio shown for a week is that judged value.
      </p>
      <Source>
        Zones after Gabbett 2016 (Br J Sports Med 50:273): 0.8–1.3 &quot;sweet spot&quot;, 1.5 and above &quot;danger
        zone&quot;. The ratio describes training; it does not predict injury on its own (Impellizzeri et al. 2020).
      </Source>
    </FigureSection>
  );
}
