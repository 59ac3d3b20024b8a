import { DataTypes } from 'sequelize';
import type { Migration } from './umzug';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const brewery = { type: DataTypes.INTEGER, allowNull: false, references: { model: 'breweries', key: 'id' } };
const litres = { type: DataTypes.DOUBLE, allowNull: false };

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('equipment_profiles', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    brewery_id: brewery,
    name: { type: DataTypes.STRING(80), allowNull: false },
    batch_volume_l: litres,
    brewhouse_efficiency: { type: DataTypes.DOUBLE, allowNull: false },
    boil_off_l_per_hour: litres,
    boil_minutes: { type: DataTypes.DOUBLE, allowNull: false },
    mash_tun_dead_space_l: litres,
    kettle_dead_space_l: litres,
    trub_chiller_loss_l: litres,
    fermenter_loss_l: litres,
    grain_absorption_l_per_kg: { type: DataTypes.DOUBLE, allowNull: false },
    max_mash_tun_volume_l: litres,
    max_kettle_volume_l: litres,
    mash_thickness_l_per_kg: { type: DataTypes.DOUBLE, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('equipment_profiles', ['brewery_id', 'name'], { unique: true });

  await qi.createTable('ingredients', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    brewery_id: brewery,
    kind: { type: DataTypes.ENUM('fermentable', 'hop', 'yeast', 'adjunct', 'salt'), allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: false },
    ppg: { type: DataTypes.DOUBLE, allowNull: true },
    colour_lovibond: { type: DataTypes.DOUBLE, allowNull: true },
    alpha_acid_pct: { type: DataTypes.DOUBLE, allowNull: true },
    attenuation_pct: { type: DataTypes.DOUBLE, allowNull: true },
    notes: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    /** True for the starter entries: typical values, not a supplier's analysis. */
    typical: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    ...timestamps,
  });
  await qi.addIndex('ingredients', ['brewery_id', 'kind', 'name'], { unique: true });

  await qi.createTable('recipes', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    brewery_id: brewery,
    name: { type: DataTypes.STRING(120), allowNull: false },
    style: { type: DataTypes.STRING(80), allowNull: false, defaultValue: '' },
    description: { type: DataTypes.TEXT, allowNull: false },
    status: { type: DataTypes.ENUM('draft', 'active', 'retired'), allowNull: false, defaultValue: 'draft' },
    ...timestamps,
  });
  await qi.addIndex('recipes', ['brewery_id', 'name'], { unique: true });

  await qi.createTable('recipe_versions', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    brewery_id: brewery,
    recipe_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'recipes', key: 'id' } },
    number: { type: DataTypes.INTEGER, allowNull: false },
    change_note: { type: DataTypes.STRING(300), allowNull: false },
    author_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } },
    equipment_profile_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'equipment_profiles', key: 'id' },
    },
    content: { type: DataTypes.JSON, allowNull: false },
    // Denormalised for the list; computed by shared/brewing when the version is saved.
    batch_volume_l: litres,
    og: { type: DataTypes.DOUBLE, allowNull: false },
    fg: { type: DataTypes.DOUBLE, allowNull: false },
    ibu: { type: DataTypes.DOUBLE, allowNull: false },
    srm: { type: DataTypes.DOUBLE, allowNull: false },
    abv_pct: { type: DataTypes.DOUBLE, allowNull: false },
    frozen_at: { type: DataTypes.DATE, allowNull: true },
    last_used_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('recipe_versions', ['recipe_id', 'number'], { unique: true });
  await qi.addIndex('recipe_versions', ['brewery_id']);
};

export const down: Migration = async ({ context: qi }) => {
  for (const table of ['recipe_versions', 'recipes', 'ingredients', 'equipment_profiles']) await qi.dropTable(table);
};
