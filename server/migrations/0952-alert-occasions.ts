import type { Migration } from './umzug';

// An alert is raised once per batch, kind and occasion. The D-rest and stalled alerts have one occasion per
// batch (''); a "no reading" alert's occasion is the reading it waits after, so each new lapse is raised again.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query("ALTER TABLE alerts ADD COLUMN occasion VARCHAR(32) NOT NULL DEFAULT '' AFTER kind");
  await qi.addIndex('alerts', ['batch_id', 'kind', 'occasion'], {
    unique: true,
    name: 'alerts_batch_kind_occasion_unique',
  });
  await qi.removeIndex('alerts', 'alerts_batch_kind_unique');
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(
    'DELETE a FROM alerts a JOIN alerts b ON b.batch_id = a.batch_id AND b.kind = a.kind AND b.id < a.id',
  );
  await qi.addIndex('alerts', ['batch_id', 'kind'], { unique: true, name: 'alerts_batch_kind_unique' });
  await qi.removeIndex('alerts', 'alerts_batch_kind_occasion_unique');
  await qi.sequelize.query('ALTER TABLE alerts DROP COLUMN occasion');
};
