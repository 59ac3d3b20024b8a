import { spawn, type ChildProcess } from 'node:child_process';
import { mkdirSync, openSync } from 'node:fs';

/** Browser tests' app port; KW_E2E_PORT lets two runs share a machine. */
export const E2E_PORT = Number(process.env.KW_E2E_PORT ?? 3100);
let server: ChildProcess | undefined;

async function waitForHealth(url: string, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    try {
      const res = await fetch(url);
      if (res.ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`The app did not answer at ${url}`);
}

/** Starts the built app on its own port against the test database for the browser tests. */
export async function setup(): Promise<void> {
  mkdirSync('test-results', { recursive: true });
  const log = openSync('test-results/e2e-server.log', 'w');
  // Its own process group, so teardown stops tsx and the node process it starts.
  server = spawn('npx', ['tsx', 'tests/e2e/server.ts'], {
    env: { ...process.env, PORT: String(E2E_PORT), PUBLIC_URL: `http://127.0.0.1:${E2E_PORT}` },
    stdio: ['ignore', log, log],
    detached: true,
  });
  await waitForHealth(`http://127.0.0.1:${E2E_PORT}/api/health`, 60_000);
}

export async function teardown(): Promise<void> {
  if (server?.pid) process.kill(-server.pid, 'SIGTERM');
}
