import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';

export type VesselType = 'fermenter' | 'bright_tank';
export type VesselStatus = 'clean' | 'in_use' | 'needs_cleaning';

/** A fermenter or bright tank. `currentBatchId` is unique: a vessel holds one batch, a batch sits in one vessel. */
export class Vessel extends Model<InferAttributes<Vessel>, InferCreationAttributes<Vessel>> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  declare name: string;
  declare type: VesselType;
  declare capacityL: number;
  declare ratedPressureKpa: number;
  declare status: VesselStatus;
  declare currentBatchId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Vessel.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    name: { type: DataTypes.STRING(60), allowNull: false },
    type: { type: DataTypes.ENUM('fermenter', 'bright_tank'), allowNull: false },
    capacityL: { type: DataTypes.DOUBLE, allowNull: false },
    ratedPressureKpa: { type: DataTypes.DOUBLE, allowNull: false },
    status: { type: DataTypes.ENUM('clean', 'in_use', 'needs_cleaning'), allowNull: false },
    currentBatchId: { type: DataTypes.INTEGER, allowNull: true, unique: 'vessels_current_batch_unique' },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'vessels' },
);
