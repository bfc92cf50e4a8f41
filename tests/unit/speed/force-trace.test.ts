import { describe, expect, it } from "vitest";
import {
  analyseJump,
  detectContacts,
  G,
  heightFromFlightTime,
  samplingHz,
  summariseContacts,
  velocityFromFlightTime,
} from "@/lib/speed/force-trace";

// Force traces and contacts (lib/speed/README.md §7). Synthetic traces with known answers; check values B2, B5,
// B6, B7 [C]; the jump methods of Linthorne 2001 (Am J Phys 69:1198, volume and pages from memory).
const HZ = 1000;

/** Samples of f(t) on [0, end] at HZ. */
function sample(end: number, f: (t: number) => number) {
  const n = Math.round(end * HZ);
  const t = Array.from({ length: n + 1 }, (_, i) => i / HZ);
  return { t, f: t.map(f) };
}

/** Running strides: half-sine contacts of peak P and duration tc, flights of tf, starting after one flight. */
function strides(count: number, peak: number, tc: number, tf: number) {
  const step = tc + tf;
  return sample(tf + count * step + tf, (t) => {
    const into = t - tf;
    if (into < 0) return 0;
    const phase = into % step;
    return Math.floor(into / step) < count && phase < tc ? peak * Math.sin((Math.PI * phase) / tc) : 0;
  });
}

describe("contacts of a force trace", () => {
  it("a half-sine contact of peak P and duration t has impulse 2·P·t/π (trapezoidal, 1 kHz)", () => {
    const tr = strides(1, 2000, 0.1, 0.12);
    const [c] = detectContacts(tr, 70);
    // The trapezoidal rule's error on a half-sine of 100 samples is about 1e-4 (π²/12 ÷ 100²).
    expect(c.impulseNs / ((2 * 2000 * 0.1) / Math.PI)).toBeCloseTo(1, 3);
    expect(c.peakN).toBeCloseTo(2000, 0);
    // Threshold 20 N: the crossings sit asin(0.01)·t/π in from each end, 0.6 % of the contact.
    expect(c.contactTimeS).toBeCloseTo(0.1 * (1 - (2 / Math.PI) * Math.asin(20 / 2000)), 4);
  });

  it("a rectangle pulse: impulse F·t, mean force F", () => {
    const tr = sample(0.5, (t) => (t >= 0.1 && t < 0.3 ? 1500 : 0));
    const [c] = detectContacts(tr, 75);
    expect(c.impulseNs).toBeCloseTo(1500 * 0.2, 6);
    expect(c.contactTimeS).toBeCloseTo(0.2, 2);
    expect(c.peakN).toBe(1500);
    expect(c.netImpulseNs).toBeCloseTo(1500 * 0.2 - 75 * G * c.contactTimeS, 6);
    expect(c.meanN / 1500).toBeCloseTo(1, 2); // one sample of 200 either way
  });

  it("B2: contact 0.086 s, flight 0.145 s, stance impulse = m·g·step time → mean 2.686 BW, half-sine peak 4.219 BW, 4.329 Hz", () => {
    const m = 95.43; // B3: Čoh 2018's 3932 N ÷ 4.2 ÷ 9.81
    const tc = 0.086;
    const tf = 0.145;
    const meanN = (m * G * (tc + tf)) / tc;
    const contacts = detectContacts(strides(4, (Math.PI / 2) * meanN, tc, tf), m);
    expect(contacts).toHaveLength(4);
    for (const c of contacts) {
      // Over a whole step the vertical impulse is body weight × step time (B2).
      expect(c.impulseNs / (m * G * (tc + tf))).toBeCloseTo(1, 3);
      expect(c.impulseNs / c.contactTimeS / (m * G)).toBeCloseTo(2.686 * (tc / c.contactTimeS), 2);
      expect(c.peakBw).toBeCloseTo(4.219, 2);
    }
    expect(contacts[0].stepTimeS).toBeCloseTo(0.231, 6);
    expect(contacts[0].stepFrequencyHz).toBeCloseTo(4.329, 3);
    expect(contacts[0].flightTimeS! + contacts[0].contactTimeS).toBeCloseTo(0.231, 6);
    // Impulse–momentum: the contact turns the landing's downward speed into the take-off's upward one, Δv = g·t_flight.
    expect(contacts[0].deltaVerticalMs).toBeCloseTo(G * tf, 2);
  });

  it("common practice: a top-speed stride (contact 0.10 s, flight 0.12 s) reads as a 0.08–0.12 s contact at 2–3+ × BW", () => {
    const m = 75;
    const meanN = (m * G * 0.22) / 0.1; // B2 generic case: 2.20 BW average
    const contacts = detectContacts(strides(3, (Math.PI / 2) * meanN, 0.1, 0.12), m);
    for (const c of contacts) {
      expect(c.contactTimeS).toBeGreaterThanOrEqual(0.08);
      expect(c.contactTimeS).toBeLessThanOrEqual(0.12);
      expect(c.peakBw).toBeGreaterThanOrEqual(2);
      expect(c.meanBw).toBeCloseTo(2.2, 1);
    }
  });

  it("reads the sampling rate (a 2 Hz trace is told apart from 1 kHz)", () => {
    expect(samplingHz(strides(1, 1000, 0.1, 0.1).t)).toBeCloseTo(1000, 6);
    expect(samplingHz([0, 0.5, 1, 1.5])).toBe(2);
  });
});

describe("jumps: impulse–momentum and flight time side by side (Linthorne 2001)", () => {
  /** Quiet standing, a rectangular push of `net` N·s above body weight over `push` s, flight, landing. */
  function jump(m: number, push: number, force: number, flight: number) {
    const bw = m * G;
    return sample(0.5 + push + flight + 0.3, (t) => {
      if (t < 0.5) return bw;
      if (t < 0.5 + push) return force;
      if (t < 0.5 + push + flight) return 0;
      return 3 * bw;
    });
  }

  it("B6: 75 kg, 1500 N over 0.25 s from rest → net impulse 191.0625 N·s, v 2.5475 m/s, h 0.330772 m", () => {
    const v = ((1500 - 75 * G) * 0.25) / 75;
    const j = analyseJump(jump(75, 0.25, 1500, (2 * v) / G), 75)!;
    expect(j.netImpulseNs).toBeCloseTo(191.0625, 0);
    expect(j.takeOffVelocityMs).toBeCloseTo(2.5475, 2);
    expect(j.heightByImpulseM).toBeCloseTo(0.330772, 2);
    expect(j.heightByFlightTimeM!).toBeCloseTo(0.330772, 2);
  });

  it("B5: 75 kg and net impulse 210 N·s → v 2.8 m/s, h 0.399592 m; flight 0.570846 s gives the same height", () => {
    const force = 75 * G + 210 / 0.3;
    const j = analyseJump(jump(75, 0.3, force, 0.570846), 75)!;
    expect(j.takeOffVelocityMs).toBeCloseTo(2.8, 2);
    expect(j.heightByImpulseM).toBeCloseTo(0.399592, 2);
    expect(j.flightTimeS!).toBeCloseTo(0.570846, 2);
    expect(j.heightByFlightTimeM!).toBeCloseTo(0.399592, 2);
  });

  it("B7: flight 0.500 s → h 0.306563 m and v 2.4525 m/s (g = 9.81)", () => {
    expect(heightFromFlightTime(0.5)).toBeCloseTo(0.306563, 6);
    expect(velocityFromFlightTime(0.5)).toBeCloseTo(2.4525, 10);
  });

  it("a trace that never leaves the ground is no jump", () => {
    expect(
      analyseJump(
        sample(1, () => 700),
        70,
      ),
    ).toBeNull();
  });
});

describe("contact-mat rows (lib/speed/README.md §7, B1, B2)", () => {
  it("B1/B2: contact 0.086 s, flight 0.145 s → 4.329 Hz and a mean stance force of 2.686 BW", () => {
    const s = summariseContacts([
      { contactTimeS: 0.086, flightTimeS: 0.145, stepLengthM: 2.7 },
      { contactTimeS: 0.086, flightTimeS: 0.145, stepLengthM: 2.7 },
    ])!;
    expect(s.stepFrequencyHz).toBeCloseTo(4.329, 3);
    expect(s.stanceForceBw).toBeCloseTo(2.686, 3);
    expect(s.stepLengthM).toBe(2.7);
    // The generic case: contact 0.10 s and flight 0.12 s → 2.20 BW.
    expect(summariseContacts([{ contactTimeS: 0.1, flightTimeS: 0.12 }])!.stanceForceBw).toBeCloseTo(2.2, 12);
    expect(summariseContacts([])).toBeNull();
  });
});
