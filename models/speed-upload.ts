import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { SpeedTestKind } from "@/lib/domain/speed";
import type { Team } from "./team";
import type { User } from "./user";

/** A speed-lab file exactly as it was uploaded (kept whatever was read from it). */
export class SpeedUpload extends Model<InferAttributes<SpeedUpload>, InferCreationAttributes<SpeedUpload>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare uploadedByUserId: ForeignKey<User["id"]> | null;
  declare fileName: string;
  declare kind: SpeedTestKind;
  declare sizeBytes: number;
  declare sha256: string;
  declare content: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SpeedUpload.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        fileName: { type: DataTypes.STRING(200), allowNull: false },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
        sha256: { type: DataTypes.STRING(64), allowNull: false },
        content: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "speed_uploads", underscored: true },
    );
  }
}
