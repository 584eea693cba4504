import type { INestApplication } from '@nestjs/common';
import { formatMoney } from '@keenroute/shared';
import Stripe from 'stripe';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import type { InvoiceDto } from '../src/invoices/dto/invoice-response.dto';
import { InvoicePayLink } from '../src/invoices/invoice-pay-link';
import type { PublicInvoiceDto } from '../src/payments/online/dto/public-invoice.dto';
import { createStripeClient } from '../src/payments/stripe-client';
import {
  createCustomer,
  createInvoice,
  createIssuedInvoice,
  createRouteDay,
  createStop,
  createToInvoiceTicket,
  ensureRateCard,
  invoiceActors,
  type CustomerRef,
  type StopRef,
} from './utils/invoice-fixtures';
import { eventually } from './utils/faults/fault-fixtures';
import { mailTo, waitForMail } from './utils/mail-catcher';
import { createTestApp } from './utils/test-app';

const STAND_IN = process.env.STRIPE_API_URL;
const SECRET = process.env.STRIPE_WEBHOOK_SECRET ?? 'whsec_keenroute_local_stand_in_secret';
const tokenOf = (invoice: InvoiceDto) => invoice.payUrl!.split('/pay/')[1]!;

interface StandInRecord {
  id: string;
  type: string;
  payload: string;
  event: { data: { object: { id: string } } };
}

/**
 * The pay link's public page and online checkout (through the official SDK against the local payment stand-in: the
 * runner exports STRIPE_API_URL), and payments recorded by hand: part and whole, refusals, receipts, who may record.
 */
describe('invoice payments (e2e)', () => {
  let app: INestApplication<App>;
  let db: DataSource;
  let actors: Awaited<ReturnType<typeof invoiceActors>>;
  let stop: StopRef;
  let customer: CustomerRef;
  const http = () => request(app.getHttpServer());
  const office = () => actors.as('office');

  const issued = async (who: CustomerRef = customer, extra: { routeDayId?: string; stopId?: string } = {}) => {
    const ticket = await createToInvoiceTicket(app, actors.tokens.office, { customerId: who.id, ...extra });
    return createIssuedInvoice(app, actors.tokens.office, [ticket.id]);
  };
  const pay = (invoiceId: string, body: Record<string, unknown>, as = office()) =>
    http().post(`/api/invoices/${invoiceId}/payments`).set(as).send(body);
  const publicRead = (token: string) => http().get(`/api/public/invoices/${token}`);

  beforeAll(async () => {
    if (!STAND_IN) throw new Error('STRIPE_API_URL is not set: run the e2e tests through the runner (npm test).');
    app = await createTestApp();
    db = app.get(DataSource);
    actors = await invoiceActors(app);
    await ensureRateCard(app, actors.tokens.owner);
    await db.query(`UPDATE business_profile SET name = 'Bright Edge Sharpening (demo)', email = $1, phone = $2`, [
      'desk@demo.keenroute.test',
      '555-0142',
    ]);
    stop = await createStop(app, actors.tokens.office, { name: 'Quarry Hill Salon', taxRateBp: 825 });
    customer = await createCustomer(app, actors.tokens.office, { name: 'Tamsin Reed', stopId: stop.id });
  });
  afterAll(async () => {
    await app.close();
  });

  describe('public pay page', () => {
    it('shows an issued invoice by its token, with the business and what is owed', async () => {
      const invoice = await issued();
      const page = (await publicRead(tokenOf(invoice)).expect(200)).body as PublicInvoiceDto;
      expect(page).toMatchObject({
        number: invoice.number,
        status: 'sent',
        overdue: false,
        billToName: customer.name,
        issueDate: invoice.issueDate,
        dueDate: invoice.dueDate,
        currency: 'USD',
        totalCents: invoice.totalCents,
        paidCents: 0,
        creditedCents: 0,
        balanceCents: invoice.totalCents,
        taxCents: invoice.taxCents,
        business: { name: 'Bright Edge Sharpening (demo)', email: 'desk@demo.keenroute.test', phone: '555-0142' },
        pdfUrl: `/api/public/invoices/${tokenOf(invoice)}/pdf`,
        canPayOnline: true,
      });
      expect(page.lines).toEqual(
        invoice.lines.map((line) => ({ description: line.description, amountCents: line.amountCents })),
      );
      // No internal ids beyond the link's own token (which carries the invoice id by design).
      const shown = JSON.stringify({ ...page, pdfUrl: undefined });
      for (const internal of [invoice.id, customer.id, stop.id]) expect(shown).not.toContain(internal);
      const status = await http()
        .get(`/api/public/invoices/${tokenOf(invoice)}/status`)
        .expect(200);
      expect(status.body).toEqual({ status: 'sent', balanceCents: invoice.totalCents, paidCents: 0 });
    });

    it('shows an invoice discount as its own line, so lines and tax add up to the total', async () => {
      const ticket = await createToInvoiceTicket(app, actors.tokens.office, { customerId: customer.id });
      const invoice = await createIssuedInvoice(app, actors.tokens.office, [ticket.id], { discountBp: 1000 });
      expect(invoice.discountTotalCents).toBeGreaterThan(0);
      const page = (await publicRead(tokenOf(invoice)).expect(200)).body as PublicInvoiceDto;
      expect(page.lines.at(-1)).toEqual({ description: 'Discount', amountCents: -invoice.discountTotalCents });
      const sum = page.lines.reduce((cents, line) => cents + line.amountCents, 0);
      expect(sum + page.taxCents).toBe(page.totalCents);
    });

    it("answers 404 for a forged, tampered or unknown token and for a draft's own token", async () => {
      const invoice = await issued();
      const token = tokenOf(invoice);
      const [id, signature] = token.split('.');
      await publicRead(`${id}.${signature!.slice(1)}x`).expect(404);
      await publicRead(`00000000-0000-4000-8000-000000000000.${signature}`).expect(404);
      await publicRead('not-a-token').expect(404);
      const ticket = await createToInvoiceTicket(app, actors.tokens.office, { customerId: customer.id });
      const draft = await createInvoice(app, actors.tokens.office, [ticket.id]);
      const draftToken = app.get(InvoicePayLink).token(draft.id);
      expect((await publicRead(draftToken).expect(404)).body.message).toMatch(/pay link is not valid/);
      await http().post(`/api/public/invoices/${draftToken}/checkout`).expect(404);
      await http().get(`/api/public/invoices/${draftToken}/status`).expect(404);
    });

    it('shows a void invoice as void, owing nothing, and refuses a checkout for it', async () => {
      const invoice = await issued();
      await http()
        .post(`/api/invoices/${invoice.id}/void`)
        .set(office())
        .send({ reason: 'Billed to the wrong salon' })
        .expect(200);
      const page = (await publicRead(tokenOf(invoice)).expect(200)).body as PublicInvoiceDto;
      expect(page).toMatchObject({ status: 'void', balanceCents: 0, canPayOnline: false });
      const refused = await http()
        .post(`/api/public/invoices/${tokenOf(invoice)}/checkout`)
        .expect(409);
      expect(refused.body.message).toMatch(/void/);
    });

    it('offers no online payment for a balance under the service’s 50-cent minimum (USD, its published table)', async () => {
      const invoice = await issued();
      await pay(invoice.id, { method: 'cash', amountCents: invoice.totalCents - 30 }).expect(201);
      const page = (await publicRead(tokenOf(invoice)).expect(200)).body as PublicInvoiceDto;
      expect(page).toMatchObject({ status: 'part-paid', balanceCents: 30, canPayOnline: false });
      const refused = await http()
        .post(`/api/public/invoices/${tokenOf(invoice)}/checkout`)
        .expect(409);
      expect(refused.body.message).toBe(
        'The $0.30 still owed is below the smallest online payment ($0.50); pay it by cash or cheque.',
      );
    });
  });

  describe('online checkout through the stand-in', () => {
    const sdk = () => createStripeClient('sk_test_keenroute_local_stand_in', STAND_IN);

    it('opens a session for the balance, and only the signed webhook marks the invoice paid', async () => {
      const invoice = await issued();
      const token = tokenOf(invoice);
      // Part paid by hand first: the checkout asks for what is left, not the total.
      await pay(invoice.id, { method: 'cash', amountCents: 500 }).expect(201);
      const balance = invoice.totalCents - 500;

      const { url } = (await http().post(`/api/public/invoices/${token}/checkout`).expect(200)).body as {
        url: string;
      };
      expect(url.startsWith(`${STAND_IN}/checkout/cs_test_`)).toBe(true);
      const sessionId = url.split('/checkout/')[1]!;
      const [row] = await db.query<{ invoice_id: string; amount_cents: number; status: string; url: string }[]>(
        `SELECT invoice_id, amount_cents, status, url FROM invoice_checkouts WHERE id = $1`,
        [sessionId],
      );
      expect(row).toEqual({ invoice_id: invoice.id, amount_cents: balance, status: 'open', url });

      const session = await sdk().checkout.sessions.retrieve(sessionId, { expand: ['line_items'] });
      const appUrl = process.env.APP_URL!.replace(/\/+$/, '');
      expect(session).toMatchObject({
        mode: 'payment',
        amount_total: balance,
        currency: 'usd',
        customer_email: customer.email,
        client_reference_id: invoice.id,
        metadata: { invoiceId: invoice.id, invoiceNumber: invoice.number },
        success_url: `${appUrl}/pay/${token}/done?session_id={CHECKOUT_SESSION_ID}`,
        cancel_url: `${appUrl}/pay/${token}`,
      });
      expect(session.line_items?.data).toEqual([
        expect.objectContaining({ description: `Invoice ${invoice.number}`, quantity: 1, amount_total: balance }),
      ]);

      // A second click while that session is open hands out the same one.
      const again = await http().post(`/api/public/invoices/${token}/checkout`).expect(200);
      expect(again.body.url).toBe(url);

      // Paying on the stand-in sends the browser to the success page; nothing is paid until the webhook is heard.
      const paid = await fetch(url, {
        method: 'POST',
        headers: { 'content-type': 'application/x-www-form-urlencoded' },
        body: 'action=pay',
        redirect: 'manual',
      });
      expect(paid.status).toBe(303);
      expect(paid.headers.get('location')).toBe(`${appUrl}/pay/${token}/done?session_id=${sessionId}`);
      const before = await http().get(`/api/public/invoices/${token}/status`).expect(200);
      expect(before.body).toEqual({ status: 'part-paid', balanceCents: balance, paidCents: 500 });

      // The stand-in in the runner has no webhook target: deliver its recorded event, its exact bytes, ourselves.
      const events = (await (await fetch(`${STAND_IN}/__stand-in/events`)).json()) as { items: StandInRecord[] };
      const completed = events.items.find(
        (record) => record.type === 'checkout.session.completed' && record.event.data.object.id === sessionId,
      )!;
      const header = new Stripe('sk_test_x').webhooks.generateTestHeaderString({
        payload: completed.payload,
        secret: SECRET,
      });
      await http()
        .post('/api/webhooks/stripe')
        .set('content-type', 'application/json; charset=utf-8')
        .set('stripe-signature', header)
        .send(completed.payload)
        .expect(200);

      const after = await http().get(`/api/public/invoices/${token}/status`).expect(200);
      expect(after.body).toEqual({ status: 'paid', balanceCents: 0, paidCents: invoice.totalCents });
      const [checkout] = await db.query<{ status: string }[]>(`SELECT status FROM invoice_checkouts WHERE id = $1`, [
        sessionId,
      ]);
      expect(checkout!.status).toBe('complete');
      expect((await publicRead(token).expect(200)).body).toMatchObject({ status: 'paid', canPayOnline: false });
      await http().post(`/api/public/invoices/${token}/checkout`).expect(409);
      await waitForMail(customer.email!, new RegExp(`Receipt.*${invoice.number}`));
    });
  });

  describe('payments recorded by hand', () => {
    it('goes part-paid then paid, refusing more than the balance and cheques without a number', async () => {
      const invoice = await issued();
      const total = invoice.totalCents;
      const first = Math.floor(total / 3);

      const over = await pay(invoice.id, { method: 'cash', amountCents: total + 1 }).expect(400);
      expect(over.body.message).toContain(formatMoney(total, 'USD'));
      const noCheque = await pay(invoice.id, { method: 'cheque', amountCents: first }).expect(400);
      expect(noCheque.body.fields).toHaveProperty('reference');
      await pay(invoice.id, { method: 'card-terminal', amountCents: first, reference: '  ' }).expect(400);
      await pay(invoice.id, { method: 'online', amountCents: first }).expect(400);
      await pay(invoice.id, { method: 'cash', amountCents: 0 }).expect(400);

      const part = (await pay(invoice.id, { method: 'cheque', amountCents: first, reference: '1042' }).expect(201))
        .body as InvoiceDto;
      expect(part).toMatchObject({ status: 'part-paid', paidCents: first, balanceCents: total - first });
      expect(part.payments).toEqual([
        expect.objectContaining({ method: 'cheque', amountCents: first, reference: '1042', onSite: false }),
      ]);
      await pay(invoice.id, { method: 'cash', amountCents: total - first + 1 }).expect(400);

      const whole = (
        await pay(invoice.id, { method: 'card-terminal', amountCents: total - first, reference: 'T-88' }).expect(201)
      ).body as InvoiceDto;
      expect(whole).toMatchObject({ status: 'paid', paidCents: total, balanceCents: 0, payUrl: null });
      const settled = await pay(invoice.id, { method: 'cash', amountCents: 1 }).expect(409);
      expect(settled.body.message).toMatch(/paid in full/);
    });

    it('refuses a draft and a void invoice', async () => {
      const ticket = await createToInvoiceTicket(app, actors.tokens.office, { customerId: customer.id });
      const draft = await createInvoice(app, actors.tokens.office, [ticket.id]);
      expect((await pay(draft.id, { method: 'cash', amountCents: 100 }).expect(409)).body.message).toMatch(/Issue/);
      const invoice = await issued();
      await http().post(`/api/invoices/${invoice.id}/void`).set(office()).send({ reason: 'Duplicate' }).expect(200);
      await pay(invoice.id, { method: 'cash', amountCents: 100 }).expect(409);
    });

    it('takes concurrent payments only up to the balance', async () => {
      const invoice = await issued();
      const half = Math.ceil(invoice.totalCents / 2);
      const responses = await Promise.all([0, 1, 2].map(() => pay(invoice.id, { method: 'cash', amountCents: half })));
      expect(responses.map((response) => response.status).sort()).toEqual(
        half * 2 === invoice.totalCents ? [201, 201, 409] : [201, 400, 400],
      );
      const [sum] = await db.query<{ paid: string }[]>(
        `SELECT coalesce(sum(amount_cents), 0) AS paid FROM payments WHERE invoice_id = $1`,
        [invoice.id],
      );
      expect(Number(sum!.paid)).toBeLessThanOrEqual(invoice.totalCents);
    });

    it('e-mails a receipt when asked, logs it, and marks the payment', async () => {
      const invoice = await issued();
      const amount = Math.floor(invoice.totalCents / 2);
      await pay(invoice.id, { method: 'cheque', amountCents: amount, reference: '2207', sendReceipt: true }).expect(
        201,
      );
      const mail = await waitForMail(customer.email!, new RegExp(`Receipt.*${invoice.number}`));
      expect(mail.subject).toBe(`Receipt for ${formatMoney(amount, 'USD')}: invoice ${invoice.number}`);
      expect(mail.text).toContain(`We received ${formatMoney(amount, 'USD')} (cheque, reference 2207)`);
      expect(mail.text).toContain(`balance due ${formatMoney(invoice.totalCents - amount, 'USD')}`);
      expect(mail.text).toContain(invoice.payUrl!);
      expect(mail.text).toContain('Bright Edge Sharpening (demo)');
      // The receipt goes through the mail queue, which marks the log and the payment once the relay took it.
      const rows = await eventually('the receipt to be marked sent', async () => {
        const found = await db.query<{ kind: string; status: string; receipt_sent_at: Date | null }[]>(
          `SELECT m.kind, m.status, p.receipt_sent_at FROM invoice_mails m JOIN payments p ON p.id = m.payment_id
            WHERE m.invoice_id = $1`,
          [invoice.id],
        );
        return found[0]?.status === 'queued' ? undefined : found;
      });
      expect(rows).toEqual([{ kind: 'receipt', status: 'sent', receipt_sent_at: expect.any(Date) }]);

      // Without sendReceipt nothing is sent.
      await pay(invoice.id, { method: 'cash', amountCents: 1 }).expect(201);
      const [count] = await db.query<{ count: string }[]>(`SELECT count(*) FROM invoice_mails WHERE invoice_id = $1`, [
        invoice.id,
      ]);
      expect(count!.count).toBe('1');
      expect((await mailTo(customer.email!)).filter((m) => m.subject.includes(invoice.number!))).toHaveLength(1);
    });

    it('records without a receipt when the invoice has no e-mail address', async () => {
      const silent = await createCustomer(app, actors.tokens.office, { stopId: stop.id, email: null });
      const invoice = await issued(silent);
      expect(invoice.billToEmail).toBeNull();
      await pay(invoice.id, { method: 'cash', amountCents: 100, sendReceipt: true }).expect(201);
      const [count] = await db.query<{ count: string }[]>(`SELECT count(*) FROM invoice_mails WHERE invoice_id = $1`, [
        invoice.id,
      ]);
      expect(count!.count).toBe('0');
    });
  });

  describe('who may record a payment', () => {
    it('owner and office; a sharpener on their own route day only; never a client', async () => {
      const routeStop = await createStop(app, actors.tokens.office, { name: 'Millrace Salon' });
      const routeCustomer = await createCustomer(app, actors.tokens.office, { stopId: routeStop.id });
      const routeDayId = await createRouteDay(app, actors.ids.sharpener, [routeStop.id]);
      const onRoute = await issued(routeCustomer, { routeDayId, stopId: routeStop.id });
      const elsewhere = await issued();
      const cash = { method: 'cash', amountCents: 1 };

      await pay(onRoute.id, cash, actors.as('owner')).expect(201);
      await pay(onRoute.id, cash, actors.as('office')).expect(201);
      await pay(onRoute.id, cash, actors.as('sharpener')).expect(201);
      await pay(elsewhere.id, cash, actors.as('sharpener')).expect(404);
      await pay(onRoute.id, cash, actors.as('otherSharpener')).expect(404);
      await pay(onRoute.id, cash, actors.as('client')).expect(403);
      await http().post(`/api/invoices/${onRoute.id}/payments`).send(cash).expect(401);

      const [recorded] = await db.query<{ count: string }[]>(
        `SELECT count(*) FROM payments WHERE invoice_id = $1 AND ticket_id IS NULL`,
        [onRoute.id],
      );
      expect(recorded!.count).toBe('3');
    });

    it('lets anyone with the link read it without signing in, and nobody without it', async () => {
      const invoice = await issued();
      await publicRead(tokenOf(invoice)).expect(200);
      await http().get(`/api/invoices/${invoice.id}`).expect(401);
    });
  });
});
