import { DataTypes, QueryTypes } from 'sequelize';
import type { Migration } from './umzug';

// Appending to a batch's log is one INSERT: the database itself writes the entry's idempotency record and
// its audit row in the same statement, so an entry can never exist without them (nor they without it).
// The entry keeps the SHA-256 of the request that created it, which the idempotency record needs.
// mariadb-dump --triggers carries the trigger into every backup.
export const up: Migration = async ({ context: qi }) => {
  const sequelize = qi.sequelize;
  await qi.addColumn('batch_log_entries', 'request_hash', { type: DataTypes.CHAR(64), allowNull: true });
  await sequelize.query(
    `UPDATE batch_log_entries e JOIN idempotency_keys k ON k.brewery_id = e.brewery_id AND k.\`key\` = e.idempotency_key
        SET e.request_hash = k.request_hash`,
    { type: QueryTypes.UPDATE },
  );
  // An entry without a key record cannot be replayed; its own hash stands in so the column can be required.
  await sequelize.query('UPDATE batch_log_entries SET request_hash = hash WHERE request_hash IS NULL', {
    type: QueryTypes.UPDATE,
  });
  await qi.changeColumn('batch_log_entries', 'request_hash', { type: DataTypes.CHAR(64), allowNull: false });
  await sequelize.query(
    `CREATE TRIGGER batch_log_entries_after_insert AFTER INSERT ON batch_log_entries FOR EACH ROW
     BEGIN
       INSERT INTO idempotency_keys (brewery_id, \`key\`, request_hash, scope, result_id, created_at)
         VALUES (NEW.brewery_id, NEW.idempotency_key, NEW.request_hash, 'batch-log', NEW.id, UTC_TIMESTAMP());
       INSERT INTO audit_events (brewery_id, user_id, action, detail, created_at)
         VALUES (NEW.brewery_id, NEW.author_id, 'batch-log.append',
                 JSON_OBJECT('batchId', NEW.batch_id, 'entryId', NEW.id, 'kind', NEW.kind), UTC_TIMESTAMP());
     END`,
    { type: QueryTypes.RAW },
  );
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TRIGGER IF EXISTS batch_log_entries_after_insert', { type: QueryTypes.RAW });
  await qi.sequelize.query('ALTER TABLE batch_log_entries DROP COLUMN request_hash');
};
