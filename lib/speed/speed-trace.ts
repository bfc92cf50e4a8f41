import { levenbergMarquardt } from "ml-levenberg-marquardt";
import type { SpeedBands, TeamLoadSettings } from "@/lib/load/types";
import { samplingHz } from "./force-trace";
import { FIT_BOUNDS } from "./sprint-fit";

// Speed traces from a radar, laser or GPS unit (time s, speed m/s, ≥ 10 Hz; lib/speed/README.md §8): vmax
// as the peak of a stated smoothing, τ fitted to the sprint that holds it, and the metres in the athlete's
// speed bands, so a trace of a planned session becomes that session's measured running load.

/** The slowest trace we take, Hz: at 10 Hz a 0.5 s smoothing window still holds 5 samples. */
export const MIN_TRACE_HZ = 10;
/**
 * vmax is the peak of a centred moving average over this window, s: about one stride (two steps) at top speed
 * (common practice, from memory: ≈ 4.5 steps/s), so the speed's rise and fall within each stride averages out.
 */
export const TRACE_SMOOTHING_S = 0.5;
/** Below this the athlete is taken to be at rest: the sprint that holds the peak starts at the last such sample. */
const TRACE_REST_MS = 0.2;

export type SpeedTrace = { t: readonly number[]; v: readonly number[] };

type TraceFit = { vmax: number; tau: number; startS: number; rmseMs: number; samples: number };

export type SpeedTraceAnalysis = {
  samplingHz: number;
  durationS: number;
  samples: number;
  /** Trapezoidal ∫v dt over the whole trace, m. */
  distanceM: number;
  /** Peak of the TRACE_SMOOTHING_S centred moving average (whole windows only), and when it came. */
  vmaxMs: number;
  vmaxAtS: number;
  /** Highest single sample, for comparison with the smoothed peak. */
  rawPeakMs: number;
  fit: TraceFit | null;
  /** Metres at or above each of the team's lines (absolute) and the athlete's % of vmax (relative). */
  bands: SpeedBands;
  /** The team's HSR figure (absolute or relative line, as the load engine counts it) and near-max metres. */
  hsrM: number;
  nearMaxM: number;
  /** The vmax the relative bands were taken from (the athlete's profile in force on the trace's date). */
  bandVmaxMs: number;
};

/**
 * Centred moving average over `windowS`: the samples in [t − windowS/2, t + windowS/2), so a window holds
 * windowS × rate samples; the window shrinks at the trace's ends.
 */
export function smoothSpeed(tr: SpeedTrace, windowS = TRACE_SMOOTHING_S): number[] {
  const { t, v } = tr;
  const half = windowS / 2;
  const out: number[] = [];
  let lo = 0;
  let hi = 0;
  let sum = 0;
  for (let i = 0; i < t.length; i++) {
    // The epsilon keeps sample times that are rounded (0.1 + 0.2) on the side of the edge they were meant for.
    while (hi < t.length && t[hi] < t[i] + half - 1e-9) sum += v[hi++];
    while (t[lo] < t[i] - half - 1e-9) sum -= v[lo++];
    out.push(sum / (hi - lo));
  }
  return out;
}

/** Index of the smoothed peak among samples whose whole window lies inside the trace (all of a shorter trace). */
function peakIndex(t: readonly number[], smooth: readonly number[], windowS: number): number {
  const half = windowS / 2;
  const first = t[0] + half - 1e-9;
  const last = t[t.length - 1] - half + 1e-9;
  let p = -1;
  for (let i = 0; i < smooth.length; i++) {
    if (t[i] < first || t[i] > last) continue;
    if (p < 0 || smooth[i] > smooth[p]) p = i;
  }
  if (p >= 0) return p;
  for (let i = 0; i < smooth.length; i++) if (p < 0 || smooth[i] > smooth[p]) p = i;
  return p;
}

/**
 * Metres at or above `lineMs`, speed taken as linear between samples: each segment's distance above the line
 * is exact for that straight line (the trapezoidal rule on the part above it).
 */
export function metresAbove(tr: SpeedTrace, lineMs: number): number {
  const { t, v } = tr;
  let m = 0;
  for (let k = 0; k + 1 < t.length; k++) {
    const dt = t[k + 1] - t[k];
    const [lo, hi] = v[k] <= v[k + 1] ? [v[k], v[k + 1]] : [v[k + 1], v[k]];
    if (lo >= lineMs) m += ((lo + hi) / 2) * dt;
    else if (hi > lineMs) m += ((lineMs + hi) / 2) * dt * ((hi - lineMs) / (hi - lo));
  }
  return m;
}

/**
 * Fits v(t) = vmax·(1 − e^(−(t − t₀)/τ)) (Furusawa, Hill & Parkinson 1927) to the samples of the sprint that
 * holds the smoothed peak, from the last sample at rest before it up to the peak, by least squares on speed with
 * ml-levenberg-marquardt; the start t₀ is fitted too (a trace's clock does not start with the run).
 */
function fitTraceSprint(tr: SpeedTrace, peakIndex: number): TraceFit | null {
  const { t, v } = tr;
  let s = peakIndex;
  while (s > 0 && v[s] >= TRACE_REST_MS) s--;
  const xs = t.slice(s, peakIndex + 1);
  const ys = v.slice(s, peakIndex + 1);
  if (xs.length < 5) return null;
  const t0 = xs[0];
  const model =
    ([vmax, tau, start]: number[]) =>
    (x: number) =>
      x <= start ? 0 : vmax * -Math.expm1(-(x - start) / tau);
  const peak = Math.max(...ys);
  const result = levenbergMarquardt({ x: xs, y: ys }, model, {
    initialValues: [Math.min(FIT_BOUNDS.vmax[1], Math.max(FIT_BOUNDS.vmax[0], peak)), 1, t0],
    minValues: [FIT_BOUNDS.vmax[0], FIT_BOUNDS.tau[0], t0 - 1],
    maxValues: [FIT_BOUNDS.vmax[1], FIT_BOUNDS.tau[1], t0 + 1],
    damping: 1e-2,
    gradientDifference: 1e-6,
    maxIterations: 400,
    errorTolerance: 1e-14,
  });
  const [vmax, tau, startS] = result.parameterValues;
  if (![vmax, tau, startS].every(Number.isFinite)) return null;
  const f = model(result.parameterValues);
  const rmseMs = Math.sqrt(xs.reduce((acc, x, i) => acc + (f(x) - ys[i]) ** 2, 0) / xs.length);
  return { vmax, tau, startS, rmseMs, samples: xs.length };
}

type BandSettings = Pick<
  TeamLoadSettings,
  "hsrSpeedMs" | "sprintSpeedMs" | "hsrPct" | "nearMaxPct" | "maximalPct" | "speedZones"
>;

/** Everything a speed trace tells the coach; `bandVmaxMs` is the athlete's vmax for the relative bands. */
export function analyseSpeedTrace(tr: SpeedTrace, bandVmaxMs: number, settings: BandSettings): SpeedTraceAnalysis {
  const smooth = smoothSpeed(tr);
  const p = peakIndex(tr.t, smooth, TRACE_SMOOTHING_S);
  const pct = (x: number) => (bandVmaxMs * x) / 100;
  const bands: SpeedBands = {
    absHsrM: metresAbove(tr, settings.hsrSpeedMs),
    absSprintM: metresAbove(tr, settings.sprintSpeedMs),
    relHsrM: metresAbove(tr, pct(settings.hsrPct)),
    relNearMaxM: metresAbove(tr, pct(settings.nearMaxPct)),
    relMaximalM: metresAbove(tr, pct(settings.maximalPct)),
  };
  return {
    samplingHz: samplingHz(tr.t),
    durationS: tr.t[tr.t.length - 1] - tr.t[0],
    samples: tr.t.length,
    distanceM: metresAbove(tr, -Infinity),
    vmaxMs: smooth[p],
    vmaxAtS: tr.t[p],
    rawPeakMs: Math.max(...tr.v),
    fit: fitTraceSprint(tr, p),
    bands,
    hsrM: settings.speedZones === "relative" ? bands.relHsrM : bands.absHsrM,
    nearMaxM: bands.relNearMaxM,
    bandVmaxMs,
  };
}

/** At most `points` samples of the trace for a chart (every n-th, the peak region kept by the smoothing). */
export function chartPoints(tr: SpeedTrace, points = 400): { t: number; v: number }[] {
  const step = Math.max(1, Math.ceil(tr.t.length / points));
  const out: { t: number; v: number }[] = [];
  for (let i = 0; i < tr.t.length; i += step) out.push({ t: tr.t[i], v: tr.v[i] });
  return out;
}
