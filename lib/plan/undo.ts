import type { PlanChange } from "./drop";
import type { PlanSession, PlanWriteResult } from "./types";

/**
 * One step that reverses part of a saved change. Versions are not stored: they are read from the grid when
 * the undo runs, so an older entry still works after later saves touched the same session.
 */
export type UndoOp =
  | { op: "remove"; sessionId: number }
  | { op: "move"; sessionId: number; athleteId: number; date: string }
  | { op: "remove-block"; sessionId: number; blockId: number }
  | { op: "recreate"; session: PlanSession }
  | { op: "reinstate"; sessionId: number }
  | { op: "restore-fields"; sessionId: number; fields: EditableFields };

type EditableFields = Pick<PlanSession, "startTime" | "durationMin" | "title" | "plannedRpe" | "notes" | "blocks">;

export type UndoEntry = { label: string; ops: UndoOp[] };

const UNDO_LIMIT = 20;

export function pushUndo(stack: readonly UndoEntry[], entry: UndoEntry, limit = UNDO_LIMIT): UndoEntry[] {
  if (entry.ops.length === 0) return [...stack];
  return [...stack, entry].slice(-limit);
}

export function popUndo(stack: readonly UndoEntry[]): { entry: UndoEntry | null; rest: UndoEntry[] } {
  if (stack.length === 0) return { entry: null, rest: [] };
  return { entry: stack[stack.length - 1], rest: stack.slice(0, -1) };
}

/** Blocks of `after` that `before` did not have (the ones a drop appended). */
function addedBlockIds(before: PlanSession | undefined, after: PlanSession): number[] {
  const had = new Set((before?.blocks ?? []).map((b) => b.id));
  return after.blocks.filter((b) => !had.has(b.id)).map((b) => b.id);
}

/** How to take back a saved drop, given the sessions as they were and the server's answer. */
export function undoForChange(
  change: PlanChange,
  before: (sessionId: number) => PlanSession | undefined,
  result: PlanWriteResult,
): UndoEntry {
  const ops: UndoOp[] = [];
  switch (change.kind) {
    case "move": {
      ops.push({ op: "move", sessionId: change.sessionId, athleteId: change.fromAthleteId, date: change.fromDate });
      return { label: "move", ops };
    }
    case "create":
    case "copy":
      for (const s of result.sessions) ops.push({ op: "remove", sessionId: s.id });
      return { label: change.kind === "copy" ? "copy" : "new session", ops };
    case "add-block":
    case "group":
      for (const s of result.sessions) {
        const prior = before(s.id);
        if (!prior) ops.push({ op: "remove", sessionId: s.id });
        else for (const blockId of addedBlockIds(prior, s)) ops.push({ op: "remove-block", sessionId: s.id, blockId });
      }
      return { label: change.kind === "group" ? "group drop" : "added block", ops };
  }
}

/** Undo for an edit made in the session editor: put the fields back. */
export function undoForEdit(before: PlanSession): UndoEntry {
  const { startTime, durationMin, title, plannedRpe, notes, blocks } = before;
  return {
    label: "edit",
    ops: [
      {
        op: "restore-fields",
        sessionId: before.id,
        fields: { startTime, durationMin, title, plannedRpe, notes, blocks },
      },
    ],
  };
}

/** Undo for a delete: a removed draft is written again; a cancelled published session is reinstated. */
export function undoForDelete(before: PlanSession, result: PlanWriteResult): UndoEntry {
  if (result.removedIds.includes(before.id)) return { label: "delete", ops: [{ op: "recreate", session: before }] };
  return { label: "cancel", ops: [{ op: "reinstate", sessionId: before.id }] };
}
