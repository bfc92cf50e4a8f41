import { DRILL_KINDS, RUNNING_KINDS } from "@/lib/load/block-kinds";
import { drillContacts } from "@/lib/load/plyo";
import type { BlockInput } from "@/lib/load/types";
import { formatNumber } from "@/lib/format/number";

// Plausibility limits: a session past one of them is most likely a typo (600 m typed where 60 m was meant),
// so the server asks "Are you sure?" with the numbers before saving it, and saves it once the coach confirms.
// Pure and isomorphic: the handlers (through notify()) and the planner's editor run the same checks.
// None of these is a refusal; the schemas' own ranges (lib/validations/template.ts) are the hard limits.

/** The limits, each with where it comes from. */
export const PLAUSIBILITY_LIMITS = {
  /**
   * A rep at 90 % of max velocity or more is at most 150 m: the 200 m world record (19.19 s) averages
   * 10.4 m/s, about 85 % of the fastest measured top speeds (about 12.3 m/s), so nobody holds 90 % much
   * beyond 150 m (from memory).
   */
  fastRepM: { value: 150, fromPct: 90 },
  /** Sets × reps of one running block: sprint sessions run 10–30 reps in all (common practice); 40 is past that. */
  blockReps: { value: 40 },
  /** Metres of one running block: extensive tempo, the longest running work, reaches 2,000–3,000 m (common practice). */
  blockMetres: { value: 3000 },
  /**
   * Ground contacts of one drill block: twice the top of the NSCA's advanced session band (140, lib/load/plyo.ts)
   * and about the top of the preseason ranges (Chu 1998, from memory).
   */
  blockContacts: { value: 300 },
  /** Running metres of a session, all blocks: above two long tempo blocks (common practice). */
  sessionMetres: { value: 4000 },
  /**
   * Metres at 90 % of max velocity or more in a session: speed-endurance sessions total 600–1,200 m at that
   * intensity, speed sessions far less (common practice).
   */
  sessionFastMetres: { value: 1200, fromPct: 90 },
  /** Ground contacts of a session, all blocks: above the highest preseason range for experienced athletes (from memory). */
  sessionContacts: { value: 400 },
} as const;

type PlausibilityLimit = keyof typeof PLAUSIBILITY_LIMITS;

/** One limit a session goes past: which, where (the body field, as the editor and the API name it), the numbers. */
export type PlausibilityCheck = {
  limit: PlausibilityLimit;
  /** The request field, e.g. "blocks.0.running.distanceM"; "blocks" for a whole-session total. */
  field: string;
  /** The block's title for block limits; null for session totals. */
  block: string | null;
  value: number;
  max: number;
  /** "10 × 30 × 600 m = 180,000 m is more than 3,000 m in one block." */
  message: string;
};

type Checked = { blocks: readonly BlockInput[] };

const n = (x: number) => formatNumber(x, 0);

function running(b: BlockInput) {
  return RUNNING_KINDS.includes(b.kind) ? (b.running ?? null) : null;
}

function contactsOf(b: BlockInput): number {
  return DRILL_KINDS.includes(b.kind) && b.drills ? drillContacts(b.drills) : 0;
}

/** Metres of a running block, run-in included (a flying start's run-in is run too). */
function metresOf(b: BlockInput): number {
  const r = running(b);
  return r ? r.sets * r.reps * (r.distanceM + r.runInM) : 0;
}

/** The check when `value` goes past the limit, else nothing; `say` words it from the limit's value. */
function past(
  limit: PlausibilityLimit,
  field: string,
  block: string | null,
  value: number,
  say: (max: number) => string,
): PlausibilityCheck[] {
  const max = PLAUSIBILITY_LIMITS[limit].value;
  return value > max ? [{ limit, field, block, value, max, message: say(max) }] : [];
}

function blockChecks(b: BlockInput, i: number): PlausibilityCheck[] {
  const fast = PLAUSIBILITY_LIMITS.fastRepM.fromPct;
  const r = running(b);
  const contacts = past("blockContacts", `blocks.${i}.drills`, b.title, contactsOf(b), (max) => {
    return `${n(contactsOf(b))} ground contacts is more than ${max} in one block.`;
  });
  if (!r) return contacts;
  const reps = r.sets * r.reps;
  const metres = metresOf(b);
  const field = (f: string) => `blocks.${i}.running.${f}`;
  return [
    ...(r.intensityPct >= fast
      ? past("fastRepM", field("distanceM"), b.title, r.distanceM, (max) => {
          return `${n(r.distanceM)} m a rep at ${r.intensityPct} % is more than the ${max} m anyone holds ${fast} % of max velocity for.`;
        })
      : []),
    ...past("blockReps", field("reps"), b.title, reps, (max) => {
      return `${r.sets} × ${r.reps} = ${reps} reps is more than ${max} in one block.`;
    }),
    ...past("blockMetres", field("sets"), b.title, metres, (max) => {
      return `${r.sets} × ${r.reps} × ${n(r.distanceM + r.runInM)} m = ${n(metres)} m is more than ${n(max)} m in one block.`;
    }),
    ...contacts,
  ];
}

function sessionChecks(s: Checked): PlausibilityCheck[] {
  const fromPct = PLAUSIBILITY_LIMITS.sessionFastMetres.fromPct;
  const sum = (of: (b: BlockInput) => number) => s.blocks.reduce((total, b) => total + of(b), 0);
  const metres = sum(metresOf);
  const fast = sum((b) => ((running(b)?.intensityPct ?? 0) >= fromPct ? metresOf(b) : 0));
  const contacts = sum(contactsOf);
  return [
    ...past(
      "sessionMetres",
      "blocks",
      null,
      metres,
      (max) => `${n(metres)} m of running is more than ${n(max)} m in one session.`,
    ),
    ...past("sessionFastMetres", "blocks", null, fast, (max) => {
      return `${n(fast)} m at ${fromPct} % of max velocity or more is more than ${n(max)} m in one session.`;
    }),
    ...past(
      "sessionContacts",
      "blocks",
      null,
      contacts,
      (max) => `${n(contacts)} ground contacts is more than ${max} in one session.`,
    ),
  ];
}

/** Every limit a session (or a template's one block) goes past: block limits first, then the session's totals. */
export function plausibilityChecks(s: Checked): PlausibilityCheck[] {
  return [...s.blocks.flatMap(blockChecks), ...sessionChecks(s)];
}

const keyOf = (c: PlausibilityCheck) => `${c.limit}:${c.value}`;

/**
 * What a change adds: checks the session did not already go past with the same numbers, so moving a session
 * the coach confirmed once, or changing its time, does not ask again, while changing the numbers does (a new
 * session, copies included, is asked about like any new session, as restrictions are).
 */
export function newPlausibilityChecks(before: Checked | null, after: Checked | null): PlausibilityCheck[] {
  if (!after) return [];
  const had = new Set((before ? plausibilityChecks(before) : []).map(keyOf));
  return plausibilityChecks(after).filter((c) => !had.has(keyOf(c)));
}

/** Each check's numbers in words, block checks led by the block's title. */
export function plausibilityLines(checks: readonly PlausibilityCheck[]): string {
  return checks.map((c) => (c.block ? `${c.block}: ${c.message}` : c.message)).join(" ");
}

/** The question, in words: "Are you sure? …" with each check's numbers. */
export function plausibilityQuestion(checks: readonly PlausibilityCheck[]): string {
  return `Are you sure? ${plausibilityLines(checks)}`;
}

/** Per-field messages for a refusal: each field named with its limit. */
export function plausibilityFields(checks: readonly PlausibilityCheck[]): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const c of checks) (out[c.field] ??= []).push(`${c.message} Send confirmed: true to save it anyway.`);
  return out;
}
