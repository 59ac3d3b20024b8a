// npm start: our own MariaDB, migrations, the demo brewery once, the built client, one Express server.
import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { ensureInstance } from './lib/mariadb-instance';
import { APP_DATA, ROOT } from './lib/paths';
import { sessionSecret } from './lib/session-secret';
import { startMailCatcher } from '../server/dev/mail-catcher';
import { startFakeS3 } from '../server/dev/fake-s3';

const APP_PORT = Number(process.env.PORT ?? 3000);
const SMTP_PORT = Number(process.env.KW_SMTP_PORT ?? 2525);
const S3_PORT = Number(process.env.KW_S3_PORT ?? 4569);

async function main() {
  console.log(`Starting Kettlewright's MariaDB on 127.0.0.1:${APP_DATA.port} (data in .data/) ...`);
  const instance = await ensureInstance(APP_DATA);
  const { migrate } = await import('../server/migrations/umzug');
  const applied = await migrate(instance.ownerUrl, instance.credentials.appUser);
  if (applied.length) console.log(`Applied migrations: ${applied.join(', ')}`);

  const mailDir = path.join(APP_DATA.dataDir, 'mail');
  const catcher = await startMailCatcher(SMTP_PORT, mailDir);
  // Uploaded photos and lab sheets: a local fake object store unless a real one is configured.
  const objectStore = process.env.S3_ENDPOINT ? null : await startFakeS3(S3_PORT, path.join(APP_DATA.dataDir, 's3'));
  Object.assign(process.env, {
    NODE_ENV: process.env.NODE_ENV ?? 'development',
    DATABASE_URL: instance.appUrl,
    SESSION_SECRET: sessionSecret(APP_DATA.dataDir),
    SMTP_URL: catcher.url,
    PUBLIC_URL: process.env.PUBLIC_URL ?? `http://127.0.0.1:${APP_PORT}`,
    PORT: String(APP_PORT),
    MAIL_DIR: mailDir,
    ...objectStore?.env,
  });

  const { seedDemo, DEMO_PEOPLE, DEMO_PASSWORD } = await import('../server/seed/demo');
  if (await seedDemo()) console.log('Seeded the demo brewery.');

  if (process.env.KW_SKIP_BUILD !== '1') {
    console.log('Building the client ...');
    execFileSync('npx', ['vite', 'build', '--logLevel', 'warn'], {
      cwd: ROOT,
      stdio: 'inherit',
      env: { ...process.env, NODE_ENV: 'production' },
    });
  }
  const { startServer } = await import('../server/index');
  await startServer();
  const url = `http://127.0.0.1:${APP_PORT}`;
  console.log(`\nKettlewright is running at ${url}\n`);
  console.log('Demo sign-ins (password for all: ' + DEMO_PASSWORD + '):');
  for (const p of DEMO_PEOPLE) console.log(`  ${p.role.padEnd(17)} ${p.email}`);
  console.log(`\nMail sent by the app (invites, resets, alerts): ${url}/api/dev/mail`);
  console.log('Stop with Ctrl+C; `npm run db:stop` stops the database.');
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
