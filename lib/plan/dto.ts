import type { SessionSnapshot } from "./changes";
import type { BlockKind, PlyoDrill, RunningPrescription, SessionStatus } from "@/lib/load/types";
import { toBlockInput } from "./blocks";
import type { PlanBlock, PlanSession, PlanTemplate } from "./types";

// Mapping from plain database rows (model.get({ plain: true })) to the JSON the grid reads.

/** SQLite hands JSON columns back as text on some paths; accept both. */
function jsonValue<T>(value: unknown): T | null {
  if (value === null || value === undefined) return null;
  if (typeof value !== "string") return value as T;
  try {
    return JSON.parse(value) as T;
  } catch {
    return null;
  }
}

type BlockRow = {
  id: number;
  templateId: number | null;
  position: number;
  kind: BlockKind;
  title: string;
  running: unknown;
  drills: unknown;
  notes: string | null;
};

export type SessionRow = {
  id: number;
  athleteId: number;
  date: string;
  startTime: string;
  durationMin: number;
  title: string;
  plannedRpe: number;
  status: SessionStatus;
  notes: string | null;
  version: number;
  sequence: number;
  publishedAt: Date | string | null;
  updatedAt: Date | string;
  blocks?: BlockRow[];
  log?: { id: number } | null;
};

export type TemplateRow = Omit<BlockRow, "templateId" | "position"> & {
  durationMin: number;
  plannedRpe: number;
  version: number;
};

function toPlanBlock(b: BlockRow): PlanBlock {
  return {
    id: b.id,
    templateId: b.templateId ?? null,
    position: b.position,
    kind: b.kind,
    title: b.title,
    running: jsonValue<RunningPrescription>(b.running),
    drills: jsonValue<PlyoDrill[]>(b.drills),
    notes: b.notes ?? null,
  };
}

const iso = (v: Date | string | null) =>
  v === null ? null : typeof v === "string" ? new Date(v).toISOString() : v.toISOString();

export function toPlanSession(s: SessionRow): PlanSession {
  const blocks = (s.blocks ?? []).map(toPlanBlock).sort((a, b) => a.position - b.position || a.id - b.id);
  return {
    id: s.id,
    athleteId: s.athleteId,
    date: String(s.date).slice(0, 10),
    startTime: s.startTime,
    durationMin: Number(s.durationMin),
    title: s.title,
    plannedRpe: Number(s.plannedRpe),
    status: s.status,
    notes: s.notes ?? null,
    version: s.version,
    sequence: s.sequence,
    publishedAt: iso(s.publishedAt),
    logged: Boolean(s.log),
    blocks,
  };
}

export function toPlanTemplate(t: TemplateRow): PlanTemplate {
  return {
    id: t.id,
    kind: t.kind,
    title: t.title,
    running: jsonValue<RunningPrescription>(t.running),
    drills: jsonValue<PlyoDrill[]>(t.drills),
    notes: t.notes ?? null,
    durationMin: Number(t.durationMin),
    plannedRpe: Number(t.plannedRpe),
    version: Number(t.version),
  };
}

/** What notices (alerts, e-mail, calendar invitations) are told about a session at one moment. */
export function toSnapshot(s: PlanSession, updatedAt: Date): SessionSnapshot {
  return {
    id: s.id,
    athleteId: s.athleteId,
    date: s.date,
    startTime: s.startTime,
    durationMin: s.durationMin,
    title: s.title,
    plannedRpe: s.plannedRpe,
    status: s.status,
    sequence: s.sequence,
    updatedAt,
    notes: s.notes,
    blocks: s.blocks.map(toBlockInput),
  };
}
