/**
 * The cellar: vessels, the batch's cellar plan, logged cellar actions (signed batch log entries),
 * the carbonation setting capped by the vessel's rating, and the vessel board.
 */
import { Op, Transaction, UniqueConstraintError } from 'sequelize';
import { Batch, BatchLogEntry, CellarPlan, GravityReading, IN_FORCE, Vessel } from '../models';
import { conflict, notFound, unprocessable } from '../errors';
import { appendLogEntry, type LogActor } from './batch-log';
import { assignVessel, changeBatchStatus, findBatch } from './batches';
import { batchReadings } from './readings';
import { packagingSummary } from './packaging';
import { batchActuals } from '../../shared/batches/brew-day';
import {
  carbonationSetting,
  dRestTriggerSg,
  fToC,
  kpaToPsi,
  predictFermentation,
  psiToKpa,
  readingOverdue,
  usBblToL,
  type CarbonationSetting,
} from '../../shared/brewing';
import { formatGaugePressure, type CarbonationUnits } from '../../shared/brewing';
import type { WriteMeta } from '../../shared/schemas/batch-log';
import type { FrozenPlan } from '../../shared/schemas/batches';
import {
  type ActionEntryInput,
  type ActionView,
  type BatchCellarView,
  type BoardVessel,
  type CarbonationQuery,
  type CellarAction,
  type CellarPlanInput,
  type CellarPlanView,
  type TempUnit,
  type VesselInput,
  type VesselView,
} from '../../shared/schemas/cellar';

const toC = (value: number, unit: TempUnit) => (unit === 'f' ? fToC(value) : value);

// ------------------------------------------------------------------- vessels

export function toVesselView(v: Vessel): VesselView {
  return {
    id: v.id,
    name: v.name,
    type: v.type,
    capacityL: v.capacityL,
    ratedPressureKpa: v.ratedPressureKpa,
    status: v.status,
    currentBatchId: v.currentBatchId,
  };
}

function vesselFields(input: VesselInput) {
  return {
    name: input.name,
    type: input.type,
    capacityL: input.capacityUnit === 'bbl' ? usBblToL(input.capacity) : input.capacity,
    ratedPressureKpa: input.pressureUnit === 'psi' ? psiToKpa(input.ratedPressure) : input.ratedPressure,
  };
}

async function findVessel(breweryId: number, id: number, transaction?: Transaction): Promise<Vessel> {
  const vessel = await Vessel.findOne({ where: { id, breweryId }, transaction });
  if (!vessel) throw notFound('This vessel');
  return vessel;
}

async function uniqueName<T>(name: string, write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw conflict(`There is already a vessel called “${name}”.`);
    throw error;
  }
}

export async function listVessels(breweryId: number): Promise<VesselView[]> {
  const vessels = await Vessel.findAll({
    where: { breweryId },
    order: [
      ['type', 'ASC'],
      ['name', 'ASC'],
    ],
  });
  return vessels.map(toVesselView);
}

export async function createVessel(breweryId: number, input: VesselInput): Promise<VesselView> {
  const vessel = await uniqueName(input.name, () =>
    Vessel.create({ breweryId, ...vesselFields(input), status: 'clean', currentBatchId: null }),
  );
  return toVesselView(vessel);
}

export async function updateVessel(breweryId: number, id: number, input: VesselInput): Promise<VesselView> {
  const vessel = await findVessel(breweryId, id);
  if (vessel.currentBatchId !== null && input.type !== vessel.type)
    throw conflict(`${vessel.name} holds a batch: change its type once it is empty.`);
  await uniqueName(input.name, () => vessel.update(vesselFields(input)));
  return toVesselView(vessel);
}

/** Marks an empty vessel clean (after CIP) so it can be filled again. */
export async function markVesselClean(breweryId: number, id: number): Promise<VesselView> {
  const vessel = await findVessel(breweryId, id);
  if (vessel.currentBatchId !== null) throw conflict(`${vessel.name} holds a batch: it is cleaned once emptied.`);
  await vessel.update({ status: 'clean' });
  return toVesselView(vessel);
}

export async function deleteVessel(breweryId: number, id: number): Promise<void> {
  const vessel = await findVessel(breweryId, id);
  if (vessel.currentBatchId !== null) throw conflict(`${vessel.name} holds a batch: empty it before removing it.`);
  await vessel.destroy();
}

// ---------------------------------------------------------------------- plan

/** The recipe's fermentation plan, when the batch's frozen plan carries the version's content. */
interface FrozenFermentation {
  primaryTempC: number;
  dRestPointsAboveFg?: number;
  dRestTempC?: number;
  crashTempC: number;
  co2Volumes: number;
}

/** Defaults where the recipe gives none (common practice, no source): 3 points, +2 °C, every 24 h. */
const DEFAULT_D_REST_POINTS = 3;
const DEFAULT_D_REST_RISE_C = 2;
const DEFAULT_READING_INTERVAL_HOURS = 24;

/** The batch's cellar plan: saved by the head brewer, or else taken from the frozen recipe plan. */
export async function cellarPlanFor(batch: Batch, transaction?: Transaction): Promise<CellarPlanView> {
  return (await cellarPlansFor([batch], transaction)).get(batch.id)!;
}

/** The cellar plans of several batches (the vessel board, the overdue sweep) in one query, by batch id. */
export async function cellarPlansFor(
  batches: Batch[],
  transaction?: Transaction,
): Promise<Map<number, CellarPlanView>> {
  const saved = batches.length
    ? await CellarPlan.findAll({ where: { batchId: { [Op.in]: batches.map((b) => b.id) } }, transaction })
    : [];
  const savedByBatch = new Map(saved.map((p) => [p.batchId, p]));
  return new Map(batches.map((batch) => [batch.id, planView(batch, savedByBatch.get(batch.id))]));
}

/** A batch's saved cellar plan, or one drawn from its frozen recipe plan with the trade's usual defaults. */
function planView(batch: Batch, saved: CellarPlan | undefined): CellarPlanView {
  if (saved) {
    return {
      saved: true,
      plannedFg: saved.plannedFg,
      primaryTempC: saved.primaryTempC,
      dRestPoints: saved.dRestPoints,
      dRestTempC: saved.dRestTempC,
      crashTempC: saved.crashTempC,
      co2Volumes: saved.co2Volumes,
      readingIntervalHours: saved.readingIntervalHours,
    };
  }
  const plan = batch.plan as FrozenPlan & { content?: { fermentation?: FrozenFermentation } };
  const f = plan.content?.fermentation;
  const primaryTempC = f?.primaryTempC ?? 19;
  return {
    saved: false,
    plannedFg: plan.computed.fg,
    primaryTempC,
    dRestPoints: f?.dRestPointsAboveFg ?? DEFAULT_D_REST_POINTS,
    dRestTempC: f?.dRestTempC ?? primaryTempC + DEFAULT_D_REST_RISE_C,
    crashTempC: f?.crashTempC ?? 1,
    co2Volumes: f?.co2Volumes ?? 2.5,
    readingIntervalHours: DEFAULT_READING_INTERVAL_HOURS,
  };
}

export async function saveCellarPlan(
  breweryId: number,
  batchId: number,
  input: CellarPlanInput,
): Promise<CellarPlanView> {
  const batch = await findBatch(breweryId, batchId);
  const fields = {
    plannedFg: input.plannedFg,
    primaryTempC: toC(input.primaryTemp, input.tempUnit),
    dRestPoints: input.dRestPoints,
    dRestTempC: toC(input.dRestTemp, input.tempUnit),
    crashTempC: toC(input.crashTemp, input.tempUnit),
    co2Volumes: input.co2Volumes,
    readingIntervalHours: input.readingIntervalHours,
  };
  const existing = await CellarPlan.findOne({ where: { batchId } });
  if (existing) await existing.update(fields);
  else await CellarPlan.create({ breweryId, batchId, ...fields });
  return cellarPlanFor(batch);
}

// ------------------------------------------------------------------- actions

function toActionView(e: BatchLogEntry): ActionView {
  const d = e.data;
  const n = (key: string) => (typeof d[key] === 'number' ? d[key] : null);
  const s = (key: string) => (typeof d[key] === 'string' ? d[key] : null);
  return {
    logEntryId: Number(e.id),
    action: d.action as CellarAction,
    at: new Date(e.capturedAt).toISOString(),
    tempC: n('tempC'),
    volumeL: n('volumeL'),
    detail: s('detail'),
    co2Volumes: n('co2Volumes'),
    pressureKpa: n('pressureKpa'),
    toVesselId: n('toVesselId'),
    note: s('note'),
    authorName: e.authorName,
  };
}

/** The vessel a batch sits in, if any. */
async function vesselOf(breweryId: number, batchId: number, transaction?: Transaction): Promise<Vessel | null> {
  return Vessel.findOne({ where: { breweryId, currentBatchId: batchId }, transaction });
}

/** The head pressure for a target on a vessel; refused (422) above the vessel's rated working pressure. */
/** A screen that sends °F shows psi (a US brewery); one that sends °C shows kPa. */
const screenUnits = (tempUnit: 'c' | 'f'): CarbonationUnits => (tempUnit === 'f' ? 'us' : 'metric');

export async function carbonationFor(
  breweryId: number,
  query: CarbonationQuery,
): Promise<CarbonationSetting & { pressurePsi: number }> {
  const vessel = await findVessel(breweryId, query.vesselId);
  const setting = carbonationSetting(
    toC(query.temp, query.tempUnit),
    query.co2Volumes,
    vessel.ratedPressureKpa,
    screenUnits(query.tempUnit),
  );
  return { ...setting, pressurePsi: kpaToPsi(setting.pressureKpa) };
}

/**
 * Logs a cellar action as a signed entry. A transfer puts the batch into the bright tank (409 if it
 * holds another batch) and starts conditioning; a carbonation stores the head pressure, refused above
 * the vessel's rating — all in the entry's transaction.
 */
export async function recordAction(
  actor: LogActor,
  batchId: number,
  input: ActionEntryInput,
  meta: WriteMeta,
): Promise<ActionView> {
  const tempC = 'temp' in input ? toC(input.temp, input.tempUnit) : undefined;
  const volumeL =
    input.action !== 'transfer' ? undefined : input.volumeUnit === 'bbl' ? usBblToL(input.volume) : input.volume;
  let pressureKpa: number | undefined;
  if (input.action === 'carbonation') {
    const vessel = await vesselOf(actor.breweryId, batchId);
    if (!vessel) throw conflict('This batch is in no vessel: a head pressure is set on the vessel that holds it.');
    const units = screenUnits(input.tempUnit);
    const setting = carbonationSetting(tempC!, input.co2Volumes, vessel.ratedPressureKpa, units);
    if (input.pressureKpa !== undefined && input.pressureKpa > vessel.ratedPressureKpa) {
      throw unprocessable(
        `${formatGaugePressure(input.pressureKpa, units)} is above ${vessel.name}'s rated working pressure of ${formatGaugePressure(vessel.ratedPressureKpa, units)}.`,
      );
    }
    pressureKpa = input.pressureKpa ?? setting.pressureKpa;
  }
  const entry = await appendLogEntry(
    actor,
    batchId,
    { ...input, stepKey: input.action, tempC, volumeL, pressureKpa },
    meta,
    {
      onInsert: async (_e, t) => {
        const batch = await findBatch(actor.breweryId, batchId, t);
        if (!['fermenting', 'conditioning'].includes(batch.status)) {
          throw conflict(
            `Batch ${batch.number} is ${batch.status}: cellar work is logged while it ferments or conditions.`,
          );
        }
        if (input.action === 'transfer') {
          const tank = await findVessel(actor.breweryId, input.toVesselId, t);
          if (tank.type !== 'bright_tank')
            throw unprocessable(`${tank.name} is a fermenter: transfer into a bright tank.`);
          if (tank.currentBatchId === null && tank.status !== 'clean')
            throw conflict(`${tank.name} needs cleaning before it is filled.`);
          if (volumeL! > tank.capacityL)
            throw unprocessable(`${tank.name} holds ${tank.capacityL.toFixed(0)} L, less than the volume moved.`);
          await assignVessel(actor.breweryId, batchId, tank.id, t);
          if (batch.status === 'fermenting') await changeBatchStatus(actor, batchId, { status: 'conditioning' }, t);
        }
      },
    },
  );
  return toActionView(entry);
}

// ---------------------------------------------------------------- batch page

/** Measured OG (knockout) when logged, else the plan's. */
async function originalGravity(batch: Batch, transaction?: Transaction): Promise<{ sg: number; measured: boolean }> {
  const entries = await BatchLogEntry.findAll({
    where: { batchId: batch.id, kind: { [Op.in]: ['step', 'measurement', 'correction'] } },
    transaction,
  });
  const actual = batchActuals(
    batch.plan,
    entries.map((e) => ({
      id: Number(e.id),
      kind: e.kind,
      stepKey: e.stepKey,
      data: e.data,
      correctsEntryId: e.correctsEntryId === null ? null : Number(e.correctsEntryId),
    })),
  );
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

// --------------------------------------------------------------------- board

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
