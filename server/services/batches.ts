/** Batches: planning from a recipe version, the list, one batch with its log, status and vessel. */
import { QueryTypes, Transaction } from 'sequelize';
import { sequelize } from '../config/database';
import { AuditEvent, Batch, Brewery, Vessel } from '../models';
import { conflict, forbidden, notFound, unprocessable } from '../errors';
import { freezeRecipeVersion, planForBatch } from './recipe-plans';
import { logEntries } from './batch-log';
import { LRUCache } from 'lru-cache';
import { signaturesOf } from './signatures';
import { batchActuals, effectiveMeasurements } from '../../shared/batches/brew-day';
import { fermenterFill, tooSmall, tooSmallMessage } from '../../shared/batches/fermenter';
import type { Measurements } from '../../shared/schemas/batch-log';
import { can } from '../../shared/policy';
import {
  BATCH_STATUS_LABELS,
  canMoveTo,
  type BatchDetail,
  type BatchList,
  type BatchListQuery,
  type BatchSummary,
  type ChangeStatusInput,
  type CreateBatchInput,
  type FrozenPlan,
  type PlanPreview,
  type PlanPreviewQuery,
} from '../../shared/schemas/batches';

export const BATCH_PAGE_SIZE = 50;

type Actor = Pick<Express.User, 'id' | 'breweryId'>;

async function audit(actor: Actor, action: string, detail: Record<string, unknown>, transaction?: Transaction) {
  await AuditEvent.create(
    { breweryId: actor.breweryId, userId: actor.id, action, detail, ip: null, userAgent: null, requestId: null },
    { transaction },
  );
}

export async function findBatch(
  breweryId: number,
  id: number,
  transaction?: Transaction,
  lock = false,
): Promise<Batch> {
  const batch = await Batch.findOne({
    where: { id, breweryId },
    transaction,
    ...(lock && transaction ? { lock: transaction.LOCK.UPDATE } : {}),
  });
  if (!batch) throw notFound('This batch');
  return batch;
}

/** The brewery's next batch number for a year: `2026-001`, `2026-002`… */
async function nextNumber(
  breweryId: number,
  year: number,
  transaction: Transaction,
): Promise<{ number: string; sequence: number }> {
  const last = await Batch.findOne({
    where: { breweryId, year },
    order: [['sequence', 'DESC']],
    lock: transaction.LOCK.UPDATE,
    transaction,
  });
  const sequence = (last?.sequence ?? 0) + 1;
  return { number: `${year}-${String(sequence).padStart(3, '0')}`, sequence };
}

/**
 * Puts a batch into a vessel (409 if the vessel holds another batch; 422 for a fermenter smaller than the
 * volume the batch runs into it at knockout). A batch sits in one vessel at a time: the one it leaves is
 * marked as needing cleaning. The unique index on `current_batch_id` settles races. A tank that needs
 * cleaning is accepted: planning days ahead into a tank still to be cleaned is normal.
 */
export async function assignVessel(
  breweryId: number,
  batchId: number,
  vesselId: number,
  transaction: Transaction,
): Promise<Vessel> {
  const vessel = await Vessel.findOne({
    where: { id: vesselId, breweryId },
    lock: transaction.LOCK.UPDATE,
    transaction,
  });
  if (!vessel) throw notFound('This vessel');
  if (vessel.currentBatchId === batchId) return vessel;
  if (vessel.currentBatchId !== null) {
    const other = await Batch.findByPk(vessel.currentBatchId, { transaction });
    throw conflict(`${vessel.name} already holds batch ${other?.number ?? vessel.currentBatchId}. Empty it first.`);
  }
  if (vessel.type === 'fermenter') {
    const batch = await Batch.findOne({ where: { id: batchId, breweryId }, transaction });
    const fill = batch ? fermenterFill(batch.plan) : 0;
    if (tooSmall(vessel.capacityL, fill)) {
      const brewery = await Brewery.findByPk(breweryId, { transaction });
      throw unprocessable(tooSmallMessage(brewery?.unitSystem ?? 'metric', vessel.name, vessel.capacityL, fill));
    }
  }
  await releaseVessel(breweryId, batchId, transaction);
  return vessel.update({ currentBatchId: batchId, status: 'in_use' }, { transaction });
}

/** Takes a batch out of whatever vessel holds it; the vessel then needs cleaning. */
export async function releaseVessel(breweryId: number, batchId: number, transaction: Transaction): Promise<void> {
  await Vessel.update(
    { currentBatchId: null, status: 'needs_cleaning' },
    { where: { breweryId, currentBatchId: batchId }, transaction },
  );
}

/** Creates a batch from a plan that is already frozen (planning, the demo seed and tests use it). */
export async function createBatchFromPlan(
  actor: Actor,
  plan: FrozenPlan,
  input: { brewDate: string; fermenterId?: number },
  transaction: Transaction,
): Promise<Batch> {
  const year = Number(input.brewDate.slice(0, 4));
  const { number, sequence } = await nextNumber(actor.breweryId, year, transaction);
  const batch = await Batch.create(
    {
      breweryId: actor.breweryId,
      number,
      year,
      sequence,
      beerName: plan.recipeName,
      recipeId: plan.recipeId ?? null,
      recipeVersionId: plan.recipeVersionId ?? null,
      equipmentProfileId: null,
      plan,
      plannedVolumeL: plan.equipment.batchVolumeL,
      plannedOg: plan.computed.og,
      brewDate: input.brewDate,
      status: 'planned',
      dumpedReason: null,
      dumpedAt: null,
      createdById: actor.id,
    },
    { transaction },
  );
  if (input.fermenterId !== undefined) await assignVessel(actor.breweryId, batch.id, input.fermenterId, transaction);
  await audit(actor, 'batch.plan', { batchId: batch.id, number }, transaction);
  return batch;
}

/** Plans a batch of a recipe version on a brewhouse or at a typed volume; the plan is frozen and so is the version. */
export async function planBatch(actor: Actor, input: CreateBatchInput): Promise<Batch> {
  return sequelize.transaction(async (transaction) => {
    const plan = await planForBatch(actor.breweryId, input, transaction);
    await freezeRecipeVersion(actor.breweryId, input.recipeVersionId, transaction);
    const batch = await createBatchFromPlan(actor, plan, input, transaction);
    return batch.update({ equipmentProfileId: plan.equipmentProfileId }, { transaction });
  });
}

/** What planning would freeze, without planning: recipe, version, brewhouse, volume, and what the fermenter must hold. */
export async function previewPlan(breweryId: number, input: PlanPreviewQuery): Promise<PlanPreview> {
  const plan = await planForBatch(breweryId, input);
  return {
    recipeName: plan.recipeName,
    versionNumber: plan.versionNumber,
    equipmentName: plan.equipmentName,
    batchVolumeL: plan.equipment.batchVolumeL,
    fermenterFillL: fermenterFill(plan),
  };
}

function summary(batch: Batch, vessel: Vessel | undefined, actualOg: number | null): BatchSummary {
  return {
    id: batch.id,
    number: batch.number,
    beerName: batch.beerName,
    recipeId: batch.recipeId,
    status: batch.status,
    brewDate: batch.brewDate,
    vessel: vessel ? { id: vessel.id, name: vessel.name } : null,
    plannedOg: batch.plannedOg,
    actualOg,
  };
}

interface ListRow {
  id: number;
  number: string;
  beerName: string;
  recipeId: number | null;
  status: BatchSummary['status'];
  brewDate: string;
  plannedOg: number;
  vesselId: number | null;
  vesselName: string | null;
  /** The log's last entry as `sequence:id` (null for an empty log). */
  logHead: string | null;
  total: number | bigint;
}

/** A knockout-end entry or a correction of one, as read for the list. */
interface KnockoutRow {
  batchId: number;
  id: number | bigint;
  sequence: number;
  kind: string;
  stepKey: string | null;
  correctsEntryId: number | bigint | null;
  measurements: string | Measurements | null;
}

/**
 * The OG measured at knockout of a batch, after corrections, by `batchId:logHead`. A log is append-only,
 * so the entries up to a given head never change: an entry added later makes a new head, hence a new key.
 */
const knockoutOgCache = new LRUCache<string, { og: number | null }>({ max: 20_000 });

/** Each batch's knockout-end entries and the corrections pointing at them, up to the log head the page was read at. */
async function knockoutOgs(breweryId: number, heads: Map<number, number>): Promise<Map<number, number | null>> {
  const ids = [...heads.keys()];
  const rows = await sequelize.query<KnockoutRow>(
    `SELECT k.batch_id AS batchId, k.id, k.sequence, k.kind, k.step_key AS stepKey, k.corrects_entry_id AS correctsEntryId,
            JSON_EXTRACT(k.data, '$.measurements') AS measurements
       FROM batch_log_entries k
      WHERE k.batch_id IN (?) AND k.step_key = 'knockout-end' AND k.brewery_id = ?
     UNION ALL
     SELECT k.batch_id, c.id, c.sequence, c.kind, c.step_key, c.corrects_entry_id, JSON_EXTRACT(c.data, '$.measurements')
       FROM batch_log_entries k STRAIGHT_JOIN batch_log_entries c ON c.corrects_entry_id = k.id
      WHERE k.batch_id IN (?) AND k.step_key = 'knockout-end' AND k.brewery_id = ? AND c.kind = 'correction'`,
    { type: QueryTypes.SELECT, replacements: [ids, breweryId, ids, breweryId] },
  );
  const byBatch = new Map<number, KnockoutRow[]>(ids.map((id) => [id, []]));
  // Entries appended after the page was read belong to a later head.
  for (const r of rows) if (r.sequence <= heads.get(r.batchId)!) byBatch.get(r.batchId)!.push(r);
  const ogs = new Map<number, number | null>();
  for (const [batchId, entries] of byBatch) {
    const ordered = entries
      .sort((x, y) => x.sequence - y.sequence)
      .map((e) => {
        const measurements =
          typeof e.measurements === 'string' ? (JSON.parse(e.measurements) as Measurements) : e.measurements;
        return {
          id: Number(e.id),
          kind: e.kind,
          stepKey: e.stepKey,
          correctsEntryId: e.correctsEntryId === null ? null : Number(e.correctsEntryId),
          data: measurements === null ? {} : { measurements },
        };
      });
    let og: number | null = null;
    // The same rule as the batch page: each entry's measurements after corrections, the last knockout reading wins.
    for (const { stepKey, measurements } of effectiveMeasurements(ordered).values()) {
      if (stepKey === 'knockout-end' && measurements.gravitySg !== undefined) og = measurements.gravitySg;
    }
    ogs.set(batchId, og);
  }
  return ogs;
}

/**
 * One page of the brewery's batches, newest first, with vessel and planned/actual OG. One statement reads
 * the page in index order (brewery, brew date, id) with its vessel, each batch's log head (index-only) and
 * the total (an uncorrelated count over the brewery's index range, evaluated once). The actual OGs come
 * from the cache by log head; a second statement reads knockouts and corrections only for batches whose
 * log has grown since.
 */
export async function listBatches(breweryId: number, query: BatchListQuery): Promise<BatchList> {
  const filters = [...(query.status ? ['status = ?'] : []), ...(query.recipeId ? ['recipe_id = ?'] : [])];
  const values = [...(query.status ? [query.status] : []), ...(query.recipeId ? [query.recipeId] : [])];
  const where = (t: string) => [`${t}.brewery_id = ?`, ...filters.map((f) => `${t}.${f}`)].join(' AND ');
  const rows = await sequelize.query<ListRow>(
    `SELECT b.id, b.number, b.beer_name AS beerName, b.recipe_id AS recipeId, b.status,
            DATE_FORMAT(b.brew_date, '%Y-%m-%d') AS brewDate, b.planned_og AS plannedOg,
            v.id AS vesselId, v.name AS vesselName,
            (SELECT CONCAT(k.sequence, ':', k.id) FROM batch_log_entries k WHERE k.batch_id = b.id ORDER BY k.sequence DESC LIMIT 1) AS logHead,
            (SELECT COUNT(*) FROM batches n WHERE ${where('n')}) AS total
       FROM batches b
       LEFT JOIN vessels v ON v.current_batch_id = b.id AND v.brewery_id = b.brewery_id
      WHERE ${where('b')}
      ORDER BY b.brew_date DESC, b.id DESC
      LIMIT ? OFFSET ?`,
    {
      type: QueryTypes.SELECT,
      replacements: [breweryId, ...values, breweryId, ...values, BATCH_PAGE_SIZE, (query.page - 1) * BATCH_PAGE_SIZE],
    },
  );
  // Past the last page there is no row to carry the total.
  const total = rows.length
    ? Number(rows[0]!.total)
    : await Batch.count({
        where: {
          breweryId,
          ...(query.status ? { status: query.status } : {}),
          ...(query.recipeId ? { recipeId: query.recipeId } : {}),
        },
      });

  const og = new Map<number, number | null>();
  const stale = new Map<number, number>();
  for (const r of rows) {
    if (r.logHead === null) og.set(r.id, null);
    else {
      const cached = knockoutOgCache.get(`${r.id}:${r.logHead}`);
      if (cached === undefined) stale.set(r.id, Number(r.logHead.split(':')[0]));
      else og.set(r.id, cached.og);
    }
  }
  if (stale.size) {
    for (const [batchId, value] of await knockoutOgs(breweryId, stale)) {
      og.set(batchId, value);
      knockoutOgCache.set(`${batchId}:${rows.find((r) => r.id === batchId)!.logHead}`, { og: value });
    }
  }
  return {
    items: rows.map((r) => ({
      id: r.id,
      number: r.number,
      beerName: r.beerName,
      recipeId: r.recipeId,
      status: r.status,
      brewDate: r.brewDate,
      vessel: r.vesselId === null ? null : { id: r.vesselId, name: r.vesselName! },
      plannedOg: r.plannedOg,
      actualOg: og.get(r.id)!,
    })),
    total,
    page: query.page,
    pageSize: BATCH_PAGE_SIZE,
  };
}

/** One batch with its frozen plan, its log, its signatures (checked) and planned vs actual. */
export async function batchDetail(breweryId: number, id: number): Promise<BatchDetail> {
  const batch = await findBatch(breweryId, id);
  const [vessel, { rows, entries }] = await Promise.all([
    Vessel.findOne({ where: { breweryId, currentBatchId: id } }),
    logEntries(id),
  ]);
  const actuals = batchActuals(batch.plan, entries);
  return {
    ...summary(batch, vessel ?? undefined, actuals.og.actual),
    dumpedReason: batch.dumpedReason,
    dumpedAt: batch.dumpedAt ? new Date(batch.dumpedAt).toISOString() : null,
    recipeVersionId: batch.recipeVersionId,
    plan: batch.plan,
    entries,
    signatures: signaturesOf(batch, rows),
    actuals,
    brewDaySigned: rows.some((r) => r.kind === 'sign_off'),
  };
}

/**
 * Moves a batch along planned → brewing → fermenting → conditioning → packaged → released, or to dumped
 * (with a reason, which also empties its vessel). Anything else answers 409. Cellar and taproom call this.
 */
export async function changeBatchStatus(
  actor: Actor,
  batchId: number,
  input: ChangeStatusInput,
  transaction?: Transaction,
): Promise<Batch> {
  const run = async (t: Transaction) => {
    const batch = await findBatch(actor.breweryId, batchId, t, true);
    if (!canMoveTo(batch.status, input.status)) {
      throw conflict(
        `A ${BATCH_STATUS_LABELS[batch.status].toLowerCase()} batch cannot move to ${BATCH_STATUS_LABELS[input.status].toLowerCase()}.`,
      );
    }
    const from = batch.status;
    if (input.status === 'dumped') await releaseVessel(actor.breweryId, batchId, t);
    const dumped = input.status === 'dumped';
    await batch.update(
      { status: input.status, dumpedReason: dumped ? input.reason! : null, dumpedAt: dumped ? new Date() : null },
      { transaction: t },
    );
    await audit(actor, 'batch.status', { batchId, from, to: input.status }, t);
    return batch;
  };
  return transaction ? run(transaction) : sequelize.transaction(run);
}

/** A status change asked for through the API: dumping needs the 'batch.dump' permission (403 otherwise). */
export async function requestStatusChange(
  actor: Actor & Pick<Express.User, 'role'>,
  batchId: number,
  input: ChangeStatusInput,
): Promise<Batch> {
  if (input.status === 'dumped' && !can(actor.role, 'batch.dump')) {
    await findBatch(actor.breweryId, batchId);
    throw forbidden('Only the head brewer can dump a batch. Ask them, and note what you saw in the log.');
  }
  return changeBatchStatus(actor, batchId, input);
}

/** Puts a batch into a vessel through the API. */
export async function moveToVessel(actor: Actor, batchId: number, vesselId: number): Promise<Vessel> {
  return sequelize.transaction(async (t) => {
    await findBatch(actor.breweryId, batchId, t, true);
    const vessel = await assignVessel(actor.breweryId, batchId, vesselId, t);
    await audit(actor, 'batch.vessel', { batchId, vesselId }, t);
    return vessel;
  });
}
