import { DRILL_KINDS, RUNNING_KINDS } from "@/lib/load/block-kinds";
import type { BlockInput, LogInput, SessionInput } from "@/lib/load/types";
import type { BlockBody } from "@/lib/validations/template";
import type { PlanBlock, PlanSession, PlanTemplate } from "./types";

export type BlockContent = BlockBody & { templateId?: number | null };

/**
 * Keeps only the prescription a kind uses (a form switched from "max velocity" to "strength" may still hold
 * sets and reps) and drops a run-in that only a flying start has. The engine would ignore the leftovers,
 * but a stored block should say exactly what the athlete is asked to do.
 */
export function normaliseBlock<T extends BlockContent>(block: T): T {
  const running =
    RUNNING_KINDS.includes(block.kind) && block.running
      ? { ...block.running, runInM: block.running.start === "flying" ? block.running.runInM : 0 }
      : null;
  const drills = DRILL_KINDS.includes(block.kind) && block.drills && block.drills.length > 0 ? block.drills : null;
  const notes = block.notes?.trim() ? block.notes.trim() : null;
  return { ...block, running, drills, notes };
}

/** A template's content as a new block inside a session. */
export function blockFromTemplate(t: PlanTemplate): BlockContent {
  return { templateId: t.id, kind: t.kind, title: t.title, running: t.running, drills: t.drills, notes: t.notes };
}

/** Default start of a session made from a template. */
const DEFAULT_START_TIME = "16:00";

/** Fields of a new session made by dropping a template: title, duration and RPE come from the template. */
export function sessionFieldsFromTemplate(t: PlanTemplate) {
  return { title: t.title, durationMin: t.durationMin, plannedRpe: t.plannedRpe, startTime: DEFAULT_START_TIME };
}

/** The engine's (and blockSummary's) view of a block, a template or a form's block; the id only when stored. */
export function toBlockInput(
  b: Pick<PlanBlock, "kind" | "title" | "running" | "drills" | "notes"> & { id?: number },
): BlockInput {
  return {
    ...(b.id !== undefined ? { id: String(b.id) } : {}),
    kind: b.kind,
    title: b.title,
    running: b.running,
    drills: b.drills,
    ...(b.notes ? { notes: b.notes } : {}),
  };
}

/** The engine's view of a planned session (ids as strings, as lib/data/load.ts gives them). */
export function toSessionInput(s: PlanSession): SessionInput {
  return {
    id: String(s.id),
    date: s.date,
    startTime: s.startTime,
    durationMin: s.durationMin,
    plannedRpe: s.plannedRpe,
    status: s.status,
    blocks: s.blocks.map(toBlockInput),
  };
}

/** Logs whose session is among `sessions` (a moved session takes its log along; moving a logged one is refused). */
export function logsFor(logs: readonly LogInput[], sessions: readonly PlanSession[]): LogInput[] {
  const ids = new Set(sessions.map((s) => String(s.id)));
  return logs.filter((l) => ids.has(l.sessionId));
}

/** Sessions in calendar order: date, start time, then id (stable). */
export function sortSessions<T extends Pick<PlanSession, "date" | "startTime" | "id">>(list: T[]): T[] {
  return [...list].sort(
    (a, b) => a.date.localeCompare(b.date) || a.startTime.localeCompare(b.startTime) || a.id - b.id,
  );
}
