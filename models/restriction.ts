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
import type { RestrictionRuleKind } from "@/lib/restrictions/rules";
import type { Athlete } from "./athlete";
import type { Team } from "./team";
import type { RestrictionOverride } from "./restriction-override";

/** A limit the medical staff put on one athlete's training for a span of days (lib/restrictions/rules.ts). */
export class Restriction extends Model<InferAttributes<Restriction>, InferCreationAttributes<Restriction>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare athleteId: ForeignKey<Athlete["id"]>;
  declare rule: RestrictionRuleKind;
  /** JSON array of block kinds ("no_kind" only). */
  declare blockKinds: string | null;
  /** % of vmax ("max_intensity") or contacts per session ("contact_cap"). */
  declare limitValue: number | null;
  declare startsOn: string;
  declare endsOn: string | null;
  declare liftedOn: string | null;
  declare note: string;
  declare createdBy: number | null;
  declare liftedBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // Filled only when a query includes the association (models/index.ts wires them).
  declare athlete?: NonAttribute<Athlete>;
  declare team?: NonAttribute<Team>;
  declare overrides?: NonAttribute<RestrictionOverride[]>;
  declare getOverrides: HasManyGetAssociationsMixin<RestrictionOverride>;
  declare static associations: {
    athlete: Association<Restriction, Athlete>;
    team: Association<Restriction, Team>;
    overrides: Association<Restriction, RestrictionOverride>;
  };

  static initModel(sequelize: Sequelize) {
    Restriction.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        rule: { type: DataTypes.STRING(20), allowNull: false },
        blockKinds: { type: DataTypes.TEXT, allowNull: true },
        limitValue: { type: DataTypes.FLOAT, allowNull: true },
        startsOn: { type: DataTypes.DATEONLY, allowNull: false },
        endsOn: { type: DataTypes.DATEONLY, allowNull: true },
        liftedOn: { type: DataTypes.DATEONLY, allowNull: true },
        note: { type: DataTypes.TEXT, allowNull: false },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        liftedBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "restrictions", underscored: true },
    );
  }
}
