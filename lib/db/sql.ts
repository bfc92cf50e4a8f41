import type { Sequelize } from "sequelize";

/** `SELECT value FROM …` over a JSON array of integers bound as `:name`, in the dialect's own words. */
export function jsonIds(sequelize: Sequelize, name = "ids"): string {
  return sequelize.getDialect() === "postgres"
    ? `SELECT value::int AS value FROM json_array_elements_text(CAST(:${name} AS json))`
    : `SELECT value FROM json_each(:${name})`;
}
