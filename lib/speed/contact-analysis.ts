import {
  analyseJump,
  CONTACT_THRESHOLD_N,
  detectContacts,
  samplingHz,
  summariseContacts,
  type Contact,
  type ContactRow,
  type JumpAnalysis,
  type Trace,
} from "./force-trace";

// What a force trace or a contact-mat file tells the coach (lib/speed/README.md §7, §9): each contact and the
// mean, and the relation the profile teaches, mean stance force in body weights = step time ÷ contact time.

const mean = (xs: readonly number[]) => (xs.length ? xs.reduce((s, x) => s + x, 0) / xs.length : null);

type ContactMeans = {
  contactTimeS: number | null;
  flightTimeS: number | null;
  stepTimeS: number | null;
  stepFrequencyHz: number | null;
  peakN: number | null;
  peakBw: number | null;
  meanN: number | null;
  meanBw: number | null;
  impulseNs: number | null;
  netImpulseNs: number | null;
  deltaVerticalMs: number | null;
  /** Step time ÷ contact time of the means: the stance force a whole step needs (§7, B2). */
  impliedStanceBw: number | null;
};

export type ForceTraceAnalysis = {
  samplingHz: number;
  bodyMassKg: number;
  thresholdN: number;
  /** A trace that starts with the athlete standing on the plate is a jump (Linthorne 2001); else running contacts. */
  mode: "jump" | "contacts";
  jump: JumpAnalysis | null;
  contacts: Contact[];
  means: ContactMeans;
};

function meansOf(contacts: readonly Contact[]): ContactMeans {
  const of = (f: (c: Contact) => number | null) =>
    mean(contacts.map(f).filter((x): x is number => x !== null && Number.isFinite(x)));
  const contactTimeS = of((c) => c.contactTimeS);
  const stepTimeS = of((c) => c.stepTimeS);
  return {
    contactTimeS,
    flightTimeS: of((c) => c.flightTimeS),
    stepTimeS,
    stepFrequencyHz: stepTimeS ? 1 / stepTimeS : null,
    peakN: of((c) => c.peakN),
    peakBw: of((c) => c.peakBw),
    meanN: of((c) => c.meanN),
    meanBw: of((c) => c.meanBw),
    impulseNs: of((c) => c.impulseNs),
    netImpulseNs: of((c) => c.netImpulseNs),
    deltaVerticalMs: of((c) => c.deltaVerticalMs),
    impliedStanceBw: stepTimeS && contactTimeS ? stepTimeS / contactTimeS : null,
  };
}

export function analyseForceTrace(tr: Trace, bodyMassKg: number): ForceTraceAnalysis {
  const jumpMode = tr.f[0] > CONTACT_THRESHOLD_N;
  const contacts = jumpMode ? [] : detectContacts(tr, bodyMassKg);
  return {
    samplingHz: samplingHz(tr.t),
    bodyMassKg,
    thresholdN: CONTACT_THRESHOLD_N,
    mode: jumpMode ? "jump" : "contacts",
    jump: jumpMode ? analyseJump(tr, bodyMassKg) : null,
    contacts,
    means: meansOf(contacts),
  };
}

export type ContactRowsAnalysis = {
  rows: (ContactRow & { stepTimeS: number; stepFrequencyHz: number; stanceForceBw: number })[];
  means: NonNullable<ReturnType<typeof summariseContacts>>;
};

/** Contact-mat or optical rows: per contact and the mean (summariseContacts). */
export function analyseContactRows(rows: readonly ContactRow[]): ContactRowsAnalysis | null {
  const means = summariseContacts(rows);
  if (!means) return null;
  return {
    rows: rows.map((r) => {
      const stepTimeS = r.contactTimeS + r.flightTimeS;
      return {
        ...r,
        stepLengthM: r.stepLengthM ?? null,
        stepTimeS,
        stepFrequencyHz: 1 / stepTimeS,
        stanceForceBw: stepTimeS / r.contactTimeS,
      };
    }),
    means,
  };
}
