import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';
import type { AbvMethod } from '../../shared/brewing';
import { RELEASE_STATES, type Allergen, type Glass, type ReleaseState } from '../../shared/schemas/taproom';

/** A batch's release to the taproom: the public sheet, the numbers frozen when it was released, and when it went off tap. */
export class Release extends Model<InferAttributes<Release>, InferCreationAttributes<Release>> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  declare batchId: number;
  declare state: ReleaseState;
  declare beerName: string;
  declare style: string;
  declare description: string;
  declare glass: Glass;
  declare servingTempC: number;
  declare servingNotes: string;
  declare allergens: Allergen[];
  declare photoAttachmentId: number | null;
  declare og: number | null;
  declare fg: number | null;
  declare abvPct: number | null;
  declare abvMethod: AbvMethod | null;
  declare ibu: number | null;
  declare srm: number | null;
  declare releasedAt: Date | null;
  declare releasedById: number | null;
  // Optional when created: a release starts on tap or before it, never off tap.
  declare offTapAt: CreationOptional<Date | null>;
  declare offTapById: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Release.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    batchId: { type: DataTypes.INTEGER, allowNull: false, unique: true },
    state: { type: DataTypes.ENUM(...RELEASE_STATES), allowNull: false },
    beerName: { type: DataTypes.STRING(120), allowNull: false },
    style: { type: DataTypes.STRING(80), allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false },
    glass: { type: DataTypes.STRING(32), allowNull: false },
    servingTempC: { type: DataTypes.DOUBLE, allowNull: false },
    servingNotes: { type: DataTypes.STRING(500), allowNull: false },
    allergens: { type: DataTypes.JSON, allowNull: false },
    photoAttachmentId: { type: DataTypes.INTEGER, allowNull: true },
    og: { type: DataTypes.DOUBLE, allowNull: true },
    fg: { type: DataTypes.DOUBLE, allowNull: true },
    abvPct: { type: DataTypes.DOUBLE, allowNull: true },
    abvMethod: { type: DataTypes.STRING(16), allowNull: true },
    ibu: { type: DataTypes.DOUBLE, allowNull: true },
    srm: { type: DataTypes.DOUBLE, allowNull: true },
    releasedAt: { type: DataTypes.DATE, allowNull: true },
    releasedById: { type: DataTypes.INTEGER, allowNull: true },
    offTapAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
    offTapById: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'releases' },
);
