import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { CustomerStopHistory } from '../../customers/entities/customer-stop-history.entity';
import { Customer } from '../../customers/entities/customer.entity';
import { insertMany } from '../insert-many';
import {
  CUSTOMER_COLUMNS,
  CUSTOMER_REQUIRED_COLUMNS,
  customerResolver,
  readCustomerRow,
  type CustomerDraft,
  type CustomerReady,
  type StopByName,
} from '../rows/customer-rows';
import type { ImportHandler } from './import-handler';
import { stopsHandler } from './stops.kind';

const distinct = (values: (string | null)[]) => [...new Set(values.filter((v): v is string => v !== null))];

export const customersHandler: ImportHandler<CustomerDraft, CustomerReady> = {
  columns: CUSTOMER_COLUMNS,
  required: CUSTOMER_REQUIRED_COLUMNS,
  example: {
    name: 'Robin Example',
    email: 'robin.example@demo.keenroute.test',
    phone: '555-0178',
    stop_name: stopsHandler.example.name!,
    stop_street: stopsHandler.example.street!,
    notes: 'Left-handed; prefers shears back the same day',
    visit_notice_consent: 'yes',
  },
  read: readCustomerRow,

  async prepare(manager: EntityManager, drafts: readonly CustomerDraft[]) {
    // Two queries for the whole file: the e-mails already taken and every stop the rows name.
    const emails = distinct(drafts.map((draft) => draft.email));
    const stopNames = distinct(drafts.map((draft) => draft.stopName?.toLowerCase() ?? null));
    const taken: { email: string }[] = await manager.query(
      `SELECT lower(email) AS email FROM customers WHERE lower(email) = ANY($1::text[])`,
      [emails],
    );
    const stops: StopByName[] = await manager.query(
      `SELECT id, name, street FROM stops WHERE lower(name) = ANY($1::text[])`,
      [stopNames],
    );
    const stopsByName = new Map<string, StopByName[]>();
    for (const stop of stops) {
      const key = stop.name.toLowerCase();
      stopsByName.set(key, [...(stopsByName.get(key) ?? []), stop]);
    }
    return customerResolver(new Set(taken.map((row) => row.email)), stopsByName);
  },

  async insert({ manager }, rows) {
    const startedAt = new Date();
    // Ids made here, so the stop history rows can point at the customers without reading them back.
    const customers = rows.map((row) => ({
      id: randomUUID(),
      name: row.name,
      email: row.email,
      phone: row.phone,
      stopId: row.stopId,
      notes: row.notes,
      visitNoticeConsent: row.visitNoticeConsent,
    }));
    await insertMany(
      manager,
      Customer,
      ['id', 'name', 'email', 'phone', 'stopId', 'notes', 'visitNoticeConsent'],
      customers,
    );
    const history = customers.flatMap((customer) =>
      customer.stopId === null ? [] : [{ customerId: customer.id, stopId: customer.stopId, startedAt }],
    );
    await insertMany(manager, CustomerStopHistory, ['customerId', 'stopId', 'startedAt'], history);
  },
};
