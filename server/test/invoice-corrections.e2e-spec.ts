import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import type { InvoiceDto, ReadyGroupDto } from '../src/invoices/dto/invoice-response.dto';
import {
  businessToday,
  createCustomer,
  createInvoice,
  createIssuedInvoice,
  createStop,
  createToInvoiceTicket,
  ensureRateCard,
  invoiceActors,
  type CustomerRef,
} from './utils/invoice-fixtures';
import { createTestApp } from './utils/test-app';

/** Correcting an issued invoice: void with a reason (tickets released, re-invoiceable), or a credit note. */
describe('invoice voids and credit notes (e2e)', () => {
  let app: INestApplication<App>;
  let db: DataSource;
  let actors: Awaited<ReturnType<typeof invoiceActors>>;
  let customer: CustomerRef;
  let year: string;
  const http = () => request(app.getHttpServer());
  const office = () => actors.as('office');
  const ticket = (paidOnSiteCents?: number) =>
    createToInvoiceTicket(app, actors.tokens.office, { customerId: customer.id, shears: [{}, {}], paidOnSiteCents });
  const voidIt = (id: string, body: Record<string, unknown>, status: number) =>
    http().post(`/api/invoices/${id}/void`).set(office()).send(body).expect(status);
  const credit = (id: string, body: Record<string, unknown>, status: number) =>
    http().post(`/api/invoices/${id}/credit-notes`).set(office()).send(body).expect(status);
  const readyIds = async () =>
    ((await http().get('/api/invoices/ready').set(office()).expect(200)).body as ReadyGroupDto[]).flatMap((group) =>
      group.tickets.map((t) => t.id),
    );

  beforeAll(async () => {
    app = await createTestApp();
    db = app.get(DataSource);
    year = businessToday(app).slice(0, 4);
    actors = await invoiceActors(app, ['owner', 'office']);
    await ensureRateCard(app, actors.tokens.owner);
    const stop = await createStop(app, actors.tokens.office, { taxRateBp: 825 });
    customer = await createCustomer(app, actors.tokens.office, { stopId: stop.id });
  });
  afterAll(async () => {
    await app.close();
  });

  describe('void', () => {
    it('voids with a reason, releases the tickets and their on-site payments, and they can be invoiced again', async () => {
      const partPaid = await ticket(1200);
      const invoice = await createIssuedInvoice(app, actors.tokens.office, [partPaid.id]);
      expect(invoice.status).toBe('part-paid');
      await voidIt(invoice.id, {}, 400);
      expect((await voidIt(invoice.id, { reason: 'no' }, 400)).body.fields.reason).toEqual([
        expect.stringMatching(/Say why/),
      ]);

      const voided = (await voidIt(invoice.id, { reason: '  Billed to the wrong salon ' }, 200)).body as InvoiceDto;
      expect(voided).toMatchObject({
        status: 'void',
        number: invoice.number,
        voidReason: 'Billed to the wrong salon',
        voidedAt: expect.any(String),
        balanceCents: 0,
        paidCents: 0,
        payUrl: null,
        payments: [],
      });
      // Still says what it billed, and is kept (never deleted once sent).
      expect(voided.tickets.map((t) => t.id)).toEqual([partPaid.id]);
      expect(voided.lines.length).toBe(invoice.lines.length);
      await http().delete(`/api/invoices/${invoice.id}`).set(office()).expect(409);
      expect((await voidIt(invoice.id, { reason: 'Once more' }, 409)).body.message).toMatch(/already void/);

      const [released] = await db.query<{ invoice_id: string | null; settlement: string }[]>(
        'SELECT invoice_id, settlement FROM tickets WHERE id = $1',
        [partPaid.id],
      );
      expect(released).toEqual({ invoice_id: null, settlement: 'to-invoice' });
      expect(await readyIds()).toContain(partPaid.id);

      const again = await createIssuedInvoice(app, actors.tokens.office, [partPaid.id]);
      expect(again.number).not.toBe(invoice.number);
      expect(again).toMatchObject({ status: 'part-paid', paidCents: 1200 });
      expect(again.payments).toEqual([expect.objectContaining({ amountCents: 1200, onSite: true })]);
    });

    it('refuses a draft (deleted instead) and an invoice with a payment recorded against it', async () => {
      const draft = await createInvoice(app, actors.tokens.office, [(await ticket()).id]);
      expect((await voidIt(draft.id, { reason: 'Mistake' }, 409)).body.message).toMatch(/deleted, not voided/);

      const issued = await createIssuedInvoice(app, actors.tokens.office, [(await ticket()).id]);
      // A payment against the invoice itself, as the office's record-payment route writes it.
      await db.query(
        `INSERT INTO payments (invoice_id, method, amount_cents, reference, recorded_by) VALUES ($1, 'cheque', 500, '1042', $2)`,
        [issued.id, actors.ids.office],
      );
      const refused = await voidIt(issued.id, { reason: 'Wrong amount' }, 409);
      expect(refused.body.message).toMatch(/issue a credit note instead/);
      const [row] = await db.query<{ status: string }[]>('SELECT status FROM invoices WHERE id = $1', [issued.id]);
      expect(row!.status).toBe('sent');
    });
  });

  describe('credit notes', () => {
    it('numbers credit notes in their own series, up to what is left to credit, and settles the status', async () => {
      const invoice = await createIssuedInvoice(app, actors.tokens.office, [(await ticket()).id]);
      const total = invoice.totalCents;
      await credit(invoice.id, { amountCents: 0, reason: 'Nothing', refundMethod: 'none' }, 400);
      await credit(invoice.id, { amountCents: 100, reason: 'Refund', refundMethod: 'bank-transfer' }, 400);
      await credit(invoice.id, { amountCents: 100, refundMethod: 'cash' }, 400);

      const first = (
        await credit(invoice.id, { amountCents: 1000, reason: 'One pair re-done', refundMethod: 'none' }, 201)
      ).body as InvoiceDto;
      expect(first).toMatchObject({ status: 'part-paid', creditedCents: 1000, balanceCents: total - 1000 });
      const note = first.creditNotes[0]!;
      expect(note).toMatchObject({ amountCents: 1000, reason: 'One pair re-done', refundMethod: 'none' });
      expect(note.number).toMatch(new RegExp(`^CN-${year}-\\d{4,}$`));

      const over = await credit(
        invoice.id,
        { amountCents: total - 999, reason: 'Too much', refundMethod: 'cash' },
        400,
      );
      expect(over.body.message).toMatch(/At most .* can still be credited/);
      const rest = (
        await credit(invoice.id, { amountCents: total - 1000, reason: 'Goodwill', refundMethod: 'cash' }, 201)
      ).body as InvoiceDto;
      expect(rest).toMatchObject({ status: 'paid', creditedCents: total, balanceCents: 0, payUrl: null });
      const numbers = rest.creditNotes.map((n) => Number(n.number.split('-')[2]));
      expect(numbers[1]).toBe(numbers[0]! + 1);
      expect(rest.creditNotes[1]!.number.startsWith('KR')).toBe(false);
      const full = await credit(invoice.id, { amountCents: 1, reason: 'Again', refundMethod: 'none' }, 400);
      expect(full.body.message).toMatch(/credited in full/);
      // A credited invoice is corrected by credit, not by void.
      expect((await voidIt(invoice.id, { reason: 'Start over' }, 409)).body.message).toMatch(/credit note/);
    });

    it('credits a paid invoice as a refund, and refuses drafts and void invoices', async () => {
      const paidOnSite = await ticket();
      const partly = await createIssuedInvoice(app, actors.tokens.office, [paidOnSite.id]);
      await db.query(`INSERT INTO payments (invoice_id, method, amount_cents, reference) VALUES ($1, 'cash', $2, '')`, [
        partly.id,
        partly.totalCents,
      ]);
      const refunded = (
        await credit(partly.id, { amountCents: 700, reason: 'Refund: nicked tip', refundMethod: 'cash' }, 201)
      ).body as InvoiceDto;
      // Paid in full (the row is re-added by the credit's settle) and 7.00 handed back: nothing owed, still paid.
      expect(refunded).toMatchObject({ status: 'paid', creditedCents: 700, balanceCents: 0 });

      const draft = await createInvoice(app, actors.tokens.office, [(await ticket()).id]);
      expect(
        (await credit(draft.id, { amountCents: 100, reason: 'Early', refundMethod: 'none' }, 409)).body.message,
      ).toMatch(/Issue the invoice first/);
      const voided = await createIssuedInvoice(app, actors.tokens.office, [(await ticket()).id]);
      await voidIt(voided.id, { reason: 'Duplicate' }, 200);
      expect(
        (await credit(voided.id, { amountCents: 100, reason: 'Late', refundMethod: 'none' }, 409)).body.message,
      ).toMatch(/is void/);
    });
  });
});
