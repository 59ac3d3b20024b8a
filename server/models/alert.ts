import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';
import type { AlertKind } from '../../shared/schemas/cellar';

/** A cellar alert for the head brewer. Unique per batch, kind and occasion, so each is raised and e-mailed once. */
export class Alert extends Model<InferAttributes<Alert>, InferCreationAttributes<Alert>> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  declare batchId: number;
  declare kind: AlertKind;
  /** Which time this kind is raised for the batch: '' when once per batch; a lapse's start for "no reading". */
  declare occasion: CreationOptional<string>;
  declare message: string;
  declare emailedAt: Date | null;
  declare readAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Alert.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    batchId: { type: DataTypes.INTEGER, allowNull: false },
    kind: { type: DataTypes.ENUM('d_rest', 'stalled', 'overdue'), allowNull: false },
    occasion: { type: DataTypes.STRING(32), allowNull: false, defaultValue: '' },
    message: { type: DataTypes.STRING(300), allowNull: false },
    emailedAt: { type: DataTypes.DATE, allowNull: true },
    readAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'alerts' },
);
