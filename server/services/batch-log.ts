/**
 * The batch log: signed, append-only entries chained by SHA-256 per batch. Every write goes through
 * appendLogEntry, which does idempotency, the hash chain, authorship, lateness and the audit row in one transaction.
 */
import { createHash } from 'node:crypto';
import { Transaction, UniqueConstraintError } from 'sequelize';
import { sequelize } from '../config/database';
import { AuditEvent, Batch, BatchLogEntry, IdempotencyKey } from '../models';
import { badRequest, conflict, notFound, unprocessable } from '../errors';
import { fieldMessages } from '../middlewares/validate';
import { BREW_DAY_KINDS, writeMetaSchema, type ChainCheck, type LogEntry, type SignatureMeaning, type WriteMeta } from '../../shared/schemas/batch-log';
import type { Role } from '../../shared/schemas/roles';

export { batchActuals } from '../../shared/batches/brew-day';

/** An entry later than this after its capture on the device is flagged as late. */
export const LATE_AFTER_MS = 15 * 60 * 1000;
/** A device clock this far ahead of the server's is refused: a capture cannot be in the future. */
const CLOCK_SKEW_MS = 5 * 60 * 1000;
/** The previous hash of a batch's first entry. */
export const GENESIS_HASH = '0'.repeat(64);

/** Who is writing: the signed-in person (from the session, never from the body). */
export type LogActor = Pick<Express.User, 'id' | 'breweryId' | 'role' | 'displayName'>;

/**
 * What to record. `kind`, `stepKey`, `correctsEntryId`, `reason` and `meaning` have columns; every other
 * field is kept as the entry's data (measurements, note text, a cellar reading's values…).
 */
export interface NewLogEntry {
  kind: string;
  stepKey?: string | null;
  correctsEntryId?: number | null;
  reason?: string | null;
  meaning?: SignatureMeaning;
  [field: string]: unknown;
}

export interface AppendOptions {
  /** Run inside the caller's transaction (use READ COMMITTED, see below). */
  transaction?: Transaction;
  /** Runs inside the same transaction after the entry is written (e.g. a cellar reading's own row). */
  onInsert?: (entry: BatchLogEntry, transaction: Transaction) => Promise<void>;
}

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
  | 'breweryId' | 'batchId' | 'sequence' | 'kind' | 'stepKey' | 'data' | 'correctsEntryId' | 'reason' | 'authorId' | 'authorRole'
  | 'authorName' | 'meaning' | 'capturedAt' | 'receivedAt' | 'deviceId' | 'late' | 'idempotencyKey'
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

/** Reads the signed-write headers the client outbox sends; a missing or malformed one answers 400. */
export function writeMetaFromHeaders(get: (name: string) => string | undefined): WriteMeta {
  const parsed = writeMetaSchema.safeParse({
    idempotencyKey: get('idempotency-key'),
    capturedAt: get('x-captured-at'),
    deviceId: get('x-device-id'),
  });
  if (!parsed.success) throw badRequest('This write is missing its device details', fieldMessages(parsed.error));
  return parsed.data;
}

const requestHash = (batchId: number, input: NewLogEntry, meta: WriteMeta) =>
  sha256(canonicalJson({ scope: 'batch-log', batchId, input, capturedAt: meta.capturedAt.toISOString(), deviceId: meta.deviceId }));

async function findReplay(breweryId: number, batchId: number, input: NewLogEntry, meta: WriteMeta, transaction?: Transaction): Promise<BatchLogEntry | null> {
  const existing = await IdempotencyKey.findOne({ where: { breweryId, key: meta.idempotencyKey }, transaction });
  if (!existing) return null;
  if (existing.scope !== 'batch-log' || existing.requestHash !== requestHash(batchId, input, meta)) {
    throw unprocessable('This idempotency key was already used for a different request. Nothing was saved.');
  }
  const entry = await BatchLogEntry.findByPk(existing.resultId, { transaction });
  if (!entry) throw notFound('The entry for this idempotency key');
  return entry;
}

/** Whether the brew day of a batch has been signed off. */
export async function brewDaySigned(batchId: number, transaction?: Transaction): Promise<boolean> {
  return (await BatchLogEntry.count({ where: { batchId, kind: 'sign_off' }, transaction })) > 0;
}

async function append(actor: LogActor, batchId: number, input: NewLogEntry, meta: WriteMeta, options: AppendOptions, transaction: Transaction): Promise<BatchLogEntry> {
  // Locking the batch row serialises writers of one batch, so the chain never forks.
  const batch = await Batch.findOne({ where: { id: batchId, breweryId: actor.breweryId }, lock: transaction.LOCK.UPDATE, transaction });
  if (!batch) throw notFound('This batch');
  const replay = await findReplay(actor.breweryId, batchId, input, meta, transaction);
  if (replay) return replay;

  const receivedAt = new Date();
  if (meta.capturedAt.getTime() > receivedAt.getTime() + CLOCK_SKEW_MS) {
    throw unprocessable('The captured time is in the future: check the tablet’s clock. Nothing was saved.');
  }
  const { kind, stepKey = null, correctsEntryId = null, reason = null, meaning = 'performed', ...data } = input;
  if (BREW_DAY_KINDS.includes(kind) && (await brewDaySigned(batchId, transaction))) {
    throw conflict('The brew day is signed off: add a correction instead.');
  }
  if (correctsEntryId !== null) {
    const target = await BatchLogEntry.findOne({ where: { id: correctsEntryId, batchId }, transaction });
    if (!target) throw unprocessable('The entry to correct is not in this batch’s log.');
    if (target.kind === 'sign_off') throw unprocessable('A signature cannot be corrected.');
  }

  const previous = await BatchLogEntry.findOne({ where: { batchId }, order: [['sequence', 'DESC']], transaction });
  const prevHash = previous?.hash ?? GENESIS_HASH;
  const fields = {
    breweryId: actor.breweryId,
    batchId,
    sequence: (previous?.sequence ?? 0) + 1,
    kind,
    stepKey,
    data,
    correctsEntryId,
    reason,
    authorId: actor.id,
    authorRole: actor.role as Role,
    authorName: actor.displayName,
    meaning,
    capturedAt: meta.capturedAt,
    receivedAt,
    deviceId: meta.deviceId,
    late: receivedAt.getTime() - meta.capturedAt.getTime() > LATE_AFTER_MS,
    idempotencyKey: meta.idempotencyKey,
  };
  const entry = await BatchLogEntry.create({ ...fields, prevHash, hash: entryHash(prevHash, fields) }, { transaction });
  await IdempotencyKey.create(
    { breweryId: actor.breweryId, key: meta.idempotencyKey, requestHash: requestHash(batchId, input, meta), scope: 'batch-log', resultId: entry.id },
    { transaction },
  );
  await AuditEvent.create(
    { breweryId: actor.breweryId, userId: actor.id, action: 'batch-log.append', detail: { batchId, entryId: entry.id, kind }, ip: null, userAgent: null, requestId: null },
    { transaction },
  );
  // The first brew-day step starts the brew.
  if (kind === 'step' && batch.status === 'planned') await batch.update({ status: 'brewing' }, { transaction });
  await options.onInsert?.(entry, transaction);
  return entry;
}

/**
 * Appends one entry to a batch's log and returns it. The same idempotency key with the same request
 * returns the first entry; with a different request answers 422. READ COMMITTED so a writer that waited
 * on the batch lock sees what the one before it committed.
 */
export async function appendLogEntry(actor: LogActor, batchId: number, input: NewLogEntry, meta: WriteMeta, options: AppendOptions = {}): Promise<BatchLogEntry> {
  if (options.transaction) return append(actor, batchId, input, meta, options, options.transaction);
  try {
    return await sequelize.transaction({ isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED }, (t) => append(actor, batchId, input, meta, options, t));
  } catch (error) {
    // The same key raced in on another batch: the unique index kept one; answer as a replay would.
    if (error instanceof UniqueConstraintError) {
      const replay = await findReplay(actor.breweryId, batchId, input, meta);
      if (replay) return replay;
    }
    throw error;
  }
}

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
    if (problem) return { ok: false, checked: i + 1, firstBad: { entryId: Number(e.id), sequence: Number(e.sequence), problem } };
    prevHash = e.hash;
  }
  return { ok: true, checked: entries.length, firstBad: null };
}

/** An entry as the API answers it. */
export function toLogEntry(e: BatchLogEntry, correctedByIds: number[] = []): LogEntry {
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

/** A batch's entries in order, each with the corrections that point at it. */
export async function logEntries(batchId: number, transaction?: Transaction): Promise<{ rows: BatchLogEntry[]; entries: LogEntry[] }> {
  const rows = await BatchLogEntry.findAll({ where: { batchId }, order: [['sequence', 'ASC']], transaction });
  const correctedBy = new Map<number, number[]>();
  for (const r of rows) {
    if (r.correctsEntryId !== null) {
      const target = Number(r.correctsEntryId);
      correctedBy.set(target, [...(correctedBy.get(target) ?? []), Number(r.id)]);
    }
  }
  return { rows, entries: rows.map((r) => toLogEntry(r, correctedBy.get(Number(r.id)))) };
}
