import type { Migration } from './umzug';

// A beer can be taken off tap (poured out): the release keeps its row, sheet and frozen numbers in a fourth
// state, with when and by whom. The new value goes last, so the enum's order (draft < coming soon < on tap)
// that the tap list sorts by is unchanged.
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(
    `ALTER TABLE releases
       MODIFY state ENUM('draft', 'coming_soon', 'on_tap', 'off_tap') NOT NULL,
       ADD COLUMN off_tap_at DATETIME NULL AFTER released_by_id,
       ADD COLUMN off_tap_by_id INT NULL AFTER off_tap_at,
       ADD CONSTRAINT releases_off_tap_by_fk FOREIGN KEY (off_tap_by_id) REFERENCES users (id)`,
  );
};

// Back to three states: a beer taken off tap counts as on tap again.
export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query("UPDATE releases SET state = 'on_tap' WHERE state = 'off_tap'");
  await qi.sequelize.query('ALTER TABLE releases DROP FOREIGN KEY releases_off_tap_by_fk');
  await qi.sequelize.query(
    "ALTER TABLE releases DROP COLUMN off_tap_by_id, DROP COLUMN off_tap_at, MODIFY state ENUM('draft', 'coming_soon', 'on_tap') NOT NULL",
  );
};
