import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

/** The app's own instance (npm start) and the test instance (npm test) never share data or port. */
export const APP_DATA = {
  dataDir: path.join(ROOT, '.data'),
  port: Number(process.env.KW_DB_PORT ?? 3307),
  database: 'kettlewright',
};
export const TEST_DATA = {
  dataDir: path.join(ROOT, '.data-test'),
  port: Number(process.env.KW_TEST_DB_PORT ?? 3308),
  // KW_TEST_DB_NAME gives parallel work its own database on the test instance.
  database: process.env.KW_TEST_DB_NAME ?? 'kettlewright_test',
};
