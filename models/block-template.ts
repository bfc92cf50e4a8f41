import {
  DataTypes,
  Model,
  type Association,
  type CreationOptional,
  type ForeignKey,
  type HasManyGetAssociationsMixin,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { BlockKind, PlyoDrill, RunningPrescription } from "@/lib/load/types";
import type { Team } from "./team";
import type { SessionBlock } from "./session-block";

/** A team's reusable block; dropping it on the week grid copies it into a SessionBlock. */
export class BlockTemplate extends Model<InferAttributes<BlockTemplate>, InferCreationAttributes<BlockTemplate>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare kind: BlockKind;
  declare title: string;
  declare running: RunningPrescription | null;
  declare drills: PlyoDrill[] | null;
  declare notes: string | null;
  /** Suggested session duration and RPE when the template starts a new session. */
  declare durationMin: number;
  declare plannedRpe: number;
  /** Optimistic-locking counter, as on sessions: every edit must send the version it read. */
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // Filled only when a query includes the association (models/index.ts wires them).
  declare team?: NonAttribute<Team>;
  declare copies?: NonAttribute<SessionBlock[]>;
  declare getCopies: HasManyGetAssociationsMixin<SessionBlock>;
  declare static associations: {
    team: Association<BlockTemplate, Team>;
    copies: Association<BlockTemplate, SessionBlock>;
  };

  static initModel(sequelize: Sequelize) {
    BlockTemplate.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        title: { type: DataTypes.STRING(120), allowNull: false },
        running: { type: DataTypes.JSON, allowNull: true },
        drills: { type: DataTypes.JSON, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: true },
        durationMin: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 60 },
        plannedRpe: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 5 },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "block_templates", underscored: true },
    );
  }
}
