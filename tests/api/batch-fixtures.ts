import { randomUUID } from 'node:crypto';
import { computeRecipe } from '../../shared/brewing';
import { EXAMPLE_IPA, PILOT_SYSTEM } from '../../shared/brewing/example-recipes';
import { sequelize } from '../../server/config/database';
import { createBatchFromPlan } from '../../server/services/batches';
import type { FrozenPlan } from '../../shared/schemas/batches';
import type { Batch } from '../../server/models';

/** A frozen plan built straight from shared/brewing's example recipe on the pilot system. */
export function examplePlan(): FrozenPlan {
  return {
    recipeName: EXAMPLE_IPA.name,
    equipmentName: PILOT_SYSTEM.name,
    equipment: PILOT_SYSTEM,
    recipe: EXAMPLE_IPA,
    computed: computeRecipe(EXAMPLE_IPA, PILOT_SYSTEM),
  };
}

/** A planned batch of the example recipe, created the way planning does once the plan is frozen. */
export function plannedBatch(actor: { id: number; breweryId: number }, brewDate = '2026-11-30'): Promise<Batch> {
  return sequelize.transaction((t) => createBatchFromPlan(actor, examplePlan(), { brewDate }, t));
}

/** Headers of a signed write as the tablet's outbox sends them. */
export function writeHeaders(overrides: { key?: string; capturedAt?: Date; deviceId?: string } = {}) {
  return {
    'Idempotency-Key': overrides.key ?? randomUUID(),
    'X-Captured-At': (overrides.capturedAt ?? new Date()).toISOString(),
    'X-Device-Id': overrides.deviceId ?? 'tablet-test-01',
  };
}

/** A cellar plan as the head brewer sends it: ale at 19 °C, D-rest 3 points above the planned FG. */
export const cellarPlanBody = (plannedFg = 1.012) => ({
  plannedFg,
  tempUnit: 'c',
  primaryTemp: 19,
  dRestPoints: 3,
  dRestTemp: 21,
  crashTemp: 1,
  co2Volumes: 2.5,
  readingIntervalHours: 24,
});
