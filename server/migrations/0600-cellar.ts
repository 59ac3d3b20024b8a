import { DataTypes } from 'sequelize';
import type { Migration } from './umzug';

const brewery = { type: DataTypes.INTEGER, allowNull: false, references: { model: 'breweries', key: 'id' } };
const batch = { type: DataTypes.INTEGER, allowNull: false, references: { model: 'batches', key: 'id' } };
const logEntry = {
  type: DataTypes.BIGINT,
  allowNull: false,
  unique: true,
  references: { model: 'batch_log_entries', key: 'id' },
};

export const up: Migration = async ({ context: qi }) => {
  // A projection of reading log entries for charts and the vessel board, written in the entry's transaction.
  await qi.createTable('gravity_readings', {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    brewery_id: brewery,
    batch_id: batch,
    log_entry_id: logEntry,
    taken_at: { type: DataTypes.DATE(3), allowNull: false },
    sg: { type: DataTypes.DOUBLE, allowNull: false },
    entered_value: { type: DataTypes.DOUBLE, allowNull: false },
    entered_unit: { type: DataTypes.ENUM('sg', 'plato', 'brix'), allowNull: false },
    temp_c: { type: DataTypes.DOUBLE, allowNull: true },
    ph: { type: DataTypes.DOUBLE, allowNull: true },
    method: { type: DataTypes.ENUM('hydrometer', 'refractometer', 'probe'), allowNull: false },
    author_name: { type: DataTypes.STRING(80), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('gravity_readings', ['batch_id', 'taken_at']);
  await qi.addIndex('gravity_readings', ['brewery_id', 'batch_id']);

  await qi.createTable('cellar_plans', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    brewery_id: brewery,
    batch_id: { ...batch, unique: true },
    planned_fg: { type: DataTypes.DOUBLE, allowNull: false },
    primary_temp_c: { type: DataTypes.DOUBLE, allowNull: false },
    d_rest_points: { type: DataTypes.DOUBLE, allowNull: false },
    d_rest_temp_c: { type: DataTypes.DOUBLE, allowNull: false },
    crash_temp_c: { type: DataTypes.DOUBLE, allowNull: false },
    co2_volumes: { type: DataTypes.DOUBLE, allowNull: false },
    reading_interval_hours: { type: DataTypes.DOUBLE, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });

  // One alert per batch and kind: the unique index is what makes "sent once" hold under concurrent readings.
  await qi.createTable('alerts', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    brewery_id: brewery,
    batch_id: batch,
    kind: { type: DataTypes.ENUM('d_rest', 'stalled', 'overdue'), allowNull: false },
    message: { type: DataTypes.STRING(300), allowNull: false },
    emailed_at: { type: DataTypes.DATE, allowNull: true },
    read_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('alerts', ['batch_id', 'kind'], { unique: true, name: 'alerts_batch_kind_unique' });
  await qi.addIndex('alerts', ['brewery_id', 'read_at']);

  await qi.createTable('packaging_runs', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    brewery_id: brewery,
    batch_id: batch,
    log_entry_id: logEntry,
    packaged_at: { type: DataTypes.DATE(3), allowNull: false },
    lines: { type: DataTypes.JSON, allowNull: false },
    packaged_l: { type: DataTypes.DOUBLE, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('packaging_runs', ['brewery_id', 'packaged_at']);
  await qi.addIndex('packaging_runs', ['batch_id']);
};

export const down: Migration = async ({ context: qi }) => {
  for (const table of ['packaging_runs', 'alerts', 'cellar_plans', 'gravity_readings']) await qi.dropTable(table);
};
