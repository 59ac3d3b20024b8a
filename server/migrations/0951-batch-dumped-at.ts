import type { Migration } from './umzug';

// When a batch was dumped, kept apart from updated_at (which any later change to the row moves), so the
// monthly report files a dump in the month it happened. Existing dumps take their last update, as before.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE batches ADD COLUMN dumped_at DATETIME(3) NULL AFTER dumped_reason');
  await qi.sequelize.query("UPDATE batches SET dumped_at = updated_at WHERE status = 'dumped'");
  await qi.addIndex('batches', ['brewery_id', 'status', 'dumped_at'], { name: 'batches_brewery_status_dumped' });
  await qi.removeIndex('batches', 'batches_brewery_status_updated');
};

export const down: Migration = async ({ context: qi }) => {
  await qi.addIndex('batches', ['brewery_id', 'status', 'updated_at'], { name: 'batches_brewery_status_updated' });
  await qi.removeIndex('batches', 'batches_brewery_status_dumped');
  await qi.sequelize.query('ALTER TABLE batches DROP COLUMN dumped_at');
};
