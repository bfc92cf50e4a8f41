// Horizontal force–velocity profile from the sprint model without air drag (lib/speed/README.md §3): the
// model's F(t) = m·a(t) = (m·vmax/τ)·(1 − v/vmax) is a straight force–velocity line with F0 = m·vmax/τ,
// V0 = vmax and Pmax = F0·V0/4 (Samozino et al. 2016, Scand J Med Sci Sports 26:648–658, no-drag form).
// The air-drag correction of that paper is not applied: its constants were not checked in the paper.

export interface ForceVelocityProfile {
  /** Theoretical maximal horizontal force, N. */
  f0N: number;
  /** F0 per kg of body mass, N/kg. */
  f0PerKg: number;
  /** Theoretical maximal velocity, m/s (= vmax without drag). */
  v0: number;
  /** Maximal horizontal power, W. */
  pmaxW: number;
  pmaxPerKg: number;
}

export function forceVelocityProfile(input: { bodyMassKg: number; vmax: number; tau: number }): ForceVelocityProfile {
  const { bodyMassKg: m, vmax, tau } = input;
  const f0N = (m * vmax) / tau;
  const v0 = vmax;
  const pmaxW = (f0N * v0) / 4;
  return { f0N, f0PerKg: f0N / m, v0, pmaxW, pmaxPerKg: pmaxW / m };
}
