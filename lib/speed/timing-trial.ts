import { averageSpeed, msToKmh } from "@/lib/load/sprint-model";
import { forceVelocityProfile, type ForceVelocityProfile } from "./force-velocity";
import { fitSprint, timedGates, type GateTime, type SprintFit } from "./sprint-fit";

// What one timing-gate trial tells the coach (lib/speed/README.md §1–§3): average speed from the start to each
// gate, speed over each interval between gates, the best flying interval, the model fit and, with body mass,
// the horizontal force–velocity profile.

interface SpeedPair {
  ms: number;
  kmh: number;
}

interface GateInterval {
  fromM: number;
  toM: number;
  seconds: number;
  speed: SpeedPair;
}

interface FlyingZone {
  lengthM: number;
  timeS: number;
}

export interface TimingTrialInput {
  gates: readonly GateTime[];
  /** A separately timed flying zone (its own run-in), when the trial has one. */
  flying?: FlyingZone | null;
  bodyMassKg?: number | null;
}

export interface TimingTrialAnalysis {
  /** Average speed from the start to each gate, d ÷ t. */
  splits: (GateTime & { speed: SpeedPair })[];
  /** Speed over each interval between consecutive gates (the first starts at 0 m). */
  intervals: GateInterval[];
  /** Fastest interval not starting at 0 m, or the flying zone, whichever is faster; null without either. */
  bestFlying: GateInterval | null;
  fit: SprintFit | null;
  profile: ForceVelocityProfile | null;
}

function speedPair(ms: number): SpeedPair {
  return { ms, kmh: msToKmh(ms) };
}

export function analyseTimingTrial(input: TimingTrialInput): TimingTrialAnalysis {
  const timed = timedGates(input.gates);
  const splits = timed.map((g) => ({ ...g, speed: speedPair(averageSpeed(g.distanceM, g.timeS)) }));
  const intervals: GateInterval[] = timed.map((g, i) => {
    const from = i === 0 ? { distanceM: 0, timeS: 0 } : timed[i - 1];
    const seconds = g.timeS - from.timeS;
    return {
      fromM: from.distanceM,
      toM: g.distanceM,
      seconds,
      speed: speedPair(averageSpeed(g.distanceM - from.distanceM, seconds)),
    };
  });
  const flyingCandidates = intervals.filter((iv) => iv.fromM > 0 && iv.seconds > 0);
  if (input.flying && input.flying.lengthM > 0 && input.flying.timeS > 0) {
    const { lengthM, timeS } = input.flying;
    flyingCandidates.push({ fromM: 0, toM: lengthM, seconds: timeS, speed: speedPair(averageSpeed(lengthM, timeS)) });
  }
  const bestFlying = flyingCandidates.reduce<GateInterval | null>(
    (best, iv) => (best === null || iv.speed.ms > best.speed.ms ? iv : best),
    null,
  );
  const fit = fitSprint(timed);
  const mass = input.bodyMassKg;
  const profile =
    fit && mass && mass > 0 ? forceVelocityProfile({ bodyMassKg: mass, vmax: fit.vmax, tau: fit.tau }) : null;
  return { splits, intervals, bestFlying, fit, profile };
}
