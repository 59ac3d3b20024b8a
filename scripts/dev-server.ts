// The API process `npm run dev` restarts on change: mail catcher, fake object store, demo seed (once), API without the built client.
import path from 'node:path';
import { startMailCatcher } from '../server/dev/mail-catcher';
import { startFakeS3 } from '../server/dev/fake-s3';
import { APP_DATA } from './lib/paths';

await startMailCatcher(Number(process.env.KW_SMTP_PORT ?? 2525), process.env.MAIL_DIR);
if (!process.env.S3_ENDPOINT) {
  const objectStore = await startFakeS3(Number(process.env.KW_S3_PORT ?? 4569), path.join(APP_DATA.dataDir, 's3'));
  Object.assign(process.env, objectStore.env);
}
const { seedDemo } = await import('../server/seed/demo');
await seedDemo();
const { startServer } = await import('../server/index');
await startServer({ serveClient: false });
console.log(`API on http://127.0.0.1:${process.env.PORT}; open the app at http://127.0.0.1:5173`);
