import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { LogChangeAction } from "@/lib/domain/wellbeing";
import type { Athlete } from "./athlete";
import type { Team } from "./team";

/** One change to a session's log (or a coach reopening it), with who made it and when; never updated. */
export class SessionLogChange extends Model<
  InferAttributes<SessionLogChange>,
  InferCreationAttributes<SessionLogChange>
> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare athleteId: ForeignKey<Athlete["id"]>;
  declare sessionId: number | null;
  declare sessionDate: string;
  declare action: LogChangeAction;
  /** JSON text of the log and its pain report after the change; null for a removal or an unlock. */
  declare after: string | null;
  declare userId: number | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SessionLogChange.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        sessionId: { type: DataTypes.INTEGER, allowNull: true },
        sessionDate: { type: DataTypes.DATEONLY, allowNull: false },
        action: { type: DataTypes.STRING(10), allowNull: false },
        after: { type: DataTypes.TEXT, allowNull: true },
        userId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: "session_log_changes", underscored: true, updatedAt: false },
    );
  }
}
