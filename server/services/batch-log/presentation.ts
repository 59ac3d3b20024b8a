/** The log as the API answers it: entries with the corrections that point at them, cached as JSON bytes. */
import { QueryTypes, Transaction } from 'sequelize';
import { LRUCache } from 'lru-cache';
import { sequelize } from '../../config/database';
import { BatchLogEntry, type Batch } from '../../models';
import { batchActuals } from '../../../shared/batches/brew-day';
import { notFound } from '../../errors';
import { LOG_HEAD_JOIN } from './chain';
import type { LogEntry } from '../../../shared/schemas/batch-log';

/** The columns an entry is answered with. */
type AnsweredFields = Pick<
  BatchLogEntry,
  | 'id'
  | 'batchId'
  | 'sequence'
  | 'kind'
  | 'stepKey'
  | 'data'
  | 'correctsEntryId'
  | 'reason'
  | 'authorId'
  | 'authorRole'
  | 'authorName'
  | 'meaning'
  | 'capturedAt'
  | 'receivedAt'
  | 'deviceId'
  | 'late'
  | 'hash'
>;

/** An entry as the API answers it. */
export function toLogEntry(e: AnsweredFields, correctedByIds: number[] = []): LogEntry {
  return {
    id: Number(e.id),
    batchId: e.batchId,
    sequence: e.sequence,
    kind: e.kind,
    stepKey: e.stepKey,
    data: e.data,
    correctsEntryId: e.correctsEntryId === null ? null : Number(e.correctsEntryId),
    reason: e.reason,
    authorId: e.authorId,
    authorRole: e.authorRole,
    authorName: e.authorName,
    meaning: e.meaning,
    capturedAt: new Date(e.capturedAt).toISOString(),
    receivedAt: new Date(e.receivedAt).toISOString(),
    deviceId: e.deviceId,
    late: Boolean(e.late),
    hash: e.hash,
    correctedByIds,
  };
}

/** Entries in order as the API answers them, each with the corrections that point at it. */
function toLogEntries(rows: AnsweredFields[]): LogEntry[] {
  const correctedBy = new Map<number, number[]>();
  for (const r of rows) {
    if (r.correctsEntryId !== null) {
      const target = Number(r.correctsEntryId);
      correctedBy.set(target, [...(correctedBy.get(target) ?? []), Number(r.id)]);
    }
  }
  return rows.map((r) => toLogEntry(r, correctedBy.get(Number(r.id))));
}

/** A batch's entries in order, each with the corrections that point at it. */
export async function logEntries(
  batchId: number,
  transaction?: Transaction,
): Promise<{ rows: BatchLogEntry[]; entries: LogEntry[] }> {
  const rows = await BatchLogEntry.findAll({ where: { batchId }, order: [['sequence', 'ASC']], transaction });
  return { rows, entries: toLogEntries(rows) };
}

/** Planned against actual for a batch, read from its whole log with corrections applied (shared/batches/brew-day). */
export async function batchActualsOf(
  batch: Batch,
  transaction?: Transaction,
): Promise<ReturnType<typeof batchActuals>> {
  const { entries } = await logEntries(batch.id, transaction);
  return batchActuals(batch.plan, entries);
}

/**
 * Logs as UTF-8 JSON by batch id, each with the head (last sequence and hash) it was read at. Entries are
 * never changed or deleted (the application account may only INSERT and SELECT them) and every append
 * moves the head, so a log whose head matches the batch's current head is exactly the log: never stale.
 * At most 8 MB in all (about 120 logs of 130 entries), none over 2 MB. Kept as bytes, so an answer
 * is written out as it is, without encoding (and allocating) it again for every request.
 */
const logCache = new LRUCache<number, { sequence: number; hash: string; body: Buffer }>({
  maxSize: 8 * 1024 * 1024,
  maxEntrySize: 2 * 1024 * 1024,
  sizeCalculation: (log) => log.body.length,
});

/**
 * A batch's log as the API's JSON (an array of LogEntry, UTF-8) and the head it was read at (null while empty).
 * One statement finds the batch within the brewery (404 otherwise) and its head; a second reads the
 * entries only when the cache has no log at that head.
 */
export async function batchLogJson(
  breweryId: number,
  batchId: number,
): Promise<{ body: Buffer; head: { sequence: number; hash: string } | null }> {
  const [found] = await sequelize.query<{ sequence: number | null; hash: string | null }>(
    `SELECT h.sequence, h.hash FROM batches b ${LOG_HEAD_JOIN} WHERE b.id = :batchId AND b.brewery_id = :breweryId`,
    { type: QueryTypes.SELECT, replacements: { batchId, breweryId } },
  );
  if (!found) throw notFound('This batch');
  if (found.sequence === null || found.hash === null) return { body: Buffer.from('[]'), head: null };
  const cached = logCache.get(batchId);
  if (cached && cached.sequence === Number(found.sequence) && cached.hash === found.hash) {
    return { body: cached.body, head: { sequence: cached.sequence, hash: cached.hash } };
  }
  const rows = await sequelize.query<AnsweredFields>(
    `SELECT id, batch_id AS batchId, sequence, kind, step_key AS stepKey, data, corrects_entry_id AS correctsEntryId, reason,
            author_id AS authorId, author_role AS authorRole, author_name AS authorName, meaning,
            captured_at AS capturedAt, received_at AS receivedAt, device_id AS deviceId, late, hash
       FROM batch_log_entries WHERE batch_id = :batchId ORDER BY sequence`,
    { type: QueryTypes.SELECT, replacements: { batchId } },
  );
  for (const r of rows) if (typeof r.data === 'string') r.data = JSON.parse(r.data) as Record<string, unknown>;
  const body = Buffer.from(JSON.stringify(toLogEntries(rows)));
  // Cached under the head of what was read: an entry appended since the first statement is in it.
  const last = rows.at(-1)!;
  const head = { sequence: Number(last.sequence), hash: last.hash };
  logCache.set(batchId, { ...head, body });
  return { body, head };
}
