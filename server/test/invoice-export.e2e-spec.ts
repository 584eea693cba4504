import type { INestApplication } from '@nestjs/common';
import { addDays } from '@keenroute/shared';
import Papa from 'papaparse';
import request from 'supertest';
import type { App } from 'supertest/types';
import type { InvoiceDto } from '../src/invoices/dto/invoice-response.dto';
import {
  businessToday,
  createCustomer,
  createInvoice,
  createIssuedInvoice,
  createStop,
  createToInvoiceTicket,
  ensureRateCard,
  invoiceActors,
  type ActorName,
} from './utils/invoice-fixtures';
import { createTestApp } from './utils/test-app';

/** Written out by hand (not with the code under test): whole units, a point, two digits. */
const decimal = (cents: number) => `${Math.floor(cents / 100)}.${String(cents % 100).padStart(2, '0')}`;

/**
 * The bookkeeper's CSV downloads: a header row, amounts as plain decimal numbers, and cells that a spreadsheet would
 * run as formulas (OWASP "CSV Injection": = + - @ tab CR at the start) neutralised with a leading quote.
 */
describe('invoice and payment CSV export (e2e)', () => {
  let app: INestApplication<App>;
  let actors: Awaited<ReturnType<typeof invoiceActors>>;
  let today: string;
  let issued: InvoiceDto;
  let draftName: string;
  const http = () => request(app.getHttpServer());
  const as = (who: ActorName) => actors.as(who);
  const csvOf = async (path: string, query: Record<string, string> = {}) => {
    const response = await http().get(path).query(query).set(as('office')).expect(200);
    expect(response.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(response.headers['content-disposition']).toMatch(/^attachment; filename="keenroute-\w+.*\.csv"$/);
    expect(response.text.endsWith('\r\n')).toBe(true);
    return Papa.parse<string[]>(response.text.trimEnd(), { newline: '\r\n' }).data;
  };

  beforeAll(async () => {
    app = await createTestApp();
    actors = await invoiceActors(app, ['owner', 'office', 'sharpener', 'client']);
    await ensureRateCard(app, actors.tokens.owner);
    today = businessToday(app);
    const stop = await createStop(app, actors.tokens.office, { name: 'Export Salon (demo)' });
    // A name someone could type on purpose: a spreadsheet would run it as a link formula.
    const sly = await createCustomer(app, actors.tokens.office, { stopId: stop.id, name: '=HYPERLINK("x")' });
    const tickets = [
      await createToInvoiceTicket(app, actors.tokens.office, { customerId: sly.id, shears: [{}, {}] }),
      await createToInvoiceTicket(app, actors.tokens.office, { customerId: sly.id }),
    ];
    issued = await createIssuedInvoice(
      app,
      actors.tokens.office,
      tickets.map((t) => t.id),
    );
    const paid = await http()
      .post(`/api/invoices/${issued.id}/payments`)
      .set(as('office'))
      .send({ method: 'cheque', amountCents: 1200, reference: '-2+3' })
      .expect(201);
    issued = paid.body as InvoiceDto;
    const drafty = await createCustomer(app, actors.tokens.office, { stopId: stop.id, name: 'Draft Only (demo)' });
    draftName = drafty.name;
    const ticket = await createToInvoiceTicket(app, actors.tokens.office, { customerId: drafty.id });
    await createInvoice(app, actors.tokens.office, [ticket.id]);
  });

  afterAll(async () => {
    await app.close();
  });

  it('lists issued invoices with decimal amounts and a neutralised formula name', async () => {
    const [header, ...rows] = await csvOf('/api/invoices/export.csv', { from: today, to: today });
    expect(header).toEqual([
      'Number',
      'Status',
      'Issue date',
      'Due date',
      'Bill to',
      'Currency',
      'Subtotal',
      'Tax',
      'Total',
      'Paid',
      'Credited',
      'Balance',
    ]);
    const row = rows.find((cells) => cells[0] === issued.number);
    expect(row).toEqual([
      issued.number,
      'part-paid',
      today,
      issued.dueDate,
      `'${issued.billToName}`,
      'USD',
      decimal(issued.subtotalCents),
      decimal(issued.taxCents),
      decimal(issued.totalCents),
      '12.00',
      '0.00',
      decimal(issued.totalCents - 1200),
    ]);
    expect(row![4]!.startsWith(`'=HYPERLINK("x")`)).toBe(true);
    // Drafts have no number yet: they are not for the books.
    expect(rows.some((cells) => cells.join(',').includes(draftName))).toBe(false);
  });

  it('lists payments by the day received, with a neutralised reference', async () => {
    const [header, ...rows] = await csvOf('/api/payments/export.csv', { from: today, to: today });
    expect(header).toEqual(['Date', 'Invoice number', 'Method', 'Reference', 'Amount']);
    expect(rows.filter((cells) => cells[1] === issued.number)).toEqual([
      [today, issued.number, 'cheque', "'-2+3", '12.00'],
    ]);
  });

  it('keeps to the range, and refuses a backwards or malformed one', async () => {
    const yesterday = addDays(today, -1);
    const before = await csvOf('/api/invoices/export.csv', { to: yesterday });
    expect(before.some((cells) => cells[0] === issued.number)).toBe(false);
    const payments = await csvOf('/api/payments/export.csv', { from: addDays(today, 1) });
    expect(payments).toHaveLength(1);
    const everything = await csvOf('/api/invoices/export.csv');
    expect(everything.some((cells) => cells[0] === issued.number)).toBe(true);

    const backwards = await http()
      .get('/api/invoices/export.csv')
      .query({ from: today, to: yesterday })
      .set(as('office'))
      .expect(400);
    expect(backwards.headers['content-type']).toMatch(/^application\/json/);
    expect(backwards.body.message).toContain('after it ends');
    await http().get('/api/payments/export.csv').query({ from: 'last week' }).set(as('office')).expect(400);
  });

  it('is for the owner and the office only', async () => {
    for (const path of ['/api/invoices/export.csv', '/api/payments/export.csv']) {
      await http().get(path).set(as('owner')).expect(200);
      await http().get(path).set(as('sharpener')).expect(403);
      await http().get(path).set(as('client')).expect(403);
      await http().get(path).expect(401);
    }
  });
});
