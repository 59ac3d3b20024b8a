// Backups: a dump taken while the app is up restores into a fresh database with every row and every batch log's chain head.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import * as mariadb from 'mariadb';
import { afterAll, describe, expect, it } from 'vitest';
import { backupDatabase, connectionParts } from '../../scripts/backup';
import { restoreDatabase, urlForDatabase } from '../../scripts/restore';
import { createTestBrewery } from './helpers';
import { plannedBatch, writeHeaders } from './batch-fixtures';

const ownerUrl = process.env.KW_OWNER_DATABASE_URL!;
const appUser = connectionParts(process.env.DATABASE_URL!).user;
const source = connectionParts(ownerUrl).database;
const scratch = `${source}_restore`;
const dir = mkdtempSync(path.join(tmpdir(), 'kw-backup-'));

async function withConnection<T>(database: string, fn: (conn: mariadb.Connection) => Promise<T>): Promise<T> {
  const c = connectionParts(urlForDatabase(ownerUrl, database));
  const conn = await mariadb.createConnection({
    host: c.host,
    port: Number(c.port),
    user: c.user,
    password: c.password,
    database,
    bigIntAsNumber: true,
  });
  try {
    return await fn(conn);
  } finally {
    await conn.end();
  }
}

interface Fingerprint {
  triggers: string[];
  rows: Record<string, number>;
  checksums: Record<string, number>;
  chainHeads: Record<string, string>;
}

/** The triggers, row count and CHECKSUM TABLE of every table, and the newest hash of each batch's log. */
async function fingerprint(database: string): Promise<Fingerprint> {
  return withConnection(database, async (conn) => {
    const tables = (
      await conn.query<{ name: string }[]>(
        'SELECT TABLE_NAME AS name FROM information_schema.TABLES WHERE TABLE_SCHEMA = ? ORDER BY TABLE_NAME',
        [database],
      )
    ).map((t) => t.name);
    const rows: Record<string, number> = {};
    const checksums: Record<string, number> = {};
    for (const table of tables) {
      const [r] = await conn.query<{ n: number }[]>(`SELECT COUNT(*) AS n FROM \`${table}\``);
      rows[table] = r!.n;
      const [c] = await conn.query<{ Checksum: number }[]>(`CHECKSUM TABLE \`${table}\` EXTENDED`);
      checksums[table] = c!.Checksum;
    }
    // Each batch log's newest hash: it commits to every entry before it.
    const heads = await conn.query<{ batchId: number; hash: string }[]>(
      `SELECT e.batch_id AS batchId, e.hash FROM batch_log_entries e
        WHERE e.sequence = (SELECT MAX(x.sequence) FROM batch_log_entries x WHERE x.batch_id = e.batch_id)`,
    );
    const triggers = (
      await conn.query<{ name: string }[]>(
        'SELECT TRIGGER_NAME AS name FROM information_schema.TRIGGERS WHERE TRIGGER_SCHEMA = ? ORDER BY TRIGGER_NAME',
        [database],
      )
    ).map((t) => t.name);
    return { triggers, rows, checksums, chainHeads: Object.fromEntries(heads.map((h) => [String(h.batchId), h.hash])) };
  });
}

afterAll(async () => {
  await withConnection(source, (conn) => conn.query(`DROP DATABASE IF EXISTS \`${scratch}\``));
  rmSync(dir, { recursive: true, force: true });
});

describe('backup and restore', () => {
  it('restores a dump into a fresh database with the same rows, checksums and log chain heads', async () => {
    const t = await createTestBrewery();
    await t.as.head_brewer.patch('/api/brewery').send({ name: 'Backup Test Brewing — “quoted” ünïcode 🍺' });
    const batch = await plannedBatch({ id: t.users.head_brewer.id, breweryId: t.brewery.id });
    for (const text of ['Mash in at 152 °F', 'Stuck sparge — added rice hulls', 'Knockout, 10.2 bbl']) {
      const res = await t.as.assistant_brewer
        .post(`/api/batches/${batch.id}/log`)
        .set(writeHeaders())
        .send({ kind: 'note', text });
      expect(res.status).toBe(201);
    }

    const file = path.join(dir, 'kettlewright.sql');
    const before = await fingerprint(source);
    const { bytes } = await backupDatabase({ url: ownerUrl }, file);
    expect(bytes).toBeGreaterThan(1000);

    await restoreDatabase({ ownerUrl, appUser, database: scratch, file, replace: true });
    const after = await fingerprint(scratch);

    expect(Object.keys(before.rows).length).toBeGreaterThan(3);
    expect(before.rows.breweries).toBeGreaterThan(0);
    // The trigger that writes each log entry's idempotency record and audit row comes back too.
    expect(before.triggers).toContain('batch_log_entries_after_insert');
    expect(after.triggers).toEqual(before.triggers);
    expect(after.rows).toEqual(before.rows);
    expect(after.checksums).toEqual(before.checksums);
    expect(before.chainHeads[String(batch.id)]).toMatch(/^[0-9a-f]{64}$/);
    expect(after.chainHeads).toEqual(before.chainHeads);
  });

  it('refuses to restore over a database that already holds tables', async () => {
    const file = path.join(dir, 'again.sql');
    await backupDatabase({ url: ownerUrl }, file);
    await expect(restoreDatabase({ ownerUrl, appUser, database: source, file })).rejects.toThrow(/already holds/);
  });
});
