import type { Migration } from './umzug';

// The latest reading in force of each batch in a recipe's history is read from the index alone again:
// the index that carries each reading's gravity now carries the reading it stands for too (migration 0950).
export const up: Migration = async ({ context: qi }) => {
  await qi.addIndex('gravity_readings', ['batch_id', 'taken_at', 'id', 'sg', 'reading_entry_id'], {
    name: 'gravity_readings_batch_taken_sg_reading',
  });
  await qi.removeIndex('gravity_readings', 'gravity_readings_batch_taken_sg');
};

export const down: Migration = async ({ context: qi }) => {
  await qi.addIndex('gravity_readings', ['batch_id', 'taken_at', 'id', 'sg'], {
    name: 'gravity_readings_batch_taken_sg',
  });
  await qi.removeIndex('gravity_readings', 'gravity_readings_batch_taken_sg_reading');
};
