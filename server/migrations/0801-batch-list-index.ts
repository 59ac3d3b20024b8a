import type { Migration } from './umzug';

// The batch list pages through a brewery's batches newest first: read them in index order
// instead of sorting every batch (and its frozen plan) on each request.
export const up: Migration = async ({ context: qi }) => {
  await qi.addIndex('batches', ['brewery_id', 'brew_date', 'id'], { name: 'batches_brewery_brew_date' });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.removeIndex('batches', 'batches_brewery_brew_date');
};
