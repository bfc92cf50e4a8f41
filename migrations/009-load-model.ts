import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

// Team choices for the sprint-specific load model: which speed zones drive the flags, what counts as
// high-intensity work for the recovery rule, how a missing log enters the series, and the monotony limit.
const COLUMNS = {
  // "absolute" (m/s lines) | "relative" (% of each athlete's own tested vmax)
  speed_zones: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "absolute" },
  hsr_pct: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 75 },
  sprint_speed_ms: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 7 },
  maximal_pct: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 95 },
  // JSON array of lib/load/types.ts RECOVERY_WORK values
  recovery_work: {
    type: DataTypes.TEXT,
    allowNull: false,
    defaultValue: '["max_velocity","max_acceleration","speed_endurance","high_plyo"]',
  },
  // "estimate" (the plan stands in) | "exclude" (the day is left out)
  missing_logs: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "estimate" },
  monotony_limit: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 2 },
} as const;

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  for (const [name, spec] of Object.entries(COLUMNS)) await qi.addColumn("team_load_settings", name, spec);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  for (const name of Object.keys(COLUMNS).reverse()) await qi.removeColumn("team_load_settings", name);
};
