import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';
import type { BatchStatus, FrozenPlan } from '../../shared/schemas/batches';

/** One brew of a recipe version: its frozen plan and where it is in the life of the beer. */
export class Batch extends Model<InferAttributes<Batch>, InferCreationAttributes<Batch>> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  /** The brewery's own number, e.g. `2026-007` (year + running number). */
  declare number: string;
  declare year: number;
  declare sequence: number;
  declare beerName: string;
  declare recipeId: number | null;
  declare recipeVersionId: number | null;
  declare equipmentProfileId: number | null;
  /** Frozen when planned: later recipe edits never change it. */
  declare plan: FrozenPlan;
  declare plannedVolumeL: number;
  declare plannedOg: number;
  declare brewDate: string;
  declare status: BatchStatus;
  declare dumpedReason: string | null;
  /** When it was dumped: the month the production report files the loss in. */
  declare dumpedAt: Date | null;
  declare createdById: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Batch.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    number: { type: DataTypes.STRING(20), allowNull: false },
    year: { type: DataTypes.SMALLINT, allowNull: false },
    sequence: { type: DataTypes.INTEGER, allowNull: false },
    beerName: { type: DataTypes.STRING(120), allowNull: false },
    recipeId: { type: DataTypes.INTEGER, allowNull: true },
    recipeVersionId: { type: DataTypes.INTEGER, allowNull: true },
    equipmentProfileId: { type: DataTypes.INTEGER, allowNull: true },
    plan: { type: DataTypes.JSON, allowNull: false },
    plannedVolumeL: { type: DataTypes.DOUBLE, allowNull: false },
    plannedOg: { type: DataTypes.DOUBLE, allowNull: false },
    brewDate: { type: DataTypes.DATEONLY, allowNull: false },
    status: {
      type: DataTypes.ENUM('planned', 'brewing', 'fermenting', 'conditioning', 'packaged', 'released', 'dumped'),
      allowNull: false,
    },
    dumpedReason: { type: DataTypes.STRING(500), allowNull: true },
    dumpedAt: { type: DataTypes.DATE(3), allowNull: true },
    createdById: { type: DataTypes.INTEGER, allowNull: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'batches' },
);
