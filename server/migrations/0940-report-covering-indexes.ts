import type { Migration } from './umzug';

// The reports read indexes, not rows: each new index starts with the columns of the one it replaces, so every
// lookup that used the old one still can.
// - knockouts before a month's end, with their batch, answer "knocked out by then" from the index alone;
// - packaging runs after a month's end, with their batch and log entry, answer "still to be finished then" from the
//   index alone, reading a run's entry only for the few batches also knocked out before the end;
// - a batch's runs in time order give its first run and what it packaged before a month in one index dive;
// - a recipe's batches newest first page through the index instead of sorting every batch of the recipe;
// - batches dumped in a month are found by when they changed.
const swaps = [
  {
    table: 'batch_log_entries',
    old: { name: 'log_brewery_step_captured', fields: ['brewery_id', 'step_key', 'captured_at'] },
    fields: ['brewery_id', 'step_key', 'captured_at', 'batch_id'],
    name: 'log_brewery_step_captured_batch',
  },
  {
    table: 'packaging_runs',
    old: { name: 'packaging_runs_brewery_id_packaged_at', fields: ['brewery_id', 'packaged_at'] },
    fields: ['brewery_id', 'packaged_at', 'batch_id', 'log_entry_id'],
    name: 'packaging_runs_brewery_packaged_batch',
  },
  {
    table: 'packaging_runs',
    old: { name: 'packaging_runs_batch_id', fields: ['batch_id'] },
    fields: ['batch_id', 'packaged_at'],
    name: 'packaging_runs_batch_packaged',
  },
  {
    table: 'batches',
    old: { name: 'batches_brewery_id_recipe_id', fields: ['brewery_id', 'recipe_id'] },
    fields: ['brewery_id', 'recipe_id', 'brew_date', 'id'],
    name: 'batches_brewery_recipe_brew_date',
  },
];

export const up: Migration = async ({ context: qi }) => {
  // Add before removing: a foreign key needs an index on its column at every moment.
  for (const s of swaps) {
    await qi.addIndex(s.table, s.fields, { name: s.name });
    await qi.removeIndex(s.table, s.old.name);
  }
  await qi.addIndex('batches', ['brewery_id', 'status', 'updated_at'], { name: 'batches_brewery_status_updated' });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.removeIndex('batches', 'batches_brewery_status_updated');
  for (const s of [...swaps].reverse()) {
    await qi.addIndex(s.table, s.old.fields, { name: s.old.name });
    await qi.removeIndex(s.table, s.name);
  }
};
