import "server-only";
import { Op, type Transaction } from "sequelize";
import { toBlockInput } from "@/lib/plan/blocks";
import { overrideKey, sessionConflicts, type SessionConflict } from "@/lib/restrictions/conflicts";
import type { Restriction } from "@/lib/restrictions/rules";
import { db } from "@/models";
import { loadSessions } from "./plan-rows";
import { listRestrictions } from "./restrictions";

/**
 * Planned and published sessions from `from` on that break a current restriction of their athlete (those the
 * coach planned past with a reason left out). `restrictions` narrows the check to those (a restriction just set).
 */
export async function listSessionConflicts({
  teamId,
  athleteIds,
  from,
  restrictions,
  transaction,
}: {
  teamId: number;
  athleteIds?: readonly number[];
  from: string;
  restrictions?: readonly Restriction[];
  transaction?: Transaction;
}): Promise<SessionConflict[]> {
  const rules = restrictions ?? (await listRestrictions({ teamId, athleteIds, from, transaction }));
  if (rules.length === 0) return [];
  const limited = [...new Set(rules.map((r) => r.athleteId))];
  const sessions = await loadSessions(
    { teamId, athleteId: { [Op.in]: limited }, date: { [Op.gte]: from }, status: { [Op.ne]: "cancelled" } },
    transaction,
  );
  if (sessions.length === 0) return [];
  const { RestrictionOverride } = await db();
  const overrides = await RestrictionOverride.findAll({
    where: { restrictionId: { [Op.in]: rules.map((r) => r.id) }, sessionId: { [Op.ne]: null } },
    attributes: ["restrictionId", "sessionId"],
    transaction,
  });
  const overridden = new Set(overrides.map((o) => overrideKey(o.restrictionId, o.sessionId!)));
  return sessionConflicts(
    rules,
    sessions.map(({ dto }) => ({
      id: dto.id,
      athleteId: dto.athleteId,
      date: dto.date,
      status: dto.status,
      title: dto.title,
      blocks: dto.blocks.map(toBlockInput),
    })),
    overridden,
  );
}

/**
 * The athlete's published sessions from `from` on that the medical staff's later change conflicts with, each with
 * the restriction in words: what the athlete's screens mark "changed by your medical staff: check with your coach".
 */
export async function medicalChangesFor({
  teamId,
  athleteId,
  from,
}: {
  teamId: number;
  athleteId: number;
  from: string;
}): Promise<Map<number, string[]>> {
  const out = new Map<number, string[]>();
  for (const c of await listSessionConflicts({ teamId, athleteIds: [athleteId], from })) {
    if (c.status !== "published") continue;
    out.set(c.sessionId, [...(out.get(c.sessionId) ?? []), c.rule]);
  }
  return out;
}
