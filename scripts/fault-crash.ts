// Crash fault: concurrent log-entry POSTs against the running API; `kill -9` the MariaDB server mid-run; restart it.
// Every entry answered 201 must be present with its audit row and idempotency record, and no entry may be half
// written. Then every unanswered request is sent again with its original key (as the tablet's outbox does), and
// the log ends with exactly one entry per request.
// Long form by hand: npx tsx scripts/fault-crash.ts --entries 2000 --rounds 3
import { randomUUID } from 'node:crypto';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import * as mariadb from 'mariadb';
import { startMariaDb, stopMariaDb } from './lib/mariadb-instance';
import { ROOT } from './lib/paths';
import { apiEnv, numberArg, prepareInstance, signIn, startApi, type ApiProcess } from './fault-harness';
import { connectionParts } from './backup';

export const FAULT_DATA = {
  dataDir: path.join(ROOT, '.data-fault'),
  port: Number(process.env.KW_FAULT_DB_PORT ?? 3309),
  database: 'kettlewright_fault',
};
const API_PORT = Number(process.env.KW_FAULT_API_PORT ?? 3190);

interface Sent {
  key: string;
  batchId: number;
  capturedAt: string;
  body: { kind: 'note'; text: string };
  status: number | 'network';
  entryId?: number;
}

export interface CrashReport {
  rounds: number;
  sent: number;
  answered201BeforeRestart: number;
  failedDuringOutage: Record<string, number>;
  ackedMissing: number;
  ackedWithoutAudit: number;
  ackedWithoutIdempotency: number;
  halfWritten: number;
  resent: number;
  finalEntries: number;
  duplicateKeys: number;
  chainsBroken: number;
}

async function post(api: string, cookie: string, s: Sent): Promise<void> {
  try {
    const res = await fetch(`${api}/api/batches/${s.batchId}/log`, {
      method: 'POST',
      headers: {
        'content-type': 'application/json',
        'x-kettlewright': '1',
        cookie,
        'Idempotency-Key': s.key,
        'X-Captured-At': s.capturedAt,
        'X-Device-Id': 'fault-tablet',
      },
      body: JSON.stringify(s.body),
      signal: AbortSignal.timeout(60_000),
    });
    s.status = res.status;
    const body = (await res.json().catch(() => null)) as { id?: number } | null;
    if (res.status === 201) s.entryId = body?.id;
  } catch {
    s.status = 'network';
  }
}

async function waitForHealth(api: string, timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const ok = await fetch(`${api}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (ok) return;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error('The API did not report a healthy database after the restart');
}

/** Runs `rounds` crash rounds of `entries` concurrent POSTs each; returns the counts. */
export async function runCrashFault(options: {
  entries: number;
  rounds?: number;
  log?: (line: string) => void;
}): Promise<CrashReport> {
  const log = options.log ?? console.log;
  const rounds = options.rounds ?? 1;
  const instance = await prepareInstance({ ...FAULT_DATA, fresh: true });
  let api: ApiProcess | undefined;
  const report: CrashReport = {
    rounds,
    sent: 0,
    answered201BeforeRestart: 0,
    failedDuringOutage: {},
    ackedMissing: 0,
    ackedWithoutAudit: 0,
    ackedWithoutIdempotency: 0,
    halfWritten: 0,
    resent: 0,
    finalEntries: 0,
    duplicateKeys: 0,
    chainsBroken: 0,
  };
  try {
    api = await startApi(apiEnv(instance, API_PORT), { seed: { batches: 20 } });
    const { emails, password, batchIds, breweryId } = api.ready as {
      emails: Record<string, string>;
      password: string;
      batchIds: number[];
      breweryId: number;
    };
    const cookie = await signIn(api.url, emails.assistant_brewer!, password);
    const all: Sent[] = [];

    // A round counts when the kill landed mid-run (some requests answered 201, some not). The kill comes
    // once a quarter of the round has been answered 201, while the rest are in flight or waiting on a batch's lock.
    for (let round = 1, attempts = 0; round <= rounds; attempts++) {
      if (attempts >= rounds * 5) throw new Error('The kill never landed mid-run');
      const sends: Sent[] = Array.from({ length: options.entries }, (_, i) => ({
        key: randomUUID(),
        batchId: batchIds[i % batchIds.length]!,
        capturedAt: new Date().toISOString(),
        body: { kind: 'note', text: `Crash round ${round}, entry ${i + 1}` },
        status: 'network',
      }));
      all.push(...sends);
      report.sent += sends.length;
      let killed: Promise<boolean> | undefined;
      let answered = 0;
      const inFlight = Promise.all(
        sends.map((s) =>
          post(api!.url, cookie, s).then(() => {
            if (s.status === 201 && ++answered >= sends.length / 4)
              killed ??= stopMariaDb(FAULT_DATA.dataDir, 'SIGKILL');
          }),
        ),
      );
      await inFlight;
      await (killed ?? stopMariaDb(FAULT_DATA.dataDir, 'SIGKILL'));
      await startMariaDb(FAULT_DATA);
      await waitForHealth(api.url);
      const acked = sends.filter((s) => s.status === 201).length;
      report.answered201BeforeRestart += acked;
      for (const s of sends.filter((x) => x.status !== 201)) {
        report.failedDuringOutage[String(s.status)] = (report.failedDuringOutage[String(s.status)] ?? 0) + 1;
      }
      log(`round ${round}: ${acked}/${sends.length} answered 201 before MariaDB was killed and restarted`);
      if (acked > 0 && acked < sends.length) round++;
    }

    // What the database kept for every 201.
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
      for (const s of all.filter((x) => x.status === 201)) {
        const [entry] = await conn.query<{ id: number }[]>(
          'SELECT id FROM batch_log_entries WHERE brewery_id = ? AND idempotency_key = ?',
          [breweryId, s.key],
        );
        if (!entry || entry.id !== s.entryId) report.ackedMissing += 1;
        const [idem] = await conn.query<{ n: number }[]>(
          'SELECT COUNT(*) AS n FROM idempotency_keys WHERE brewery_id = ? AND `key` = ? AND result_id = ?',
          [breweryId, s.key, s.entryId],
        );
        if (idem!.n !== 1) report.ackedWithoutIdempotency += 1;
        const [audit] = await conn.query<{ n: number }[]>(
          "SELECT COUNT(*) AS n FROM audit_events WHERE brewery_id = ? AND action = 'batch-log.append' AND JSON_VALUE(detail, '$.entryId') = ?",
          [breweryId, s.entryId],
        );
        if (audit!.n !== 1) report.ackedWithoutAudit += 1;
      }
      // Half-written: an entry without its idempotency record or audit row, or a record without its entry.
      const [half] = await conn.query<{ n: number }[]>(
        `SELECT
           (SELECT COUNT(*) FROM batch_log_entries e LEFT JOIN idempotency_keys k ON k.brewery_id = e.brewery_id AND k.key = e.idempotency_key WHERE k.id IS NULL)
         + (SELECT COUNT(*) FROM idempotency_keys k LEFT JOIN batch_log_entries e ON e.id = k.result_id WHERE e.id IS NULL)
         + (SELECT COUNT(*) FROM batch_log_entries e WHERE NOT EXISTS (
              SELECT 1 FROM audit_events a WHERE a.action = 'batch-log.append' AND JSON_VALUE(a.detail, '$.entryId') = e.id)) AS n`,
      );
      report.halfWritten = half!.n;

      // The outbox's part: send every unanswered request again with its original key.
      const unanswered = all.filter((s) => s.status !== 201);
      report.resent = unanswered.length;
      for (let i = 0; i < unanswered.length; i += 25)
        await Promise.all(unanswered.slice(i, i + 25).map((s) => post(api!.url, cookie, s)));
      const stillFailing = unanswered.filter((s) => s.status !== 201).length;
      if (stillFailing) throw new Error(`${stillFailing} requests still failed after MariaDB came back`);

      const [final] = await conn.query<{ n: number; keys: number }[]>(
        'SELECT COUNT(*) AS n, COUNT(DISTINCT idempotency_key) AS `keys` FROM batch_log_entries WHERE brewery_id = ?',
        [breweryId],
      );
      report.finalEntries = final!.n;
      report.duplicateKeys = final!.n - final!.keys;
    } finally {
      await conn.end();
    }
    for (const batchId of batchIds) {
      const res = await fetch(`${api.url}/api/batches/${batchId}/log/verify`, { headers: { cookie } });
      const body = (await res.json()) as { ok?: boolean };
      if (res.status !== 200 || !body.ok) report.chainsBroken += 1;
    }
    log(
      `crash fault: ${report.sent} sent over ${rounds} round(s); ${report.answered201BeforeRestart} answered 201 before the restart ` +
        `(failed meanwhile: ${JSON.stringify(report.failedDuringOutage)}); 201s missing ${report.ackedMissing}, without audit row ` +
        `${report.ackedWithoutAudit}, without idempotency record ${report.ackedWithoutIdempotency}; half-written ${report.halfWritten}; ` +
        `resent ${report.resent} with their keys; final entries ${report.finalEntries} (duplicates ${report.duplicateKeys}); broken chains ${report.chainsBroken}`,
    );
    return report;
  } finally {
    await api?.stop();
    await stopMariaDb(FAULT_DATA.dataDir);
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  runCrashFault({ entries: numberArg('entries', 200), rounds: numberArg('rounds', 1) }).then(
    (r) => {
      const ok =
        r.ackedMissing +
          r.ackedWithoutAudit +
          r.ackedWithoutIdempotency +
          r.halfWritten +
          r.duplicateKeys +
          r.chainsBroken ===
          0 && r.finalEntries === r.sent;
      console.log(ok ? 'PASS: nothing answered 201 was lost, nothing half-written, every entry exactly once.' : 'FAIL');
      process.exit(ok ? 0 : 1);
    },
    (err) => {
      console.error(err instanceof Error ? err.stack : err);
      process.exit(1);
    },
  );
}
