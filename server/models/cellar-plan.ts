import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';

/** A batch's cellar plan (SI): what the alerts and the vessel board measure readings against. */
export class CellarPlan extends Model<InferAttributes<CellarPlan>, InferCreationAttributes<CellarPlan>> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  declare batchId: number;
  declare plannedFg: number;
  declare primaryTempC: number;
  declare dRestPoints: number;
  declare dRestTempC: number;
  declare crashTempC: number;
  declare co2Volumes: number;
  declare readingIntervalHours: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

CellarPlan.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    batchId: { type: DataTypes.INTEGER, allowNull: false, unique: true },
    plannedFg: { type: DataTypes.DOUBLE, allowNull: false },
    primaryTempC: { type: DataTypes.DOUBLE, allowNull: false },
    dRestPoints: { type: DataTypes.DOUBLE, allowNull: false },
    dRestTempC: { type: DataTypes.DOUBLE, allowNull: false },
    crashTempC: { type: DataTypes.DOUBLE, allowNull: false },
    co2Volumes: { type: DataTypes.DOUBLE, allowNull: false },
    readingIntervalHours: { type: DataTypes.DOUBLE, allowNull: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'cellar_plans' },
);
