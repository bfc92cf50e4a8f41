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
import type { Athlete } from "./athlete";
import type { Restriction } from "./restriction";
import type { Team } from "./team";

/** A coach planned a session against a restriction, and said why: kept for the medical staff. */
export class RestrictionOverride extends Model<
  InferAttributes<RestrictionOverride>,
  InferCreationAttributes<RestrictionOverride>
> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare restrictionId: ForeignKey<Restriction["id"]>;
  declare athleteId: ForeignKey<Athlete["id"]>;
  declare sessionId: number | null;
  declare sessionDate: string;
  /** What in the session broke the rule, as shown to the coach. */
  declare detail: string;
  declare reason: string;
  declare userId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // Filled only when a query includes the association (models/index.ts wires them).
  declare restriction?: NonAttribute<Restriction>;
  declare athlete?: NonAttribute<Athlete>;
  declare team?: NonAttribute<Team>;
  declare static associations: {
    restriction: Association<RestrictionOverride, Restriction>;
    athlete: Association<RestrictionOverride, Athlete>;
    team: Association<RestrictionOverride, Team>;
  };

  static initModel(sequelize: Sequelize) {
    RestrictionOverride.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        sessionId: { type: DataTypes.INTEGER, allowNull: true },
        sessionDate: { type: DataTypes.DATEONLY, allowNull: false },
        detail: { type: DataTypes.TEXT, allowNull: false },
        reason: { type: DataTypes.TEXT, allowNull: false },
        userId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "restriction_overrides", underscored: true },
    );
  }
}
