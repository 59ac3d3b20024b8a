import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';
import type { RecipeStatus } from '../../shared/schemas/recipes';

/** A beer the brewery makes; its content lives in numbered RecipeVersions. */
export class Recipe extends Model<InferAttributes<Recipe>, InferCreationAttributes<Recipe>> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  declare name: string;
  declare style: string;
  declare description: string;
  declare status: RecipeStatus;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Recipe.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    style: { type: DataTypes.STRING(80), allowNull: false, defaultValue: '' },
    description: { type: DataTypes.TEXT, allowNull: false },
    status: { type: DataTypes.ENUM('draft', 'active', 'retired'), allowNull: false, defaultValue: 'draft' },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'recipes' },
);
