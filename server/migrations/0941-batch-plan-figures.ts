import { QueryTypes } from 'sequelize';
import type { Migration } from './umzug';

// A recipe's batch history compares each batch with two figures of its frozen plan (some 12 KB of JSON).
// The database keeps them beside the batch as it is written, so reading a page of batches never parses a plan.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(
    `ALTER TABLE batches
       ADD COLUMN planned_efficiency DOUBLE AS (JSON_VALUE(plan, '$.equipment.brewhouseEfficiency')) STORED,
       ADD COLUMN planned_knockout_l DOUBLE AS (JSON_VALUE(plan, '$.computed.volumes.knockoutL')) STORED`,
    { type: QueryTypes.RAW },
  );
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE batches DROP COLUMN planned_knockout_l');
  await qi.sequelize.query('ALTER TABLE batches DROP COLUMN planned_efficiency');
};
