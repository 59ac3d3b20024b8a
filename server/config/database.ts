import { Sequelize, QueryTypes } from 'sequelize';
import { env } from './env';

/** Counts SQL statements per request for the benchmark (see scripts/bench.ts). */
export const queryCounter = { count: 0 };

export const sequelize = new Sequelize(env.DATABASE_URL.replace(/^mysql:/, 'mariadb:'), {
  dialect: 'mariadb',
  logging: () => {
    queryCounter.count += 1;
  },
  pool: { max: 10, min: 0, idle: 10_000, acquire: 20_000 },
  define: { underscored: true },
  dialectOptions: { connectTimeout: 5_000 },
  timezone: '+00:00',
});

/** Whether the database answers (for /api/health). */
export async function databaseAnswers(): Promise<boolean> {
  try {
    await sequelize.query('SELECT 1 AS ok', { type: QueryTypes.SELECT });
    return true;
  } catch {
    return false;
  }
}
