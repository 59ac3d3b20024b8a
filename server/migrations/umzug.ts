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
export const APPEND_ONLY_TABLES = [
  'audit_events',
  'batch_log_entries',
  'idempotency_keys',
  'tasting_notes',
  'gravity_readings',
  'packaging_runs',
];

/** This folder's migrations against `sequelize`'s database, recorded in its schema_migrations table. */
export function migrator(sequelize: Sequelize): Umzug<QueryInterface> {
  return new Umzug({
    migrations: {
      glob: ['[0-9][0-9][0-9][0-9]-*.ts', { cwd: here }],
      // Loaded through this module's own import(), so the files load wherever it runs (tsx, and Vitest's
      // transform for the schema tests), not only where Node itself can read TypeScript.
      resolve: ({ name, path: file, context }) => {
        if (!file) throw new Error(`Migration ${name} has no file`);
        const load = () => import(file) as Promise<{ up: Migration; down: Migration }>;
        return {
          name,
          up: async () => (await load()).up({ name, path: file, context }),
          down: async () => (await load()).down({ name, path: file, context }),
        };
      },
    },
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

/**
 * Runs pending migrations with the owner account, then grants the application account
 * what it needs: read/write on ordinary tables, INSERT + SELECT only on append-only tables.
 */
export async function migrate(ownerUrl: string, appUser: string): Promise<string[]> {
  const sequelize = new Sequelize(ownerUrl.replace(/^mysql:/, 'mariadb:'), { dialect: 'mariadb', logging: false });
  try {
    const applied = await migrator(sequelize).up();
    await grantApplicationAccount(sequelize, appUser);
    return applied.map((m) => m.name);
  } finally {
    await sequelize.close();
  }
}

/**
 * Gives the application account exactly its privileges on each of this database's tables. Grants come
 * before revokes and nothing it keeps is revoked first, so a running app never loses access mid-migration.
 */
async function grantApplicationAccount(sequelize: Sequelize, appUser: string): Promise<void> {
  const database = sequelize.getDatabaseName();
  const tables = await sequelize.query<{ name: string }>(
    'SELECT TABLE_NAME AS name FROM information_schema.TABLES WHERE TABLE_SCHEMA = ?',
    { replacements: [database], type: QueryTypes.SELECT },
  );
  for (const host of ['127.0.0.1', 'localhost']) {
    const account = `'${appUser}'@'${host}'`;
    // Only this database's tables: other databases on the instance keep their grants.
    const held = await sequelize.query<{ name: string; privilege: string }>(
      'SELECT TABLE_NAME AS name, PRIVILEGE_TYPE AS privilege FROM information_schema.TABLE_PRIVILEGES WHERE GRANTEE = ? AND TABLE_SCHEMA = ?',
      { replacements: [account, database], type: QueryTypes.SELECT },
    );
    for (const { name } of tables) {
      const wanted =
        name === 'schema_migrations'
          ? []
          : APPEND_ONLY_TABLES.includes(name)
            ? ['SELECT', 'INSERT']
            : ['SELECT', 'INSERT', 'UPDATE', 'DELETE'];
      if (wanted.length)
        await sequelize.query(`GRANT ${wanted.join(', ')} ON \`${database}\`.\`${name}\` TO ${account}`, {
          type: QueryTypes.RAW,
        });
      const extra = held.filter((h) => h.name === name && !wanted.includes(h.privilege)).map((h) => h.privilege);
      if (extra.length)
        await sequelize.query(`REVOKE ${extra.join(', ')} ON \`${database}\`.\`${name}\` FROM ${account}`, {
          type: QueryTypes.RAW,
        });
    }
  }
}
