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
import type { AlertEmailMode } from "@/lib/domain/alerts";
import type { Team } from "./team";
import type { User } from "./user";

/** How one member hears about load alerts in one team. No row = the role's default. */
export class NotificationSetting extends Model<
  InferAttributes<NotificationSetting>,
  InferCreationAttributes<NotificationSetting>
> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare userId: ForeignKey<User["id"]>;
  declare alertEmail: AlertEmailMode;
  declare lastDigestAt: Date | null;
  /** Alerts created after this count as unread for the member. */
  declare alertsSeenAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // Filled only when a query includes the association (models/index.ts wires them).
  declare team?: NonAttribute<Team>;
  declare user?: NonAttribute<User>;
  declare static associations: {
    team: Association<NotificationSetting, Team>;
    user: Association<NotificationSetting, User>;
  };

  static initModel(sequelize: Sequelize) {
    NotificationSetting.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        alertEmail: { type: DataTypes.STRING(10), allowNull: false },
        lastDigestAt: { type: DataTypes.DATE, allowNull: true },
        alertsSeenAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "notification_settings", underscored: true },
    );
  }
}
