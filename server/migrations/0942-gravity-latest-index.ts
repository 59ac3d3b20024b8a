import type { Migration } from './umzug';

// A batch's readings in time order, carrying each one's gravity: the latest reading of each batch in a recipe's
// history (and a batch's gravity curve) is read from the index without visiting the readings themselves.
// It starts with the columns of the index it replaces, so every lookup that used that one still can.
export const up: Migration = async ({ context: qi }) => {
  await qi.addIndex('gravity_readings', ['batch_id', 'taken_at', 'id', 'sg'], {
    name: 'gravity_readings_batch_taken_sg',
  });
  await qi.removeIndex('gravity_readings', 'gravity_readings_batch_id_taken_at');
};

export const down: Migration = async ({ context: qi }) => {
  await qi.addIndex('gravity_readings', ['batch_id', 'taken_at'], { name: 'gravity_readings_batch_id_taken_at' });
  await qi.removeIndex('gravity_readings', 'gravity_readings_batch_taken_sg');
};
