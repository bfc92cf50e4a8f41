import { PLYO_CONTACT_BANDS } from "@/lib/load/plyo";
import type { TeamLoadSettings } from "@/lib/load/types";
import { formatNumber } from "@/lib/load/format";
import { FigureSection, Formula, Source } from "./figure-section";

// Plain-word versions of lib/load/README.md §1–§4 and §8–§10; keep the two in step.

export function RunningFigures({ settings }: { settings: TeamLoadSettings }) {
  return (
    <FigureSection id="running" title="High-speed, near-max and sprint metres">
      <p>
        Nobody wears a tracker in a sprint session, so running metres are estimated from the plan. Each rep is modelled
        as a run from rest that speeds up towards its target speed (the rep&apos;s share of the athlete&apos;s tested
        vmax) and never quite reaches it.
      </p>
      <Formula>
        speed after t seconds = target × (1 − e^(−t ÷ τ)), τ = the athlete&apos;s acceleration time constant
      </Formula>
      <p>
        The metres after the runner passes a speed line count as metres at or above it. High-speed running (HSR) is
        everything at or above{" "}
        {settings.speedZones === "relative"
          ? `${formatNumber(settings.hsrPct)} % of the athlete's vmax`
          : `${formatNumber(settings.hsrSpeedMs, 1)} m/s`}
        ; near-max is everything at or above {formatNumber(settings.nearMaxPct)} % of the athlete&apos;s own vmax. A
        line at or above the rep&apos;s target earns nothing. Example: vmax 10 m/s, τ 1 s, 2 × 3 × 30 m at 95 % from
        rest gives 163.7 m of HSR above 5.5 m/s and 66.2 m above 9.0 m/s.
      </p>
      <p>
        Sprint metres are all metres of acceleration, max-velocity and speed-endurance blocks (tempo is not counted as
        sprinting; a flying rep&apos;s run-in is a build-up, see below). Sprint steps are sprint metres divided by the
        athlete&apos;s step length, an estimate. An athlete without test results is worked out with vmax 9.0 m/s, τ 1.2
        s and a 2.1 m step, and the screens say so.
      </p>
      <Source>
        Model: Furusawa, Hill &amp; Parkinson 1927 (Proc R Soc B 102:29). 5.5 m/s = 19.8 km/h, the high-speed band of
        Bradley et al. 2009 (J Sports Sci 27:159). Defaults for untested athletes are typical values for trained
        sprinters, from memory.
      </Source>
    </FigureSection>
  );
}

export function ContactFigures() {
  const bands = Object.entries(PLYO_CONTACT_BANDS)
    .map(([level, b]) => `${level} ${b.min}–${b.max}`)
    .join(", ");
  return (
    <FigureSection id="contacts" title="Ground contacts and contact overload">
      <p>One contact per landing of one foot, or of both feet together.</p>
      <Formula>contacts = sets × reps × contacts per rep, summed over the drills</Formula>
      <p>
        A session with more contacts than the top of the athlete&apos;s experience range is flagged as a contact
        overload (the top itself passes). Ranges per session: {bands}.
      </p>
      <Source>
        NSCA, Essentials of Strength Training and Conditioning, 4th ed. (Potach &amp; Chu), from memory. These ranges
        describe off-season sessions.
      </Source>
    </FigureSection>
  );
}

export function SrpeFigures() {
  return (
    <FigureSection id="srpe" title="Session RPE load">
      <Formula>sRPE load (AU) = session RPE on the 0–10 scale × minutes</Formula>
      <p>RPE 7 for 60 minutes is 420 AU. Two sessions on one day add up.</p>
      <Source>Foster et al. 2001 (J Strength Cond Res 15:109).</Source>
    </FigureSection>
  );
}

export function LogFigures() {
  return (
    <FigureSection id="logs" title="Logs, missing days and what counts">
      <p>
        A logged session counts as logged. &quot;Did it all&quot; counts the whole plan, &quot;did part of it&quot; lets
        the athlete tick the blocks done and the reps of each (pre-filled from the plan), which count as reps done ÷
        reps planned; a log without that falls back to half of every block, &quot;didn&apos;t do it&quot; counts as a
        rest. The sRPE uses the logged RPE and minutes; a blank falls back to the plan.
      </p>
      <p>
        A published session in the past without a log is <strong>missing</strong>: it is marked wherever it shows,
        because it is unknown rather than a rest day. By default its plan stands in as an estimate; the team can choose
        to leave such days out instead (below).
      </p>
      <p>
        &quot;Logged only&quot; counts logged work up to today. &quot;Logged + plan&quot; adds the plan from today on
        (drafts included, cancelled sessions left out); the week plan and the alerts use it, so a spike is flagged while
        it is still only planned.
      </p>
    </FigureSection>
  );
}

export function WeeklyChangeFigures({ settings }: { settings: TeamLoadSettings }) {
  return (
    <FigureSection id="weekly-change" title="Weekly jump">
      <Formula>change % = (this week − last week) ÷ last week × 100</Formula>
      <p>
        A rise of more than {formatNumber(settings.weeklyChangeLimitPct, 1)} % is flagged; exactly{" "}
        {formatNumber(settings.weeklyChangeLimitPct, 1)} % passes. There is no change when last week was zero.
      </p>
      <Source>
        Harrison &amp; Johnston 2017 (J Strength Cond Res 31:2686): weekly spikes of 15–49 % raised injury risk the
        following week.
      </Source>
    </FigureSection>
  );
}

export function MonotonyFigures() {
  return (
    <FigureSection id="monotony" title="Monotony and strain">
      <Formula>monotony = mean daily load ÷ standard deviation of the 7 days; strain = weekly load × monotony</Formula>
      <p>
        We use the population standard deviation (divide by 7), because the week is the whole of what is described, not
        a sample. A week of identical days has no monotony (nothing to divide by).
      </p>
      <Source>
        Foster 1998 (Med Sci Sports Exerc 30:1164). Foster does not say which standard deviation; the choice is ours.
      </Source>
    </FigureSection>
  );
}

export function RecoveryFigures({ settings }: { settings: TeamLoadSettings }) {
  return (
    <FigureSection id="recovery" title="Short recovery">
      <p>
        Two high-intensity sessions less than {formatNumber(settings.recoveryHours)} h apart by the clock are flagged;
        exactly {formatNumber(settings.recoveryHours)} h passes (Monday 09:00 to Wednesday 09:00 is fine).
      </p>
      <Source>NSCA: 48–72 h between plyometric sessions (from memory).</Source>
    </FigureSection>
  );
}
