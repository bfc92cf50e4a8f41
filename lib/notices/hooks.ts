import "server-only";
import type { Transaction } from "sequelize";
import type { BlockInput } from "@/lib/load/types";

/**
 * The seam between plan/log writes and notices (alerts, e-mail, calendar invitations). Writers call these
 * inside the same transaction as their change, so a notice is recorded exactly when the change commits.
 * The notices feature fills these in; until then they record nothing.
 */
export type SessionSnapshot = {
  id: number;
  athleteId: number;
  date: string;
  startTime: string;
  durationMin: number;
  title: string;
  plannedRpe: number;
  status: "draft" | "published" | "cancelled";
  sequence: number;
  updatedAt: Date;
  notes: string | null;
  blocks: BlockInput[];
};

export type SessionChange = {
  kind: "created" | "updated" | "deleted" | "published";
  athleteId: number;
  sessionId: number;
  /** State before the change (null when created). */
  before: SessionSnapshot | null;
  /** State after the change (null when deleted). */
  after: SessionSnapshot | null;
};

export async function afterPlanChange(args: { transaction: Transaction; teamId: number; actorUserId: number; changes: SessionChange[] }): Promise<void> {
  void args;
}

export async function afterLogChange(args: { transaction: Transaction; teamId: number; athleteId: number; sessionId: number; actorUserId: number }): Promise<void> {
  void args;
}
