import type { EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';
import type { ColumnMetadata } from 'typeorm/metadata/ColumnMetadata';
import { ApplyValueTransformers } from 'typeorm/util/ApplyValueTransformers';
import { chunksOf } from '../../../imports/in-chunks';

/** Rows per statement: one array parameter per column, so the bind parameters stay few however many rows go in. */
const ROWS_PER_INSERT = 2000;

/** `{"a","b"}`: unnest flattens an array of arrays, so an array column travels as the text of its literal. */
function arrayLiteral(values: readonly unknown[]): string {
  return `{${values.map((value) => `"${String(value).replace(/["\\]/g, '\\$&')}"`).join(',')}}`;
}

function parameterOf(column: ColumnMetadata, value: unknown): unknown {
  const stored: unknown = column.transformer ? ApplyValueTransformers.transformTo(column.transformer, value) : value;
  if (stored === null || stored === undefined) return null;
  if (column.isArray) return arrayLiteral(stored as unknown[]);
  return column.type === 'jsonb' ? JSON.stringify(stored) : stored;
}

/** What a column's values are sent as (text for arrays and jsonb, cast back in the SELECT), and how they are read. */
function columnSql(column: ColumnMetadata, index: number): { parameter: string; value: string } {
  const type = String(column.type);
  if (column.isArray) return { parameter: `$${index + 1}::text[]`, value: `c${index}::${type}[]` };
  if (type === 'jsonb') return { parameter: `$${index + 1}::text[]`, value: `c${index}::jsonb` };
  return { parameter: `$${index + 1}::${type}[]`, value: `c${index}` };
}

/**
 * Inserts rows as insertMany (server/src/imports) does, INSERT … SELECT FROM unnest(one array per column), with the
 * columns named by the first row's properties and typed by the entity; it also carries array and jsonb columns,
 * which the visit history needs (add-ons, price summaries). Properties left undefined take the column's default.
 */
export async function insertRows<Entity extends ObjectLiteral>(
  manager: EntityManager,
  target: EntityTarget<Entity>,
  rows: readonly Partial<Entity>[],
): Promise<void> {
  if (rows.length === 0) return;
  const metadata = manager.connection.getMetadata(target);
  const columns = metadata.columns.filter((column) => rows[0]![column.propertyName] !== undefined);
  const parts = columns.map(columnSql);
  const sql =
    `INSERT INTO "${metadata.tablePath}" (${columns.map((column) => `"${column.databaseName}"`).join(', ')}) ` +
    `SELECT ${parts.map((part) => part.value).join(', ')} ` +
    `FROM unnest(${parts.map((part) => part.parameter).join(', ')}) AS r(${parts.map((_, i) => `c${i}`).join(', ')})`;
  for (const chunk of chunksOf(rows, ROWS_PER_INSERT)) {
    await manager.query(
      sql,
      columns.map((column) => chunk.map((row) => parameterOf(column, row[column.propertyName]))),
    );
  }
}
