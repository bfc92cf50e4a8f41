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
import { ROLES, type Role } from "@/lib/auth/roles";
import type { Team } from "./team";
import type { User } from "./user";

export class Membership extends Model<InferAttributes<Membership>, InferCreationAttributes<Membership>> {
  declare id: CreationOptional<number>;
  declare userId: ForeignKey<User["id"]>;
  declare teamId: ForeignKey<Team["id"]>;
  declare role: Role;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // Filled only when a query includes the association (models/index.ts wires them).
  declare team?: NonAttribute<Team>;
  declare user?: NonAttribute<User>;
  declare static associations: {
    team: Association<Membership, Team>;
    user: Association<Membership, User>;
  };

  static initModel(sequelize: Sequelize) {
    Membership.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        role: { type: DataTypes.STRING(20), allowNull: false, validate: { isIn: [[...ROLES]] } },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "memberships", underscored: true },
    );
  }
}
