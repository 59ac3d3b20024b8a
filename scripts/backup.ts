// npm run db:backup [FILE]: a consistent dump of Kettlewright's database (the app instance in .data/ by default).
// The dump is taken inside one transaction (--single-transaction), so it is consistent while the app keeps writing.
import { spawn } from 'node:child_process';
import { closeSync, mkdirSync, mkdtempSync, openSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { ensureInstance } from './lib/mariadb-instance';
import { APP_DATA, ROOT } from './lib/paths';

/** Where to reach a database with an account allowed to dump or load it. */
export interface DatabaseTarget {
  url: string;
}

/** Splits a mariadb:// URL into the client's options. */
export function connectionParts(url: string): {
  host: string;
  port: string;
  user: string;
  password: string;
  database: string;
} {
  const u = new URL(url.replace(/^mysql:/, 'mariadb:'));
  return {
    host: u.hostname,
    port: u.port || '3306',
    user: decodeURIComponent(u.username),
    password: decodeURIComponent(u.password),
    database: decodeURIComponent(u.pathname.replace(/^\//, '')),
  };
}

/**
 * Runs a MariaDB client program with the password in a private option file (never on the command line,
 * where other users could read it). `stdinFile`/`stdoutFile` become the program's stdin/stdout.
 */
export async function runClient(
  program: 'mariadb-dump' | 'mariadb',
  url: string,
  args: string[],
  io: { stdinFile?: string; stdoutFile?: string } = {},
): Promise<void> {
  const c = connectionParts(url);
  const dir = mkdtempSync(path.join(tmpdir(), 'kw-client-'));
  const optionFile = path.join(dir, 'client.cnf');
  writeFileSync(
    optionFile,
    `[client]\nuser=${c.user}\npassword=${c.password}\nhost=${c.host}\nport=${c.port}\nprotocol=TCP\n`,
    { mode: 0o600 },
  );
  const stdin = io.stdinFile ? openSync(io.stdinFile, 'r') : 'ignore';
  const stdout = io.stdoutFile ? openSync(io.stdoutFile, 'w', 0o600) : 'inherit';
  try {
    await new Promise<void>((resolve, reject) => {
      const child = spawn(program, [`--defaults-extra-file=${optionFile}`, ...args], {
        stdio: [stdin, stdout, 'pipe'],
      });
      let stderr = '';
      child.stderr!.on('data', (d: Buffer) => (stderr += d.toString()));
      child.on('error', reject);
      child.on('close', (code) => {
        if (code === 0) resolve();
        else reject(new Error(`${program} exited with ${code}: ${stderr.trim()}`));
      });
    });
  } finally {
    if (typeof stdin === 'number') closeSync(stdin);
    if (typeof stdout === 'number') closeSync(stdout);
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Dumps one database (schema, data, triggers, routines) into `file` in one consistent snapshot. */
export async function backupDatabase(target: DatabaseTarget, file: string): Promise<{ file: string; bytes: number }> {
  mkdirSync(path.dirname(file), { recursive: true });
  const { database } = connectionParts(target.url);
  await runClient(
    'mariadb-dump',
    target.url,
    [
      '--single-transaction',
      '--quick',
      '--routines',
      '--triggers',
      '--hex-blob',
      '--default-character-set=utf8mb4',
      '--skip-lock-tables',
      database,
    ],
    { stdoutFile: file },
  );
  return { file, bytes: statSync(file).size };
}

function defaultFile(): string {
  const stamp = new Date().toISOString().replace(/[:]/g, '-').replace(/\..*$/, 'Z');
  return path.join(ROOT, 'backups', `kettlewright-${stamp}.sql`);
}

async function main() {
  const file = path.resolve(process.argv[2] ?? defaultFile());
  const instance = await ensureInstance(APP_DATA);
  const { bytes } = await backupDatabase({ url: instance.ownerUrl }, file);
  console.log(`Backed up database '${APP_DATA.database}' to ${file} (${(bytes / 1024).toFixed(1)} KB).`);
  const shown = path.relative(process.cwd(), file);
  console.log(`Restore it with: npm run db:restore ${shown.startsWith('..') ? file : shown}`);
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  main().catch((err) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  });
}
