// Shared by the fault scripts and the benchmark: a private MariaDB instance in its own data folder and port,
// and the API running as a separate process against it, so either can be killed and restarted.
import { spawn, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { createInterface } from 'node:readline';
import path from 'node:path';
import { ensureInstance, type Instance, type InstanceOptions } from './lib/mariadb-instance';
import { ROOT } from './lib/paths';
import { migrateDatabase } from './restore';

/** Starts (or reuses) the instance, optionally with a fresh database, and applies every migration. */
export async function prepareInstance(options: InstanceOptions & { fresh?: boolean }): Promise<Instance> {
  const instance = await ensureInstance(options);
  migrateDatabase(instance.ownerUrl, instance.credentials.appUser);
  return instance;
}

/** The environment the API process runs with against `instance`. */
export function apiEnv(
  instance: Instance,
  port: number,
  overrides: Record<string, string> = {},
): Record<string, string> {
  return {
    NODE_ENV: 'test',
    LOG_LEVEL: 'silent',
    HOST: '127.0.0.1',
    PORT: String(port),
    DATABASE_URL: instance.appUrl,
    SESSION_SECRET: randomBytes(36).toString('base64url'),
    SMTP_URL: 'smtp://127.0.0.1:9', // nothing in these runs sends mail
    PUBLIC_URL: `http://127.0.0.1:${port}`,
    ...overrides,
  };
}

export interface ApiProcess {
  child: ChildProcess;
  /** What the process printed on its READY line (seeded ids, credentials). */
  ready: Record<string, unknown>;
  url: string;
  /** SIGTERM (or the given signal) and wait for the exit. */
  stop(signal?: NodeJS.Signals): Promise<void>;
}

/**
 * Runs scripts/fault-server.ts as its own process. With `seed`, the process first creates a brewery, its
 * people and `batches` planned batches, and reports them on its READY line.
 */
export async function startApi(
  env: Record<string, string>,
  options: { seed?: { batches: number } } = {},
): Promise<ApiProcess> {
  const args = ['--import', 'tsx', path.join(ROOT, 'scripts/fault-server.ts')];
  if (options.seed) args.push('--seed', String(options.seed.batches));
  const child = spawn(process.execPath, args, {
    cwd: ROOT,
    env: { ...process.env, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let stderr = '';
  child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
  const ready = await new Promise<Record<string, unknown>>((resolve, reject) => {
    const lines = createInterface({ input: child.stdout });
    lines.on('line', (line) => {
      if (line.startsWith('READY ')) resolve(JSON.parse(line.slice(6)) as Record<string, unknown>);
    });
    child.once('exit', (code) => reject(new Error(`The API process exited (${code}) before it was ready:\n${stderr}`)));
  });
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  return {
    child,
    ready,
    url: `http://127.0.0.1:${env.PORT}`,
    async stop(signal: NodeJS.Signals = 'SIGTERM') {
      if (child.exitCode === null && child.signalCode === null) child.kill(signal);
      await exited;
    },
  };
}

/** Signs in through the API and returns the session cookie. */
export async function signIn(url: string, email: string, password: string): Promise<string> {
  const res = await fetch(`${url}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-kettlewright': '1' },
    body: JSON.stringify({ email, password }),
  });
  if (res.status !== 200) throw new Error(`sign-in as ${email} answered ${res.status}: ${await res.text()}`);
  const cookie = res.headers.getSetCookie().find((c) => c.includes('='));
  if (!cookie) throw new Error('sign-in set no cookie');
  return cookie.split(';')[0]!;
}

/** A numeric command-line option of the long-form fault runs (`--entries 500`), or its default. */
export function numberArg(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? Number(process.argv[i + 1]) : fallback;
}
