import type { Migration } from './umzug';

// Whether a batch's brew day is signed is asked on every brew-day entry (steps, measurements, notes):
// find the batch's sign-off through an index instead of reading every entry of its log.
export const up: Migration = async ({ context: qi }) => {
  await qi.addIndex('batch_log_entries', ['batch_id', 'kind'], { name: 'log_batch_kind' });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.removeIndex('batch_log_entries', 'log_batch_kind');
};
