import type { INestApplication } from '@nestjs/common';
import type { App } from 'supertest/types';
import type { DataSource } from 'typeorm';
import type { InvoiceDto } from '../../../src/invoices/dto/invoice-response.dto';
import {
  createCustomer,
  createInvoice,
  createStop,
  createToInvoiceTicket,
  ensureRateCard,
  invoiceActors,
  type CustomerRef,
} from '../invoice-fixtures';

type TestApp = INestApplication<App>;

/** Polls until `check` returns a value, or fails after the timeout: queued jobs run on pg-boss's own schedule. */
export async function eventually<T>(what: string, check: () => Promise<T | undefined>, timeoutMs = 45_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await check();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error(`Timed out waiting for ${what}.`);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

export interface InvoicesToSend {
  actors: Awaited<ReturnType<typeof invoiceActors>>;
  customer: CustomerRef;
  /** Drafts: sending one issues it first. */
  drafts: InvoiceDto[];
}

/** An office, a customer with an e-mail address, and `count` draft invoices for them, through the API. */
export async function invoicesToSend(app: TestApp, count: number): Promise<InvoicesToSend> {
  const actors = await invoiceActors(app, ['owner', 'office']);
  await ensureRateCard(app, actors.tokens.owner);
  const stop = await createStop(app, actors.tokens.office, { name: 'Faults Salon (demo)' });
  const customer = await createCustomer(app, actors.tokens.office, { stopId: stop.id });
  const drafts: InvoiceDto[] = [];
  for (let i = 0; i < count; i += 1) {
    const ticket = await createToInvoiceTicket(app, actors.tokens.office, { customerId: customer.id });
    drafts.push(await createInvoice(app, actors.tokens.office, [ticket.id]));
  }
  return { actors, customer, drafts };
}

export interface OutboxRow {
  id: string;
  key: string;
  status: string;
  attempts: number;
  text: string;
  lastError: string | null;
}

export const outboxRows = (db: DataSource): Promise<OutboxRow[]> =>
  db.query<OutboxRow[]>(
    `SELECT id, key, status, attempts, text, last_error AS "lastError" FROM mail_outbox ORDER BY created_at, id`,
  );

/** pg-boss's jobs on the mail queue that are still to run or running. */
export async function openMailJobs(db: DataSource): Promise<number> {
  const [row] = await db.query<{ open: string }[]>(
    `SELECT count(*) AS open FROM pgboss.job WHERE name = 'mail.send' AND state < 'completed'`,
  );
  return Number(row!.open);
}
