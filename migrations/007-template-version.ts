import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

// Templates get the same optimistic-locking counter as sessions: an edit sends the version it read.

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.addColumn("block_templates", "version", { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  // Native DROP COLUMN (SQLite 3.35+): Sequelize's removeColumn rebuilds the table, and dropping the old copy
  // would run ON DELETE SET NULL on every session block's template link.
  await qi.sequelize.query("ALTER TABLE block_templates DROP COLUMN version");
};
