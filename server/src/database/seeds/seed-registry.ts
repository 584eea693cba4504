/** Inserts the invented demo registry (stops, customers, shears) inside the caller's transaction. */
import { formatTagCode } from '@keenroute/shared';
import type { EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';
import type { ColumnMetadata } from 'typeorm/metadata/ColumnMetadata';
import { Customer } from '../../customers/entities/customer.entity';
import { CustomerStopHistory } from '../../customers/entities/customer-stop-history.entity';
import { Shear } from '../../shears/entities/shear.entity';
import { ShearHistoryEntry } from '../../shears/entities/shear-history-entry.entity';
import { Stop } from '../../stops/entities/stop.entity';
import { StopVisit } from '../../stops/entities/stop-visit.entity';
import { User } from '../../users/entities/user.entity';
import { buildDemoRegistry } from './demo-registry';
import type { DemoPeopleIds } from './demo-stops';
import { DEMO_EMAILS } from './demo-users';

// Rows per INSERT: well under PostgreSQL's 65,535 bind parameters at a dozen-odd columns a row.
const CHUNK = 500;

function columnValue(column: ColumnMetadata, row: ObjectLiteral): unknown {
  let value: unknown = row[column.propertyName];
  for (const transformer of [column.transformer ?? []].flat()) value = transformer.to(value);
  // node-postgres would turn a JS array into a PostgreSQL array; jsonb wants JSON text.
  return column.type === 'jsonb' ? JSON.stringify(value) : value;
}

/**
 * Multi-row INSERTs in chunks, with column names from the entity's metadata: TypeORM's insert builder spends
 * seconds on a few thousand rows, plain VALUES lists take milliseconds.
 */
async function insertChunks<T extends ObjectLiteral>(
  manager: EntityManager,
  target: EntityTarget<T>,
  rows: readonly T[],
): Promise<void> {
  if (rows.length === 0) return;
  const metadata = manager.connection.getMetadata(target);
  const columns = metadata.columns.filter((column) => rows[0]![column.propertyName] !== undefined);
  const names = columns.map((column) => `"${column.databaseName}"`).join(', ');
  for (let i = 0; i < rows.length; i += CHUNK) {
    const params: unknown[] = [];
    const tuples = rows.slice(i, i + CHUNK).map((row) => {
      const slots = columns.map((column) => `$${params.push(columnValue(column, row))}`);
      return `(${slots.join(', ')})`;
    });
    await manager.query(`INSERT INTO "${metadata.tableName}" (${names}) VALUES ${tuples.join(', ')}`, params);
  }
}

async function demoPeople(manager: EntityManager): Promise<DemoPeopleIds> {
  const users = await manager
    .getRepository(User)
    .find({ where: Object.values(DEMO_EMAILS).map((email) => ({ email })) });
  const idOf = (email: string) => {
    const user = users.find((candidate) => candidate.email === email);
    if (!user) throw new Error(`The demo user ${email} is missing; seed the demo users first.`);
    return user.id;
  };
  return {
    ownerId: idOf(DEMO_EMAILS.owner),
    sharpenerId: idOf(DEMO_EMAILS.sharpener),
    clientId: idOf(DEMO_EMAILS.client),
    shopManagerId: idOf(DEMO_EMAILS.shopManager),
  };
}

/** True when the registry holds no stops and no customers: only then is the demo registry added. */
export async function registryIsEmpty(manager: EntityManager): Promise<boolean> {
  return !(await manager.getRepository(Stop).exists()) && !(await manager.getRepository(Customer).exists());
}

export async function seedDemoRegistry(manager: EntityManager, today: string): Promise<void> {
  const registry = buildDemoRegistry(today, await demoPeople(manager));
  // One round trip for every serial; the sequence then continues past the demo tags for new shears.
  const serials: { serial: string }[] = await manager.query(
    `SELECT nextval('shear_tag_serial') AS serial FROM generate_series(1, $1) ORDER BY 1`,
    [registry.shears.length],
  );
  const shears = registry.shears.map((shear, i) => ({ ...shear, tagCode: formatTagCode(Number(serials[i]!.serial)) }));

  await insertChunks(manager, Stop, registry.stops);
  await insertChunks(manager, StopVisit, registry.visits);
  await insertChunks(manager, Customer, registry.customers);
  await insertChunks(manager, CustomerStopHistory, registry.customerHistory);
  await insertChunks(manager, Shear, shears);
  await insertChunks(manager, ShearHistoryEntry, registry.shearHistory);
}
