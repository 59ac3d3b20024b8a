// Runs before each API test file: a mail catcher on a free port, so invite and reset mail can be read back,
// and a fake object store on a free port (files in a fresh temporary folder) for uploads.
import { afterAll } from 'vitest';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { startMailCatcher, type MailCatcher } from '../../server/dev/mail-catcher';
import { startFakeS3 } from '../../server/dev/fake-s3';

const catcher = await startMailCatcher(0);
process.env.SMTP_URL = catcher.url;
(globalThis as { mailCatcher?: MailCatcher }).mailCatcher = catcher;
const objectStore = await startFakeS3(0, mkdtempSync(path.join(tmpdir(), 'kw-s3-')));
Object.assign(process.env, objectStore.env);

afterAll(async () => {
  await catcher.close();
  await objectStore.close();
  const { sequelize } = await import('../../server/config/database');
  await sequelize.close();
});
