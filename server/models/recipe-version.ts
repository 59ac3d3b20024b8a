import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';
import type { RecipeVersionContent } from '../../shared/schemas/recipes';

/**
 * One numbered state of a recipe. `content` is the validated document (shared/schemas/recipes);
 * og…abvPct are computed by shared/brewing at save time for the list. Frozen once a batch uses it.
 */
export class RecipeVersion extends Model<InferAttributes<RecipeVersion>, InferCreationAttributes<RecipeVersion>> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  declare recipeId: number;
  declare number: number;
  declare changeNote: string;
  declare authorId: number;
  declare equipmentProfileId: number;
  declare content: RecipeVersionContent;
  declare batchVolumeL: number;
  declare og: number;
  declare fg: number;
  declare ibu: number;
  declare srm: number;
  declare abvPct: number;
  declare frozenAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

// A fresh object per attribute: Sequelize writes into the one it is given.
const number = () => ({ type: DataTypes.DOUBLE, allowNull: false });

RecipeVersion.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    recipeId: { type: DataTypes.INTEGER, allowNull: false },
    number: { type: DataTypes.INTEGER, allowNull: false },
    changeNote: { type: DataTypes.STRING(300), allowNull: false },
    authorId: { type: DataTypes.INTEGER, allowNull: false },
    equipmentProfileId: { type: DataTypes.INTEGER, allowNull: false },
    content: {
      type: DataTypes.JSON,
      allowNull: false,
      // MariaDB stores JSON as LONGTEXT; the driver may hand back the text.
      get(): RecipeVersionContent {
        const raw = this.getDataValue('content') as unknown;
        return typeof raw === 'string' ? (JSON.parse(raw) as RecipeVersionContent) : (raw as RecipeVersionContent);
      },
    },
    batchVolumeL: { ...number(), field: 'batch_volume_l' },
    og: number(),
    fg: number(),
    ibu: number(),
    srm: number(),
    abvPct: number(),
    frozenAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'recipe_versions' },
);
