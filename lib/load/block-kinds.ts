// What each block kind means to the load engine, in one table. The engine (accumulate.ts) reads it, as do the
// forms, the plan validation and the restriction rules, so a new kind is decided once, in one place.
// `satisfies Record<BlockKind, BlockKindRules>` makes the compiler refuse a kind without a row.
import type { BlockKind, RecoveryWork } from "./types";

/**
 * A block carries a running prescription, plyometric drills or neither (strength, recovery: only the
 * session's sRPE counts them). `recoveryWork` is the team's recovery-work choice (TeamLoadSettings.recoveryWork)
 * under which this kind makes its session high-intensity for the recovery rule; null: never.
 */
export type BlockKindRules =
  | {
      /** Running metres, HSR and speed-band metres from the running prescription (lib/load/README.md §11). */
      readonly carries: "running";
      /** The timed distance also counts as sprint metres and sprint steps (tempo: sub-maximal, it does not). */
      readonly sprintMetres: boolean;
      /** "max_acceleration" counts only reps at or above the team's maximal line (maximalPct). */
      readonly recoveryWork: Extract<RecoveryWork, "max_velocity" | "max_acceleration" | "speed_endurance"> | null;
    }
  | {
      /** Ground contacts from the drills, by intensity (NSCA). */
      readonly carries: "drills";
      /** "high_plyo": high-intensity drills make the session high-intensity. */
      readonly recoveryWork: Extract<RecoveryWork, "high_plyo"> | null;
    }
  | { readonly carries: "nothing"; readonly recoveryWork: null };

export const BLOCK_KIND_RULES = {
  acceleration: { carries: "running", sprintMetres: true, recoveryWork: "max_acceleration" },
  max_velocity: { carries: "running", sprintMetres: true, recoveryWork: "max_velocity" },
  speed_endurance: { carries: "running", sprintMetres: true, recoveryWork: "speed_endurance" },
  tempo: { carries: "running", sprintMetres: false, recoveryWork: null },
  plyometric: { carries: "drills", recoveryWork: "high_plyo" },
  strength: { carries: "nothing", recoveryWork: null },
  recovery: { carries: "nothing", recoveryWork: null },
} as const satisfies Record<BlockKind, BlockKindRules>;

/** The rules for a stored kind; undefined for a kind the engine does not know (its block counts as nothing). */
export function blockKindRules(kind: string): BlockKindRules | undefined {
  return Object.prototype.hasOwnProperty.call(BLOCK_KIND_RULES, kind) ? BLOCK_KIND_RULES[kind as BlockKind] : undefined;
}

const kindsWhere = (test: (rules: BlockKindRules) => boolean): readonly BlockKind[] =>
  (Object.keys(BLOCK_KIND_RULES) as BlockKind[]).filter((k) => test(BLOCK_KIND_RULES[k]));

/** Kinds whose `running` prescription produces running metres. */
export const RUNNING_KINDS: readonly BlockKind[] = kindsWhere((r) => r.carries === "running");

/** Kinds whose `drills` produce ground contacts. */
export const DRILL_KINDS: readonly BlockKind[] = kindsWhere((r) => r.carries === "drills");
