// npm run db:restore FILE [--into NAME] [--replace]: loads a dump made by `npm run db:backup` into a fresh database
// on Kettlewright's own instance (.data/), then applies any newer migrations and the application account's grants.
import path from 'node:path';
import { existsSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import * as mariadb from 'mariadb';
import { ensureInstance } from './lib/mariadb-instance';
import { APP_DATA } from './lib/paths';
import { connectionParts, runClient } from './backup';
import { execFileSync } from 'node:child_process';
import { ROOT } from './lib/paths';

const SAFE_NAME = /^[A-Za-z0-9_]{1,64}$/;

/**
 * Applies pending migrations and the application account's grants, in a child process: umzug loads the
 * migration files with Node's own import, which a test runner's module loader does not provide.
 */
export function migrateDatabase(ownerUrl: string, appUser: string): string[] {
  const script = `import { migrate } from './server/migrations/umzug.ts';
console.log(JSON.stringify(await migrate(process.env.KW_MIGRATE_URL, process.env.KW_MIGRATE_APP_USER)));`;
  const out = execFileSync(process.execPath, ['--import', 'tsx', '--input-type=module', '-e', script], {
    cwd: ROOT,
    env: { ...process.env, KW_MIGRATE_URL: ownerUrl, KW_MIGRATE_APP_USER: appUser },
    encoding: 'utf8',
  });
  return JSON.parse(out.trim().split('\n').pop()!) as string[];
}

/** The same server and account as `url`, another database. */
export function urlForDatabase(url: string, database: string): string {
  const u = new URL(url);
  u.pathname = `/${database}`;
  return u.toString();
}

/**
 * Restores `file` into `database` (created fresh; refused when it already holds tables unless `replace`).
 * `ownerUrl` is the migration account on the target instance; `appUser` gets its usual grants afterwards.
 */
export async function restoreDatabase(options: {
  ownerUrl: string;
  appUser: string;
  database: string;
  file: string;
  replace?: boolean;
}): Promise<{ database: string; migrationsApplied: string[] }> {
  const { database, file } = options;
  if (!SAFE_NAME.test(database))
    throw new Error(`'${database}' is not a database name Kettlewright uses (letters, digits, _).`);
  if (!existsSync(file)) throw new Error(`No backup file at ${file}`);
  const c = connectionParts(options.ownerUrl);
  const conn = await mariadb.createConnection({
    host: c.host,
    port: Number(c.port),
    user: c.user,
    password: c.password,
  });
  try {
    const [row] = await conn.query<{ tables: bigint }[]>(
      'SELECT COUNT(*) AS tables FROM information_schema.TABLES WHERE TABLE_SCHEMA = ?',
      [database],
    );
    if (Number(row!.tables) > 0 && !options.replace) {
      throw new Error(
        `Database '${database}' already holds ${row!.tables} tables. Restore into a fresh one (--into NAME), ` +
          'or stop the app and pass --replace to drop it first.',
      );
    }
    await conn.query(`DROP DATABASE IF EXISTS \`${database}\``);
    await conn.query(`CREATE DATABASE \`${database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  } finally {
    await conn.end();
  }
  const targetUrl = urlForDatabase(options.ownerUrl, database);
  await runClient('mariadb', targetUrl, ['--default-character-set=utf8mb4', database], { stdinFile: file });
  const migrationsApplied = migrateDatabase(targetUrl, options.appUser);
  return { database, migrationsApplied };
}

function parseArgs(argv: string[]): { file: string; into: string; replace: boolean } {
  const args = [...argv];
  let into = APP_DATA.database;
  let replace = false;
  let file: string | undefined;
  while (args.length) {
    const a = args.shift()!;
    if (a === '--into') into = args.shift() ?? '';
    else if (a === '--replace') replace = true;
    else if (!file) file = a;
    else throw new Error(`Unexpected argument '${a}'`);
  }
  if (!file) throw new Error('Usage: npm run db:restore FILE [-- --into NAME] [-- --replace]');
  return { file: path.resolve(file), into, replace };
}

async function main() {
  const { file, into, replace } = parseArgs(process.argv.slice(2));
  const instance = await ensureInstance(APP_DATA);
  const { migrationsApplied } = await restoreDatabase({
    ownerUrl: instance.ownerUrl,
    appUser: instance.credentials.appUser,
    database: into,
    file,
    replace,
  });
  console.log(`Restored ${file} into database '${into}' on 127.0.0.1:${APP_DATA.port}.`);
  if (migrationsApplied.length) console.log(`Applied newer migrations: ${migrationsApplied.join(', ')}`);
  if (into !== APP_DATA.database) console.log(`The app uses '${APP_DATA.database}'; the restored copy sits beside it.`);
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  main().catch((err) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  });
}
