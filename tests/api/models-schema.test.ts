// The Sequelize models and the migrated schema describe the same tables: each model attribute is a column of a
// compatible type and nullability, and each column of a model's table is one of its attributes (or generated).
import { describe, expect, it } from 'vitest';
import { QueryTypes, type ModelStatic, type Model, type ModelAttributeColumnOptions } from 'sequelize';
import { sequelize } from '../../server/config/database';
import '../../server/models';

interface Column {
  table: string;
  column: string;
  dataType: string;
  columnType: string;
  nullable: 'YES' | 'NO';
  length: number | null;
  extra: string;
}

/** MariaDB column types each Sequelize type may be stored in (JSON is a LONGTEXT with a JSON_VALID check). */
const STORED_AS: Record<string, string[]> = {
  INTEGER: ['int'],
  BIGINT: ['bigint'],
  SMALLINT: ['smallint'],
  TINYINT: ['tinyint'],
  BOOLEAN: ['tinyint'],
  'DOUBLE PRECISION': ['double'],
  FLOAT: ['float', 'double'],
  DECIMAL: ['decimal'],
  STRING: ['varchar'],
  CHAR: ['char'],
  TEXT: ['text', 'mediumtext', 'longtext'],
  JSON: ['longtext'],
  ENUM: ['enum'],
  DATE: ['datetime', 'timestamp'],
  DATEONLY: ['date'],
  BLOB: ['blob', 'mediumblob', 'longblob'],
};

async function columns(): Promise<Column[]> {
  return sequelize.query<Column>(
    `SELECT TABLE_NAME AS \`table\`, COLUMN_NAME AS \`column\`, DATA_TYPE AS dataType, COLUMN_TYPE AS columnType,
            IS_NULLABLE AS nullable, CHARACTER_MAXIMUM_LENGTH AS length, EXTRA AS extra
       FROM information_schema.COLUMNS WHERE TABLE_SCHEMA = DATABASE()`,
    { type: QueryTypes.SELECT },
  );
}

const tableOf = (model: ModelStatic<Model>) => {
  const name = model.getTableName();
  return typeof name === 'string' ? name : name.tableName;
};

/** The timestamp attributes Sequelize fills on every write, so the model never leaves them empty. */
function stampedBySequelize(model: ModelStatic<Model>): Set<string> {
  const { timestamps, createdAt, updatedAt } = model.options;
  if (timestamps === false) return new Set();
  const named = (option: string | boolean | undefined, fallback: string) =>
    option === false ? [] : [typeof option === 'string' ? option : fallback];
  return new Set([...named(createdAt, 'createdAt'), ...named(updatedAt, 'updatedAt')]);
}

/** What a model attribute's type asks of its column, or the reason it does not fit. */
function typeProblem(attribute: ModelAttributeColumnOptions, column: Column): string | null {
  const type = attribute.type as unknown as {
    key: string;
    values?: string[];
    options?: { length?: number; precision?: number; scale?: number };
  };
  const allowed = STORED_AS[type.key];
  if (!allowed) return `a ${type.key} attribute, which this check does not know`;
  if (!allowed.includes(column.dataType)) return `${type.key} stored as ${column.columnType}`;
  if (type.key === 'BOOLEAN' && column.columnType !== 'tinyint(1)') return `BOOLEAN stored as ${column.columnType}`;
  if ((type.key === 'STRING' || type.key === 'CHAR') && column.length !== (type.options?.length ?? 255))
    return `${type.key}(${type.options?.length ?? 255}) stored as ${column.columnType}`;
  if (type.key === 'ENUM') {
    const stored = [...column.columnType.matchAll(/'((?:[^']|'')*)'/g)].map((m) => (m[1] ?? '').replace(/''/g, "'"));
    if ([...(type.values ?? [])].sort().join('|') !== [...stored].sort().join('|'))
      return `ENUM(${(type.values ?? []).join(', ')}) stored as ${column.columnType}`;
  }
  if (type.key === 'DECIMAL' && type.options?.precision !== undefined) {
    const expected = `decimal(${type.options.precision},${type.options.scale ?? 0})`;
    if (column.columnType !== expected) return `DECIMAL stored as ${column.columnType}, model says ${expected}`;
  }
  return null;
}

describe('models and migrations', () => {
  it('agree on every column: name, type and whether it may be empty', async () => {
    const all = await columns();
    const models = Object.values(sequelize.models);
    expect(models.length).toBeGreaterThan(0);
    const problems: string[] = [];
    for (const model of models) {
      const table = tableOf(model);
      const inTable = all.filter((c) => c.table === table);
      if (!inTable.length) {
        problems.push(`${model.name}: no table ${table}`);
        continue;
      }
      const stamped = stampedBySequelize(model);
      const attributes = Object.entries(model.getAttributes()).filter(
        ([, a]) => (a.type as unknown as { key: string }).key !== 'VIRTUAL',
      );
      for (const [name, attribute] of attributes) {
        const field = attribute.field ?? name;
        const column = inTable.find((c) => c.column === field);
        if (!column) {
          problems.push(`${model.name}.${name}: no column ${table}.${field}`);
          continue;
        }
        const typeWrong = typeProblem(attribute, column);
        if (typeWrong) problems.push(`${model.name}.${name}: ${typeWrong}`);
        const modelNullable = attribute.allowNull !== false && !attribute.primaryKey && !stamped.has(name);
        if (modelNullable !== (column.nullable === 'YES'))
          problems.push(
            `${model.name}.${name}: the model ${modelNullable ? 'allows' : 'refuses'} NULL, ${table}.${field} is ${column.nullable === 'YES' ? 'NULL' : 'NOT NULL'}`,
          );
      }
      const fields = new Set(attributes.map(([name, a]) => a.field ?? name));
      // A generated column is computed by the database from the model's own columns (for reports' indexes and
      // SQL); the model never writes it, so it need not be an attribute.
      for (const column of inTable)
        if (!fields.has(column.column) && !/GENERATED/i.test(column.extra))
          problems.push(`${model.name}: ${table}.${column.column} is no attribute`);
    }
    expect(problems).toEqual([]);
  });
});
