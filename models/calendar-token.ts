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
import type { Team } from "./team";

/** An athlete's calendar-feed secret. Looked up by SHA-256 hash; at most one unrevoked token per athlete. */
export class CalendarToken extends Model<InferAttributes<CalendarToken>, InferCreationAttributes<CalendarToken>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare athleteId: ForeignKey<Athlete["id"]>;
  declare tokenHash: string;
  /** The token sealed with the app secret, so the athlete can copy the link again later. */
  declare tokenSealed: string | null;
  declare createdBy: number | null;
  declare revokedAt: Date | null;
  declare lastUsedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // Filled only when a query includes the association (models/index.ts wires them).
  declare athlete?: NonAttribute<Athlete>;
  declare team?: NonAttribute<Team>;
  declare static associations: {
    athlete: Association<CalendarToken, Athlete>;
    team: Association<CalendarToken, Team>;
  };

  static initModel(sequelize: Sequelize) {
    CalendarToken.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        tokenSealed: { type: DataTypes.TEXT, allowNull: true },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        revokedAt: { type: DataTypes.DATE, allowNull: true },
        lastUsedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "calendar_tokens", underscored: true },
    );
  }
}
