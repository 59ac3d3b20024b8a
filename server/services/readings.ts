/**
 * Gravity readings: each is a signed batch log entry, with its `gravity_readings` row written in the
 * same transaction. Probe imports write every row in one transaction or none. A correction of a reading
 * that carries values adds the reading's corrected row; readers take the rows in force (IN_FORCE).
 */
import { createHash } from 'node:crypto';
import { Op, QueryTypes, Transaction } from 'sequelize';
import { sequelize } from '../config/database';
import { Batch, BatchLogEntry, GravityReading, IN_FORCE } from '../models';
import { badRequest, notFound, wrongStage } from '../errors';
import { BATCH_STATUS_LABELS, type BatchStatus } from '../../shared/schemas/batches';
import { appendLogEntries, appendLogEntry, type LogActor } from './batch-log';
import type { LogEntryInput, Measurements } from '../../shared/schemas/batch-log';
import { changeBatchStatus, findBatch } from './batches';
import { parseProbeCsv, MAX_IMPORT_ROWS } from './probe-csv';
import { evaluateReadingAlerts } from './alerts';
import { fToC, platoToSg, refractometerSg, sgToPlato } from '../../shared/brewing';
import type { WriteMeta } from '../../shared/schemas/batch-log';
import type { ProbeImportInput, ProbeImportResult, ReadingEntryInput, ReadingView } from '../../shared/schemas/cellar';

/** Batches that take cellar readings: knocked out and not yet packaged. */
const READING_STATUSES: readonly BatchStatus[] = ['brewing', 'fermenting', 'conditioning'];

export function toReadingView(r: GravityReading): ReadingView {
  return {
    id: Number(r.id),
    logEntryId: Number(r.logEntryId),
    corrected: Number(r.logEntryId) !== Number(r.readingEntryId),
    takenAt: new Date(r.takenAt).toISOString(),
    sg: r.sg,
    plato: sgToPlato(r.sg),
    enteredValue: r.enteredValue,
    enteredUnit: r.enteredUnit,
    tempC: r.tempC,
    ph: r.ph,
    method: r.method,
    authorName: r.authorName,
  };
}

/** SG and °C from what was entered (refractometer readings corrected for wort and, once fermenting, alcohol). */
export function readingInSi(input: ReadingEntryInput): { sg: number; tempC: number | null } {
  const sg =
    input.gravityUnit === 'brix'
      ? refractometerSg(input.gravity, input.originalBrix, input.wortCorrection)
      : input.gravityUnit === 'plato'
        ? platoToSg(input.gravity, 'gravity')
        : input.gravity;
  const tempC = input.temp === undefined ? null : input.tempUnit === 'f' ? fToC(input.temp) : input.temp;
  return { sg, tempC };
}

/** The first reading of a knocked-out batch starts its fermentation. */
async function readyForReadings(actor: LogActor, batchId: number, transaction: Transaction): Promise<void> {
  const batch = await Batch.findOne({ where: { id: batchId, breweryId: actor.breweryId }, transaction });
  if (!batch) throw notFound('This batch');
  if (!READING_STATUSES.includes(batch.status)) {
    throw wrongStage(
      batch.status,
      READING_STATUSES,
      `Batch ${batch.number} is ${BATCH_STATUS_LABELS[batch.status].toLowerCase()}: readings are taken from knockout until packaging.`,
    );
  }
  if (batch.status === 'brewing') await changeBatchStatus(actor, batchId, { status: 'fermenting' }, transaction);
}

/** A reading's projected row, from its log entry (which holds what was entered and the values in SI). */
function readingRow(actor: LogActor, entry: BatchLogEntry) {
  const d = entry.data as Omit<ReadingEntryInput, 'kind'> & { sg: number; tempC: number | null };
  return {
    breweryId: actor.breweryId,
    batchId: Number(entry.batchId),
    logEntryId: Number(entry.id),
    readingEntryId: Number(entry.id),
    takenAt: entry.capturedAt,
    sg: d.sg,
    enteredValue: d.gravity,
    enteredUnit: d.gravityUnit,
    tempC: d.tempC,
    ph: d.ph ?? null,
    method: d.method,
    authorName: actor.displayName,
  };
}

/** Writes one reading's log entry and projection (inside `transaction` when given); alerts are the caller's to check. */
export async function writeReading(
  actor: LogActor,
  batchId: number,
  input: ReadingEntryInput,
  meta: WriteMeta,
  transaction?: Transaction,
): Promise<GravityReading> {
  let reading: GravityReading | null = null;
  const entry = await appendLogEntry(actor, batchId, { ...input, ...readingInSi(input) }, meta, {
    transaction,
    onInsert: async (e, t) => {
      await readyForReadings(actor, batchId, t);
      reading = await GravityReading.create(readingRow(actor, e), { transaction: t });
    },
  });
  // A replayed key returns the first entry, whose reading was written with it.
  return (
    reading ?? (await GravityReading.findOne({ where: { logEntryId: entry.id }, transaction, rejectOnEmpty: true }))
  );
}

/** Records one reading (idempotent by the write's key) and raises any alert it triggers. */
export async function recordReading(
  actor: LogActor,
  batchId: number,
  input: ReadingEntryInput,
  meta: WriteMeta,
): Promise<ReadingView> {
  const reading = await writeReading(actor, batchId, input, meta);
  await evaluateReadingAlerts(actor.breweryId, batchId);
  return toReadingView(reading);
}

/**
 * The batch page's log write. A correction of a reading, or of an earlier correction of one, that carries a
 * gravity, temperature or pH also writes the reading's corrected row in the same transaction: the values it
 * gives replace those in force, the others stay, and the sample keeps the time it was taken. The alerts are
 * checked again against the corrected curve.
 */
export async function appendBatchLogEntry(
  actor: LogActor,
  batchId: number,
  input: LogEntryInput,
  meta: WriteMeta,
): Promise<BatchLogEntry> {
  if (input.kind !== 'correction') return appendLogEntry(actor, batchId, input, meta);
  let corrected = false;
  const entry = await appendLogEntry(actor, batchId, input, meta, {
    onInsert: async (e, t) => {
      corrected = await writeReadingCorrection(actor, e, input.measurements, t);
    },
  });
  if (corrected) await evaluateReadingAlerts(actor.breweryId, batchId);
  return entry;
}

async function writeReadingCorrection(
  actor: LogActor,
  correction: BatchLogEntry,
  m: Measurements | undefined,
  transaction: Transaction,
): Promise<boolean> {
  if (m?.gravitySg === undefined && m?.tempC === undefined && m?.ph === undefined) return false;
  // The row in force of the reading the corrected entry stands for: found through the entry's own row, or
  // (for a correction that carried no values) through the entries it corrects in turn.
  const [current] = await sequelize.query<GravityReading>(
    `WITH RECURSIVE chain (id, corrects) AS (
       SELECT id, corrects_entry_id FROM batch_log_entries WHERE id = :target AND batch_id = :batchId
       UNION ALL
       SELECT e.id, e.corrects_entry_id FROM batch_log_entries e JOIN chain c ON e.id = c.corrects AND e.batch_id = :batchId
     )
     SELECT g.* FROM gravity_readings g
      WHERE g.reading_entry_id = (SELECT r.reading_entry_id FROM chain JOIN gravity_readings r ON r.log_entry_id = chain.id LIMIT 1)
      ORDER BY g.id DESC LIMIT 1`,
    {
      type: QueryTypes.SELECT,
      model: GravityReading,
      mapToModel: true,
      replacements: { target: correction.correctsEntryId, batchId: correction.batchId },
      transaction,
    },
  );
  if (!current) return false;
  const readingEntryId = Number(current.readingEntryId);
  await GravityReading.create(
    {
      breweryId: actor.breweryId,
      batchId: current.batchId,
      logEntryId: Number(correction.id),
      readingEntryId,
      takenAt: current.takenAt,
      sg: m.gravitySg ?? current.sg,
      enteredValue: m.gravitySg ?? current.enteredValue,
      enteredUnit: m.gravitySg === undefined ? current.enteredUnit : 'sg',
      tempC: m.tempC ?? current.tempC,
      ph: m.ph ?? current.ph,
      method: current.method,
      authorName: actor.displayName,
    },
    { transaction },
  );
  return true;
}

export async function batchReadings(batchId: number): Promise<ReadingView[]> {
  const rows = await GravityReading.findAll({
    where: { batchId, [Op.and]: [IN_FORCE] },
    order: [
      ['takenAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  return rows.map(toReadingView);
}

/** A per-row key from the import's key: the same file sent twice replays row by row. */
const rowKey = (key: string, line: number) =>
  `imp-${createHash('sha256').update(`${key}:${line}`).digest('base64url').slice(0, 40)}`;

/**
 * Checks a probe export and, given the write's device details, writes its rows in one transaction:
 * any row with an error refuses the whole file (400, nothing written); rows at a time already stored,
 * or repeated in the file, are skipped and counted. Without them (`null`) it only answers the preview.
 */
export async function importProbeCsv(
  actor: LogActor,
  batchId: number,
  input: ProbeImportInput,
  meta: WriteMeta | null,
): Promise<ProbeImportResult> {
  await findBatch(actor.breweryId, batchId);
  const { rows } = parseProbeCsv(input.csv, input);
  if (rows.length > MAX_IMPORT_ROWS)
    throw badRequest(`The file has ${rows.length} rows; import at most ${MAX_IMPORT_ROWS} at a time.`);
  const now = Date.now();
  for (const row of rows) {
    if (row.takenAt && Date.parse(row.takenAt) > now + 5 * 60_000) {
      row.status = 'error';
      row.error = `${row.time} is in the future. Check the time zone.`;
    }
  }
  const times = rows.filter((r) => r.status === 'ok').map((r) => new Date(r.takenAt!));
  const stored = times.length
    ? await GravityReading.findAll({
        where: { batchId, breweryId: actor.breweryId, takenAt: { [Op.in]: times } },
        attributes: ['takenAt'],
      })
    : [];
  const storedSeconds = new Set(stored.map((r) => Math.floor(new Date(r.takenAt).getTime() / 1000)));
  for (const row of rows) {
    if (row.status === 'ok' && storedSeconds.has(Math.floor(Date.parse(row.takenAt!) / 1000))) row.status = 'duplicate';
  }
  const count = (status: string) => rows.filter((r) => r.status === status).length;
  const result: ProbeImportResult = {
    rows,
    toImport: count('ok'),
    duplicates: count('duplicate'),
    errors: count('error'),
    imported: false,
  };
  if (!meta) return result;

  if (result.errors > 0) {
    const fields = Object.fromEntries(
      rows.filter((r) => r.status === 'error').map((r) => [`line.${r.line}`, r.error!]),
    );
    throw badRequest(
      `${result.errors} row${result.errors > 1 ? 's have' : ' has'} errors; nothing was imported. Fix the file and try again.`,
      fields,
    );
  }
  if (result.toImport === 0) return { ...result, imported: true };
  const writes = rows
    .filter((row) => row.status === 'ok')
    .map((row) => {
      const reading: ReadingEntryInput = {
        kind: 'reading',
        method: 'probe',
        gravity: input.gravityUnit === 'plato' ? Number(row.gravity.replace(',', '.')) : row.sg!,
        gravityUnit: input.gravityUnit,
        temp: Number(row.temp.replace(',', '.')),
        tempUnit: input.tempUnit,
      };
      return {
        input: { ...reading, ...readingInSi(reading) },
        meta: { ...meta, idempotencyKey: rowKey(meta.idempotencyKey, row.line), capturedAt: new Date(row.takenAt!) },
      };
    });
  await sequelize.transaction({ isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED }, async (transaction) => {
    const entries = await appendLogEntries(actor, batchId, writes, transaction);
    if (entries.length === 0) return;
    await readyForReadings(actor, batchId, transaction);
    await GravityReading.bulkCreate(
      entries.map((e) => readingRow(actor, e)),
      { transaction },
    );
  });
  await evaluateReadingAlerts(actor.breweryId, batchId);
  return { ...result, imported: true };
}
