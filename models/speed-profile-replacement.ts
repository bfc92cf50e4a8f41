import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/** A same-day result an athlete's speed profile no longer uses: what it held and who replaced it (migration 026). */
export class SpeedProfileReplacement extends Model<
  InferAttributes<SpeedProfileReplacement>,
  InferCreationAttributes<SpeedProfileReplacement>
> {
  declare id: CreationOptional<number>;
  declare teamId: number;
  declare athleteId: number;
  declare entryId: number;
  declare effectiveFrom: string;
  declare speedTestId: number | null;
  declare acceptedByUserId: number | null;
  declare acceptedAt: Date;
  /** JSON text of the profile values the entry held. */
  declare values: string;
  declare replacedByUserId: number | null;
  declare replacedAt: Date;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SpeedProfileReplacement.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        teamId: { type: DataTypes.INTEGER, allowNull: false },
        athleteId: { type: DataTypes.INTEGER, allowNull: false },
        entryId: { type: DataTypes.INTEGER, allowNull: false },
        effectiveFrom: { type: DataTypes.DATEONLY, allowNull: false },
        speedTestId: { type: DataTypes.INTEGER, allowNull: true },
        acceptedByUserId: { type: DataTypes.INTEGER, allowNull: true },
        acceptedAt: { type: DataTypes.DATE, allowNull: false },
        values: { type: DataTypes.TEXT, allowNull: false },
        replacedByUserId: { type: DataTypes.INTEGER, allowNull: true },
        replacedAt: { type: DataTypes.DATE, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "speed_profile_replacements", underscored: true },
    );
  }
}
