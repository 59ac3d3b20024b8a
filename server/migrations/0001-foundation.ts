import { DataTypes } from 'sequelize';
import type { Migration } from './umzug';

const ROLE = DataTypes.ENUM('head_brewer', 'assistant_brewer', 'taproom_manager');
const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('breweries', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    unit_system: { type: DataTypes.ENUM('us', 'metric'), allowNull: false },
    time_zone: { type: DataTypes.STRING(64), allowNull: false },
    ...timestamps,
  });
  await qi.createTable('users', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    brewery_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'breweries', key: 'id' } },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    display_name: { type: DataTypes.STRING(80), allowNull: false },
    role: { type: ROLE, allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    disabled_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('users', ['brewery_id']);
  await qi.createTable('invites', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    brewery_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'breweries', key: 'id' } },
    purpose: { type: DataTypes.ENUM('invite', 'reset'), allowNull: false },
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: ROLE, allowNull: true },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    created_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' } },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('invites', ['brewery_id', 'email']);
  await qi.createTable('audit_events', {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    brewery_id: { type: DataTypes.INTEGER, allowNull: true },
    user_id: { type: DataTypes.INTEGER, allowNull: true },
    action: { type: DataTypes.STRING(64), allowNull: false },
    detail: { type: DataTypes.JSON, allowNull: true },
    ip: { type: DataTypes.STRING(64), allowNull: true },
    user_agent: { type: DataTypes.STRING(255), allowNull: true },
    request_id: { type: DataTypes.STRING(64), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('audit_events', ['brewery_id', 'created_at']);
  await qi.createTable('sessions', {
    sid: { type: DataTypes.STRING(64), primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: true },
    expires: { type: DataTypes.DATE, allowNull: true },
    data: { type: DataTypes.TEXT, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('sessions', ['user_id']);
  await qi.addIndex('sessions', ['expires']);
};

export const down: Migration = async ({ context: qi }) => {
  for (const table of ['sessions', 'audit_events', 'invites', 'users', 'breweries']) await qi.dropTable(table);
};
