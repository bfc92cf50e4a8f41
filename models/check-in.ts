import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { Athlete } from "./athlete";
import type { Team } from "./team";

/** One athlete's daily check-in: five items 1–5, 5 the best (lib/domain/wellbeing.ts CHECK_IN_SCALE). */
export class CheckIn extends Model<InferAttributes<CheckIn>, InferCreationAttributes<CheckIn>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare athleteId: ForeignKey<Athlete["id"]>;
  declare date: string;
  declare sleep: number;
  declare fatigue: number;
  declare soreness: number;
  declare stress: number;
  declare mood: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    // A fresh object per column: Sequelize keeps (and changes) the definition object it is given.
    const item = () => ({ type: DataTypes.INTEGER, allowNull: false });
    CheckIn.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        date: { type: DataTypes.DATEONLY, allowNull: false },
        sleep: item(),
        fatigue: item(),
        soreness: item(),
        stress: item(),
        mood: item(),
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "check_ins", underscored: true },
    );
  }
}
