import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';
import type { PackageLine } from '../../shared/brewing';

/** A packaging run, projected from its signed batch log entry (append-only). */
export class PackagingRun extends Model<InferAttributes<PackagingRun>, InferCreationAttributes<PackagingRun>> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  declare batchId: number;
  declare logEntryId: number;
  declare packagedAt: Date;
  declare lines: PackageLine[];
  declare packagedL: number;
  declare createdAt: CreationOptional<Date>;
}

PackagingRun.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    batchId: { type: DataTypes.INTEGER, allowNull: false },
    logEntryId: { type: DataTypes.BIGINT, allowNull: false, unique: true },
    packagedAt: { type: DataTypes.DATE(3), allowNull: false },
    lines: { type: DataTypes.JSON, allowNull: false },
    packagedL: { type: DataTypes.DOUBLE, allowNull: false },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'packaging_runs', updatedAt: false },
);
