import { blockFromTemplate, sessionFieldsFromTemplate, sortSessions } from "./blocks";
import type { PlanChange } from "./drop";
import { findSession } from "./drop";
import type { PlanAthlete, PlanBlock, PlanSession, PlanTemplate, PlanWeek } from "./types";

/** Hands out ids for not-yet-saved sessions and blocks; negative so they never meet a stored id. */
export type TempIds = () => number;

export function tempIdCounter(start = -1): TempIds {
  let next = start;
  return () => next--;
}

function newBlock(t: PlanTemplate, position: number, tempId: TempIds): PlanBlock {
  const b = blockFromTemplate(t);
  return {
    id: tempId(),
    templateId: t.id,
    position,
    kind: b.kind,
    title: b.title,
    running: b.running,
    drills: b.drills,
    notes: b.notes,
  };
}

function draft(
  fields: Omit<PlanSession, "id" | "status" | "version" | "sequence" | "publishedAt" | "logged" | "notes"> & {
    notes?: string | null;
  },
  tempId: TempIds,
): PlanSession {
  return {
    notes: null,
    ...fields,
    id: tempId(),
    status: "draft",
    version: 1,
    sequence: 0,
    publishedAt: null,
    logged: false,
  };
}

function fromTemplate(t: PlanTemplate, athleteId: number, date: string, tempId: TempIds): PlanSession {
  const s = draft({ athleteId, date, ...sessionFieldsFromTemplate(t), blocks: [] }, tempId);
  return { ...s, blocks: [newBlock(t, 0, tempId)] };
}

function withBlock(s: PlanSession, t: PlanTemplate, tempId: TempIds): PlanSession {
  const position = s.blocks.reduce((max, b) => Math.max(max, b.position + 1), 0);
  return { ...s, blocks: [...s.blocks, newBlock(t, position, tempId)] };
}

/** Athletes whose row a change touches. */
export function affectedAthletes(week: PlanWeek, change: PlanChange): number[] {
  switch (change.kind) {
    case "group":
      return change.targets.map((t) => t.athleteId);
    case "move":
      return change.fromAthleteId === change.athleteId ? [change.athleteId] : [change.fromAthleteId, change.athleteId];
    case "copy":
      return [change.athleteId];
    default:
      return week.athletes.some((a) => a.id === change.athleteId) ? [change.athleteId] : [];
  }
}

/** The week's sessions per athlete after the change, for the athletes it touches only. */
export function sessionsAfter(week: PlanWeek, change: PlanChange, tempId: TempIds): Map<number, PlanSession[]> {
  const out = new Map<number, PlanSession[]>();
  const current = (id: number) => out.get(id) ?? week.athletes.find((a) => a.id === id)?.sessions ?? [];
  const template = "templateId" in change ? week.templates.find((t) => t.id === change.templateId) : undefined;
  switch (change.kind) {
    case "create":
      if (template)
        out.set(change.athleteId, [
          ...current(change.athleteId),
          fromTemplate(template, change.athleteId, change.date, tempId),
        ]);
      break;
    case "add-block":
      if (template)
        out.set(
          change.athleteId,
          current(change.athleteId).map((s) => (s.id === change.sessionId ? withBlock(s, template, tempId) : s)),
        );
      break;
    case "group":
      if (!template) break;
      for (const t of change.targets) {
        const list = current(t.athleteId);
        out.set(
          t.athleteId,
          t.sessionId === null
            ? [...list, fromTemplate(template, t.athleteId, change.date, tempId)]
            : list.map((s) => (s.id === t.sessionId ? withBlock(s, template, tempId) : s)),
        );
      }
      break;
    case "move": {
      const s = findSession(week, change.sessionId);
      if (!s) break;
      out.set(
        change.fromAthleteId,
        current(change.fromAthleteId).filter((x) => x.id !== s.id),
      );
      out.set(change.athleteId, [
        ...current(change.athleteId),
        { ...s, athleteId: change.athleteId, date: change.date },
      ]);
      break;
    }
    case "copy": {
      const s = findSession(week, change.sessionId);
      if (!s) break;
      const copy = draft(
        { ...s, athleteId: change.athleteId, date: change.date, blocks: s.blocks.map((b) => ({ ...b, id: tempId() })) },
        tempId,
      );
      out.set(change.athleteId, [...current(change.athleteId), copy]);
      break;
    }
  }
  for (const [id, list] of out) out.set(id, sortSessions(list));
  return out;
}

/** Replaces the touched athletes' sessions; untouched rows keep their identity (cheap re-renders). */
function withSessions(
  week: PlanWeek,
  changed: ReadonlyMap<number, PlanSession[]>,
  load?: (a: PlanAthlete, sessions: PlanSession[]) => PlanAthlete["load"],
): PlanWeek {
  if (changed.size === 0) return week;
  const athletes = week.athletes.map((a) => {
    const sessions = changed.get(a.id);
    if (!sessions) return a;
    return { ...a, sessions, load: load ? load(a, sessions) : a.load };
  });
  return { ...week, athletes };
}

/** The week as it would look after the change: what the grid shows while the save is on its way. */
export function applyChange(
  week: PlanWeek,
  change: PlanChange,
  tempId: TempIds,
  load?: (a: PlanAthlete, sessions: PlanSession[]) => PlanAthlete["load"],
): PlanWeek {
  return withSessions(week, sessionsAfter(week, change, tempId), load);
}

/** Puts saved sessions in place of what the grid showed (after a write answers), removing `removedIds`. */
export function mergeSaved(
  week: PlanWeek,
  saved: readonly PlanSession[],
  removedIds: readonly number[],
  replacedIds: readonly number[] = [],
  load?: (a: PlanAthlete, sessions: PlanSession[]) => PlanAthlete["load"],
): PlanWeek {
  const drop = new Set([...removedIds, ...replacedIds, ...saved.map((s) => s.id)]);
  const changed = new Map<number, PlanSession[]>();
  for (const a of week.athletes) {
    const kept = a.sessions.filter((s) => !drop.has(s.id));
    const added = saved.filter((s) => s.athleteId === a.id && week.days.includes(s.date));
    if (kept.length !== a.sessions.length || added.length > 0) changed.set(a.id, sortSessions([...kept, ...added]));
  }
  return withSessions(week, changed, load);
}
