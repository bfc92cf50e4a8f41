import {
  DataTypes,
  Model,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { Athlete } from "./athlete";

/**
 * One athlete × day of the load ledger (migration 011, lib/load/README.md §12). Each value set is six
 * little-endian doubles in lib/load METRICS order; lib/data/ledger.ts reads and writes the rows with plain SQL.
 */
export class LoadLedgerDay extends Model<InferAttributes<LoadLedgerDay>, InferCreationAttributes<LoadLedgerDay>> {
  declare athleteId: ForeignKey<Athlete["id"]>;
  declare day: number;
  declare flags: number;
  declare onRecord: number;
  declare kept: number;
  declare past: Buffer;
  declare today: Buffer;
  declare ahead: Buffer;
  declare planned: Buffer;
  declare cum: Buffer;
  declare acute: Buffer;
  declare chronic: Buffer;
  declare ratio: Buffer;

  static initModel(sequelize: Sequelize) {
    const blob = { type: DataTypes.BLOB, allowNull: false };
    LoadLedgerDay.init(
      {
        athleteId: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
        day: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
        flags: { type: DataTypes.INTEGER, allowNull: false },
        onRecord: { type: DataTypes.INTEGER, allowNull: false },
        kept: { type: DataTypes.INTEGER, allowNull: false },
        past: blob,
        today: blob,
        ahead: blob,
        planned: blob,
        cum: blob,
        acute: blob,
        chronic: blob,
        ratio: blob,
      },
      { sequelize, tableName: "load_ledger", underscored: true, timestamps: false },
    );
  }
}
