import type { SessionStatus } from "@/lib/domain/sessions";
import type { BlockInput } from "@/lib/load/types";

/** A planned session as a change saw it (before or after), with its blocks in engine form. */
export type SessionSnapshot = {
  id: number;
  athleteId: number;
  date: string;
  startTime: string;
  durationMin: number;
  title: string;
  plannedRpe: number;
  status: SessionStatus;
  sequence: number;
  updatedAt: Date;
  notes: string | null;
  blocks: BlockInput[];
};

/** One session a plan write created, changed, deleted (or cancelled) or published: what the guard and notices read. */
export type SessionChange = {
  kind: "created" | "updated" | "deleted" | "published";
  athleteId: number;
  sessionId: number;
  /** State before the change (null when created). */
  before: SessionSnapshot | null;
  /** State after the change (null when deleted). */
  after: SessionSnapshot | null;
};

/** A coach's reason to plan past a restriction, sent with the write. */
export type Override = { reason: string };
