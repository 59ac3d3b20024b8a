import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';
import type { Role } from '../../shared/schemas/roles';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  /** Never reassigned: accounts are disabled, not deleted. */
  declare email: string;
  declare displayName: string;
  declare role: Role;
  declare passwordHash: string;
  declare disabledAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

User.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    displayName: { type: DataTypes.STRING(80), allowNull: false },
    role: { type: DataTypes.ENUM('head_brewer', 'assistant_brewer', 'taproom_manager'), allowNull: false },
    passwordHash: { type: DataTypes.STRING(100), allowNull: false },
    disabledAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'users' },
);
