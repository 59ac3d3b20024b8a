import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';
import type { Role } from '../../shared/schemas/roles';
import type { TastingNoteContent } from '../../shared/schemas/tasting';

/**
 * One taster's signed note on a batch. Append-only: the application account has INSERT and SELECT
 * only; `hash` chains each note to the previous one of its batch.
 */
export class TastingNote extends Model<InferAttributes<TastingNote>, InferCreationAttributes<TastingNote>> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  declare batchId: number;
  declare sequence: number;
  declare content: TastingNoteContent;
  declare score: number;
  declare correctsNoteId: number | null;
  declare reason: string | null;
  declare authorId: number;
  declare authorRole: Role;
  declare authorName: string;
  declare signedAt: Date;
  declare idempotencyKey: string;
  declare prevHash: string;
  declare hash: string;
}

TastingNote.init(
  {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    batchId: { type: DataTypes.INTEGER, allowNull: false },
    sequence: { type: DataTypes.INTEGER, allowNull: false },
    content: { type: DataTypes.JSON, allowNull: false },
    score: {
      type: DataTypes.DECIMAL(3, 1),
      allowNull: false,
      get() {
        return Number(this.getDataValue('score'));
      },
    },
    correctsNoteId: { type: DataTypes.BIGINT, allowNull: true },
    reason: { type: DataTypes.STRING(500), allowNull: true },
    authorId: { type: DataTypes.INTEGER, allowNull: false },
    authorRole: { type: DataTypes.ENUM('head_brewer', 'assistant_brewer', 'taproom_manager'), allowNull: false },
    authorName: { type: DataTypes.STRING(80), allowNull: false },
    signedAt: { type: DataTypes.DATE(3), allowNull: false },
    idempotencyKey: { type: DataTypes.STRING(64), allowNull: false },
    prevHash: { type: DataTypes.CHAR(64), allowNull: false },
    hash: { type: DataTypes.CHAR(64), allowNull: false },
  },
  { sequelize, tableName: 'tasting_notes', timestamps: false },
);
