import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { QueryTypes, Sequelize, type QueryInterface } from 'sequelize';
import { Umzug, SequelizeStorage, type MigrationFn } from 'umzug';

export type Migration = MigrationFn<QueryInterface>;

const here = path.dirname(fileURLToPath(import.meta.url));

/**
 * Tables whose rows are signed records: the application account may only INSERT and SELECT them,
 * so not even a bug in the app can change or delete what was recorded. Later areas add theirs here.
 */
export const APPEND_ONLY_TABLES = ['audit_events', 'batch_log_entries', 'idempotency_keys', 'tasting_notes', 'gravity_readings', 'packaging_runs'];

/**
 * Runs pending migrations with the owner account, then grants the application account
 * what it needs: read/write on ordinary tables, INSERT + SELECT only on append-only tables.
 */
export async function migrate(ownerUrl: string, appUser: string): Promise<string[]> {
  const sequelize = new Sequelize(ownerUrl.replace(/^mysql:/, 'mariadb:'), { dialect: 'mariadb', logging: false });
  try {
    const umzug = new Umzug({
      migrations: { glob: ['[0-9][0-9][0-9][0-9]-*.ts', { cwd: here }] },
      context: sequelize.getQueryInterface(),
      storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
      logger: undefined,
    });
    const applied = await umzug.up();
    await grantApplicationAccount(sequelize, appUser);
    return applied.map((m) => m.name);
  } finally {
    await sequelize.close();
  }
}

async function grantApplicationAccount(sequelize: Sequelize, appUser: string): Promise<void> {
  const database = sequelize.getDatabaseName();
  const tables = await sequelize.query<{ name: string }>(
    'SELECT TABLE_NAME AS name FROM information_schema.TABLES WHERE TABLE_SCHEMA = ?',
    { replacements: [database], type: QueryTypes.SELECT },
  );
  for (const host of ['127.0.0.1', 'localhost']) {
    const account = `'${appUser}'@'${host}'`;
    for (const { name } of tables) {
      // Only this database's tables: other databases on the instance keep their grants.
      await sequelize
        .query(`REVOKE ALL PRIVILEGES ON \`${database}\`.\`${name}\` FROM ${account}`, { type: QueryTypes.RAW })
        .catch(() => undefined); // no grant yet on a new table
      if (name === 'schema_migrations') continue;
      const privileges = APPEND_ONLY_TABLES.includes(name) ? 'SELECT, INSERT' : 'SELECT, INSERT, UPDATE, DELETE';
      await sequelize.query(`GRANT ${privileges} ON \`${database}\`.\`${name}\` TO ${account}`, { type: QueryTypes.RAW });
    }
  }
}
