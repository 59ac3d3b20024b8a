import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';
import type { IngredientKind } from '../../shared/schemas/recipes';

/** An entry in a brewery's ingredient library, with typical values to start a recipe line from. */
export class Ingredient extends Model<InferAttributes<Ingredient>, InferCreationAttributes<Ingredient>> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  declare kind: IngredientKind;
  declare name: string;
  declare ppg: number | null;
  declare colourLovibond: number | null;
  declare alphaAcidPct: number | null;
  declare attenuationPct: number | null;
  declare notes: string;
  declare typical: boolean;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Ingredient.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    kind: { type: DataTypes.ENUM('fermentable', 'hop', 'yeast', 'adjunct', 'salt'), allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: false },
    ppg: { type: DataTypes.DOUBLE, allowNull: true },
    colourLovibond: { type: DataTypes.DOUBLE, allowNull: true },
    alphaAcidPct: { type: DataTypes.DOUBLE, allowNull: true },
    attenuationPct: { type: DataTypes.DOUBLE, allowNull: true },
    notes: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    typical: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'ingredients' },
);
