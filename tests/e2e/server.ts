// The app as the browser tests see it: built client, test database, demo brewery, a mail catcher, a fake object store.
import { startMailCatcher } from '../../server/dev/mail-catcher';
import { startFakeS3 } from '../../server/dev/fake-s3';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

const mailDir = `${process.env.KW_TEST_DATA_DIR}/mail`;
const catcher = await startMailCatcher(0, mailDir);
process.env.SMTP_URL = catcher.url;
process.env.MAIL_DIR = mailDir;
const objectStore = await startFakeS3(0, mkdtempSync(path.join(tmpdir(), 'kw-e2e-s3-')));
Object.assign(process.env, objectStore.env);
const { seedDemo } = await import('../../server/seed/demo');
await seedDemo();
const { startServer } = await import('../../server/index');
await startServer();
console.log('e2e server ready');
