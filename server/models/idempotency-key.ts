import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';

/**
 * A write's device-generated key, unique per brewery, written in the same transaction as what it created.
 * Append-only: a key is never reused, so the application account needs INSERT and SELECT only.
 */
export class IdempotencyKey extends Model<InferAttributes<IdempotencyKey>, InferCreationAttributes<IdempotencyKey>> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  declare key: string;
  /** SHA-256 of the request (target + body + capture metadata): the same key with another body is refused. */
  declare requestHash: string;
  /** What the key created, e.g. `batch-log`. */
  declare scope: string;
  declare resultId: number;
  declare createdAt: CreationOptional<Date>;
}

IdempotencyKey.init(
  {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    key: { type: DataTypes.STRING(64), allowNull: false },
    requestHash: { type: DataTypes.CHAR(64), allowNull: false },
    scope: { type: DataTypes.STRING(40), allowNull: false },
    resultId: { type: DataTypes.BIGINT, allowNull: false },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'idempotency_keys', updatedAt: false },
);
