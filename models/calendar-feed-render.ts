import {
  DataTypes,
  Model,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { Athlete } from "./athlete";

/** An athlete's last rendered calendar feed and the stamp (ETag) of the data it was rendered from. */
export class CalendarFeedRender extends Model<
  InferAttributes<CalendarFeedRender>,
  InferCreationAttributes<CalendarFeedRender>
> {
  declare athleteId: ForeignKey<Athlete["id"]>;
  declare stamp: string;
  declare ics: string;
  /** Served as Last-Modified; strictly later than the previous render's second. */
  declare renderedAt: Date;

  static initModel(sequelize: Sequelize) {
    CalendarFeedRender.init(
      {
        athleteId: { type: DataTypes.INTEGER, primaryKey: true },
        stamp: { type: DataTypes.STRING(64), allowNull: false },
        ics: { type: DataTypes.TEXT, allowNull: false },
        renderedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, tableName: "calendar_feed_renders", underscored: true, timestamps: false },
    );
  }
}
