// Seeds the demo brewery's batches (the cellar seed, which runs next, puts them into vessels). Every number is invented.
import { Recipe, RecipeVersion } from '../models';
import { freezeRecipeVersion, planForBatch } from '../services/recipe-plans';
import { createBatchFromPlan } from '../services/batches';
import { appendLogEntry } from '../services/batch-log';
import { brewDaySteps } from '../../shared/batches/brew-day';
import type { DemoContext } from './context';

const DAY_MS = 86_400_000;

export async function seedBatches({ brewery, users, transaction }: DemoContext): Promise<void> {
  const recipes = await Recipe.findAll({ where: { breweryId: brewery.id }, order: [['id', 'ASC']], transaction });
  const head = { id: users.head_brewer.id, breweryId: brewery.id };
  const latest = async (recipeId: number) =>
    (await RecipeVersion.findOne({ where: { recipeId }, order: [['number', 'DESC']], transaction }))!;

  // Last week's flagship: brewed, logged step by step on the tablet, now fermenting.
  const flagship = await latest(recipes[0]!.id);
  const brewedPlan = await planForBatch(brewery.id, { recipeVersionId: flagship.id }, transaction);
  await freezeRecipeVersion(brewery.id, flagship.id, transaction);
  const brewDay = new Date(Date.now() - 6 * DAY_MS);
  brewDay.setUTCHours(11, 0, 0, 0);
  const brewed = await createBatchFromPlan(
    head,
    brewedPlan,
    { brewDate: brewDay.toISOString().slice(0, 10) },
    transaction,
  );
  const assistant = {
    id: users.assistant_brewer.id,
    breweryId: brewery.id,
    role: users.assistant_brewer.role,
    displayName: users.assistant_brewer.displayName,
  };
  const c = brewedPlan.computed;
  const measured: Record<string, Record<string, number>> = {
    'strike-water': { tempC: c.strikeTempC + 0.4, volumeL: c.volumes.strikeL },
    'mash-in': { tempC: (c.mashSteps[0]?.tempC ?? 66) - 0.3, ph: 5.38 },
    'boil-start': { volumeL: c.volumes.preBoilL - 6, gravitySg: c.preBoilGravity - 0.001 },
    'knockout-end': { volumeL: c.volumes.knockoutL - 8, gravitySg: c.og - 0.002, tempC: 18.5 },
    'pitch-yeast': { tempC: 18.2 },
  };
  let minute = 0;
  for (const step of brewDaySteps(brewedPlan)) {
    minute += step.boilMinute !== undefined ? 5 : 18;
    const m = measured[step.key];
    await appendLogEntry(
      assistant,
      brewed.id,
      { kind: 'step', stepKey: step.key, label: step.label, meaning: 'performed', ...(m ? { measurements: m } : {}) },
      {
        idempotencyKey: `demo-${brewed.id}-${step.key}`.padEnd(16, '0'),
        capturedAt: new Date(brewDay.getTime() + minute * 60_000),
        deviceId: 'demo-tablet-1',
      },
      { transaction },
    );
  }
  await brewed.update({ status: 'fermenting' }, { transaction });

  // Next brew: planned on the main brewhouse for the day after tomorrow.
  const next = await latest(recipes[1]?.id ?? recipes[0]!.id);
  const nextPlan = await planForBatch(brewery.id, { recipeVersionId: next.id }, transaction);
  await freezeRecipeVersion(brewery.id, next.id, transaction);
  await createBatchFromPlan(
    head,
    nextPlan,
    { brewDate: new Date(Date.now() + 2 * DAY_MS).toISOString().slice(0, 10) },
    transaction,
  );
}
