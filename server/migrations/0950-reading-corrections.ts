import type { Migration } from './umzug';

// A corrected reading: a correction of a reading's log entry writes a new gravity_readings row for the same
// reading, so every row names the reading it stands for (`reading_entry_id`, the original reading's log entry).
// The row in force for a reading is its newest; the index finds it.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE gravity_readings ADD COLUMN reading_entry_id BIGINT NULL AFTER log_entry_id');
  await qi.sequelize.query('UPDATE gravity_readings SET reading_entry_id = log_entry_id');
  await qi.sequelize.query('ALTER TABLE gravity_readings MODIFY reading_entry_id BIGINT NOT NULL');
  await qi.addIndex('gravity_readings', ['reading_entry_id', 'id'], { name: 'gravity_readings_reading_entry' });
};

// Back to one row per reading: the rows corrections added go (their log entries stay in the signed log),
// or each corrected reading would count twice once nothing tells the rows apart.
export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DELETE FROM gravity_readings WHERE log_entry_id <> reading_entry_id');
  await qi.removeIndex('gravity_readings', 'gravity_readings_reading_entry');
  await qi.sequelize.query('ALTER TABLE gravity_readings DROP COLUMN reading_entry_id');
};
