/**
 * Appending to the batch log: every write goes through appendLogEntry (or, for a probe file's many readings,
 * appendLogEntries), which does idempotency, the hash chain, authorship, lateness and the audit row in one
 * transaction (the table's insert trigger writes the idempotency record and the audit row with the entry,
 * see migration 0901).
 */
import { QueryTypes, Transaction, UniqueConstraintError } from 'sequelize';
import { sequelize } from '../../config/database';
import { Batch, BatchLogEntry, IdempotencyKey } from '../../models';
import { badRequest, notFound, signedOff, unprocessable } from '../../errors';
import { fieldMessages } from '../../middlewares/validate';
import { canonicalJson, entryHash, GENESIS_HASH, LOG_HEAD_JOIN, sha256 } from './chain';
import { checkCorrectionTarget } from './corrections';
import {
  BREW_DAY_KINDS,
  CLOSED_BY_SIGN_OFF,
  writeMetaSchema,
  type SignatureMeaning,
  type WriteMeta,
} from '../../../shared/schemas/batch-log';

/** An entry later than this after its capture on the device is flagged as late. */
const LATE_AFTER_MS = 15 * 60 * 1000;
/** A device clock this far ahead of the server's is refused: a capture cannot be in the future. */
const CLOCK_SKEW_MS = 5 * 60 * 1000;
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
  sha256(
    canonicalJson({
      scope: 'batch-log',
      batchId,
      input,
      capturedAt: meta.capturedAt.toISOString(),
      deviceId: meta.deviceId,
    }),
  );

/** The answer to a write whose idempotency key was used before: its entry, or 422 for a different request. */
async function replayOf(
  key: { scope: string; requestHash: string; resultId: number },
  expectedHash: string,
  transaction?: Transaction,
): Promise<BatchLogEntry> {
  if (key.scope !== 'batch-log' || key.requestHash !== expectedHash) {
    throw unprocessable('This idempotency key was already used for a different request. Nothing was saved.');
  }
  const entry = await BatchLogEntry.findByPk(key.resultId, { transaction });
  if (!entry) throw notFound('The entry for this idempotency key');
  return entry;
}

async function findReplay(
  breweryId: number,
  batchId: number,
  input: NewLogEntry,
  meta: WriteMeta,
): Promise<BatchLogEntry | null> {
  const existing = await IdempotencyKey.findOne({ where: { breweryId, key: meta.idempotencyKey } });
  return existing ? replayOf(existing, requestHash(batchId, input, meta)) : null;
}

/** Whether the brew day of a batch has been signed off. */
export async function brewDaySigned(batchId: number, transaction?: Transaction): Promise<boolean> {
  return (await BatchLogEntry.count({ where: { batchId, kind: 'sign_off' }, transaction })) > 0;
}

interface AppendState {
  status: string;
  lastSequence: number | null;
  lastHash: string | null;
  keyScope: string | null;
  keyRequestHash: string | null;
  keyResultId: number | null;
  /** The kind of the entry to correct, when it is in this batch's log. */
  targetKind: string | null;
  signed: number;
}

/**
 * Everything an append decides on, in one locking read: the batch (scoped to the brewery), its log's head,
 * this write's idempotency record (when a key is given) and, when asked, the entry to correct and whether the brew day is signed.
 * Locking the batch row serialises the writers of one batch, so the chain never forks (the unique
 * (batch_id, sequence) index would refuse a fork anyway). READ COMMITTED keeps the read to the rows it finds:
 * no gap locks on the idempotency index, where writers of different batches would otherwise deadlock.
 */
async function lockForAppend(
  breweryId: number,
  batchId: number,
  key: string | null,
  correctsEntryId: number | null,
  checkSigned: boolean,
  transaction: Transaction,
) {
  const [state] = await sequelize.query<AppendState>(
    `SELECT b.status, h.sequence AS lastSequence, h.hash AS lastHash,
            k.scope AS keyScope, k.request_hash AS keyRequestHash, k.result_id AS keyResultId, t.kind AS targetKind,
            ${checkSigned ? "EXISTS (SELECT 1 FROM batch_log_entries s WHERE s.batch_id = b.id AND s.kind = 'sign_off')" : '0'} AS signed
       FROM batches b
       ${LOG_HEAD_JOIN}
       LEFT JOIN idempotency_keys k ON k.brewery_id = b.brewery_id AND k.\`key\` = :key
       LEFT JOIN batch_log_entries t ON t.id = :correctsEntryId AND t.batch_id = b.id
      WHERE b.id = :batchId AND b.brewery_id = :breweryId
        FOR UPDATE`,
    { type: QueryTypes.SELECT, replacements: { breweryId, batchId, key, correctsEntryId }, transaction },
  );
  return state;
}

type EntryFields = ReturnType<typeof entryFields>;
/** An entry as inserted: its fields, the hash of the request that wrote it, and its place in the chain. */
type EntryRow = EntryFields & { requestHash: string; prevHash: string; hash: string };

const INSERT_FIELDS = [
  'breweryId',
  'batchId',
  'sequence',
  'kind',
  'stepKey',
  'data',
  'correctsEntryId',
  'reason',
  'authorId',
  'authorRole',
  'authorName',
  'meaning',
  'capturedAt',
  'receivedAt',
  'deviceId',
  'late',
  'idempotencyKey',
  'requestHash',
  'prevHash',
  'hash',
] as const;
/** INSERT of `rows` entries; the table's trigger writes each one's idempotency record and audit row with it. */
const insertSql = (rows: number) =>
  `INSERT INTO batch_log_entries (${INSERT_FIELDS.map((f) => f.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`)).join(', ')}) VALUES ${Array(
    rows,
  )
    .fill(`(${INSERT_FIELDS.map(() => '?').join(', ')})`)
    .join(', ')}`;
const INSERT_ONE = insertSql(1);
const insertValues = (row: EntryRow) => INSERT_FIELDS.map((f) => (f === 'data' ? JSON.stringify(row.data) : row[f]));
/** Rows per INSERT in a bulk append: well inside max_allowed_packet for readings' small data. */
const INSERT_CHUNK = 500;

/** An entry's columns as the next entry of its batch's chain (before its hash). */
function entryFields(
  actor: LogActor,
  batchId: number,
  input: NewLogEntry,
  meta: WriteMeta,
  sequence: number,
  receivedAt: Date,
) {
  const { kind, stepKey = null, correctsEntryId = null, reason = null, meaning = 'performed', ...data } = input;
  if (meta.capturedAt.getTime() > receivedAt.getTime() + CLOCK_SKEW_MS) {
    throw unprocessable('The captured time is in the future: check the tablet’s clock. Nothing was saved.');
  }
  return {
    breweryId: actor.breweryId,
    batchId,
    sequence,
    kind,
    stepKey,
    data,
    correctsEntryId,
    reason,
    authorId: actor.id,
    authorRole: actor.role,
    authorName: actor.displayName,
    meaning,
    capturedAt: meta.capturedAt,
    receivedAt,
    deviceId: meta.deviceId,
    late: receivedAt.getTime() - meta.capturedAt.getTime() > LATE_AFTER_MS,
    idempotencyKey: meta.idempotencyKey,
  };
}

async function append(
  actor: LogActor,
  batchId: number,
  input: NewLogEntry,
  meta: WriteMeta,
  options: AppendOptions,
  transaction: Transaction,
): Promise<BatchLogEntry> {
  const { kind, correctsEntryId = null } = input;
  const state = await lockForAppend(
    actor.breweryId,
    batchId,
    meta.idempotencyKey,
    correctsEntryId,
    CLOSED_BY_SIGN_OFF.includes(kind),
    transaction,
  );
  if (!state) throw notFound('This batch');
  const hashOfRequest = requestHash(batchId, input, meta);
  if (state.keyResultId !== null) {
    return replayOf(
      { scope: state.keyScope!, requestHash: state.keyRequestHash!, resultId: Number(state.keyResultId) },
      hashOfRequest,
      transaction,
    );
  }

  const fields = entryFields(actor, batchId, input, meta, Number(state.lastSequence ?? 0) + 1, new Date());
  if (Number(state.signed)) throw signedOff('The brew day is signed off: add a correction instead.');
  if (correctsEntryId !== null) checkCorrectionTarget(state.targetKind);

  const prevHash = state.lastHash ?? GENESIS_HASH;
  const row = { ...fields, requestHash: hashOfRequest, prevHash, hash: entryHash(prevHash, fields) };
  // One statement: the table's trigger writes the idempotency record and the audit row with the entry.
  const [id] = await sequelize.query(INSERT_ONE, {
    type: QueryTypes.INSERT,
    replacements: insertValues(row),
    transaction,
  });
  const entry = BatchLogEntry.build({ id: Number(id), ...row }, { isNewRecord: false });
  // The first brew-day step starts the brew.
  if (kind === 'step' && state.status === 'planned')
    await Batch.update({ status: 'brewing' }, { where: { id: batchId }, transaction });
  await options.onInsert?.(entry, transaction);
  return entry;
}

/**
 * Appends one entry to a batch's log and returns it. The same idempotency key with the same request
 * returns the first entry; with a different request answers 422. READ COMMITTED so a writer that waited
 * on the batch lock sees what the one before it committed.
 */
export async function appendLogEntry(
  actor: LogActor,
  batchId: number,
  input: NewLogEntry,
  meta: WriteMeta,
  options: AppendOptions = {},
): Promise<BatchLogEntry> {
  if (options.transaction) return append(actor, batchId, input, meta, options, options.transaction);
  try {
    return await sequelize.transaction({ isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED }, (t) =>
      append(actor, batchId, input, meta, options, t),
    );
  } catch (error) {
    // The same key raced in on another batch: the unique index kept one; answer as a replay would.
    if (error instanceof UniqueConstraintError) {
      const replay = await findReplay(actor.breweryId, batchId, input, meta);
      if (replay) return replay;
    }
    throw error;
  }
}

/**
 * Appends many cellar entries (no brew-day kinds, no corrections) to one batch's log in order, inside the caller's
 * READ COMMITTED transaction: one lock, one read of their idempotency records, then inserts of up to 500 rows.
 * A write whose key was used before for the same request is already in the log and is skipped; for a
 * different request nothing is saved (422). Returns the entries written now.
 */
export async function appendLogEntries(
  actor: LogActor,
  batchId: number,
  writes: { input: NewLogEntry; meta: WriteMeta }[],
  transaction: Transaction,
): Promise<BatchLogEntry[]> {
  if (writes.some((w) => BREW_DAY_KINDS.includes(w.input.kind) || w.input.correctsEntryId != null)) {
    throw new Error(
      'appendLogEntries takes cellar entries only: brew-day entries and corrections go through appendLogEntry',
    );
  }
  const state = await lockForAppend(actor.breweryId, batchId, null, null, false, transaction);
  if (!state) throw notFound('This batch');
  const used = new Map(
    (
      await IdempotencyKey.findAll({
        where: { breweryId: actor.breweryId, key: writes.map((w) => w.meta.idempotencyKey) },
        transaction,
      })
    ).map((k) => [k.key, k]),
  );
  const receivedAt = new Date();
  let sequence = Number(state.lastSequence ?? 0);
  let prevHash = state.lastHash ?? GENESIS_HASH;
  const rows: EntryRow[] = [];
  for (const { input, meta } of writes) {
    const requestHashOf = requestHash(batchId, input, meta);
    const before = used.get(meta.idempotencyKey);
    if (before) {
      if (before.scope !== 'batch-log' || before.requestHash !== requestHashOf) {
        throw unprocessable('This idempotency key was already used for a different request. Nothing was saved.');
      }
      continue;
    }
    const fields = entryFields(actor, batchId, input, meta, (sequence += 1), receivedAt);
    const hash = entryHash(prevHash, fields);
    rows.push({ ...fields, requestHash: requestHashOf, prevHash, hash });
    prevHash = hash;
  }
  for (let i = 0; i < rows.length; i += INSERT_CHUNK) {
    const chunk = rows.slice(i, i + INSERT_CHUNK);
    await sequelize.query(insertSql(chunk.length), {
      type: QueryTypes.INSERT,
      replacements: chunk.flatMap(insertValues),
      transaction,
    });
  }
  if (rows.length === 0) return [];
  const ids = await sequelize.query<{ id: number; sequence: number }>(
    'SELECT id, sequence FROM batch_log_entries WHERE batch_id = ? AND sequence BETWEEN ? AND ? ORDER BY sequence',
    {
      type: QueryTypes.SELECT,
      replacements: [batchId, rows[0]!.sequence, rows[rows.length - 1]!.sequence],
      transaction,
    },
  );
  return rows.map((row, i) => BatchLogEntry.build({ id: Number(ids[i]!.id), ...row }, { isNewRecord: false }));
}
