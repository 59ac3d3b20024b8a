import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';
import type { UnitSystem } from '../../shared/schemas/auth';

export class Brewery extends Model<InferAttributes<Brewery>, InferCreationAttributes<Brewery>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare unitSystem: UnitSystem;
  declare timeZone: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Brewery.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    unitSystem: { type: DataTypes.ENUM('us', 'metric'), allowNull: false },
    timeZone: { type: DataTypes.STRING(64), allowNull: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'breweries' },
);
