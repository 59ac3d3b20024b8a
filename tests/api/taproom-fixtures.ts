// Batches brought along through the real API, as the brewers would: knockout OG on the brew-day log,
// gravity readings in the cellar, packaging, so the taproom tests read numbers from the logs.
import { expect } from 'vitest';
import { plannedBatch, writeHeaders } from './batch-fixtures';
import type { TestBrewery } from './helpers';
import type { Batch } from '../../server/models';
import type { TastingNoteContent } from '../../shared/schemas/tasting';
import type { ReleaseSheet } from '../../shared/schemas/taproom';

export interface BrewedOptions {
  og: number;
  /** Gravity readings in the order taken; the last is the final gravity. */
  readings: number[];
  /** Package the batch (moves it to packaged). */
  packaged?: boolean;
}

async function ok(res: { status: number; body: unknown }, expected: number) {
  expect(res.status, JSON.stringify(res.body)).toBe(expected);
}

/** A batch of the example recipe with its knockout OG logged, readings taken and (optionally) packaged. */
export async function brewedBatch(t: TestBrewery, options: BrewedOptions): Promise<Batch> {
  const batch = await plannedBatch({ id: t.users.head_brewer.id, breweryId: t.brewery.id });
  const as = t.as.assistant_brewer;
  await ok(
    await as
      .post(`/api/batches/${batch.id}/log`)
      .set(writeHeaders())
      .send({
        kind: 'step',
        stepKey: 'knockout-end',
        label: 'Knockout end',
        measurements: { gravitySg: options.og, volumeL: 45 },
      }),
    201,
  );
  await ok(await as.post(`/api/batches/${batch.id}/status`).send({ status: 'fermenting' }), 200);
  for (const [i, sg] of options.readings.entries()) {
    await ok(
      await as
        .post(`/api/cellar/batches/${batch.id}/readings`)
        .set(writeHeaders({ capturedAt: new Date(Date.now() - (options.readings.length - i) * 60_000) }))
        .send({ kind: 'reading', method: 'hydrometer', sg }),
      201,
    );
  }
  if (options.packaged) {
    await ok(await as.post(`/api/batches/${batch.id}/status`).send({ status: 'conditioning' }), 200);
    await ok(
      await as
        .post(`/api/cellar/batches/${batch.id}/packaging`)
        .set(writeHeaders())
        .send({
          kind: 'packaging',
          lines: [
            { kind: 'keg', size: 'sixth_bbl', count: 2 },
            { kind: 'can', sizeMl: 473, count: 12 },
          ],
          final: true,
        }),
      201,
    );
  }
  await batch.reload();
  return batch;
}

/** A release sheet the schema accepts. */
export const SHEET: ReleaseSheet = {
  beerName: 'Breakwater Pale',
  style: 'American pale ale',
  description: 'Bright and piney with a soft malt middle; a harbour-side pint for long evenings.',
  glass: 'nonic_pint',
  servingTempC: 5,
  servingNotes: 'Pour with a finger of head.',
  allergens: ['gluten'],
  photoAttachmentId: null,
  comingSoon: false,
};

/** A tasting note's content the schema accepts. */
export const TASTING_CONTENT: TastingNoteContent = {
  appearance: { colour: 'deep gold', clarity: 'clear', head: 'good' },
  aroma: 'Pine resin and grapefruit peel',
  flavour: 'Firm bitterness, bready malt, dry finish',
  mouthfeel: { body: 'medium', carbonation: 'medium', notes: '' },
  overall: 'On target; ready to package',
  offFlavours: [],
  score: 4,
};
