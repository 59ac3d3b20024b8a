// npm run db:migrate: applies migrations in production with the migration account,
// then grants the application account (APP_DB_USER) what it needs.
import { z } from 'zod';
import { migrate } from '../server/migrations/umzug';

const env = z
  .object({
    MIGRATION_DATABASE_URL: z
      .string()
      .regex(/^(mariadb|mysql):\/\//, 'MIGRATION_DATABASE_URL must be a mariadb:// URL'),
    APP_DB_USER: z.string().min(1, 'APP_DB_USER names the account the app connects with'),
  })
  .safeParse(process.env);

if (!env.success) {
  console.error(env.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('\n'));
  process.exit(1);
}

migrate(env.data.MIGRATION_DATABASE_URL, env.data.APP_DB_USER).then(
  (applied) => console.log(applied.length ? `Applied: ${applied.join(', ')}` : 'The schema is up to date.'),
  (err) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  },
);
