import {
  DataTypes,
  Model,
  type Association,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { BlockKind, PlyoDrill, RunningPrescription } from "@/lib/load/types";
import type { BlockTemplate } from "./block-template";
import type { PlannedSession } from "./planned-session";

/** A block inside one session: a copy of a template that the coach may edit without touching the template. */
export class SessionBlock extends Model<InferAttributes<SessionBlock>, InferCreationAttributes<SessionBlock>> {
  declare id: CreationOptional<number>;
  declare sessionId: ForeignKey<PlannedSession["id"]>;
  declare templateId: ForeignKey<BlockTemplate["id"]> | null;
  declare position: number;
  declare kind: BlockKind;
  declare title: string;
  declare running: RunningPrescription | null;
  declare drills: PlyoDrill[] | null;
  declare notes: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // Filled only when a query includes the association (models/index.ts wires them).
  declare session?: NonAttribute<PlannedSession>;
  declare template?: NonAttribute<BlockTemplate | null>;
  declare static associations: {
    session: Association<SessionBlock, PlannedSession>;
    template: Association<SessionBlock, BlockTemplate>;
  };

  static initModel(sequelize: Sequelize) {
    SessionBlock.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        title: { type: DataTypes.STRING(120), allowNull: false },
        running: { type: DataTypes.JSON, allowNull: true },
        drills: { type: DataTypes.JSON, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "session_blocks", underscored: true },
    );
  }
}
