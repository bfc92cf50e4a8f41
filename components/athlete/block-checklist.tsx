"use client";

import { Input } from "@/components/ui/field";
import { prescribedReps } from "@/lib/load/block-metrics";
import type { BlockInput } from "@/lib/load/types";

export type BlockDone = { ticked: boolean; reps: number };

/** Blocks with reps to count (running sets × reps, plyometric reps across drills), keyed by block id. */
export function countableBlocks(blocks: readonly BlockInput[]): { id: string; title: string; prescribed: number }[] {
  return blocks.flatMap((b) => {
    const prescribed = prescribedReps(b);
    return b.id !== undefined && prescribed > 0 ? [{ id: b.id, title: b.title, prescribed }] : [];
  });
}

/** Pre-filled from the plan (every block done in full), or from a saved log's per-block reps. */
export function initialDone(
  blocks: readonly BlockInput[],
  logged: Record<string, number> | null | undefined,
): Record<string, BlockDone> {
  const out: Record<string, BlockDone> = {};
  for (const b of countableBlocks(blocks)) {
    const reps = logged && Object.prototype.hasOwnProperty.call(logged, b.id) ? logged[b.id] : b.prescribed;
    out[b.id] = { ticked: reps > 0, reps: reps > 0 ? reps : b.prescribed };
  }
  return out;
}

/** The log's per-block reps: a block left unticked counts 0 reps. */
export function completedRepsOf(done: Record<string, BlockDone>): Record<string, number> {
  const out: Record<string, number> = {};
  for (const [id, d] of Object.entries(done)) out[id] = d.ticked ? d.reps : 0;
  return out;
}

/** Tick the blocks done and, where fewer reps were run, say how many (phone-sized targets). */
export function BlockChecklist({
  sessionId,
  blocks,
  done,
  onChange,
  errors,
}: {
  sessionId: number;
  blocks: readonly BlockInput[];
  done: Record<string, BlockDone>;
  onChange: (next: Record<string, BlockDone>) => void;
  errors: Record<string, string>;
}) {
  const list = countableBlocks(blocks);
  if (list.length === 0) return null;
  const set = (id: string, patch: Partial<BlockDone>) => onChange({ ...done, [id]: { ...done[id], ...patch } });
  return (
    <fieldset data-testid="log-blocks">
      <legend className="text-sm font-medium text-ink-800">Which parts did you do?</legend>
      <p className="text-xs text-ink-500">Untick what you skipped; change the reps if you did fewer (or more).</p>
      <ul className="mt-2 space-y-2">
        {list.map((b) => {
          const d = done[b.id] ?? { ticked: true, reps: b.prescribed };
          const repsId = `log-${sessionId}-reps-${b.id}`;
          const error = errors[`completedReps.${b.id}`];
          return (
            <li
              key={b.id}
              className="rounded-lg bg-paper-raised px-3 py-2 ring-1 ring-ink-200 ring-inset"
              data-testid="log-block"
              data-block-id={b.id}
            >
              <div className="flex items-center gap-3">
                <label className="flex min-h-11 flex-1 cursor-pointer items-center gap-2 text-sm text-ink-800">
                  <input
                    type="checkbox"
                    checked={d.ticked}
                    onChange={(e) => set(b.id, { ticked: e.target.checked })}
                    className="h-5 w-5 accent-lane-600"
                    data-testid="log-block-done"
                  />
                  {b.title}
                </label>
                {d.ticked ? (
                  <label htmlFor={repsId} className="flex items-center gap-1 text-xs text-ink-600">
                    <Input
                      id={repsId}
                      type="number"
                      inputMode="numeric"
                      min={0}
                      max={b.prescribed * 2}
                      value={Number.isFinite(d.reps) ? d.reps : ""}
                      onChange={(e) => set(b.id, { reps: e.target.value === "" ? Number.NaN : Number(e.target.value) })}
                      aria-invalid={Boolean(error)}
                      className="w-16 text-right"
                      data-testid="log-block-reps"
                    />
                    of {b.prescribed} reps
                  </label>
                ) : null}
              </div>
              {error ? (
                <p role="alert" className="mt-1 text-xs font-medium text-form-error">
                  {error}
                </p>
              ) : null}
            </li>
          );
        })}
      </ul>
    </fieldset>
  );
}
