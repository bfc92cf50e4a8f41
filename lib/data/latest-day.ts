import "server-only";
import { Op, literal, type WhereOptions } from "sequelize";

/**
 * The rows of a team on each athlete's latest day in `table` (a correlated MAX over its athlete × date index, so the
 * cost does not grow with history); `alias` is the model name Sequelize gives the outer table.
 */
export function latestDayWhere({
  teamId,
  athleteIds,
  table,
  alias,
}: {
  teamId: number;
  athleteIds?: readonly number[];
  table: "pain_reports" | "check_ins";
  alias: string;
}): WhereOptions {
  const latest = `(SELECT MAX(x.date) FROM ${table} x WHERE x.athlete_id = "${alias}"."athlete_id")`;
  return {
    teamId,
    ...(athleteIds ? { athleteId: { [Op.in]: [...athleteIds] } } : {}),
    [Op.and]: [literal(`"${alias}"."date" = ${latest}`)],
  };
}
