/** A batch's cellar plan: saved by the head brewer, or drawn from the batch's frozen recipe plan. */
import { Op, Transaction } from 'sequelize';
import { Batch, CellarPlan } from '../../models';
import { findBatch } from '../batches';
import { toC } from './units';
import type { FrozenPlan } from '../../../shared/schemas/batches';
import type { CellarPlanInput, CellarPlanView } from '../../../shared/schemas/cellar';

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
