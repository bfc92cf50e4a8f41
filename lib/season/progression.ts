// Week-to-week volume factors for generated draft weeks. Pure: no dates, no database.
//
// Rules of thumb (lib/season/README.md):
// - Build and unload ("3:1 loading"): raise volume by a set share each week for a few weeks, then unload, and
//   start the next build one step above the last one (common practice).
// - Taper before an A meet: cut volume by 41–60 % over 8–14 days, progressively rather than in one step, and keep
//   intensity and frequency (Bosquet et al. 2007, Med Sci Sports Exerc 39(8):1358–65; from memory).

type BuildRule = {
  kind: "build";
  /** Weekly rise in the build weeks, % (e.g. 8). */
  weeklyIncreasePct: number;
  /** Build weeks before each unload week (e.g. 3). */
  buildWeeks: number;
  /** The unload week's cut from the last build week, % (e.g. 40). */
  unloadPct: number;
};

type TaperShape = "linear" | "exponential" | "step";

type TaperRule = {
  kind: "taper";
  /** Total volume cut reached in the last taper week, % of the source week (e.g. 50). */
  reductionPct: number;
  shape: TaperShape;
};

export type ProgressionRule = BuildRule | TaperRule;

/** Time constant of the exponential taper as a share of its length: a fast early cut that levels off. */
const EXPONENTIAL_TAPER_TAU = 0.5;

/**
 * The volume factor of each generated week relative to the source week (1 = the same volume). Week k of a
 * build cycle is (1 + p)^(c + k), c the cycle's number, and the unload week is the last build week × (1 − u).
 */
export function progressionFactors(rule: ProgressionRule, weeks: number): number[] {
  if (!Number.isInteger(weeks) || weeks < 1) return [];
  return rule.kind === "build" ? buildFactors(rule, weeks) : taperFactors(rule, weeks);
}

function buildFactors(rule: BuildRule, weeks: number): number[] {
  const rise = 1 + rule.weeklyIncreasePct / 100;
  const cycle = rule.buildWeeks + 1;
  const out: number[] = [];
  for (let i = 0; i < weeks; i++) {
    const c = Math.floor(i / cycle);
    const k = i % cycle;
    if (k < rule.buildWeeks) out.push(rise ** (c + k + 1));
    else out.push(rise ** (c + rule.buildWeeks) * (1 - rule.unloadPct / 100));
  }
  return out;
}

function taperFactors(rule: TaperRule, weeks: number): number[] {
  const cut = rule.reductionPct / 100;
  return Array.from({ length: weeks }, (_, i) => {
    const k = i + 1;
    if (rule.shape === "step") return 1 - cut;
    if (rule.shape === "linear") return 1 - (cut * k) / weeks;
    const tau = EXPONENTIAL_TAPER_TAU * weeks;
    return 1 - (cut * (1 - Math.exp(-k / tau))) / (1 - Math.exp(-weeks / tau));
  });
}
