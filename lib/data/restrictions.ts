import "server-only";
import { Op, type Transaction, type WhereOptions } from "sequelize";
import type { BlockKind } from "@/lib/load/types";
import type { Restriction } from "@/lib/restrictions/rules";
import { db, type Restriction as RestrictionRow } from "@/models";

async function userNames(ids: Array<number | null>, transaction?: Transaction): Promise<Map<number, string>> {
  const { User } = await db();
  const wanted = [...new Set(ids.filter((id): id is number => id !== null))];
  if (wanted.length === 0) return new Map();
  const users = await User.findAll({ where: { id: { [Op.in]: wanted } }, attributes: ["id", "name"], transaction });
  return new Map(users.map((u) => [u.id, u.name]));
}

/** A stored row in the shape lib/restrictions/rules.ts checks. */
export function toRestriction(row: RestrictionRow, names: ReadonlyMap<number, string>): Restriction {
  const base = {
    id: row.id,
    athleteId: row.athleteId,
    startsOn: row.startsOn,
    endsOn: row.endsOn,
    liftedOn: row.liftedOn,
    note: row.note,
    setByName: row.createdBy ? (names.get(row.createdBy) ?? "Medical staff") : "Medical staff",
  };
  if (row.rule === "no_kind") return { ...base, rule: "no_kind", blockKinds: JSON.parse(row.blockKinds ?? "[]") as BlockKind[] };
  if (row.rule === "max_intensity") return { ...base, rule: "max_intensity", maxPct: row.limitValue ?? 100 };
  return { ...base, rule: "contact_cap", maxContacts: row.limitValue ?? 0 };
}

/**
 * Restrictions of a team (or some of its athletes) that still apply on or after `from`, oldest first.
 * Without `from`, every restriction ever set, lifted ones included.
 */
export async function listRestrictions({ teamId, athleteIds, from, transaction }: { teamId: number; athleteIds?: readonly number[]; from?: string; transaction?: Transaction }): Promise<Restriction[]> {
  const { Restriction } = await db();
  const where: WhereOptions = { teamId };
  if (athleteIds) Object.assign(where, { athleteId: { [Op.in]: [...athleteIds] } });
  if (from) {
    Object.assign(where, {
      [Op.and]: [{ [Op.or]: [{ endsOn: null }, { endsOn: { [Op.gte]: from } }] }, { [Op.or]: [{ liftedOn: null }, { liftedOn: { [Op.gt]: from } }] }],
    });
  }
  const rows = await Restriction.findAll({ where, order: [["startsOn", "ASC"], ["id", "ASC"]], transaction });
  const names = await userNames(rows.map((r) => r.createdBy), transaction);
  return rows.map((r) => toRestriction(r, names));
}
