import "server-only";
import { Op, literal, type WhereOptions } from "sequelize";

/**
 * The rows of a team on each athlete's latest day in `table` (a correlated MAX over its athlete × date index, so the
 * cost does not grow with history). The outer table's alias is `model.name`, read at run time: Sequelize names the
 * main table after the model's class, which the production bundle minifies, so a name spelled here would match
 * under vitest and fail under `next start` ("no such column: PainReport.date").
 */
export function latestDayWhere({
  teamId,
  athleteIds,
  table,
  model,
}: {
  teamId: number;
  athleteIds?: readonly number[];
  table: "pain_reports" | "check_ins";
  model: { name: string };
}): WhereOptions {
  const alias = model.name.replaceAll('"', '""');
  const latest = `(SELECT MAX(x.date) FROM ${table} x WHERE x.athlete_id = "${alias}"."athlete_id")`;
  return {
    teamId,
    ...(athleteIds ? { athleteId: { [Op.in]: [...athleteIds] } } : {}),
    [Op.and]: [literal(`"${alias}"."date" = ${latest}`)],
  };
}
