/**
 * The log's chain: each entry's SHA-256 over the previous entry's hash and its own canonical content,
 * so a changed, removed or reordered entry shows.
 */
import { createHash } from 'node:crypto';
import { BatchLogEntry } from '../../models';
import type { ChainCheck } from '../../../shared/schemas/batch-log';

/** The previous hash of a batch's first entry. */
export const GENESIS_HASH = '0'.repeat(64);

/** JSON with object keys sorted at every level: the same content always gives the same bytes. */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value ?? null);
  if (value instanceof Date) return JSON.stringify(value.toISOString());
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
}

export const sha256 = (text: string) => createHash('sha256').update(text, 'utf8').digest('hex');

type Hashable = Pick<
  BatchLogEntry,
  | 'breweryId'
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
  | 'idempotencyKey'
>;

/** Everything an entry records, in one canonical form (ids as numbers, times as ISO UTC). */
export function entryContent(e: Hashable): Record<string, unknown> {
  return {
    breweryId: Number(e.breweryId),
    batchId: Number(e.batchId),
    sequence: Number(e.sequence),
    kind: e.kind,
    stepKey: e.stepKey ?? null,
    data: e.data,
    correctsEntryId: e.correctsEntryId === null || e.correctsEntryId === undefined ? null : Number(e.correctsEntryId),
    reason: e.reason ?? null,
    authorId: Number(e.authorId),
    authorRole: e.authorRole,
    authorName: e.authorName,
    meaning: e.meaning,
    capturedAt: new Date(e.capturedAt).toISOString(),
    receivedAt: new Date(e.receivedAt).toISOString(),
    deviceId: e.deviceId,
    late: Boolean(e.late),
    idempotencyKey: e.idempotencyKey,
  };
}

/** SHA-256 over the previous entry's hash and this entry's canonical content. */
export const entryHash = (prevHash: string, e: Hashable) => sha256(`${prevHash}\n${canonicalJson(entryContent(e))}`);

/** The newest entry of the batch (`h`), joined to the batch `b`: the log's head that the next entry chains to. */
export const LOG_HEAD_JOIN = `LEFT JOIN batch_log_entries h
       ON h.batch_id = b.id AND h.sequence = (SELECT MAX(x.sequence) FROM batch_log_entries x WHERE x.batch_id = b.id)`;

/** Recomputes a batch's chain and names the first entry whose hash does not match. */
export async function verifyChain(batchId: number): Promise<ChainCheck> {
  const entries = await BatchLogEntry.findAll({ where: { batchId }, order: [['sequence', 'ASC']] });
  let prevHash = GENESIS_HASH;
  for (const [i, e] of entries.entries()) {
    const problem =
      Number(e.sequence) !== i + 1
        ? 'an entry is missing before this one'
        : e.prevHash !== prevHash
          ? 'it does not point at the entry before it'
          : e.hash !== entryHash(prevHash, e)
            ? 'its content no longer matches its hash'
            : null;
    if (problem)
      return { ok: false, checked: i + 1, firstBad: { entryId: Number(e.id), sequence: Number(e.sequence), problem } };
    prevHash = e.hash;
  }
  return { ok: true, checked: entries.length, firstBad: null };
}
