import { describe, expect, it } from 'vitest';
import { BATCH_STATUSES, batchStagePath } from './batches';

describe("a batch label's page", () => {
  it('opens the brew day until knockout and the cellar page from then on', () => {
    const pages = Object.fromEntries(BATCH_STATUSES.map((s) => [s, batchStagePath(7, s)]));
    expect(pages).toEqual({
      planned: '/batches/7',
      brewing: '/batches/7',
      fermenting: '/cellar/batches/7',
      conditioning: '/cellar/batches/7',
      packaged: '/cellar/batches/7',
      released: '/cellar/batches/7',
      dumped: '/cellar/batches/7',
    });
  });
});
