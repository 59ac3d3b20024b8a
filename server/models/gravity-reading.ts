import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';
import type { GravityUnit, ReadingMethod } from '../../shared/schemas/cellar';

/**
 * A gravity reading, projected from its signed batch log entry in the same transaction so charts and
 * the vessel board read an indexed table. Append-only like the log. Gravity is stored as SG.
 * A corrected reading has one row per version; readers take only the rows in force (IN_FORCE below).
 */
export class GravityReading extends Model<InferAttributes<GravityReading>, InferCreationAttributes<GravityReading>> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  declare batchId: number;
  declare logEntryId: number;
  /** The reading this row stands for: its original log entry. A correction adds a row; the newest row is in force. */
  declare readingEntryId: number;
  declare takenAt: Date;
  declare sg: number;
  /** What the person entered, in `enteredUnit` (°Brix for a refractometer). */
  declare enteredValue: number;
  declare enteredUnit: GravityUnit;
  declare tempC: number | null;
  declare ph: number | null;
  declare method: ReadingMethod;
  declare authorName: string;
  declare createdAt: CreationOptional<Date>;
}

GravityReading.init(
  {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    batchId: { type: DataTypes.INTEGER, allowNull: false },
    logEntryId: { type: DataTypes.BIGINT, allowNull: false, unique: true },
    readingEntryId: { type: DataTypes.BIGINT, allowNull: false },
    takenAt: { type: DataTypes.DATE(3), allowNull: false },
    sg: { type: DataTypes.DOUBLE, allowNull: false },
    enteredValue: { type: DataTypes.DOUBLE, allowNull: false },
    enteredUnit: { type: DataTypes.ENUM('sg', 'plato', 'brix'), allowNull: false },
    tempC: { type: DataTypes.DOUBLE, allowNull: true },
    ph: { type: DataTypes.DOUBLE, allowNull: true },
    method: { type: DataTypes.ENUM('hydrometer', 'refractometer', 'probe'), allowNull: false },
    authorName: { type: DataTypes.STRING(80), allowNull: false },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'gravity_readings', updatedAt: false },
);

/**
 * Only the rows in force: a reading corrected later is replaced by its correction's row. For finders on
 * GravityReading (`where: { ..., [Op.and]: [IN_FORCE] }`); raw SQL uses readingInForce(alias).
 */
export const readingInForce = (alias: string) =>
  `NOT EXISTS (SELECT 1 FROM gravity_readings newer WHERE newer.reading_entry_id = ${alias}.reading_entry_id AND newer.id > ${alias}.id)`;
export const IN_FORCE = sequelize.literal(readingInForce('`GravityReading`'));
