import { DataTypes } from 'sequelize';
import type { Migration } from './umzug';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const brewery = { type: DataTypes.INTEGER, allowNull: false, references: { model: 'breweries', key: 'id' } };

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('batches', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    brewery_id: brewery,
    number: { type: DataTypes.STRING(20), allowNull: false },
    year: { type: DataTypes.SMALLINT, allowNull: false },
    sequence: { type: DataTypes.INTEGER, allowNull: false },
    beer_name: { type: DataTypes.STRING(120), allowNull: false },
    recipe_id: { type: DataTypes.INTEGER, allowNull: true },
    recipe_version_id: { type: DataTypes.INTEGER, allowNull: true },
    equipment_profile_id: { type: DataTypes.INTEGER, allowNull: true },
    plan: { type: DataTypes.JSON, allowNull: false },
    planned_volume_l: { type: DataTypes.DOUBLE, allowNull: false },
    planned_og: { type: DataTypes.DOUBLE, allowNull: false },
    brew_date: { type: DataTypes.DATEONLY, allowNull: false },
    status: {
      type: DataTypes.ENUM('planned', 'brewing', 'fermenting', 'conditioning', 'packaged', 'released', 'dumped'),
      allowNull: false,
    },
    dumped_reason: { type: DataTypes.STRING(500), allowNull: true },
    created_by_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } },
    ...timestamps,
  });
  await qi.addIndex('batches', ['brewery_id', 'number'], { unique: true });
  await qi.addIndex('batches', ['brewery_id', 'year', 'sequence'], { unique: true });
  await qi.addIndex('batches', ['brewery_id', 'status', 'brew_date']);
  await qi.addIndex('batches', ['brewery_id', 'recipe_id']);

  await qi.createTable('vessels', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    brewery_id: brewery,
    name: { type: DataTypes.STRING(60), allowNull: false },
    type: { type: DataTypes.ENUM('fermenter', 'bright_tank'), allowNull: false },
    capacity_l: { type: DataTypes.DOUBLE, allowNull: false },
    rated_pressure_kpa: { type: DataTypes.DOUBLE, allowNull: false },
    status: { type: DataTypes.ENUM('clean', 'in_use', 'needs_cleaning'), allowNull: false },
    // One vessel holds one batch, and one batch sits in one vessel at a time: the unique index refuses a second.
    current_batch_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'batches', key: 'id' } },
    ...timestamps,
  });
  await qi.addIndex('vessels', ['brewery_id', 'name'], { unique: true });
  await qi.addIndex('vessels', ['current_batch_id'], { unique: true, name: 'vessels_current_batch_unique' });

  await qi.createTable('batch_log_entries', {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    brewery_id: brewery,
    batch_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'batches', key: 'id' } },
    sequence: { type: DataTypes.INTEGER, allowNull: false },
    kind: { type: DataTypes.STRING(32), allowNull: false },
    step_key: { type: DataTypes.STRING(64), allowNull: true },
    data: { type: DataTypes.JSON, allowNull: false },
    corrects_entry_id: {
      type: DataTypes.BIGINT,
      allowNull: true,
      references: { model: 'batch_log_entries', key: 'id' },
    },
    reason: { type: DataTypes.STRING(500), allowNull: true },
    author_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } },
    author_role: { type: DataTypes.ENUM('head_brewer', 'assistant_brewer', 'taproom_manager'), allowNull: false },
    author_name: { type: DataTypes.STRING(80), allowNull: false },
    meaning: { type: DataTypes.ENUM('performed', 'verified', 'reviewed'), allowNull: false },
    captured_at: { type: DataTypes.DATE(3), allowNull: false },
    received_at: { type: DataTypes.DATE(3), allowNull: false },
    device_id: { type: DataTypes.STRING(64), allowNull: false },
    late: { type: DataTypes.BOOLEAN, allowNull: false },
    idempotency_key: { type: DataTypes.STRING(64), allowNull: false },
    prev_hash: { type: DataTypes.CHAR(64), allowNull: false },
    hash: { type: DataTypes.CHAR(64), allowNull: false },
  });
  await qi.addIndex('batch_log_entries', ['batch_id', 'sequence'], { unique: true });
  await qi.addIndex('batch_log_entries', ['brewery_id', 'kind', 'received_at']);

  await qi.createTable('idempotency_keys', {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    brewery_id: brewery,
    key: { type: DataTypes.STRING(64), allowNull: false },
    request_hash: { type: DataTypes.CHAR(64), allowNull: false },
    scope: { type: DataTypes.STRING(40), allowNull: false },
    result_id: { type: DataTypes.BIGINT, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('idempotency_keys', ['brewery_id', 'key'], { unique: true });
};

export const down: Migration = async ({ context: qi }) => {
  for (const table of ['idempotency_keys', 'batch_log_entries', 'vessels', 'batches']) await qi.dropTable(table);
};
