import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';
import type { Role } from '../../shared/schemas/roles';

/** A one-time link sent by e-mail: a team invite or a password reset. Only the token's hash is stored. */
export class Invite extends Model<InferAttributes<Invite>, InferCreationAttributes<Invite>> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  declare purpose: 'invite' | 'reset';
  declare email: string;
  declare role: Role | null;
  declare tokenHash: string;
  declare createdById: number | null;
  declare expiresAt: Date;
  declare usedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Invite.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    purpose: { type: DataTypes.ENUM('invite', 'reset'), allowNull: false },
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: DataTypes.ENUM('head_brewer', 'assistant_brewer', 'taproom_manager'), allowNull: true },
    tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    createdById: { type: DataTypes.INTEGER, allowNull: true },
    expiresAt: { type: DataTypes.DATE, allowNull: false },
    usedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'invites' },
);
