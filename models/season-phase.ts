import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { SeasonPhaseKind } from "@/lib/domain/season";
import type { Team } from "./team";
import type { TrainingGroup } from "./training-group";

/** A span of the season with a phase kind, a goal and weekly target ranges; the whole team when groupId is null. */
export class SeasonPhase extends Model<InferAttributes<SeasonPhase>, InferCreationAttributes<SeasonPhase>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare groupId: ForeignKey<TrainingGroup["id"]> | null;
  declare kind: SeasonPhaseKind;
  declare name: string;
  declare startsOn: string;
  declare endsOn: string;
  declare goal: string;
  /** JSON text of WeekTargets (lib/season/targets.ts). */
  declare targets: string;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SeasonPhase.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        teamId: { type: DataTypes.INTEGER, allowNull: false },
        groupId: { type: DataTypes.INTEGER, allowNull: true },
        kind: { type: DataTypes.STRING(24), allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: false },
        startsOn: { type: DataTypes.DATEONLY, allowNull: false },
        endsOn: { type: DataTypes.DATEONLY, allowNull: false },
        goal: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
        targets: { type: DataTypes.TEXT, allowNull: false, defaultValue: "{}" },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "season_phases", underscored: true },
    );
  }
}
