// Physio restrictions as plain data, and the one check both the week grid (before a drop) and the server
// (before a write) run. Pure and isomorphic: no database, no clock, no React.
import { addDays, formatDayLabel } from "@/lib/dates/plain-date";
import { drillContacts } from "@/lib/load/plyo";
import { DRILL_KINDS, RUNNING_KINDS } from "@/lib/load/block-kinds";
import type { BlockInput, BlockKind } from "@/lib/load/types";
import { BLOCK_KIND_LABEL } from "@/lib/format/block-summary";
import { formatNumber } from "@/lib/format/number";

/**
 * What a restriction limits:
 * - "no_kind": no blocks of the listed kinds (e.g. no max-velocity running while a hamstring settles);
 * - "max_intensity": running blocks at most this % of the athlete's vmax;
 * - "contact_cap": at most this many plyometric ground contacts in one session;
 * - "no_training": no blocks at all (the athlete is unavailable).
 */
export const RESTRICTION_RULES = ["no_kind", "max_intensity", "contact_cap"] as const;
/** The form's rules, and "no_training": no session at all, set only through an athlete's availability (lib/availability). */
export type RestrictionRuleKind = (typeof RESTRICTION_RULES)[number] | "no_training";

export type RestrictionRule =
  | { rule: "no_kind"; blockKinds: BlockKind[] }
  | { rule: "max_intensity"; maxPct: number }
  | { rule: "contact_cap"; maxContacts: number }
  | { rule: "no_training" };

export type Restriction = RestrictionRule & {
  id: number;
  athleteId: number;
  /** First day it applies, YYYY-MM-DD (team zone). */
  startsOn: string;
  /** Last day it applies; null = until the medical staff lift it. */
  endsOn: string | null;
  /** Lifted early: days from this one on are free again. */
  liftedOn: string | null;
  /** The medical staff's words: why, and what is still fine. */
  note: string;
  setByName: string;
};

/** A session as the check sees it: whose, which day, and what its blocks prescribe. */
export type RestrictedSession = { athleteId: number; date: string; status?: string; blocks: readonly BlockInput[] };

export type RestrictionHit = {
  restrictionId: number;
  athleteId: number;
  date: string;
  /** The restriction in a few words ("No max velocity until Fri 18 Dec"). */
  rule: string;
  /** What in the session breaks it ("Flying 30s: max velocity"). */
  detail: string;
  /** The medical staff's note and who set it, so the coach reads why before overriding. */
  note: string;
  setByName: string;
};

export const RESTRICTION_RULE_LABEL: Record<RestrictionRuleKind, string> = {
  no_kind: "Leave out block kinds",
  max_intensity: "Cap running intensity",
  contact_cap: "Cap ground contacts per session",
  no_training: "No training",
};

/** The last day the restriction applies, or null when it is open-ended. */
export function lastDay(r: Pick<Restriction, "endsOn" | "liftedOn">): string | null {
  const beforeLift = r.liftedOn ? addDays(r.liftedOn, -1) : null;
  if (r.endsOn && beforeLift) return r.endsOn < beforeLift ? r.endsOn : beforeLift;
  return r.endsOn ?? beforeLift;
}

export function isActiveOn(r: Pick<Restriction, "startsOn" | "endsOn" | "liftedOn">, date: string): boolean {
  const last = lastDay(r);
  return r.startsOn <= date && (last === null || date <= last);
}

/** Active on `date` or later: what a coach planning from `date` still has to respect. */
export function isCurrent(r: Pick<Restriction, "startsOn" | "endsOn" | "liftedOn">, date: string): boolean {
  const last = lastDay(r);
  return last === null || (date <= last && r.startsOn <= last);
}

function kindList(kinds: readonly BlockKind[]): string {
  const words = kinds.map((k) => BLOCK_KIND_LABEL[k].toLowerCase());
  return words.length <= 1 ? (words[0] ?? "") : `${words.slice(0, -1).join(", ")} or ${words.at(-1)}`;
}

/** The rule alone: "No max velocity", "Running at most 85% of vmax", "At most 60 contacts per session". */
function describeRule(r: RestrictionRule): string {
  switch (r.rule) {
    case "no_kind": {
      const text = kindList(r.blockKinds);
      return `No ${text}`;
    }
    case "max_intensity":
      return `Running at most ${formatNumber(r.maxPct)}% of vmax`;
    case "contact_cap":
      return `At most ${formatNumber(r.maxContacts)} ground contacts per session`;
    case "no_training":
      return "No training (unavailable)";
  }
}

/** The rule with its dates: "No max velocity, Mon 7 Dec – Fri 18 Dec" or "… from Mon 7 Dec, until lifted". */
export function describeRestriction(r: Restriction): string {
  const last = lastDay(r);
  const from = formatDayLabel(r.startsOn);
  const span =
    last === null
      ? `from ${from}, until lifted`
      : last < r.startsOn
        ? "lifted before it began"
        : `${from} – ${formatDayLabel(last)}`;
  return `${describeRule(r)}, ${span}`;
}

function contactsOf(block: BlockInput): number {
  if (!DRILL_KINDS.includes(block.kind) || !block.drills) return 0;
  return drillContacts(block.drills);
}

/** What in one session breaks one rule; an empty list when nothing does. */
export function ruleBreaches(r: RestrictionRule, blocks: readonly BlockInput[]): string[] {
  switch (r.rule) {
    case "no_kind":
      return blocks
        .filter((b) => r.blockKinds.includes(b.kind))
        .map((b) => `${b.title}: ${BLOCK_KIND_LABEL[b.kind].toLowerCase()}`);
    case "max_intensity":
      return blocks
        .filter((b) => RUNNING_KINDS.includes(b.kind) && b.running && b.running.intensityPct > r.maxPct)
        .map((b) => `${b.title}: ${formatNumber(b.running!.intensityPct)}% of vmax`);
    case "contact_cap": {
      const total = blocks.reduce((t, b) => t + contactsOf(b), 0);
      return total > r.maxContacts ? [`${formatNumber(total)} ground contacts in the session`] : [];
    }
    case "no_training":
      return blocks.map((b) => `${b.title}: ${BLOCK_KIND_LABEL[b.kind].toLowerCase()}`);
  }
}

/** Every restriction of the session's athlete, active on its day, that the session breaks. Cancelled sessions break none. */
export function restrictionHits(restrictions: readonly Restriction[], session: RestrictedSession): RestrictionHit[] {
  if (session.status === "cancelled") return [];
  const hits: RestrictionHit[] = [];
  for (const r of restrictions) {
    if (r.athleteId !== session.athleteId || !isActiveOn(r, session.date)) continue;
    const breaches = ruleBreaches(r, session.blocks);
    if (breaches.length === 0) continue;
    hits.push({
      restrictionId: r.id,
      athleteId: r.athleteId,
      date: session.date,
      rule: describeRestriction(r),
      detail: breaches.join("; "),
      note: r.note,
      setByName: r.setByName,
    });
  }
  return hits;
}

/**
 * The hits a change adds: those of the sessions after it that were not already there before (same
 * restriction, same athlete and day). Editing a session that was already let through does not ask again.
 */
export function newHits(before: readonly RestrictionHit[], after: readonly RestrictionHit[]): RestrictionHit[] {
  const known = new Set(before.map((h) => `${h.restrictionId}:${h.athleteId}:${h.date}`));
  return after.filter((h) => !known.has(`${h.restrictionId}:${h.athleteId}:${h.date}`));
}
