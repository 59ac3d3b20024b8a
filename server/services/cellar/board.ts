/** What the cellar screens show: one batch's cellar page and the vessel board. */
import { Op, Transaction } from 'sequelize';
import { Batch, BatchLogEntry, GravityReading, IN_FORCE, Vessel } from '../../models';
import { batchActualsOf } from '../batch-log';
import { findBatch } from '../batches';
import { batchReadings } from '../readings';
import { packagingSummary } from '../packaging';
import { toVesselView, vesselOf } from './vessels';
import { cellarPlanFor, cellarPlansFor } from './plans';
import { toActionView } from './actions';
import { dRestTriggerSg, predictFermentation, readingOverdue } from '../../../shared/brewing';
import type { BatchCellarView, BoardVessel, CellarPlanView } from '../../../shared/schemas/cellar';

/** Measured OG (knockout) when logged, else the plan's. */
async function originalGravity(batch: Batch, transaction?: Transaction): Promise<{ sg: number; measured: boolean }> {
  const actual = await batchActualsOf(batch, transaction);
  return actual.og.actual !== null
    ? { sg: actual.og.actual, measured: true }
    : { sg: batch.plannedOg, measured: false };
}

export async function batchCellar(breweryId: number, batchId: number): Promise<BatchCellarView> {
  const batch = await findBatch(breweryId, batchId);
  const [vessel, plan, og, readings, actionEntries, packaging] = await Promise.all([
    vesselOf(breweryId, batchId),
    cellarPlanFor(batch),
    originalGravity(batch),
    batchReadings(batchId),
    BatchLogEntry.findAll({ where: { batchId, kind: 'action' }, order: [['capturedAt', 'ASC']] }),
    packagingSummary(batch),
  ]);
  return {
    batch: {
      id: batch.id,
      number: batch.number,
      beerName: batch.beerName,
      status: batch.status,
      brewDate: batch.brewDate,
    },
    vessel: vessel ? toVesselView(vessel) : null,
    plan,
    og,
    readings,
    actions: actionEntries.map(toActionView),
    packaging,
  };
}

function nextAction(
  plan: CellarPlanView,
  vessel: Vessel,
  done: Set<string>,
  points: { atMs: number; sg: number }[],
): { label: string; dueAt: string | null } | null {
  const prediction = predictFermentation(points);
  const iso = (ms: number | null | undefined) => (ms === null || ms === undefined ? null : new Date(ms).toISOString());
  if (vessel.type === 'fermenter') {
    if (!done.has('d_rest')) {
      const trigger = dRestTriggerSg(plan.plannedFg, plan.dRestPoints);
      return { label: `D-rest at ${trigger.toFixed(3)}`, dueAt: iso(prediction?.reaches(trigger)) };
    }
    if (!done.has('cold_crash')) return { label: 'Cold crash', dueAt: iso(prediction?.predictedAtMs) };
    return { label: 'Transfer to a bright tank', dueAt: null };
  }
  if (!done.has('carbonation')) return { label: `Carbonate to ${plan.co2Volumes} vol`, dueAt: null };
  return { label: 'Package', dueAt: null };
}

/** Every vessel with what it holds, days in tank, latest reading, what comes next and whether a reading is overdue. */
export async function vesselBoard(breweryId: number, now = new Date()): Promise<BoardVessel[]> {
  const vessels = await Vessel.findAll({
    where: { breweryId },
    order: [
      ['type', 'ASC'],
      ['name', 'ASC'],
    ],
  });
  const batchIds = vessels.map((v) => v.currentBatchId).filter((id): id is number => id !== null);
  const [batches, readings, entries] = await Promise.all([
    Batch.findAll({ where: { breweryId, id: { [Op.in]: batchIds } } }),
    GravityReading.findAll({
      where: { batchId: { [Op.in]: batchIds }, [Op.and]: [IN_FORCE] },
      order: [['takenAt', 'ASC']],
      attributes: ['batchId', 'takenAt', 'sg', 'tempC'],
    }),
    BatchLogEntry.findAll({
      where: { batchId: { [Op.in]: batchIds }, [Op.or]: [{ kind: 'action' }, { stepKey: 'knockout-end' }] },
      attributes: ['batchId', 'kind', 'stepKey', 'capturedAt'],
      order: [['capturedAt', 'ASC']],
    }),
  ]);
  const plans = await cellarPlansFor(batches);
  return vessels.map((vessel): BoardVessel => {
    const batch = batches.find((b) => b.id === vessel.currentBatchId);
    if (!batch) return { ...toVesselView(vessel), batch: null };
    const plan = plans.get(batch.id)!;
    const own = readings.filter((r) => r.batchId === batch.id);
    const latest = own[own.length - 1];
    const log = entries.filter((e) => e.batchId === batch.id);
    const done = new Set(log.filter((e) => e.kind === 'action').map((e) => e.stepKey ?? ''));
    const filled =
      vessel.type === 'bright_tank'
        ? log.filter((e) => e.stepKey === 'transfer').at(-1)?.capturedAt
        : (log.find((e) => e.stepKey === 'knockout-end')?.capturedAt ?? own[0]?.takenAt);
    const inSince = filled ? new Date(filled) : new Date(`${batch.brewDate}T12:00:00Z`);
    const lastAt = latest ? new Date(latest.takenAt) : inSince;
    const taking = batch.status === 'fermenting';
    return {
      ...toVesselView(vessel),
      batch: {
        id: batch.id,
        number: batch.number,
        beerName: batch.beerName,
        status: batch.status,
        inSince: inSince.toISOString(),
        latestSg: latest?.sg ?? null,
        latestTempC: latest?.tempC ?? null,
        latestAt: latest ? new Date(latest.takenAt).toISOString() : null,
        nextAction: nextAction(
          plan,
          vessel,
          done,
          own.map((r) => ({ atMs: new Date(r.takenAt).getTime(), sg: r.sg })),
        ),
        nextReadingDueAt: taking
          ? new Date(lastAt.getTime() + plan.readingIntervalHours * 3_600_000).toISOString()
          : null,
        readingOverdue: taking && readingOverdue(lastAt.getTime(), now.getTime(), plan.readingIntervalHours),
      },
    };
  });
}
