import type { INestApplication } from '@nestjs/common';
import { addDays, formatMoney } from '@keenroute/shared';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import type { InvoiceDto } from '../src/invoices/dto/invoice-response.dto';
import {
  businessToday,
  createCustomer,
  createIssuedInvoice,
  createStop,
  createToInvoiceTicket,
  ensureRateCard,
  invoiceActors,
  type ActorName,
  type CustomerRef,
  type StopRef,
} from './utils/invoice-fixtures';
import { createTestApp } from './utils/test-app';
import { binary, pdfText } from './utils/binary';

const money = (cents: number) => formatMoney(cents, 'USD');

/**
 * Statements of account as PDF, read back with a PDF text extractor. Earlier activity is moved before the period by
 * back-dating the rows in the database (a test shortcut: nobody waits a month in a test). The balances printed are
 * checked against sums worked out here from the invoices, payments and credit notes the test made.
 */
describe('statements (e2e)', () => {
  let app: INestApplication<App>;
  let db: DataSource;
  let actors: Awaited<ReturnType<typeof invoiceActors>>;
  let today: string;
  let from: string;
  let salon: StopRef;
  let paysForAll: StopRef;
  let juniper: CustomerRef;
  let older: InvoiceDto;
  let current: InvoiceDto;
  let voided: InvoiceDto;
  let creditNumber: string;
  let stopInvoice: InvoiceDto;
  const http = () => request(app.getHttpServer());
  const as = (who: ActorName) => actors.as(who);
  const invoiceFor = async (customerId: string, extra: { paidOnSiteCents?: number; stopId?: string } = {}) => {
    const ticket = await createToInvoiceTicket(app, actors.tokens.office, { customerId, shears: [{}, {}], ...extra });
    return createIssuedInvoice(app, actors.tokens.office, [ticket.id]);
  };
  const read = async (id: string) =>
    (await http().get(`/api/invoices/${id}`).set(as('office')).expect(200)).body as InvoiceDto;
  const statement = async (path: string, query: Record<string, string>, who: ActorName = 'office') => {
    const response = await http().get(path).query(query).set(as(who)).buffer(true).parse(binary).expect(200);
    expect(response.headers['content-type']).toBe('application/pdf');
    expect(response.headers['content-disposition']).toMatch(/^attachment; filename="statement-.+\.pdf"$/);
    return pdfText(response.body as Buffer);
  };

  beforeAll(async () => {
    app = await createTestApp();
    db = app.get(DataSource);
    actors = await invoiceActors(app, ['owner', 'office', 'sharpener', 'client', 'otherClient']);
    await ensureRateCard(app, actors.tokens.owner);
    today = businessToday(app);
    from = addDays(today, -30);
    salon = await createStop(app, actors.tokens.office, { taxRateBp: 825, name: 'Statement Salon (demo)' });
    juniper = await createCustomer(app, actors.tokens.office, {
      stopId: salon.id,
      name: 'Juniper Vale (demo)',
      userId: actors.ids.client,
    });

    // Before the period: an invoice part-paid on site. Test shortcut: its dates moved back in the database.
    older = await invoiceFor(juniper.id, { paidOnSiteCents: 1000 });
    await db.query(`UPDATE invoices SET issue_date = $2::date, due_date = $3::date WHERE id = $1`, [
      older.id,
      addDays(today, -40),
      addDays(today, -26),
    ]);
    await db.query(`UPDATE payments SET recorded_at = now() - interval '35 days' WHERE invoice_id = $1`, [older.id]);

    // In the period: an invoice with a cheque and a credit note, and one issued and voided.
    current = await invoiceFor(juniper.id);
    await http()
      .post(`/api/invoices/${current.id}/payments`)
      .set(as('office'))
      .send({ method: 'cheque', amountCents: 700, reference: '1001' })
      .expect(201);
    const credited = await http()
      .post(`/api/invoices/${current.id}/credit-notes`)
      .set(as('office'))
      .send({ amountCents: 300, reason: 'Pair returned unsharpened (demo)', refundMethod: 'none' })
      .expect(201);
    creditNumber = (credited.body as InvoiceDto).creditNotes[0]!.number;
    voided = await invoiceFor(juniper.id);
    await http()
      .post(`/api/invoices/${voided.id}/void`)
      .set(as('office'))
      .send({ reason: 'Entered twice (demo)' })
      .expect(200);

    // A stop that pays for its people, managed by the same client.
    paysForAll = await createStop(app, actors.tokens.office, {
      billingMode: 'stop',
      name: 'Shop Pays Salon (demo)',
      managerUserId: actors.ids.client,
    });
    const stylist = await createCustomer(app, actors.tokens.office, { stopId: paysForAll.id, name: 'Rowan Pike' });
    stopInvoice = await invoiceFor(stylist.id, { stopId: paysForAll.id });
    expect(stopInvoice.billTo).toBe('stop');
  });

  afterAll(async () => {
    await app.close();
  });

  it("prints a customer's period: opening balance, invoices, payments, credits, void, closing balance", async () => {
    const text = await statement(`/api/statements/customers/${juniper.id}`, { from, to: today });
    const opening = older.totalCents - 1000;
    const closing = opening + current.totalCents - 700 - 300 + voided.totalCents - voided.totalCents;
    // The same balance, as the invoices themselves count it.
    const owed = [await read(older.id), await read(current.id), await read(voided.id)];
    expect(owed.reduce((sum, invoice) => sum + invoice.balanceCents, 0)).toBe(closing);

    expect(text).toContain('Statement of account');
    expect(text).toContain(juniper.name);
    expect(text).toContain(`c/o ${salon.name}`);
    expect(text).toContain(`${from} to ${today}`);
    expect(text).toContain(`Opening balance on ${from} ${money(opening)}`);
    expect(text).toContain(`Invoiced ${money(current.totalCents + voided.totalCents)}`);
    expect(text).toContain(`Payments received ${money(-700)}`);
    expect(text).toContain(`Credit notes ${money(-300)}`);
    expect(text).toContain(`Invoices voided ${money(-voided.totalCents)}`);
    expect(text).toContain(`Balance due on ${today} ${money(closing)}`);
    expect(text).toContain(`Invoice ${current.number}, due ${current.dueDate}`);
    expect(text).toContain(`Payment on ${current.number}`);
    expect(text).toContain(`Credit note ${creditNumber}`);
    expect(text).toContain(`Invoice ${voided.number} void`);
    // Before the period, so only in the opening balance; the stop's invoice is the stop's, not Juniper's.
    expect(text).not.toContain(older.number!);
    expect(text).not.toContain(stopInvoice.number!);
  });

  it('opens a later period where an earlier one closed, and leaves out what came after', async () => {
    const before = await statement(`/api/statements/customers/${juniper.id}`, {
      from: addDays(today, -60),
      to: addDays(today, -31),
    });
    expect(before).toContain(`Opening balance on ${addDays(today, -60)} ${money(0)}`);
    expect(before).toContain(`Invoice ${older.number}`);
    expect(before).toContain(`Balance due on ${addDays(today, -31)} ${money(older.totalCents - 1000)}`);
    expect(before).not.toContain(current.number!);
  });

  it("prints the stop's account for a stop that pays", async () => {
    const text = await statement(`/api/statements/stops/${paysForAll.id}`, { from, to: today });
    expect(text).toContain(paysForAll.name);
    expect(text).toContain(`Invoice ${stopInvoice.number}`);
    expect(text).toContain(`Balance due on ${today} ${money(stopInvoice.totalCents)}`);
    expect(text).not.toContain(current.number!);
  });

  it('defaults to this month so far, and refuses a backwards or malformed period', async () => {
    const text = await statement(`/api/statements/customers/${juniper.id}`, {});
    expect(text).toContain(`${today.slice(0, 8)}01 to ${today}`);
    const backwards = await http()
      .get(`/api/statements/customers/${juniper.id}`)
      .query({ from: today, to: from })
      .set(as('office'))
      .expect(400);
    expect(backwards.body.message).toContain('after it ends');
    await http().get(`/api/statements/stops/${paysForAll.id}`).query({ to: 'soon' }).set(as('office')).expect(400);
    await http().get('/api/statements/customers/not-a-uuid').set(as('office')).expect(400);
  });

  it('shows a client their own account and the shop they manage, and no one else', async () => {
    await statement(`/api/statements/customers/${juniper.id}`, { from, to: today }, 'client');
    await statement(`/api/statements/stops/${paysForAll.id}`, { from, to: today }, 'client');
    await statement(`/api/statements/stops/${paysForAll.id}`, { from, to: today }, 'owner');
    await http().get(`/api/statements/customers/${juniper.id}`).set(as('otherClient')).expect(404);
    await http().get(`/api/statements/stops/${paysForAll.id}`).set(as('otherClient')).expect(404);
    await http().get(`/api/statements/stops/${salon.id}`).set(as('client')).expect(404);
    await http().get(`/api/statements/customers/${juniper.id}`).set(as('sharpener')).expect(403);
    await http().get(`/api/statements/customers/${juniper.id}`).expect(401);
    await http().get(`/api/statements/customers/${paysForAll.id}`).set(as('office')).expect(404);
  });
});
