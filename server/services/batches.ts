/** Batches: planning from a recipe version, the list, one batch with its log, status and vessel. */
import { Op, Transaction, type WhereOptions } from 'sequelize';
import { sequelize } from '../config/database';
import { AuditEvent, Batch, BatchLogEntry, Vessel } from '../models';
import { conflict, notFound } from '../errors';
import { freezeRecipeVersion, planForBatch } from './recipe-plans';
import { logEntries } from './batch-log';
import { signaturesOf } from './signatures';
import { batchActuals, effectiveMeasurements } from '../../shared/batches/brew-day';
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
} from '../../shared/schemas/batches';

export const BATCH_PAGE_SIZE = 50;

type Actor = Pick<Express.User, 'id' | 'breweryId'>;

async function audit(actor: Actor, action: string, detail: Record<string, unknown>, transaction?: Transaction) {
  await AuditEvent.create({ breweryId: actor.breweryId, userId: actor.id, action, detail, ip: null, userAgent: null, requestId: null }, { transaction });
}

export async function findBatch(breweryId: number, id: number, transaction?: Transaction, lock = false): Promise<Batch> {
  const batch = await Batch.findOne({ where: { id, breweryId }, transaction, ...(lock && transaction ? { lock: transaction.LOCK.UPDATE } : {}) });
  if (!batch) throw notFound('This batch');
  return batch;
}

/** The brewery's next batch number for a year: `2026-001`, `2026-002`… */
async function nextNumber(breweryId: number, year: number, transaction: Transaction): Promise<{ number: string; sequence: number }> {
  const last = await Batch.findOne({ where: { breweryId, year }, order: [['sequence', 'DESC']], lock: transaction.LOCK.UPDATE, transaction });
  const sequence = (last?.sequence ?? 0) + 1;
  return { number: `${year}-${String(sequence).padStart(3, '0')}`, sequence };
}

/**
 * Puts a batch into a vessel (409 if the vessel holds another batch). A batch sits in one vessel at a time:
 * the one it leaves is marked as needing cleaning. The unique index on `current_batch_id` settles races.
 */
export async function assignVessel(breweryId: number, batchId: number, vesselId: number, transaction: Transaction): Promise<Vessel> {
  const vessel = await Vessel.findOne({ where: { id: vesselId, breweryId }, lock: transaction.LOCK.UPDATE, transaction });
  if (!vessel) throw notFound('This vessel');
  if (vessel.currentBatchId === batchId) return vessel;
  if (vessel.currentBatchId !== null) {
    const other = await Batch.findByPk(vessel.currentBatchId, { transaction });
    throw conflict(`${vessel.name} already holds batch ${other?.number ?? vessel.currentBatchId}. Empty it first.`);
  }
  await releaseVessel(breweryId, batchId, transaction);
  return vessel.update({ currentBatchId: batchId, status: 'in_use' }, { transaction });
}

/** Takes a batch out of whatever vessel holds it; the vessel then needs cleaning. */
export async function releaseVessel(breweryId: number, batchId: number, transaction: Transaction): Promise<void> {
  await Vessel.update({ currentBatchId: null, status: 'needs_cleaning' }, { where: { breweryId, currentBatchId: batchId }, transaction });
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

/** One page of the brewery's batches, newest first, with vessel and planned/actual OG. */
export async function listBatches(breweryId: number, query: BatchListQuery): Promise<BatchList> {
  const where: WhereOptions<Batch> = { breweryId, ...(query.status ? { status: query.status } : {}), ...(query.recipeId ? { recipeId: query.recipeId } : {}) };
  const { rows, count } = await Batch.findAndCountAll({
    where,
    attributes: { exclude: ['plan'] },
    order: [['brewDate', 'DESC'], ['id', 'DESC']],
    limit: BATCH_PAGE_SIZE,
    offset: (query.page - 1) * BATCH_PAGE_SIZE,
  });
  const ids = rows.map((b) => b.id);
  const [vessels, entries] = ids.length
    ? await Promise.all([
        Vessel.findAll({ where: { breweryId, currentBatchId: { [Op.in]: ids } } }),
        BatchLogEntry.findAll({
          // Two indexed lookups (knockouts by batch and step; corrections by brewery and kind) instead of reading every entry of the page's batches.
          where: {
            [Op.or]: [
              { batchId: { [Op.in]: ids }, stepKey: 'knockout-end' },
              { breweryId, kind: 'correction', batchId: { [Op.in]: ids } },
            ],
          },
          attributes: ['id', 'batchId', 'kind', 'stepKey', 'data', 'correctsEntryId'],
          order: [['sequence', 'ASC']],
        }),
      ])
    : [[], []];
  const ogByBatch = new Map<number, number>();
  for (const id of ids) {
    const mine = entries.filter((e) => e.batchId === id).map((e) => ({ ...e.get(), id: Number(e.id), correctsEntryId: e.correctsEntryId === null ? null : Number(e.correctsEntryId) }));
    for (const { stepKey, measurements } of effectiveMeasurements(mine).values()) {
      if (stepKey === 'knockout-end' && measurements.gravitySg !== undefined) ogByBatch.set(id, measurements.gravitySg);
    }
  }
  return {
    items: rows.map((b) => summary(b, vessels.find((v) => v.currentBatchId === b.id), ogByBatch.get(b.id) ?? null)),
    total: count,
    page: query.page,
    pageSize: BATCH_PAGE_SIZE,
  };
}

/** One batch with its frozen plan, its log, its signatures (checked) and planned vs actual. */
export async function batchDetail(breweryId: number, id: number): Promise<BatchDetail> {
  const batch = await findBatch(breweryId, id);
  const [vessel, { rows, entries }] = await Promise.all([Vessel.findOne({ where: { breweryId, currentBatchId: id } }), logEntries(id)]);
  const actuals = batchActuals(batch.plan, entries);
  return {
    ...summary(batch, vessel ?? undefined, actuals.og.actual),
    dumpedReason: batch.dumpedReason,
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
export async function changeBatchStatus(actor: Actor, batchId: number, input: ChangeStatusInput, transaction?: Transaction): Promise<Batch> {
  const run = async (t: Transaction) => {
    const batch = await findBatch(actor.breweryId, batchId, t, true);
    if (!canMoveTo(batch.status, input.status)) {
      throw conflict(`A ${BATCH_STATUS_LABELS[batch.status].toLowerCase()} batch cannot move to ${BATCH_STATUS_LABELS[input.status].toLowerCase()}.`);
    }
    const from = batch.status;
    if (input.status === 'dumped') await releaseVessel(actor.breweryId, batchId, t);
    await batch.update({ status: input.status, dumpedReason: input.status === 'dumped' ? input.reason! : null }, { transaction: t });
    await audit(actor, 'batch.status', { batchId, from, to: input.status }, t);
    return batch;
  };
  return transaction ? run(transaction) : sequelize.transaction(run);
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
