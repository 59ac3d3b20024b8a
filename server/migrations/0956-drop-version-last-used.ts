import type { Migration } from './umzug';

// A version's "last used" stamp recorded when a batch was planned from it; the recipe list now shows the
// last batch actually brewed (from batches), so nothing reads the stamp any more.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE recipe_versions DROP COLUMN last_used_at');
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE recipe_versions ADD COLUMN last_used_at DATETIME NULL');
};
