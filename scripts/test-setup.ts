// Prepares the test instance: its own data folder and port, a fresh schema, migrations applied.
// Prints shell `export` lines for the test run.
import { ensureInstance } from './lib/mariadb-instance';
import { TEST_DATA } from './lib/paths';
import { sessionSecret } from './lib/session-secret';
import { migrate } from '../server/migrations/umzug';

async function main() {
  // KW_KEEP_TEST_DB=1 applies new migrations without dropping the test database (for working on one area).
  const instance = await ensureInstance({ ...TEST_DATA, fresh: process.env.KW_KEEP_TEST_DB !== '1' });
  await migrate(instance.ownerUrl, instance.credentials.appUser);
  const vars: Record<string, string> = {
    NODE_ENV: 'test',
    LOG_LEVEL: 'silent',
    DATABASE_URL: instance.appUrl,
    KW_OWNER_DATABASE_URL: instance.ownerUrl,
    KW_TEST_DATA_DIR: TEST_DATA.dataDir,
    SESSION_SECRET: sessionSecret(TEST_DATA.dataDir),
    // Replaced per test run by the mail catcher each suite starts; a valid placeholder keeps config strict.
    SMTP_URL: 'smtp://127.0.0.1:2526',
    PUBLIC_URL: 'http://127.0.0.1:3100',
    // bcrypt's least work factor: tests hash hundreds of passwords (production keeps 12 or more, see env.ts).
    BCRYPT_COST: '4',
  };
  for (const [k, v] of Object.entries(vars)) console.log(`export ${k}='${v}'`);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.stack : err);
  process.exit(1);
});
