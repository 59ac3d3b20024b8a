import { z } from 'zod';

// Configuration is read once at start-up; a missing or malformed variable stops the process.
const schema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  PORT: z.coerce.number().int().min(1).max(65535).default(3000),
  HOST: z.string().default('127.0.0.1'),
  DATABASE_URL: z.string().regex(/^(mariadb|mysql):\/\//, 'DATABASE_URL must be a mariadb:// URL'),
  SESSION_SECRET: z.string().min(32, 'SESSION_SECRET must be at least 32 characters'),
  SMTP_URL: z.string().regex(/^smtps?:\/\//, 'SMTP_URL must be an smtp:// URL'),
  MAIL_FROM: z.string().default('Kettlewright <no-reply@kettlewright.local>'),
  PUBLIC_URL: z.url('PUBLIC_URL must be a URL such as https://brew.example.com'),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  /** Folder where the development mail catcher keeps received messages. */
  MAIL_DIR: z.string().optional(),
});

export type Env = z.infer<typeof schema>;

function load(): Env {
  const parsed = schema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    console.error(`Kettlewright cannot start: the configuration is incomplete.\n${lines.join('\n')}`);
    process.exit(1);
  }
  return parsed.data;
}

export const env = load();
export const isProduction = env.NODE_ENV === 'production';
