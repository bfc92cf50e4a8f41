// Mono-exponential sprint model, Furusawa, Hill & Parkinson 1927, Proc R Soc B 102:29–42:
// v(t) = vmax·(1 − e^(−t/τ)), a(t) = (vmax/τ)·e^(−t/τ), x(t) = vmax·(t + τ·e^(−t/τ) − τ). Time t from rest, in s.

/** 1 km/h = 1/3.6 m/s exactly. */
export function msToKmh(ms: number): number {
  return ms * 3.6;
}

export function kmhToMs(kmh: number): number {
  return kmh / 3.6;
}

/** Average speed between two gates, v̄ = d / Δt. */
export function averageSpeed(distanceM: number, seconds: number): number {
  return seconds > 0 ? distanceM / seconds : 0;
}

export function percentOfVmax(speed: number, vmax: number): number {
  return vmax > 0 ? (speed / vmax) * 100 : 0;
}

export function velocityAt(t: number, vmax: number, tau: number): number {
  if (t <= 0) return 0;
  return -vmax * Math.expm1(-t / tau);
}

export function accelerationAt(t: number, vmax: number, tau: number): number {
  if (t < 0) return 0;
  return (vmax / tau) * Math.exp(-t / tau);
}

export function distanceAt(t: number, vmax: number, tau: number): number {
  if (t <= 0) return 0;
  // t + τ·(e^(−t/τ) − 1), written with expm1 so short times keep their precision.
  return vmax * (t + tau * Math.expm1(-t / tau));
}

/**
 * Time (s) to cover `distance` from rest: Newton's method on x(t) − d. x is convex and increasing, and
 * t0 = d/vmax + τ lies right of the root (x(t) > vmax·(t − τ)), so the iterates fall monotonically to it.
 */
export function timeToDistance(distance: number, vmax: number, tau: number): number {
  if (!(distance > 0)) return 0;
  if (!(vmax > 0) || !(tau > 0)) return Number.POSITIVE_INFINITY;
  let t = distance / vmax + tau;
  for (let i = 0; i < 100; i++) {
    const f = distanceAt(t, vmax, tau) - distance;
    const step = f / velocityAt(t, vmax, tau);
    t -= step;
    if (Math.abs(step) <= 1e-13 * Math.max(1, t)) break;
  }
  return t;
}

export interface RepShape {
  /** Asymptotic speed of the rep (the prescribed share of vmax), m/s. */
  targetSpeed: number;
  tau: number;
  /** Metres run from rest in the rep (run-in included). */
  totalDistance: number;
}

/**
 * Metres from rest until the runner, approaching `targetSpeed`, reaches `speed`: x(t*) with
 * t* = −τ·ln(1 − speed/target), and because e^(−t* ÷ τ) = 1 − speed/target, x(t*) = target·t* − τ·speed.
 * +Infinity when speed ≥ target (the model only approaches its target); 0 for speed ≤ 0.
 */
export function distanceToReach(speed: number, targetSpeed: number, tau: number): number {
  if (speed <= 0) return 0;
  if (!(speed < targetSpeed)) return Number.POSITIVE_INFINITY;
  const tStar = -tau * Math.log1p(-speed / targetSpeed);
  // Clamped: for a tiny speed the two terms cancel and rounding could push x(t*) below 0.
  return Math.max(0, targetSpeed * tStar - tau * speed);
}

/**
 * Metres of one rep at or above `speed`, analytic: everything after x(t*) (see distanceToReach).
 * A threshold at or above the target gives 0.
 */
export function metresAtOrAbove(speed: number, rep: RepShape): number {
  const { targetSpeed, tau, totalDistance } = rep;
  if (!(totalDistance > 0) || !(targetSpeed > 0)) return 0;
  const reach = distanceToReach(speed, targetSpeed, tau);
  return reach >= totalDistance ? 0 : totalDistance - reach;
}
