import { PLYO_INTENSITY_WEIGHT } from "@/lib/load/plyo";
import { formatNumber } from "@/lib/load/format";
import type { RecoveryWork, TeamLoadSettings } from "@/lib/load/types";
import { FigureSection, Formula, Source } from "./figure-section";

// Plain-word versions of lib/load/README.md §11 (the sprint-specific choices); keep the two in step.

export function SpeedZoneFigures({ settings }: { settings: TeamLoadSettings }) {
  const relative = settings.speedZones === "relative";
  return (
    <FigureSection id="speed-zones" title="Speed zones: relative to each athlete, or absolute">
      <p>
        Every session&apos;s metres are worked out in five bands. Two are the same speed for everyone: at or above{" "}
        {formatNumber(settings.hsrSpeedMs, 1)} m/s and {formatNumber(settings.sprintSpeedMs, 1)} m/s. Three follow each
        athlete&apos;s own tested vmax: at or above {formatNumber(settings.hsrPct)} %,{" "}
        {formatNumber(settings.nearMaxPct)} % and {formatNumber(settings.maximalPct)} %. The squad table shows both
        kinds side by side.
      </p>
      <p>
        A fixed 5.5 m/s line comes from team sports; for a sprinter with a vmax of 9–11 m/s it sits at about half of top
        speed, so easy tempo runs would count as high-speed running. This team&apos;s HSR figure (and its ratio and
        weekly jump) uses{" "}
        <strong data-testid="figures-speed-zones-choice">
          {relative
            ? `the relative line, ${formatNumber(settings.hsrPct)} % of each athlete's vmax`
            : `the absolute line, ${formatNumber(settings.hsrSpeedMs, 1)} m/s`}
        </strong>
        . Near-max is always relative.
      </p>
      <Source>
        Clemente et al. 2023 (Biol Sport 40:919), a review of absolute against individualised speed lines, including Abt
        &amp; Lovell 2009 (J Sports Sci 27:893, pages from memory); Bradley et al. 2009 for 5.5 and 7.0 m/s; Malone et
        al. 2017 (J Sci Med Sport 20:250) for exposures above 95 % of maximal velocity. The 75 / 90 / 95 % lines are
        common practice in sprint coaching.
      </Source>
    </FigureSection>
  );
}

export function StartFigures() {
  return (
    <FigureSection id="starts" title="Starts and run-ins">
      <p>
        From blocks the model gives the athlete a 5 % shorter acceleration time constant (τ × 0.95), so every speed line
        is reached a little sooner. Crouch and standing starts use the athlete&apos;s tested τ. The start never changes
        how many metres were run.
      </p>
      <p>
        A flying rep&apos;s run-in is a build-up, not an all-out start: the athlete would reach the target speed at the
        end of the run-in at an even acceleration, but never faster than their all-out acceleration allows. Run-in
        metres count as running metres and in every speed band the build-up reaches; sprint metres and steps count only
        the timed distance.
      </p>
      <Formula>speed line s is reached at the later of run-in × (s ÷ target)² and the all-out distance to s</Formula>
      <Source>
        Even acceleration: v² = 2·a·x. Standing against crouch: Salo &amp; Bezodis 2004 (Sports Biomech 3:43) found no
        difference in speed by 10 m. The block factor is common practice, from memory.
      </Source>
    </FigureSection>
  );
}

export function MissingLogFigures({ settings }: { settings: TeamLoadSettings }) {
  return (
    <FigureSection id="missing-logs" title="Sessions nobody logged">
      <p>
        A published session in the past without a log is not a rest day. This team{" "}
        <strong data-testid="figures-missing-choice">
          {settings.missingLogs === "estimate"
            ? "counts its plan as an estimate"
            : "leaves the day out of the ratio and the monotony (it adds nothing to the totals)"}
        </strong>
        ; either way the day is marked wherever it shows, and a week with such a day never gets an
        &quot;underloaded&quot; flag, because the light week may only be missing logs.
      </p>
    </FigureSection>
  );
}

const RECOVERY_WORDS: Record<RecoveryWork, string> = {
  max_velocity: "max-velocity blocks",
  max_acceleration: "accelerations at or above the maximal line",
  speed_endurance: "speed-endurance blocks",
  high_plyo: "high-intensity plyometrics",
};

export function RecoveryWorkFigures({ settings }: { settings: TeamLoadSettings }) {
  const work = settings.recoveryWork.map((w) => RECOVERY_WORDS[w]).join(", ");
  return (
    <FigureSection id="recovery-work" title="What counts as a high-intensity session">
      <p>
        For the recovery window this team counts:{" "}
        <strong data-testid="figures-recovery-work">{work || "nothing (the rule is off)"}</strong>. The default is all
        four, with the maximal line at {formatNumber(settings.maximalPct)} % of vmax: maximal sprinting and speed
        endurance need recovery as much as jumping does.
      </p>
      <Source>Malone et al. 2017 for the 95 % line; the choice of work is common practice.</Source>
    </FigureSection>
  );
}

export function PlyoDoseFigures() {
  const w = PLYO_INTENSITY_WEIGHT;
  return (
    <FigureSection id="plyo-dose" title="Plyometric dose by intensity">
      <p>
        Contacts are counted as the NSCA counts them, one per landing, and judged per session against the experience
        ranges. Those ranges describe off-season sessions; preseason and in-season volumes differ. Next to them the
        week&apos;s contact total is shown, and a dose weighted by intensity.
      </p>
      <Formula>
        weighted contacts = low × {w.low} + moderate × {w.moderate} + high × {w.high}
      </Formula>
      <Source>
        The NSCA grades drills low to high and lowers volume as intensity rises (from memory) but gives no weights;
        these weights are our choice.
      </Source>
    </FigureSection>
  );
}

export function MonotonyFlagFigures({ settings }: { settings: TeamLoadSettings }) {
  return (
    <FigureSection id="monotony-flag" title="Monotony flag">
      <p>
        A week whose sRPE monotony is above {formatNumber(settings.monotonyLimit, 1)} is flagged as a caution, with the
        week&apos;s strain in the reason: the days are too alike to recover between them. Six equal days and a rest day
        give √6 = 2.45.
      </p>
      <Source>
        Foster 1998 (Med Sci Sports Exerc 30:1164); the 2.0 line is the value commonly attributed to Foster, from
        memory.
      </Source>
    </FigureSection>
  );
}
