import { z } from 'zod';

/** The least bcrypt work factor production accepts (OWASP Password Storage Cheat Sheet: 10 or more; we keep 12). */
export const PRODUCTION_MIN_BCRYPT_COST = 12;

// Configuration is read once at start-up; a missing or malformed variable stops the process.
export const envSchema = z
  .object({
    NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
    PORT: z.coerce.number().int().min(1).max(65535).default(3000),
    HOST: z.string().default('127.0.0.1'),
    DATABASE_URL: z.string().regex(/^(mariadb|mysql):\/\//, 'DATABASE_URL must be a mariadb:// URL'),
    SESSION_SECRET: z.string().min(32, 'SESSION_SECRET must be at least 32 characters'),
    SMTP_URL: z.string().regex(/^smtps?:\/\//, 'SMTP_URL must be an smtp:// URL'),
    MAIL_FROM: z.string().default('Kettlewright <no-reply@kettlewright.local>'),
    PUBLIC_URL: z.url('PUBLIC_URL must be a URL such as https://brew.example.com'),
    LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
    /** bcrypt's work factor for new password hashes. The test run sets 4 (scripts/test-setup.ts) to stay quick. */
    BCRYPT_COST: z.coerce.number().int().min(4).max(31).default(PRODUCTION_MIN_BCRYPT_COST),
    /** Folder where the development mail catcher keeps received messages. */
    MAIL_DIR: z.string().optional(),
    // File storage (photos, lab sheets) through the S3 API. Development and tests point these at the
    // local fake server (server/dev/fake-s3.ts); production names a real object store.
    /** Omit to use the provider's own endpoint for S3_REGION. */
    S3_ENDPOINT: z.url('S3_ENDPOINT must be a URL such as http://127.0.0.1:4569').optional(),
    S3_BUCKET: z
      .string()
      .regex(
        /^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/,
        'S3_BUCKET must be a bucket name (3–63 lower-case letters, digits, dots, hyphens)',
      )
      .default('kettlewright-files'),
    S3_REGION: z
      .string()
      .regex(/^[a-z0-9-]+$/, 'S3_REGION must be a region name such as us-east-1')
      .default('us-east-1'),
    /** Both keys or neither (neither: the SDK's own credential chain, e.g. an instance role). */
    S3_ACCESS_KEY_ID: z.string().min(1).optional(),
    S3_SECRET_ACCESS_KEY: z.string().min(1).optional(),
    /** Path-style addresses (http://host/bucket/key), which most self-hosted stores need. */
    S3_FORCE_PATH_STYLE: z
      .enum(['true', 'false'])
      .default('false')
      .transform((v) => v === 'true'),
  })
  .refine((e) => Boolean(e.S3_ACCESS_KEY_ID) === Boolean(e.S3_SECRET_ACCESS_KEY), {
    path: ['S3_SECRET_ACCESS_KEY'],
    message: 'Set both S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY, or neither',
  })
  .refine((e) => e.NODE_ENV !== 'production' || e.BCRYPT_COST >= PRODUCTION_MIN_BCRYPT_COST, {
    path: ['BCRYPT_COST'],
    message: `BCRYPT_COST must be at least ${PRODUCTION_MIN_BCRYPT_COST} in production`,
  });

export type Env = z.infer<typeof envSchema>;

function load(): Env {
  const parsed = envSchema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    console.error(`Kettlewright cannot start: the configuration is incomplete.\n${lines.join('\n')}`);
    process.exit(1);
  }
  return parsed.data;
}

export const env = load();
export const isProduction = env.NODE_ENV === 'production';
