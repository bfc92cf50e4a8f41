import {
  DataTypes,
  Model,
  type Association,
  type CreationOptional,
  type HasManyGetAssociationsMixin,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { Membership } from "./membership";
import type { Athlete } from "./athlete";
import type { Invitation } from "./invitation";
import type { NotificationSetting } from "./notification-setting";
import type { AuthSession } from "./auth-session";

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare name: string;
  /** Null until the member accepts the invitation and sets a password. */
  declare passwordHash: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // Filled only when a query includes the association (models/index.ts wires them).
  declare memberships?: NonAttribute<Membership[]>;
  declare athleteProfiles?: NonAttribute<Athlete[]>;
  declare invitations?: NonAttribute<Invitation[]>;
  declare notificationSettings?: NonAttribute<NotificationSetting[]>;
  declare sessions?: NonAttribute<AuthSession[]>;
  declare getMemberships: HasManyGetAssociationsMixin<Membership>;
  declare getAthleteProfiles: HasManyGetAssociationsMixin<Athlete>;
  declare getInvitations: HasManyGetAssociationsMixin<Invitation>;
  declare getNotificationSettings: HasManyGetAssociationsMixin<NotificationSetting>;
  declare getSessions: HasManyGetAssociationsMixin<AuthSession>;
  declare static associations: {
    memberships: Association<User, Membership>;
    athleteProfiles: Association<User, Athlete>;
    invitations: Association<User, Invitation>;
    notificationSettings: Association<User, NotificationSetting>;
    sessions: Association<User, AuthSession>;
  };

  static initModel(sequelize: Sequelize) {
    User.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        email: {
          type: DataTypes.STRING(254),
          allowNull: false,
          unique: true,
          set(value: string) {
            this.setDataValue("email", value.trim().toLowerCase());
          },
        },
        name: { type: DataTypes.STRING(120), allowNull: false },
        passwordHash: { type: DataTypes.STRING(100), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "users", underscored: true },
    );
  }
}
