import type { INestApplication } from '@nestjs/common';
import { randomBytes } from 'node:crypto';
import Stripe from 'stripe';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import type { InvoiceDto } from '../src/invoices/dto/invoice-response.dto';
import {
  createCustomer,
  createIssuedInvoice,
  createStop,
  createToInvoiceTicket,
  ensureRateCard,
  invoiceActors,
  type CustomerRef,
} from './utils/invoice-fixtures';
import { eventually } from './utils/faults/fault-fixtures';
import { mailTo, waitForMail } from './utils/mail-catcher';
import { createTestApp } from './utils/test-app';

const SECRET = process.env.STRIPE_WEBHOOK_SECRET ?? 'whsec_keenroute_local_stand_in_secret';
// Only for its webhook helpers (signing test payloads); no request goes anywhere.
const stripe = new Stripe('sk_test_keenroute_webhook_spec');
const id = (prefix: string) => `${prefix}${randomBytes(12).toString('hex')}`;

interface SessionShape {
  id?: string;
  invoiceId: string;
  amountTotal: number;
  paymentIntent?: string | null;
  paymentStatus?: 'paid' | 'unpaid';
  status?: 'open' | 'complete' | 'expired';
}

/** A checkout-session event shaped like the service's own (only the fields the endpoint reads are meaningful). */
function sessionEvent(type: string, shape: SessionShape, eventId = id('evt_')) {
  const sessionId = shape.id ?? id('cs_test_');
  return {
    id: eventId,
    object: 'event',
    api_version: '2026-10-28.endive',
    created: Math.floor(Date.now() / 1000),
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
    type,
    data: {
      object: {
        id: sessionId,
        object: 'checkout.session',
        mode: 'payment',
        status: shape.status ?? 'complete',
        payment_status: shape.paymentStatus ?? 'paid',
        amount_total: shape.amountTotal,
        currency: 'usd',
        client_reference_id: shape.invoiceId,
        metadata: { invoiceId: shape.invoiceId, invoiceNumber: 'KR-test' },
        payment_intent: shape.paymentIntent === undefined ? id('pi_') : shape.paymentIntent,
        url: null,
      },
    },
  };
}

/**
 * The payment webhook: the signature over the raw bytes (wrong secret, tampered body, stale timestamp), exactly-once
 * recording (the same event again, two events for one payment, both at once), events out of order, and a completed
 * checkout we never stored. Payloads are pretty-printed like the service's, so re-serialising the parsed body would
 * break the signature check.
 */
describe('payment webhook (e2e)', () => {
  let app: INestApplication<App>;
  let db: DataSource;
  let actors: Awaited<ReturnType<typeof invoiceActors>>;
  let customer: CustomerRef;
  const http = () => request(app.getHttpServer());

  const post = (payload: string, header: string) =>
    http()
      .post('/api/webhooks/stripe')
      .set('content-type', 'application/json; charset=utf-8')
      .set('stripe-signature', header)
      .send(payload);
  const deliver = (event: object, options: { secret?: string; timestamp?: number } = {}) => {
    const payload = JSON.stringify(event, null, 2);
    const header = stripe.webhooks.generateTestHeaderString({
      payload,
      secret: options.secret ?? SECRET,
      timestamp: options.timestamp,
    });
    return post(payload, header);
  };
  const invoice = async (): Promise<InvoiceDto> => {
    const ticket = await createToInvoiceTicket(app, actors.tokens.office, { customerId: customer.id });
    return createIssuedInvoice(app, actors.tokens.office, [ticket.id]);
  };
  const read = async (invoiceId: string) =>
    (await http().get(`/api/invoices/${invoiceId}`).set(actors.as('office')).expect(200)).body as InvoiceDto;
  const onlinePayments = (invoiceId: string) =>
    db.query<{ amount_cents: number; external_id: string; receipt_sent_at: Date | null }[]>(
      `SELECT amount_cents, external_id, receipt_sent_at FROM payments WHERE invoice_id = $1 AND method = 'online'`,
      [invoiceId],
    );
  const eventRow = async (eventId: string) =>
    (await db.query<{ type: string }[]>(`SELECT type FROM payment_events WHERE id = $1`, [eventId]))[0];

  beforeAll(async () => {
    app = await createTestApp();
    db = app.get(DataSource);
    actors = await invoiceActors(app, ['owner', 'office']);
    await ensureRateCard(app, actors.tokens.owner);
    const stop = await createStop(app, actors.tokens.office, { name: 'Heron Lane Salon', taxRateBp: 825 });
    customer = await createCustomer(app, actors.tokens.office, { name: 'Pia Lockhart', stopId: stop.id });
  });
  afterAll(async () => {
    await app.close();
  });

  describe('signature', () => {
    it('refuses a wrong secret, a tampered body and a missing header with 400, and records nothing', async () => {
      const target = await invoice();
      const event = sessionEvent('checkout.session.completed', {
        invoiceId: target.id,
        amountTotal: target.totalCents,
      });
      const wrong = await deliver(event, { secret: 'whsec_someone_elses_endpoint' }).expect(400);
      expect(wrong.body.message).toMatch(/signature does not match/);

      const payload = JSON.stringify(event, null, 2);
      const header = stripe.webhooks.generateTestHeaderString({ payload, secret: SECRET });
      await post(payload.replace(`"amount_total": ${target.totalCents}`, '"amount_total": 1'), header).expect(400);
      await http().post('/api/webhooks/stripe').set('content-type', 'application/json').send(payload).expect(400);

      expect(await eventRow(event.id)).toBeUndefined();
      expect(await onlinePayments(target.id)).toEqual([]);
      expect((await read(target.id)).status).toBe('sent');
    });

    it('refuses an event signed 10 minutes ago (tolerance 300 s) and takes the same one signed now', async () => {
      const target = await invoice();
      const event = sessionEvent('checkout.session.completed', {
        invoiceId: target.id,
        amountTotal: target.totalCents,
      });
      await deliver(event, { timestamp: Math.floor(Date.now() / 1000) - 600 }).expect(400);
      expect(await eventRow(event.id)).toBeUndefined();
      expect((await deliver(event).expect(200)).body).toEqual({ received: true });
      expect((await read(target.id)).status).toBe('paid');
    });
  });

  describe('exactly once', () => {
    it('pays once for the same event twice, and sends one receipt', async () => {
      const target = await invoice();
      const event = sessionEvent('checkout.session.completed', {
        invoiceId: target.id,
        amountTotal: target.totalCents,
      });
      expect((await deliver(event).expect(200)).body).toEqual({ received: true });
      expect((await deliver(event).expect(200)).body).toEqual({ received: true, duplicate: true });

      const payments = await onlinePayments(target.id);
      expect(payments).toHaveLength(1);
      expect(payments[0]).toMatchObject({
        amount_cents: target.totalCents,
        external_id: event.data.object.payment_intent,
      });
      // The receipt goes through the mail queue: it arrives, and then the payment is marked.
      await waitForMail(customer.email!, new RegExp(`Receipt.*${target.number}`));
      const marked = await eventually('the receipt to be marked sent', async () => {
        const [payment] = await onlinePayments(target.id);
        return payment?.receipt_sent_at ?? undefined;
      });
      expect(marked).toBeInstanceOf(Date);
      const paid = await read(target.id);
      expect(paid).toMatchObject({ status: 'paid', paidCents: target.totalCents, balanceCents: 0, payUrl: null });
      expect(paid.payments).toEqual([
        expect.objectContaining({ method: 'online', amountCents: target.totalCents, onSite: false }),
      ]);
      const receipts = (await mailTo(customer.email!)).filter((mail) => mail.subject.includes(target.number!));
      expect(receipts).toHaveLength(1);
      expect(receipts[0]!.subject).toMatch(/^Receipt/);
      expect(receipts[0]!.text).toContain(`is paid in full`);
    });

    it('pays once for two different events about the same payment', async () => {
      const target = await invoice();
      const shape = { invoiceId: target.id, amountTotal: target.totalCents, paymentIntent: id('pi_') };
      await deliver(sessionEvent('checkout.session.completed', shape)).expect(200);
      const second = await deliver(sessionEvent('checkout.session.async_payment_succeeded', shape)).expect(200);
      expect(second.body).toEqual({ received: true });
      expect(await onlinePayments(target.id)).toHaveLength(1);
      expect((await read(target.id)).paidCents).toBe(target.totalCents);
    });

    it('pays once when the same event and a second event for it arrive at the same moment', async () => {
      const target = await invoice();
      const shape = { invoiceId: target.id, amountTotal: target.totalCents, paymentIntent: id('pi_') };
      const event = sessionEvent('checkout.session.completed', shape);
      const responses = await Promise.all([
        ...Array.from({ length: 4 }, () => deliver(event)),
        deliver(sessionEvent('checkout.session.async_payment_succeeded', shape)),
      ]);
      expect(responses.map((response) => response.status)).toEqual([200, 200, 200, 200, 200]);
      expect(responses.filter((response) => response.body.duplicate === true)).toHaveLength(3);
      expect(await onlinePayments(target.id)).toHaveLength(1);
      expect((await read(target.id)).status).toBe('paid');
    });
  });

  describe('order and unknowns', () => {
    it('keeps a completed checkout paid when its expiry arrives afterwards', async () => {
      const target = await invoice();
      const sessionId = id('cs_test_');
      await db.query(
        `INSERT INTO invoice_checkouts (id, invoice_id, amount_cents, currency, url) VALUES ($1, $2, $3, 'USD', $4)`,
        [sessionId, target.id, target.totalCents, `http://127.0.0.1/checkout/${sessionId}`],
      );
      const shape = { id: sessionId, invoiceId: target.id, amountTotal: target.totalCents };
      await deliver(sessionEvent('checkout.session.completed', shape)).expect(200);
      await deliver(sessionEvent('checkout.session.expired', { ...shape, status: 'expired' })).expect(200);
      const [checkout] = await db.query<{ status: string; completed_at: Date | null }[]>(
        `SELECT status, completed_at FROM invoice_checkouts WHERE id = $1`,
        [sessionId],
      );
      expect(checkout!.status).toBe('complete');
      expect(checkout!.completed_at).not.toBeNull();
      expect((await read(target.id)).status).toBe('paid');
    });

    it('marks an open checkout expired and leaves the invoice owing', async () => {
      const target = await invoice();
      const sessionId = id('cs_test_');
      await db.query(
        `INSERT INTO invoice_checkouts (id, invoice_id, amount_cents, currency, url) VALUES ($1, $2, $3, 'USD', $4)`,
        [sessionId, target.id, target.totalCents, `http://127.0.0.1/checkout/${sessionId}`],
      );
      const expired = sessionEvent('checkout.session.expired', {
        id: sessionId,
        invoiceId: target.id,
        amountTotal: target.totalCents,
        status: 'expired',
        paymentStatus: 'unpaid',
        paymentIntent: null,
      });
      await deliver(expired).expect(200);
      const [checkout] = await db.query<{ status: string }[]>(`SELECT status FROM invoice_checkouts WHERE id = $1`, [
        sessionId,
      ]);
      expect(checkout!.status).toBe('expired');
      expect(await eventRow(expired.id)).toEqual({ type: 'checkout.session.expired' });
      expect(await read(target.id)).toMatchObject({ status: 'sent', balanceCents: target.totalCents });
    });

    it('pays a completed checkout we never stored, by the invoice its metadata names', async () => {
      const target = await invoice();
      const event = sessionEvent('checkout.session.completed', {
        invoiceId: target.id,
        amountTotal: target.totalCents,
      });
      const [stored] = await db.query<{ count: string }[]>(`SELECT count(*) FROM invoice_checkouts WHERE id = $1`, [
        event.data.object.id,
      ]);
      expect(stored!.count).toBe('0');
      await deliver(event).expect(200);
      expect((await read(target.id)).status).toBe('paid');
    });

    it('records nothing for an unpaid completion until its delayed payment succeeds, and a part is part-paid', async () => {
      const target = await invoice();
      const part = Math.floor(target.totalCents / 2);
      const shape = { invoiceId: target.id, amountTotal: part, paymentIntent: id('pi_') };
      await deliver(sessionEvent('checkout.session.completed', { ...shape, paymentStatus: 'unpaid' })).expect(200);
      expect(await onlinePayments(target.id)).toEqual([]);
      await deliver(sessionEvent('checkout.session.async_payment_succeeded', shape)).expect(200);
      expect(await read(target.id)).toMatchObject({
        status: 'part-paid',
        paidCents: part,
        balanceCents: target.totalCents - part,
      });
    });

    it('acknowledges other event types and events naming no invoice of ours, recording only the event', async () => {
      const other = { ...sessionEvent('checkout.session.completed', { invoiceId: 'x', amountTotal: 1 }) };
      other.type = 'payment_intent.created';
      await deliver(other).expect(200);
      expect(await eventRow(other.id)).toEqual({ type: 'payment_intent.created' });

      const stranger = sessionEvent('checkout.session.completed', {
        invoiceId: '00000000-0000-4000-8000-000000000000',
        amountTotal: 500,
      });
      await deliver(stranger).expect(200);
      const [row] = await db.query<{ invoice_id: string | null }[]>(
        `SELECT invoice_id FROM payment_events WHERE id = $1`,
        [stranger.id],
      );
      expect(row).toEqual({ invoice_id: null });
      const [payment] = await db.query<{ count: string }[]>(`SELECT count(*) FROM payments WHERE external_id = $1`, [
        stranger.data.object.payment_intent,
      ]);
      expect(payment!.count).toBe('0');
    });
  });

  it('still parses JSON bodies on the other routes', async () => {
    const response = await http()
      .post('/api/invoices')
      .set(actors.as('office'))
      .set('content-type', 'application/json')
      .send(JSON.stringify({ ticketIds: [] }))
      .expect(400);
    expect(JSON.stringify(response.body.fields ?? response.body.message)).toMatch(/ticketIds/);
  });
});
