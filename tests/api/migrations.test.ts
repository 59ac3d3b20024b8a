// Every migration's down undoes exactly what its up did: on a database of its own on the test instance, each
// migration is applied one at a time, then undone one at a time (newest first), then all applied again, and
// the schema is compared at every step.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes, Sequelize } from 'sequelize';
import { migrator } from '../../server/migrations/umzug';

const ownerUrl = new URL(process.env.KW_OWNER_DATABASE_URL ?? '');
// Named after the test database, so parallel runs (KW_TEST_DB_NAME) each get their own.
const database = `${ownerUrl.pathname.slice(1)}_migrations`;
const admin = new Sequelize(ownerUrl.href, { dialect: 'mariadb', logging: false });
const target = new URL(ownerUrl);
target.pathname = `/${database}`;
const sequelize = new Sequelize(target.href, { dialect: 'mariadb', logging: false, timezone: '+00:00' });

/** Tables, columns, indexes, foreign keys, checks and triggers, one line each, in a stable order. */
async function schema(): Promise<string[]> {
  const rows = (sql: string) =>
    sequelize.query<{ line: string }>(sql, { replacements: [database], type: QueryTypes.SELECT });
  const parts = await Promise.all([
    rows(`SELECT CONCAT_WS(' ', 'column', TABLE_NAME, COLUMN_NAME, COLUMN_TYPE, IS_NULLABLE, IFNULL(COLUMN_DEFAULT, '-'),
            EXTRA, COLLATION_NAME) AS line FROM information_schema.COLUMNS WHERE TABLE_SCHEMA = ?`),
    rows(`SELECT CONCAT_WS(' ', 'index', TABLE_NAME, INDEX_NAME, NON_UNIQUE, SEQ_IN_INDEX, COLUMN_NAME) AS line
            FROM information_schema.STATISTICS WHERE TABLE_SCHEMA = ?`),
    rows(`SELECT CONCAT_WS(' ', 'foreign key', TABLE_NAME, CONSTRAINT_NAME, COLUMN_NAME, REFERENCED_TABLE_NAME,
            REFERENCED_COLUMN_NAME) AS line FROM information_schema.KEY_COLUMN_USAGE
            WHERE TABLE_SCHEMA = ? AND REFERENCED_TABLE_NAME IS NOT NULL`),
    rows(`SELECT CONCAT_WS(' ', 'check', TABLE_NAME, CONSTRAINT_NAME, CHECK_CLAUSE) AS line
            FROM information_schema.CHECK_CONSTRAINTS WHERE CONSTRAINT_SCHEMA = ?`),
    rows(`SELECT CONCAT_WS(' ', 'trigger', EVENT_OBJECT_TABLE, TRIGGER_NAME, ACTION_TIMING, EVENT_MANIPULATION) AS line
            FROM information_schema.TRIGGERS WHERE TRIGGER_SCHEMA = ?`),
  ]);
  return parts
    .flat()
    .map((r) => r.line)
    .sort();
}

beforeAll(async () => {
  await admin.query(`DROP DATABASE IF EXISTS \`${database}\``, { type: QueryTypes.RAW });
  await admin.query(`CREATE DATABASE \`${database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`, {
    type: QueryTypes.RAW,
  });
});

afterAll(async () => {
  await sequelize.close();
  await admin.query(`DROP DATABASE IF EXISTS \`${database}\``, { type: QueryTypes.RAW });
  await admin.close();
});

describe('migrations', () => {
  it('undo with down exactly what up did, one at a time, and apply again', { timeout: 240_000 }, async () => {
    const umzug = migrator(sequelize);
    const names = (await umzug.pending()).map((m) => m.name);
    expect(names.length).toBeGreaterThan(0);

    // The schema before each migration; the last entry is the fully migrated schema.
    const before = [await schema()];
    for (const name of names) {
      expect((await umzug.up({ step: 1 })).map((m) => m.name)).toEqual([name]);
      before.push(await schema());
    }
    const migrated = before.at(-1);

    for (const [index, name] of [...names.entries()].reverse()) {
      expect((await umzug.down({ step: 1 })).map((m) => m.name)).toEqual([name]);
      expect({ after: `${name} down`, schema: await schema() }).toEqual({
        after: `${name} down`,
        schema: before[index],
      });
    }
    expect(await umzug.executed()).toEqual([]);

    expect((await umzug.up()).map((m) => m.name)).toEqual(names);
    expect(await schema()).toEqual(migrated);
  });
});
