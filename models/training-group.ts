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
import type { Team } from "./team";
import type { Athlete } from "./athlete";

export class TrainingGroup extends Model<InferAttributes<TrainingGroup>, InferCreationAttributes<TrainingGroup>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare name: string;
  declare sortOrder: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // Filled only when a query includes the association (models/index.ts wires them).
  declare team?: NonAttribute<Team>;
  declare athletes?: NonAttribute<Athlete[]>;
  declare getAthletes: HasManyGetAssociationsMixin<Athlete>;
  declare static associations: {
    team: Association<TrainingGroup, Team>;
    athletes: Association<TrainingGroup, Athlete>;
  };

  static initModel(sequelize: Sequelize) {
    TrainingGroup.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(80), allowNull: false },
        sortOrder: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "training_groups", underscored: true },
    );
  }
}
