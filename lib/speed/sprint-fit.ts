import { levenbergMarquardt } from "ml-levenberg-marquardt";
import { distanceAt, timeToDistance } from "@/lib/load/sprint-model";

// Least-squares fit of the mono-exponential sprint model (Furusawa, Hill & Parkinson 1927, Proc R Soc B
// 102:29–42) to timing-gate splits, in its distance form x(t) = vmax·(t + τ·e^(−t/τ) − τ) with the gate times
// as the independent variable (lib/speed/README.md §2). The optimiser is ml-levenberg-marquardt.

export interface GateTime {
  distanceM: number;
  /** Seconds from the start of the run (first movement or the start signal, one choice per trial). */
  timeS: number;
}

interface GateResidual {
  distanceM: number;
  timeS: number;
  /** Model distance at the measured time minus the gate's distance, m. */
  distanceResidualM: number;
  /** Model time to the gate's distance minus the measured time, s. */
  timeResidualS: number;
}

export interface SprintFit {
  vmax: number;
  tau: number;
  residuals: GateResidual[];
  /** Root mean square of the time residuals, s. */
  rmseTimeS: number;
  iterations: number;
}

/** Parameter box the optimiser stays inside: wider than any human sprint, narrow enough to keep e^(−t/τ) finite. */
export const FIT_BOUNDS = { vmax: [1, 15], tau: [0.1, 5] } as const;

const model =
  ([vmax, tau]: number[]) =>
  (t: number): number =>
    distanceAt(t, vmax, tau);

// ∂x/∂vmax = t + τ(e^(−t/τ) − 1); ∂x/∂τ = vmax·(e^(−t/τ)·(1 + t/τ) − 1).
const jacobian =
  ([vmax, tau]: number[]) =>
  (t: number): number[] => {
    const e = Math.exp(-t / tau);
    return [t + tau * Math.expm1(-t / tau), vmax * (e * (1 + t / tau) - 1)];
  };

/** Gates timed after the start (distance and time both above 0), nearest first. */
export function timedGates(gates: readonly GateTime[]): GateTime[] {
  return gates.filter((g) => g.distanceM > 0 && g.timeS > 0).sort((a, b) => a.distanceM - b.distanceM);
}

/**
 * Fits vmax and τ to gates timed from rest. Needs two timed gates at least (two unknowns); answers null when
 * there are fewer or when the numbers cannot come from a run (times that do not grow with distance).
 */
export function fitSprint(gates: readonly GateTime[]): SprintFit | null {
  const timed = timedGates(gates);
  if (timed.length < 2) return null;
  for (let i = 1; i < timed.length; i++) {
    if (!(timed[i].timeS > timed[i - 1].timeS) || !(timed[i].distanceM > timed[i - 1].distanceM)) return null;
  }
  const last = timed[timed.length - 1];
  // Start from the last interval's speed (a little under vmax, lib/speed/README.md T4) and a typical τ.
  const prev = timed[timed.length - 2];
  const lastSpeed = (last.distanceM - prev.distanceM) / (last.timeS - prev.timeS);
  const clamp = (v: number, [lo, hi]: readonly [number, number]) => Math.min(hi, Math.max(lo, v));
  const initialValues = [clamp(lastSpeed * 1.03, FIT_BOUNDS.vmax), 1];
  const result = levenbergMarquardt({ x: timed.map((g) => g.timeS), y: timed.map((g) => g.distanceM) }, model, {
    initialValues,
    jacobianFunction: jacobian,
    minValues: [FIT_BOUNDS.vmax[0], FIT_BOUNDS.tau[0]],
    maxValues: [FIT_BOUNDS.vmax[1], FIT_BOUNDS.tau[1]],
    damping: 1e-2,
    maxIterations: 300,
    // The package keeps a step only when it beats the best error by more than this; the default (1e-2 m²) stops early.
    errorTolerance: 1e-14,
  });
  const [vmax, tau] = result.parameterValues;
  if (!Number.isFinite(vmax) || !Number.isFinite(tau)) return null;
  const residuals = timed.map((g) => ({
    distanceM: g.distanceM,
    timeS: g.timeS,
    distanceResidualM: distanceAt(g.timeS, vmax, tau) - g.distanceM,
    timeResidualS: timeToDistance(g.distanceM, vmax, tau) - g.timeS,
  }));
  const rmseTimeS = Math.sqrt(residuals.reduce((s, r) => s + r.timeResidualS ** 2, 0) / residuals.length);
  return { vmax, tau, residuals, rmseTimeS, iterations: result.iterations };
}
