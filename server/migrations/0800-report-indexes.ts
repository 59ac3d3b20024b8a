import type { Migration } from './umzug';

// The monthly production report finds knockouts by brewery and time, and a batch's knockout by batch:
// both without scanning a batch's whole log (a busy brewery's batch carries well over a hundred entries).
export const up: Migration = async ({ context: qi }) => {
  await qi.addIndex('batch_log_entries', ['brewery_id', 'step_key', 'captured_at'], {
    name: 'log_brewery_step_captured',
  });
  await qi.addIndex('batch_log_entries', ['batch_id', 'step_key'], { name: 'log_batch_step' });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.removeIndex('batch_log_entries', 'log_batch_step');
  await qi.removeIndex('batch_log_entries', 'log_brewery_step_captured');
};
