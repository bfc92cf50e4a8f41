import "server-only";
import { Op, type Transaction } from "sequelize";
import { CHECK_IN_ITEMS, type CheckInItem } from "@/lib/domain/wellbeing";
import { latestDayWhere } from "./latest-day";
import { db, type CheckIn } from "@/models";

export type CheckInScores = Record<CheckInItem, number>;

/** One day's check-in: the five items (1–5, 5 the best) and their sum (5–25). */
export type CheckInDto = CheckInScores & {
  id: number;
  athleteId: number;
  date: string;
  total: number;
  updatedAt: string;
};

const FIELDS = ["id", "athleteId", "date", ...CHECK_IN_ITEMS, "updatedAt"] as const;

function toDto(r: CheckIn): CheckInDto {
  const scores = Object.fromEntries(CHECK_IN_ITEMS.map((k) => [k, r[k]])) as CheckInScores;
  return {
    id: r.id,
    athleteId: r.athleteId,
    date: String(r.date).slice(0, 10),
    ...scores,
    total: CHECK_IN_ITEMS.reduce((sum, k) => sum + r[k], 0),
    updatedAt: r.updatedAt.toISOString(),
  };
}

/** Each athlete's most recent check-in, for the squad's status; athletes who never checked in are absent. */
export async function latestCheckInByAthlete({
  teamId,
  athleteIds,
  transaction,
}: {
  teamId: number;
  athleteIds?: readonly number[];
  transaction?: Transaction;
}): Promise<Map<number, CheckInDto>> {
  const { CheckIn } = await db();
  const where = latestDayWhere({ teamId, athleteIds, table: "check_ins", model: CheckIn });
  const rows = await CheckIn.findAll({ where, attributes: [...FIELDS], transaction });
  return new Map(rows.map((r) => [r.athleteId, toDto(r)]));
}

/** One athlete's check-ins between two days (inclusive), oldest first (the trend). */
export async function listCheckIns({
  athleteId,
  from,
  to,
}: {
  athleteId: number;
  from: string;
  to: string;
}): Promise<CheckInDto[]> {
  const { CheckIn } = await db();
  const rows = await CheckIn.findAll({
    where: { athleteId, date: { [Op.between]: [from, to] } },
    attributes: [...FIELDS],
    order: [["date", "ASC"]],
  });
  return rows.map(toDto);
}

/** Creates or replaces the athlete's check-in of one day. */
export async function writeCheckIn({
  teamId,
  athleteId,
  date,
  scores,
  transaction,
}: {
  teamId: number;
  athleteId: number;
  date: string;
  scores: CheckInScores;
  transaction: Transaction;
}): Promise<CheckInDto> {
  const { CheckIn } = await db();
  const existing = await CheckIn.findOne({ where: { athleteId, date }, transaction });
  if (existing) return toDto(await existing.update(scores, { transaction }));
  return toDto(await CheckIn.create({ teamId, athleteId, date, ...scores }, { transaction }));
}
