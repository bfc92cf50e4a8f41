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
import type { Role } from "@/lib/auth/roles";
import type { Athlete } from "./athlete";
import type { Team } from "./team";
import type { User } from "./user";

/**
 * A one-time link: an invitation to join a team (purpose "invite"), accepted by setting a first password or,
 * for an existing account, by its signed-in owner; or a password reset. Only the token's hash is stored.
 * An invitation is not a membership: the membership is created when it is accepted.
 */
export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare userId: ForeignKey<User["id"]>;
  declare purpose: CreationOptional<"invite" | "reset">;
  /** Invite: the address the inviting team typed (all the team may see until it is accepted). */
  declare email: CreationOptional<string | null>;
  /** Invite: the name the inviting team typed. */
  declare name: CreationOptional<string | null>;
  declare role: CreationOptional<Role | null>;
  /** Invite as an athlete: the team's profile to link on acceptance. */
  declare athleteId: CreationOptional<ForeignKey<Athlete["id"]> | null>;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // Filled only when a query includes the association (models/index.ts wires them).
  declare team?: NonAttribute<Team>;
  declare user?: NonAttribute<User>;
  declare static associations: {
    team: Association<Invitation, Team>;
    user: Association<Invitation, User>;
  };

  static initModel(sequelize: Sequelize) {
    Invitation.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        purpose: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "invite" },
        email: { type: DataTypes.STRING(254), allowNull: true },
        name: { type: DataTypes.STRING(120), allowNull: true },
        role: { type: DataTypes.STRING(20), allowNull: true },
        athleteId: { type: DataTypes.INTEGER, allowNull: true },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        usedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "invitations", underscored: true },
    );
  }
}
