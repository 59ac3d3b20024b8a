// Development: the same database bootstrap as npm start, then the API under `tsx watch` and Vite beside it.
import { spawn } from 'node:child_process';
import path from 'node:path';
import { ensureInstance } from './lib/mariadb-instance';
import { APP_DATA, ROOT } from './lib/paths';
import { sessionSecret } from './lib/session-secret';
import { migrate } from '../server/migrations/umzug';

const API_PORT = Number(process.env.PORT ?? 3000);

async function main() {
  const instance = await ensureInstance(APP_DATA);
  await migrate(instance.ownerUrl, instance.credentials.appUser);
  const env = {
    ...process.env,
    NODE_ENV: 'development',
    DATABASE_URL: instance.appUrl,
    SESSION_SECRET: sessionSecret(APP_DATA.dataDir),
    SMTP_URL: `smtp://127.0.0.1:${process.env.KW_SMTP_PORT ?? 2525}`,
    PUBLIC_URL: 'http://127.0.0.1:5173',
    PORT: String(API_PORT),
    MAIL_DIR: path.join(APP_DATA.dataDir, 'mail'),
  };
  const children = [
    spawn('npx', ['tsx', 'watch', '--clear-screen=false', 'scripts/dev-server.ts'], {
      cwd: ROOT,
      env,
      stdio: 'inherit',
    }),
    spawn('npx', ['vite', '--host', '127.0.0.1'], { cwd: ROOT, env, stdio: 'inherit' }),
  ];
  const stop = () => children.forEach((c) => c.kill('SIGTERM'));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
