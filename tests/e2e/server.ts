// The app as the browser tests see it: built client, test database, demo brewery, a mail catcher.
import { startMailCatcher } from '../../server/dev/mail-catcher';

const mailDir = `${process.env.KW_TEST_DATA_DIR}/mail`;
const catcher = await startMailCatcher(0, mailDir);
process.env.SMTP_URL = catcher.url;
process.env.MAIL_DIR = mailDir;
const { seedDemo } = await import('../../server/seed/demo');
await seedDemo();
const { startServer } = await import('../../server/index');
await startServer();
console.log('e2e server ready');
