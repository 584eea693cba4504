/**
 * The payment service repeats itself: the same webhook three times, two of them at once, and a late event about the
 * same checkout arriving between them, out of order. One payment, one receipt. The event is the payment stand-in's own
 * (a checkout paid on its page), delivered with its exact bytes, as the service would retry it.
 */
import type { INestApplication } from '@nestjs/common';
import Stripe from 'stripe';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import {
  createCustomer,
  createIssuedInvoice,
  createStop,
  createToInvoiceTicket,
  ensureRateCard,
  invoiceActors,
} from './utils/invoice-fixtures';
import { eventually } from './utils/faults/fault-fixtures';
import { mailTo } from './utils/mail-catcher';
import { createTestApp } from './utils/test-app';

const STAND_IN = process.env.STRIPE_API_URL;
const SECRET = process.env.STRIPE_WEBHOOK_SECRET ?? 'whsec_keenroute_local_stand_in_secret';
const signer = new Stripe('sk_test_keenroute_faults').webhooks;

interface StandInRecord {
  id: string;
  type: string;
  payload: string;
  event: { created: number; data: { object: { id: string; status: string } } };
}

describe('faults: one webhook three times and out of order (e2e)', () => {
  let app: INestApplication<App>;
  let db: DataSource;

  beforeAll(async () => {
    if (!STAND_IN) throw new Error('STRIPE_API_URL is not set: run the e2e tests through the runner (npm test).');
    app = await createTestApp();
    db = app.get(DataSource);
  });
  afterAll(async () => {
    await app.close();
  });

  const deliver = (payload: string) =>
    request(app.getHttpServer())
      .post('/api/webhooks/stripe')
      .set('content-type', 'application/json; charset=utf-8')
      .set('stripe-signature', signer.generateTestHeaderString({ payload, secret: SECRET }))
      .send(payload);

  it('records one payment and sends one receipt', async () => {
    const actors = await invoiceActors(app, ['owner', 'office']);
    await ensureRateCard(app, actors.tokens.owner);
    const stop = await createStop(app, actors.tokens.office, { name: 'Replay Salon (demo)' });
    const customer = await createCustomer(app, actors.tokens.office, { stopId: stop.id });
    const ticket = await createToInvoiceTicket(app, actors.tokens.office, { customerId: customer.id });
    const invoice = await createIssuedInvoice(app, actors.tokens.office, [ticket.id]);
    const token = invoice.payUrl!.split('/pay/')[1]!;

    // The customer pays on the stand-in's checkout page; it records the completed event it would send.
    const { url } = (await request(app.getHttpServer()).post(`/api/public/invoices/${token}/checkout`).expect(200))
      .body as { url: string };
    const sessionId = url.split('/checkout/')[1]!;
    const paid = await fetch(url, {
      method: 'POST',
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
      body: 'action=pay',
      redirect: 'manual',
    });
    expect(paid.status).toBe(303);
    const events = (await (await fetch(`${STAND_IN}/__stand-in/events`)).json()) as { items: StandInRecord[] };
    const completed = events.items.find(
      (record) => record.type === 'checkout.session.completed' && record.event.data.object.id === sessionId,
    )!;
    // A late "expired" event for the same checkout, as the service may send after the payment went through.
    const expired = JSON.stringify(
      {
        ...completed.event,
        id: `evt_late_${sessionId.slice(-12)}`,
        type: 'checkout.session.expired',
        data: { object: { ...completed.event.data.object, status: 'expired', url: null } },
      },
      null,
      2,
    );

    // The completed event once, the late expiry, then the completed event twice at the same moment.
    const first = await deliver(completed.payload).expect(200);
    await deliver(expired).expect(200);
    const again = await Promise.all([deliver(completed.payload), deliver(completed.payload)]);
    expect(first.body).toEqual({ received: true });
    expect(again.map((response) => response.status)).toEqual([200, 200]);
    expect(again.map((response) => response.body)).toEqual([
      { received: true, duplicate: true },
      { received: true, duplicate: true },
    ]);

    const payments = await db.query<{ amount_cents: number }[]>(
      `SELECT amount_cents FROM payments WHERE invoice_id = $1`,
      [invoice.id],
    );
    expect(payments).toEqual([{ amount_cents: invoice.totalCents }]);
    const read = await request(app.getHttpServer()).get(`/api/public/invoices/${token}/status`).expect(200);
    expect(read.body).toEqual({ status: 'paid', balanceCents: 0, paidCents: invoice.totalCents });
    const [checkout] = await db.query<{ status: string }[]>(`SELECT status FROM invoice_checkouts WHERE id = $1`, [
      sessionId,
    ]);
    expect(checkout!.status).toBe('complete');

    // One receipt, through the mail queue: it arrives, the payment is marked, and no second one follows.
    await eventually('the receipt to be sent', async () => {
      const [row] = await db.query<{ receipt_sent_at: Date | null }[]>(
        `SELECT receipt_sent_at FROM payments WHERE invoice_id = $1`,
        [invoice.id],
      );
      return row?.receipt_sent_at ? true : undefined;
    });
    const receipts = async () =>
      (await mailTo(customer.email!)).filter((mail) => mail.subject.includes(invoice.number!));
    expect(await receipts()).toHaveLength(1);
    const log = await db.query<{ kind: string; status: string }[]>(
      `SELECT kind, status FROM invoice_mails WHERE invoice_id = $1`,
      [invoice.id],
    );
    expect(log).toEqual([{ kind: 'receipt', status: 'sent' }]);
  }, 60_000);
});
