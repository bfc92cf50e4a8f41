import "server-only";
import { Op, type Transaction } from "sequelize";
import type { Availability } from "@/lib/availability/levels";
import { db, type AthleteAvailability as AvailabilityRow } from "@/models";
import { userNames } from "./users";

function toAvailability(row: AvailabilityRow, names: ReadonlyMap<number, string>): Availability {
  return {
    id: row.id,
    athleteId: row.athleteId,
    level: row.level,
    startsOn: row.startsOn,
    returnOn: row.returnOn,
    note: row.note,
    setByName: row.createdBy ? (names.get(row.createdBy) ?? "Medical staff") : "Medical staff",
    createdAt: row.createdAt.toISOString(),
  };
}

/** The newest availability setting of each athlete asked for (athletes never set are missing: full training). */
export async function currentAvailability({
  teamId,
  athleteIds,
  transaction,
}: {
  teamId: number;
  athleteIds?: readonly number[];
  transaction?: Transaction;
}): Promise<Map<number, Availability & { restrictionId: number | null }>> {
  const { AthleteAvailability } = await db();
  const rows = await AthleteAvailability.findAll({
    where: { teamId, ...(athleteIds ? { athleteId: { [Op.in]: [...athleteIds] } } : {}) },
    order: [["id", "DESC"]],
    transaction,
  });
  const newest = new Map<number, AvailabilityRow>();
  for (const r of rows) if (!newest.has(r.athleteId)) newest.set(r.athleteId, r);
  const names = await userNames(
    [...newest.values()].map((r) => r.createdBy),
    transaction,
  );
  return new Map([...newest].map(([id, r]) => [id, { ...toAvailability(r, names), restrictionId: r.restrictionId }]));
}

export async function insertAvailability({
  transaction,
  ...values
}: {
  transaction: Transaction;
  teamId: number;
  athleteId: number;
  level: Availability["level"];
  startsOn: string;
  returnOn: string | null;
  note: string;
  restrictionId: number | null;
  createdBy: number;
}): Promise<Availability> {
  const { AthleteAvailability } = await db();
  const row = await AthleteAvailability.create(values, { transaction });
  return toAvailability(row, await userNames([values.createdBy], transaction));
}
