// Scales one session's volume by a factor for a generated draft week, keeping intensity: distances, % of vmax,
// starts and rests stay; the number of reps (or sets) and the minutes change. Pure.
import { blockKindRules } from "@/lib/load/block-kinds";
import type { PlyoDrill, RunningPrescription } from "@/lib/load/types";

/** What scaling reads of a block: plan blocks, engine blocks and stored blocks all fit. */
export type ScalableBlock = { kind: string; running?: RunningPrescription | null; drills?: PlyoDrill[] | null };

export type DraftSession<B extends ScalableBlock = ScalableBlock> = {
  /** Days from the week's first day (0–6). */
  dayOffset: number;
  startTime: string;
  durationMin: number;
  title: string;
  plannedRpe: number;
  notes: string | null;
  blocks: B[];
};

/** Shortest session a scaled week proposes: below this the warm-up alone does not fit (common practice). */
const MIN_SESSION_MIN = 20;

/**
 * Sets × reps scaled to the nearest whole count (at least one rep); the larger of the two carries the change so
 * that 4 × 1 can still become 5 × 1.
 */
export function scaleCounts(sets: number, reps: number, factor: number): { sets: number; reps: number } {
  const total = Math.max(1, Math.round(sets * reps * factor));
  if (reps >= sets) return { sets, reps: Math.max(1, Math.round(total / sets)) };
  return { sets: Math.max(1, Math.round(total / reps)), reps };
}

function scaleRunning(running: RunningPrescription, factor: number): RunningPrescription {
  return { ...running, ...scaleCounts(running.sets, running.reps, factor) };
}

function scaleDrill(drill: PlyoDrill, factor: number): PlyoDrill {
  return { ...drill, ...scaleCounts(drill.sets, drill.reps, factor) };
}

function scaleBlock<B extends ScalableBlock>(block: B, factor: number): B {
  const rules = blockKindRules(block.kind);
  if (rules?.carries === "running" && block.running) return { ...block, running: scaleRunning(block.running, factor) };
  if (rules?.carries === "drills" && block.drills)
    return { ...block, drills: block.drills.map((d) => scaleDrill(d, factor)) };
  return block;
}

/** Minutes scale with the volume (sRPE = RPE × minutes), rounded to 5 and never under MIN_SESSION_MIN. */
export function scaleMinutes(durationMin: number, factor: number): number {
  const scaled = Math.round((durationMin * factor) / 5) * 5;
  return Math.max(Math.min(durationMin, MIN_SESSION_MIN), scaled);
}

export function scaleSession<B extends ScalableBlock>(session: DraftSession<B>, factor: number): DraftSession<B> {
  if (factor === 1) return session;
  return {
    ...session,
    durationMin: scaleMinutes(session.durationMin, factor),
    blocks: session.blocks.map((b) => scaleBlock(b, factor)),
  };
}
