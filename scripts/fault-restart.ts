// Restart fault: the tablet's outbox (the same createOutbox the browser uses, with an in-memory store) sends
// log entries one by one while the API process is killed (SIGKILL, mid-request) and started again. Every entry
// must arrive exactly once, in the order it was logged.
// Long form by hand: npx tsx scripts/fault-restart.ts --entries 500 --restarts 5
import { pathToFileURL } from 'node:url';
import * as mariadb from 'mariadb';
import { stopMariaDb } from './lib/mariadb-instance';
import { apiEnv, numberArg, prepareInstance, signIn, startApi, type ApiProcess } from './fault-harness';
import { FAULT_DATA } from './fault-crash';
import { connectionParts } from './backup';
import { createOutbox, sendItem, type OutboxItem, type OutboxStore } from '../src/lib/outbox-queue';

const API_PORT = Number(process.env.KW_FAULT_API_PORT ?? 3190);

export interface RestartReport {
  enqueued: number;
  restarts: number;
  retriesSeen: number;
  arrived: number;
  duplicates: number;
  outOfOrder: number;
}

/** An outbox store kept in memory: the browser keeps the same list in IndexedDB. */
function memoryStore(): OutboxStore {
  let items: OutboxItem[] = [];
  return {
    get: async () => items,
    update: async (fn) => {
      items = fn(items);
    },
  };
}

export async function runRestartFault(options: {
  entries: number;
  restarts: number;
  log?: (line: string) => void;
}): Promise<RestartReport> {
  const log = options.log ?? console.log;
  const instance = await prepareInstance({ ...FAULT_DATA, fresh: true });
  // One environment for every start: the same session secret keeps the tablet signed in across restarts.
  const env = apiEnv(instance, API_PORT);
  let api: ApiProcess | undefined = await startApi(env, { seed: { batches: 1 } });
  const { emails, password, batchIds, breweryId } = api.ready as {
    emails: Record<string, string>;
    password: string;
    batchIds: number[];
    breweryId: number;
  };
  const base = api.url;
  const cookie = await signIn(base, emails.assistant_brewer!, password);

  // The outbox's sendItem runs as in the browser; Node has no cookie jar, so lend it the session cookie.
  const realFetch = globalThis.fetch;
  globalThis.fetch = (input, init) =>
    realFetch(input, { ...init, headers: { ...(init?.headers as Record<string, string>), cookie } });
  const device = `dev-${crypto.randomUUID()}`;

  const report: RestartReport = { enqueued: 0, restarts: 0, retriesSeen: 0, arrived: 0, duplicates: 0, outOfOrder: 0 };
  let sent = 0;
  const box = createOutbox(memoryStore(), async (item) => {
    const result = await sendItem(item, device);
    if (result.kind === 'retry') report.retriesSeen += 1;
    if (result.kind === 'rejected') throw new Error(`The server rejected entry ${item.label}: ${result.message}`);
    return result;
  });
  box.onSent(() => {
    sent += 1;
  });
  // The outbox sends only the signed-in person's writes; the cookie above is the assistant's session.
  box.setUser({ id: 0, displayName: emails.assistant_brewer! });
  const keys: string[] = [];
  try {
    const restartEvery = Math.floor(options.entries / (options.restarts + 1));
    for (let i = 1; i <= options.entries; i++) {
      const item = await box.enqueue({
        url: `${base}/api/batches/${batchIds[0]}/log`,
        body: { kind: 'note', text: `Outbox entry ${i}` },
        label: `entry ${i}`,
        group: `batch:${batchIds[0]}`,
      });
      keys.push(item.idempotencyKey);
      if (i % restartEvery === 0 && report.restarts < options.restarts) {
        // Kill while the outbox is mid-send (a few entries still waiting), then bring the API back after a pause.
        const caughtUp = Date.now() + 30_000;
        while (sent < i - 3 && Date.now() < caughtUp) await new Promise((r) => setTimeout(r, 2));
        await api.stop('SIGKILL');
        report.restarts += 1;
        await new Promise((r) => setTimeout(r, 300));
        api = await startApi(env);
        log(`restart ${report.restarts}: API killed after ${sent} entries were confirmed, started again`);
      } else {
        await new Promise((r) => setTimeout(r, 5));
      }
    }
    // Let the outbox finish (its backoff retries come by themselves); nudge it the way the 'online' event would.
    const deadline = Date.now() + 120_000;
    while (box.getSnapshot().items.length > 0 || sent < options.entries) {
      if (Date.now() > deadline) throw new Error(`The outbox still holds ${box.getSnapshot().items.length} entries`);
      await box.flush();
      await new Promise((r) => setTimeout(r, 100));
    }
    report.enqueued = keys.length;

    const c = connectionParts(instance.ownerUrl);
    const conn = await mariadb.createConnection({
      host: c.host,
      port: Number(c.port),
      user: c.user,
      password: c.password,
      database: c.database,
      bigIntAsNumber: true,
    });
    try {
      const rows = await conn.query<{ key: string }[]>(
        'SELECT idempotency_key AS `key` FROM batch_log_entries WHERE brewery_id = ? AND batch_id = ? ORDER BY sequence',
        [breweryId, batchIds[0]],
      );
      report.arrived = rows.length;
      report.duplicates = rows.length - new Set(rows.map((r) => r.key)).size;
      report.outOfOrder = rows.filter((r, i) => r.key !== keys[i]).length;
    } finally {
      await conn.end();
    }
    log(
      `restart fault: ${report.enqueued} entries through the outbox, API killed and restarted ${report.restarts} times, ` +
        `${report.retriesSeen} sends retried; arrived ${report.arrived}, duplicates ${report.duplicates}, out of order ${report.outOfOrder}`,
    );
    return report;
  } finally {
    globalThis.fetch = realFetch;
    await api?.stop();
    await stopMariaDb(FAULT_DATA.dataDir);
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  runRestartFault({ entries: numberArg('entries', 60), restarts: numberArg('restarts', 2) }).then(
    (r) => {
      const ok = r.arrived === r.enqueued && r.duplicates === 0 && r.outOfOrder === 0;
      console.log(ok ? 'PASS: every entry arrived exactly once, in order.' : 'FAIL');
      process.exit(ok ? 0 : 1);
    },
    (err) => {
      console.error(err instanceof Error ? err.stack : err);
      process.exit(1);
    },
  );
}
