import { env } from './config/env';
import { sequelize } from './config/database';
import { durabilityProblems } from './config/durability';
import { createApp } from './app';
import { sweepOverdueReadings } from './services/alerts';
import { logger } from './logger';

/** How often fermenting batches are checked for an overdue gravity reading. */
const OVERDUE_SWEEP_MS = 15 * 60 * 1000;

/** Starts the API (and the built client) after checking the database keeps committed work through a crash. */
export async function startServer(
  options: { serveClient?: boolean } = { serveClient: true },
): Promise<import('node:http').Server> {
  const problems = await durabilityProblems(sequelize);
  if (problems.length) {
    throw new Error(
      `Kettlewright refuses to run on a database that could lose signed records:\n  ${problems.join('\n  ')}`,
    );
  }
  const app = createApp(options);
  setInterval(() => {
    sweepOverdueReadings().catch((err: unknown) => logger.error({ err }, 'overdue reading check failed'));
  }, OVERDUE_SWEEP_MS).unref();
  return new Promise((resolve) => {
    const server = app.listen(env.PORT, env.HOST, () => resolve(server));
  });
}

if (import.meta.url === `file://${process.argv[1]}`) {
  startServer().then(
    () => console.log(`Kettlewright is serving http://${env.HOST}:${env.PORT}`),
    (err) => {
      console.error(err instanceof Error ? err.message : err);
      process.exit(1);
    },
  );
}
