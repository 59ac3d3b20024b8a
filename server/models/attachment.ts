import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';

export type AttachmentKind = 'photo' | 'document';

/** A photo or lab sheet on a batch (optionally on one of its tasting notes); the bytes live in object storage. */
export class Attachment extends Model<InferAttributes<Attachment>, InferCreationAttributes<Attachment>> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  declare batchId: number;
  declare tastingNoteId: number | null;
  declare kind: AttachmentKind;
  /** Detected from the bytes, never taken from the client. */
  declare contentType: string;
  declare byteSize: number;
  declare storageKey: string;
  declare thumbnailKey: string | null;
  declare displayName: string;
  declare uploadedById: number;
  declare createdAt: CreationOptional<Date>;
}

Attachment.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    batchId: { type: DataTypes.INTEGER, allowNull: false },
    tastingNoteId: { type: DataTypes.BIGINT, allowNull: true },
    kind: { type: DataTypes.ENUM('photo', 'document'), allowNull: false },
    contentType: { type: DataTypes.STRING(64), allowNull: false },
    byteSize: { type: DataTypes.INTEGER, allowNull: false },
    storageKey: { type: DataTypes.STRING(200), allowNull: false, unique: true },
    thumbnailKey: { type: DataTypes.STRING(200), allowNull: true },
    displayName: { type: DataTypes.STRING(200), allowNull: false },
    uploadedById: { type: DataTypes.INTEGER, allowNull: false },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'attachments', updatedAt: false },
);
