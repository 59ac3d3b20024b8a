// The API process `npm run dev` restarts on change: mail catcher, demo seed (once), API without the built client.
import { startMailCatcher } from '../server/dev/mail-catcher';

await startMailCatcher(Number(process.env.KW_SMTP_PORT ?? 2525), process.env.MAIL_DIR);
const { seedDemo } = await import('../server/seed/demo');
await seedDemo();
const { startServer } = await import('../server/index');
await startServer({ serveClient: false });
console.log(`API on http://127.0.0.1:${process.env.PORT}; open the app at http://127.0.0.1:5173`);
