// Vertical force traces (time s, force N, ≥ 500 Hz) and contact measurements (lib/speed/README.md §7):
// contacts found by a force threshold, impulses by the trapezoidal rule, take-off velocity by impulse–momentum
// and jump height both ways (Linthorne 2001, Am J Phys 69:1198).

/** g, fixed once (lib/speed/README.md: 9.81 m/s², as the check values use). */
export const G = 9.81;
/** A contact is force above this (our choice; 10–50 N is common practice for force plates), N. */
export const CONTACT_THRESHOLD_N = 20;
/** The slowest force trace we analyse, Hz: a 0.08 s contact needs 40 samples or more. */
export const MIN_FORCE_HZ = 500;

export type Trace = { t: readonly number[]; f: readonly number[] };

export type Contact = {
  startS: number;
  endS: number;
  contactTimeS: number;
  /** Until the next contact starts; null for the last one. */
  flightTimeS: number | null;
  /** Contact start to next contact start; null for the last one. */
  stepTimeS: number | null;
  stepFrequencyHz: number | null;
  peakN: number;
  peakBw: number;
  /** Vertical impulse ∫F dt over the contact (trapezoidal), N·s. */
  impulseNs: number;
  /** ∫(F − m·g) dt over the contact, N·s. */
  netImpulseNs: number;
  /** Mean stance force = impulse ÷ contact time. */
  meanN: number;
  meanBw: number;
  /** Change of vertical velocity over the contact, net impulse ÷ m (impulse–momentum; g·flight time in steady running), m/s. */
  deltaVerticalMs: number;
};

/** Median sampling rate, Hz (0 for fewer than two samples). */
export function samplingHz(t: readonly number[]): number {
  if (t.length < 2) return 0;
  const dts = t.slice(1).map((v, i) => v - t[i]);
  dts.sort((a, b) => a - b);
  const mid = dts[Math.floor(dts.length / 2)];
  return mid > 0 ? 1 / mid : 0;
}

/** Trapezoidal ∫ y dt over samples i..j inclusive. */
function trapezoid(t: readonly number[], y: readonly number[], i = 0, j = t.length - 1): number {
  let s = 0;
  for (let k = i; k < j; k++) s += ((y[k] + y[k + 1]) / 2) * (t[k + 1] - t[k]);
  return s;
}

/** Time at which the segment k → k+1 crosses `level` (linear interpolation). */
function crossing(tr: Trace, k: number, level: number): number {
  const { t, f } = tr;
  const df = f[k + 1] - f[k];
  return df === 0 ? t[k] : t[k] + ((level - f[k]) / df) * (t[k + 1] - t[k]);
}

/**
 * Contacts of a trace: runs of samples above the threshold, timed from the interpolated threshold crossings;
 * impulses integrate from the last sample at or below the threshold before to the first after, so a pulse
 * that starts and ends at zero is integrated whole. A run touching either end of the trace is left out.
 */
export function detectContacts(tr: Trace, bodyMassKg: number, threshold = CONTACT_THRESHOLD_N): Contact[] {
  const { t, f } = tr;
  const bw = bodyMassKg * G;
  const runs: [number, number][] = [];
  let start = -1;
  for (let k = 0; k < f.length; k++) {
    const on = f[k] > threshold;
    if (on && start < 0) start = k;
    if (!on && start >= 0) {
      if (start > 0) runs.push([start, k - 1]);
      start = -1;
    }
  }
  const contacts = runs.map(([a, b]) => {
    const startS = crossing(tr, a - 1, threshold);
    const endS = crossing(tr, b, threshold);
    const impulseNs = trapezoid(t, f, a - 1, b + 1);
    const contactTimeS = endS - startS;
    // Body weight acts over the contact as timed, not over the sample-wide margins of the integration.
    const netImpulseNs = impulseNs - bw * contactTimeS;
    let peakN = 0;
    for (let k = a; k <= b; k++) peakN = Math.max(peakN, f[k]);
    const meanN = impulseNs / contactTimeS;
    return {
      startS,
      endS,
      contactTimeS,
      peakN,
      peakBw: peakN / bw,
      impulseNs,
      netImpulseNs,
      meanN,
      meanBw: meanN / bw,
    };
  });
  return contacts.map((c, i) => {
    const next = contacts[i + 1];
    const stepTimeS = next ? next.startS - c.startS : null;
    return {
      ...c,
      flightTimeS: next ? next.startS - c.endS : null,
      stepTimeS,
      stepFrequencyHz: stepTimeS ? 1 / stepTimeS : null,
      deltaVerticalMs: c.netImpulseNs / bodyMassKg,
    };
  });
}

/** Jump height from take-off velocity, h = v²/(2g). */
function heightFromVelocity(v: number): number {
  return (v * v) / (2 * G);
}

/** Jump height from flight time, h = g·t²/8 (Linthorne 2001; Bosco et al. 1983). */
export function heightFromFlightTime(flightS: number): number {
  return (G * flightS * flightS) / 8;
}

/** Take-off velocity from flight time, v = g·t/2 (take-off and landing at the same height). */
export function velocityFromFlightTime(flightS: number): number {
  return (G * flightS) / 2;
}

export type JumpAnalysis = {
  takeOffS: number;
  landingS: number | null;
  netImpulseNs: number;
  takeOffVelocityMs: number;
  heightByImpulseM: number;
  flightTimeS: number | null;
  heightByFlightTimeM: number | null;
};

/**
 * A vertical jump from quiet standing (Linthorne 2001): net impulse ∫(F − m·g) dt from the first sample (the
 * athlete standing still) to take-off, the first fall below the threshold; v = net impulse ÷ m. The flight
 * lasts until the force rises above the threshold again. Null when the trace never leaves the ground.
 */
export function analyseJump(tr: Trace, bodyMassKg: number, threshold = CONTACT_THRESHOLD_N): JumpAnalysis | null {
  const { t, f } = tr;
  const bw = bodyMassKg * G;
  const off = f.findIndex((v) => v <= threshold);
  if (off <= 0) return null;
  const takeOffS = crossing(tr, off - 1, threshold);
  const net = trapezoid(t, f, 0, off) - bw * (t[off] - t[0]);
  const v = net / bodyMassKg;
  let land = -1;
  for (let k = off; k < f.length; k++) {
    if (f[k] > threshold) {
      land = k;
      break;
    }
  }
  const landingS = land > 0 ? crossing(tr, land - 1, threshold) : null;
  const flightTimeS = landingS === null ? null : landingS - takeOffS;
  return {
    takeOffS,
    landingS,
    netImpulseNs: net,
    takeOffVelocityMs: v,
    heightByImpulseM: heightFromVelocity(Math.max(0, v)),
    flightTimeS,
    heightByFlightTimeM: flightTimeS === null ? null : heightFromFlightTime(flightTimeS),
  };
}

export type ContactRow = { contactTimeS: number; flightTimeS: number; stepLengthM?: number | null };

/**
 * Contact-mat or optical measurements, one row per contact: averages, step frequency 1 ÷ (contact + flight) and
 * the mean stance force in body weights it implies, step time ÷ contact time (over a whole step the vertical
 * impulse is m·g·step time; lib/speed/README.md §7, B2).
 */
export function summariseContacts(rows: readonly ContactRow[]) {
  if (rows.length === 0) return null;
  const mean = (xs: number[]) => xs.reduce((s, x) => s + x, 0) / xs.length;
  const contactTimeS = mean(rows.map((r) => r.contactTimeS));
  const flightTimeS = mean(rows.map((r) => r.flightTimeS));
  const stepTimeS = contactTimeS + flightTimeS;
  const lengths = rows.map((r) => r.stepLengthM).filter((x): x is number => typeof x === "number" && x > 0);
  return {
    contactTimeS,
    flightTimeS,
    stepFrequencyHz: 1 / stepTimeS,
    stepLengthM: lengths.length ? mean(lengths) : null,
    stanceForceBw: stepTimeS / contactTimeS,
  };
}
