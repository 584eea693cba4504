import { formatTagCode } from '@keenroute/shared';
import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { ShearHistoryEntry } from '../../shears/entities/shear-history-entry.entity';
import { Shear } from '../../shears/entities/shear.entity';
import { insertMany } from '../insert-many';
import {
  readShearRow,
  SHEAR_COLUMNS,
  SHEAR_REQUIRED_COLUMNS,
  shearResolver,
  type ShearDraft,
  type ShearReady,
} from '../rows/shear-rows';
import { customersHandler } from './customers.kind';
import type { ImportHandler } from './import-handler';

const SHEAR_PROPERTIES = [
  'id',
  'tagCode',
  'customerId',
  'make',
  'model',
  'lengthIn',
  'edgeType',
  'toolKind',
  'handedness',
  'use',
  'notes',
] as const;

export const shearsHandler: ImportHandler<ShearDraft, ShearReady> = {
  columns: SHEAR_COLUMNS,
  required: SHEAR_REQUIRED_COLUMNS,
  example: {
    customer_email: customersHandler.example.email!,
    make: 'Example Works',
    model: 'K-60',
    length_in: '6.5',
    edge_type: 'convex',
    tool_kind: 'straight',
    handedness: 'left',
    use: 'hair',
    notes: 'Small nick near the tip',
  },
  read: readShearRow,

  async prepare(manager: EntityManager, drafts: readonly ShearDraft[]) {
    // One query for the whole file: the customer behind every e-mail it names.
    const emails = [...new Set(drafts.map((draft) => draft.customerEmail))];
    const found: { id: string; email: string }[] = await manager.query(
      `SELECT id, lower(email) AS email FROM customers WHERE lower(email) = ANY($1::text[])`,
      [emails],
    );
    const resolve = shearResolver(new Map(found.map((customer) => [customer.email, customer.id])));
    return (draft) => resolve(draft);
  },

  async insert({ manager, actor, fileName, today }, rows) {
    // Every tag serial in one round trip; sorted so tag codes follow the file's order.
    const serials: { serial: string }[] = await manager.query(
      `SELECT nextval('shear_tag_serial')::text AS serial FROM generate_series(1, $1::int)`,
      [rows.length],
    );
    const tagCodes = serials
      .map((row) => Number(row.serial))
      .sort((a, b) => a - b)
      .map(formatTagCode);
    const summary = `Registered from the CSV import ${fileName}.`.slice(0, 500);
    const shears = rows.map((row, index) => ({ ...row, id: randomUUID(), tagCode: tagCodes[index]! }));
    await insertMany(manager, Shear, SHEAR_PROPERTIES, shears);
    const history = shears.map((shear) => ({
      shearId: shear.id,
      happenedOn: today,
      kind: 'registered' as const,
      summary,
      recordedBy: actor.id,
    }));
    await insertMany(manager, ShearHistoryEntry, ['shearId', 'happenedOn', 'kind', 'summary', 'recordedBy'], history);
  },
};
