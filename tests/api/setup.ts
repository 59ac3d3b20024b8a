// Runs before each API test file: a mail catcher on a free port, so invite and reset mail can be read back.
import { afterAll } from 'vitest';
import { startMailCatcher, type MailCatcher } from '../../server/dev/mail-catcher';

const catcher = await startMailCatcher(0);
process.env.SMTP_URL = catcher.url;
(globalThis as { mailCatcher?: MailCatcher }).mailCatcher = catcher;

afterAll(async () => {
  await catcher.close();
  const { sequelize } = await import('../../server/config/database');
  await sequelize.close();
});
