import type { INestApplication } from '@nestjs/common';
import {
  invoiceLinesFromTicket,
  priceInvoice,
  priceTicket,
  taxCents,
  type InvoiceDiscountInput,
  type RateCard,
} from '@keenroute/shared';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import type { InvoiceDto, ReadyGroupDto } from '../src/invoices/dto/invoice-response.dto';
import type { TicketDto } from '../src/tickets/dto/ticket-response.dto';
import {
  businessToday,
  createCustomer,
  createInvoice,
  createStop,
  createToInvoiceTicket,
  ensureRateCard,
  invoiceActors,
  issueInvoice,
  type CustomerRef,
  type StopRef,
} from './utils/invoice-fixtures';
import { createTestApp } from './utils/test-app';

/** Calendar arithmetic done here on its own, not with the server's dueDate: "YYYY-MM-DD" + days. */
const plusDays = (day: string, days: number) =>
  new Date(Date.parse(`${day}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

/**
 * Invoices from finished tickets: what may go on one, totals against the rules package itself, changing and deleting
 * a draft, and issuing (number, dates from the business profile's terms, bill-to, payments taken on site).
 */
describe('invoices (e2e)', () => {
  let app: INestApplication<App>;
  let db: DataSource;
  let actors: Awaited<ReturnType<typeof invoiceActors>>;
  const http = () => request(app.getHttpServer());
  const office = () => actors.as('office');
  let today: string;
  let salon: StopRef; // customers pay for themselves, 8.25 %
  let shop: StopRef; // the stop pays, 6 %
  let mara: CustomerRef;
  let bryn: CustomerRef;
  let stylist: CustomerRef;
  const ticketFor = (
    customer: CustomerRef,
    options: Omit<Parameters<typeof createToInvoiceTicket>[2], 'customerId'> = {},
  ) => createToInvoiceTicket(app, actors.tokens.office, { customerId: customer.id, ...options });
  const post = (body: Record<string, unknown>, status: number) =>
    http().post('/api/invoices').set(office()).send(body).expect(status);
  const get = async (id: string) =>
    (await http().get(`/api/invoices/${id}`).set(office()).expect(200)).body as InvoiceDto;
  const cardOf = async (ticket: TicketDto) => {
    const [row] = await db.query<{ card: RateCard }[]>('SELECT card FROM rate_cards WHERE version = $1', [
      ticket.price.rateCardVersion,
    ]);
    return row!.card;
  };
  /** The rules package's own reading of a ticket, for comparison with what the server stored. */
  const rulesLines = async (ticket: TicketDto, taxRateBp: number) =>
    invoiceLinesFromTicket({
      label: 'check',
      lines: ticket.lines.map((line) => ({
        ticketLineId: line.id,
        description: line.shear.tagCode,
        amountCents: line.effectiveCents,
      })),
      subtotalCents: ticket.price.subtotalCents,
      taxRateBp,
      servicesTaxable: (await cardOf(ticket)).servicesTaxable,
      adjustmentLabel: 'check',
    });
  const expectPriced = (invoice: InvoiceDto, expected: ReturnType<typeof priceInvoice>) =>
    expect(invoice).toMatchObject({
      linesCents: expected.linesCents,
      discountTotalCents: expected.discountCents,
      subtotalCents: expected.subtotalCents,
      taxCents: expected.taxCents,
      totalCents: expected.totalCents,
      taxGroups: expected.taxGroups,
    });

  beforeAll(async () => {
    app = await createTestApp();
    db = app.get(DataSource);
    today = businessToday(app);
    actors = await invoiceActors(app, ['owner', 'office']);
    await ensureRateCard(app, actors.tokens.owner);
    salon = await createStop(app, actors.tokens.office, { name: 'Alder Row Salon', taxRateBp: 825 });
    shop = await createStop(app, actors.tokens.office, {
      name: 'Tanner Street Barbers',
      taxRateBp: 600,
      billingMode: 'stop',
    });
    mara = await createCustomer(app, actors.tokens.office, { name: 'Mara Quill', stopId: salon.id });
    bryn = await createCustomer(app, actors.tokens.office, { name: 'Bryn Hale', stopId: salon.id });
    stylist = await createCustomer(app, actors.tokens.office, { name: 'Otto Fenn', stopId: shop.id });
  });
  afterAll(async () => {
    await app.close();
  });

  describe('what goes on an invoice', () => {
    it('refuses an open ticket, one not left for an invoice, one paid on site, and an unknown one', async () => {
      const open = await http()
        .post('/api/tickets')
        .set(office())
        .send({ customerId: mara.id, kind: 'walk-up' })
        .expect(201);
      const refused = await post({ ticketIds: [open.body.id] }, 409);
      expect(refused.body.message).toMatch(/still open; finish it/);

      const notLeft = await ticketFor(mara, { settle: false });
      expect((await post({ ticketIds: [notLeft.id] }, 409)).body.message).toMatch(/not left for an invoice/);
      const paid = await ticketFor(mara, { settle: false });
      await http()
        .post(`/api/tickets/${paid.id}/payments`)
        .set(office())
        .send({ method: 'cash', amountCents: paid.price.totalCents })
        .expect(201);
      expect((await post({ ticketIds: [paid.id] }, 409)).body.message).toMatch(/paid on site/);
      await post({ ticketIds: ['00000000-0000-4000-8000-000000000000'] }, 404);
    });

    it('refuses tickets of different payers, a ticket already invoiced, and malformed requests', async () => {
      const [a, b] = [await ticketFor(mara), await ticketFor(bryn)];
      const mixed = await post({ ticketIds: [a.id, b.id] }, 409);
      expect(mixed.body.message).toMatch(/different payers; make one invoice per payer/);
      await createInvoice(app, actors.tokens.office, [a.id]);
      expect((await post({ ticketIds: [a.id] }, 409)).body.message).toMatch(/already on an invoice/);

      await post({ ticketIds: [] }, 400);
      await post({ ticketIds: [b.id, b.id] }, 400);
      await post({ ticketIds: ['not-a-ticket'] }, 400);
      await post({ ticketIds: [b.id], discountBp: 10001 }, 400);
      const both = await post({ ticketIds: [b.id], discountBp: 500, discountCents: 100 }, 400);
      expect(both.body.message).toMatch(/either as a share or as an amount/);
      await post({ ticketIds: [b.id], discountCents: b.price.subtotalCents + 1 }, 400);
      await post({ ticketIds: [b.id], surprise: true }, 400);
      // None of the refusals left the ticket taken.
      await post({ ticketIds: [b.id] }, 201);
    });

    it('bills the stop for tickets of different customers where the stop pays', async () => {
      const other = await createCustomer(app, actors.tokens.office, { name: 'Ines Varga', stopId: shop.id });
      const tickets = [await ticketFor(stylist), await ticketFor(other)];
      const ready = (await http().get('/api/invoices/ready').set(office()).expect(200)).body as ReadyGroupDto[];
      const group = ready.find((entry) => entry.stopId === shop.id)!;
      expect(group).toMatchObject({ billTo: 'stop', customerId: null, name: shop.name, email: shop.email });
      expect(group.tickets.map((ticket) => ticket.id)).toEqual(tickets.map((ticket) => ticket.id));
      expect(group.totalCents).toBe(tickets[0]!.price.totalCents + tickets[1]!.price.totalCents);

      const invoice = await createInvoice(
        app,
        actors.tokens.office,
        tickets.map((ticket) => ticket.id),
      );
      expect(invoice).toMatchObject({ status: 'draft', number: null, billTo: 'stop', stop: { id: shop.id } });
      expect(invoice.billToName).toBe(shop.name);
      expect(invoice.tickets.map((ticket) => ticket.customerName).sort()).toEqual([other.name, stylist.name].sort());
      const after = (await http().get('/api/invoices/ready').set(office()).expect(200)).body as ReadyGroupDto[];
      expect(after.find((entry) => entry.stopId === shop.id)).toBeUndefined();
    });
  });

  describe('totals', () => {
    it('prices one ticket exactly as priceTicket does', async () => {
      // A fresh stop, so this first ticket of the visit carries the trip charge (an adjustment line).
      const corner = await createStop(app, actors.tokens.office, { name: 'Corner Salon', taxRateBp: 825 });
      const client = await createCustomer(app, actors.tokens.office, { stopId: corner.id });
      const ticket = await ticketFor(client, {
        shears: [
          { edgeType: 'convex', toolKind: 'straight', lengthIn: 6.5 },
          { edgeType: 'semi-convex', toolKind: 'thinning', lengthIn: 7.5, addOns: ['tension-adjustment'] },
          { edgeType: 'beveled', toolKind: 'curved', lengthIn: 5.5, handedness: 'left' },
        ],
      });
      const rules = priceTicket(
        ticket.lines.map(({ shear, addOns }) => ({
          shear: {
            edgeType: shear.edgeType,
            toolKind: shear.toolKind,
            lengthIn: shear.lengthIn,
            handedness: shear.handedness,
          },
          addOns,
        })),
        await cardOf(ticket),
        { taxRateBp: 825, chargeTrip: ticket.price.chargeTrip },
      );
      expect(ticket.price.chargeTrip).toBe(true);
      const invoice = await createInvoice(app, actors.tokens.office, [ticket.id]);
      expect(invoice).toMatchObject({
        subtotalCents: rules.subtotalCents,
        taxCents: rules.taxCents,
        totalCents: rules.totalCents,
        discountTotalCents: 0,
      });
      const shearLines = invoice.lines.filter((line) => line.kind === 'shear');
      expect(shearLines.map((line) => line.amountCents)).toEqual(rules.lines.map((line) => line.totalCents));
      expect(shearLines[0]!.description).toContain(ticket.lines[0]!.shear.tagCode);
      const adjustment = invoice.lines.filter((line) => line.kind === 'adjustment');
      expect(adjustment.map((line) => line.amountCents)).toEqual([rules.subtotalCents - rules.linesCents]);
      expect(adjustment[0]!.description).toMatch(/trip charge/);
      expect(invoice.lines.map((line) => line.position)).toEqual(invoice.lines.map((_, index) => index));
    });

    it('takes a discount before tax, spread over the tax rates, as priceInvoice does', async () => {
      // Mara's tickets: one at her own salon (8.25 %), one at the barbers (6 %) where she still pays herself.
      const here = await ticketFor(mara, { shears: [{}, { toolKind: 'thinning' }] });
      const away = await ticketFor(mara, {
        stopId: (await createStop(app, actors.tokens.office, { taxRateBp: 600 })).id,
      });
      const discount: InvoiceDiscountInput = { discountBp: 1250 };
      const expected = priceInvoice(
        [...(await rulesLines(here, 825)), ...(await rulesLines(away, 600))],
        discount,
        'USD',
      );
      const invoice = await createInvoice(app, actors.tokens.office, [here.id, away.id], discount);
      expect(invoice.taxGroups.map((group) => group.taxRateBp)).toEqual([600, 825]);
      expectPriced(invoice, expected);
      // The tax of each rate is that rate on its share of the discounted subtotal, to the cent.
      for (const group of invoice.taxGroups) expect(group.taxCents).toBe(taxCents(group.taxableCents, group.taxRateBp));
      expect(invoice.taxGroups.reduce((sum, group) => sum + group.taxableCents, 0)).toBe(invoice.subtotalCents);
      expect(invoice.subtotalCents).toBe(
        here.price.subtotalCents + away.price.subtotalCents - invoice.discountTotalCents,
      );
    });
  });

  describe('drafts', () => {
    it('re-prices a draft on a change of discount, and refuses a stale version', async () => {
      const ticket = await ticketFor(bryn, { shears: [{}, {}] });
      const draft = await createInvoice(app, actors.tokens.office, [ticket.id], { discountBp: 1000, notes: 'Thanks!' });
      const patch = (body: Record<string, unknown>, status: number) =>
        http().patch(`/api/invoices/${draft.id}`).set(office()).send(body).expect(status);
      const lines = await rulesLines(ticket, 825);
      const changed = (await patch({ discountCents: 500, version: draft.version }, 200)).body as InvoiceDto;
      expect(changed).toMatchObject({ discountBp: 0, discountCents: 500, notes: 'Thanks!' });
      expect(changed.version).toBeGreaterThan(draft.version);
      expectPriced(changed, priceInvoice(lines, { discountCents: 500 }, 'USD'));
      expect((await patch({ discountCents: 0, version: draft.version }, 409)).body.message).toMatch(/changed since/);
      const cleared = (await patch({ discountCents: 0, notes: '', version: changed.version }, 200)).body as InvoiceDto;
      expect(cleared).toMatchObject({ totalCents: ticket.price.totalCents, discountTotalCents: 0, notes: '' });
      await patch({ discountCents: 100 }, 400);
      await issueInvoice(app, actors.tokens.office, draft.id);
      const issued = await get(draft.id);
      expect((await patch({ discountCents: 100, version: issued.version }, 409)).body.message).toMatch(
        /credit note or void/,
      );
    });

    it('deletes a draft and releases its tickets; an issued invoice is voided, not deleted', async () => {
      const ticket = await ticketFor(bryn);
      const draft = await createInvoice(app, actors.tokens.office, [ticket.id]);
      await http().delete(`/api/invoices/${draft.id}`).set(office()).expect(204);
      await http().get(`/api/invoices/${draft.id}`).set(office()).expect(404);
      const ready = (await http().get('/api/invoices/ready').set(office()).expect(200)).body as ReadyGroupDto[];
      expect(ready.flatMap((group) => group.tickets.map((t) => t.id))).toContain(ticket.id);
      const again = await createInvoice(app, actors.tokens.office, [ticket.id]);
      await issueInvoice(app, actors.tokens.office, again.id);
      const refused = await http().delete(`/api/invoices/${again.id}`).set(office()).expect(409);
      expect(refused.body.message).toMatch(/void it instead/);
    });
  });

  describe('issuing', () => {
    afterEach(async () => {
      await db.query('UPDATE business_profile SET payment_terms_days = 14 WHERE id = 1');
    });

    it("numbers and dates it by the business profile's terms, and takes the bill-to as it is then", async () => {
      await db.query('UPDATE business_profile SET payment_terms_days = 30 WHERE id = 1');
      const draft = await createInvoice(app, actors.tokens.office, [(await ticketFor(mara)).id]);
      const issued = await issueInvoice(app, actors.tokens.office, draft.id);
      expect(issued.number).toMatch(new RegExp(`^KR-${today.slice(0, 4)}-\\d{4,}$`));
      expect(issued).toMatchObject({
        status: 'sent',
        issueDate: today,
        dueDate: plusDays(today, 30),
        termsDays: 30,
        billTo: 'customer',
        billToName: mara.name,
        billToEmail: mara.email,
        balanceCents: issued.totalCents,
        overdue: false,
        payUrl: expect.stringMatching(new RegExp(`/pay/${issued.id}\\.`)),
      });
      expect(issued.billToAddress).toContain(`c/o ${salon.name}`);
      expect(issued.billToAddress).toContain('12 Invoice Row');
      const again = await issueInvoice(app, actors.tokens.office, draft.id);
      expect(again).toMatchObject({ number: issued.number, issueDate: today });

      const listed = await http().get('/api/invoices').query({ q: issued.number!, status: 'sent' }).set(office());
      expect(listed.body.items.map((item: InvoiceDto) => item.id)).toEqual([issued.id]);
    });

    it('counts a part payment taken on site: the invoice is part-paid from the start', async () => {
      const ticket = await ticketFor(bryn, { shears: [{}, {}], paidOnSiteCents: 1500 });
      expect(ticket.settlement).toBe('to-invoice');
      const draft = await createInvoice(app, actors.tokens.office, [ticket.id]);
      expect(draft).toMatchObject({ status: 'draft', paidCents: 1500, balanceCents: ticket.price.totalCents - 1500 });
      const issued = await issueInvoice(app, actors.tokens.office, draft.id);
      expect(issued).toMatchObject({
        status: 'part-paid',
        paidCents: 1500,
        balanceCents: ticket.price.totalCents - 1500,
      });
      expect(issued.payments).toEqual([expect.objectContaining({ method: 'cash', amountCents: 1500, onSite: true })]);
      const [row] = await db.query<{ invoice_id: string }[]>('SELECT invoice_id FROM payments WHERE ticket_id = $1', [
        ticket.id,
      ]);
      expect(row!.invoice_id).toBe(issued.id);
    });

    it('lists newest first, filtered by status, payer and overdue', async () => {
      const first = await createInvoice(app, actors.tokens.office, [(await ticketFor(stylist)).id]);
      const second = await issueInvoice(
        app,
        actors.tokens.office,
        (await createInvoice(app, actors.tokens.office, [(await ticketFor(stylist)).id])).id,
      );
      const list = async (query: Record<string, string>) =>
        ((await http().get('/api/invoices').query(query).set(office()).expect(200)).body.items as InvoiceDto[]).map(
          (item) => item.id,
        );
      expect(await list({ stopId: shop.id, pageSize: '2' })).toEqual([second.id, first.id]);
      expect(await list({ stopId: shop.id, status: 'draft' })).toContain(first.id);
      expect(await list({ stopId: shop.id, status: 'draft' })).not.toContain(second.id);
      expect(await list({ stopId: shop.id, overdue: 'true' })).not.toContain(second.id);
      // Due yesterday: overdue by one day.
      await db.query('UPDATE invoices SET due_date = $2 WHERE id = $1', [second.id, plusDays(today, -1)]);
      expect(await list({ stopId: shop.id, overdue: 'true' })).toEqual([second.id]);
      expect(await get(second.id)).toMatchObject({ overdue: true, daysOverdue: 1 });
      await http().get('/api/invoices').query({ overdue: 'maybe' }).set(office()).expect(400);
    });
  });
});
