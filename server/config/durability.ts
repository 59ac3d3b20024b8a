import { QueryTypes, type Sequelize } from 'sequelize';

interface Variable {
  Variable_name: string;
  Value: string;
}

/**
 * Signed batch records must survive a crash: refuse to run on an instance that could lose
 * committed transactions. Returns the problems found (empty when the instance is durable).
 */
export async function durabilityProblems(sequelize: Sequelize): Promise<string[]> {
  const rows = await sequelize.query<Variable>(
    "SHOW GLOBAL VARIABLES WHERE Variable_name IN ('innodb_flush_log_at_trx_commit','innodb_doublewrite','log_bin','sync_binlog','default_storage_engine')",
    { type: QueryTypes.SELECT },
  );
  const v = Object.fromEntries(rows.map((r) => [r.Variable_name, r.Value]));
  const problems: string[] = [];
  if (v.innodb_flush_log_at_trx_commit !== '1') problems.push('innodb_flush_log_at_trx_commit must be 1');
  if (v.innodb_doublewrite !== 'ON' && v.innodb_doublewrite !== '1') problems.push('innodb_doublewrite must be ON');
  if (v.log_bin === 'ON' && v.sync_binlog !== '1') problems.push('sync_binlog must be 1 when the binary log is on');
  if (v.default_storage_engine !== 'InnoDB') problems.push('default_storage_engine must be InnoDB');
  return problems;
}
