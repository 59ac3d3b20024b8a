import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';
import type { Role } from '../../shared/schemas/roles';
import type { SignatureMeaning } from '../../shared/schemas/batch-log';

/**
 * One signed, append-only record of what happened to a batch. The application account has
 * INSERT and SELECT only on this table; `hash` chains each entry to the previous one of its batch.
 */
export class BatchLogEntry extends Model<InferAttributes<BatchLogEntry>, InferCreationAttributes<BatchLogEntry>> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  declare batchId: number;
  /** 1, 2, 3… per batch, in the order the server accepted them. */
  declare sequence: number;
  declare kind: string;
  declare stepKey: string | null;
  /** The kind's own values (measurements, note text, what was signed…). */
  declare data: Record<string, unknown>;
  declare correctsEntryId: number | null;
  declare reason: string | null;
  declare authorId: number;
  declare authorRole: Role;
  declare authorName: string;
  declare meaning: SignatureMeaning;
  declare capturedAt: Date;
  declare receivedAt: Date;
  declare deviceId: string;
  declare late: boolean;
  declare idempotencyKey: string;
  /** SHA-256 of the request that created the entry; the insert trigger copies it into the idempotency record. */
  declare requestHash: string;
  declare prevHash: string;
  declare hash: string;
}

BatchLogEntry.init(
  {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    batchId: { type: DataTypes.INTEGER, allowNull: false },
    sequence: { type: DataTypes.INTEGER, allowNull: false },
    kind: { type: DataTypes.STRING(32), allowNull: false },
    stepKey: { type: DataTypes.STRING(64), allowNull: true },
    data: { type: DataTypes.JSON, allowNull: false },
    correctsEntryId: { type: DataTypes.BIGINT, allowNull: true },
    reason: { type: DataTypes.STRING(500), allowNull: true },
    authorId: { type: DataTypes.INTEGER, allowNull: false },
    authorRole: { type: DataTypes.ENUM('head_brewer', 'assistant_brewer', 'taproom_manager'), allowNull: false },
    authorName: { type: DataTypes.STRING(80), allowNull: false },
    meaning: { type: DataTypes.ENUM('performed', 'verified', 'reviewed'), allowNull: false },
    capturedAt: { type: DataTypes.DATE(3), allowNull: false },
    receivedAt: { type: DataTypes.DATE(3), allowNull: false },
    deviceId: { type: DataTypes.STRING(64), allowNull: false },
    late: { type: DataTypes.BOOLEAN, allowNull: false },
    idempotencyKey: { type: DataTypes.STRING(64), allowNull: false },
    requestHash: { type: DataTypes.CHAR(64), allowNull: false },
    prevHash: { type: DataTypes.CHAR(64), allowNull: false },
    hash: { type: DataTypes.CHAR(64), allowNull: false },
  },
  { sequelize, tableName: 'batch_log_entries', timestamps: false },
);
