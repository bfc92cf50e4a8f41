import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { PlannedSession } from "./planned-session";
import type { Team } from "./team";

/** One message in a session's thread: the athlete and their coaches and physio answering each other. */
export class SessionMessage extends Model<InferAttributes<SessionMessage>, InferCreationAttributes<SessionMessage>> {
  declare id: CreationOptional<number>;
  declare teamId: Team["id"];
  declare sessionId: PlannedSession["id"];
  declare userId: number | null;
  declare body: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SessionMessage.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        teamId: { type: DataTypes.INTEGER, allowNull: false },
        sessionId: { type: DataTypes.INTEGER, allowNull: false },
        userId: { type: DataTypes.INTEGER, allowNull: true },
        body: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "session_messages", underscored: true },
    );
  }
}
