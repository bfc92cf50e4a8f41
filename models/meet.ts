import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { MeetPriority } from "@/lib/domain/season";
import type { Athlete } from "./athlete";
import type { Team } from "./team";
import type { TrainingGroup } from "./training-group";

/** A competition on the calendar: the whole team, one group (groupId) or one athlete (athleteId). */
export class Meet extends Model<InferAttributes<Meet>, InferCreationAttributes<Meet>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare groupId: ForeignKey<TrainingGroup["id"]> | null;
  declare athleteId: ForeignKey<Athlete["id"]> | null;
  declare name: string;
  declare date: string;
  declare priority: MeetPriority;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Meet.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        teamId: { type: DataTypes.INTEGER, allowNull: false },
        groupId: { type: DataTypes.INTEGER, allowNull: true },
        athleteId: { type: DataTypes.INTEGER, allowNull: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        date: { type: DataTypes.DATEONLY, allowNull: false },
        priority: { type: DataTypes.STRING(1), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "meets", underscored: true },
    );
  }
}
