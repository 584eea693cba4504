import assert from 'node:assert/strict';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { createRequire } from 'node:module';
import { after, before, beforeEach, describe, it } from 'node:test';
import { formatAmount, parseFormBody, signWebhookPayload, startStripeStandIn, type StripeStandIn } from './stripe.js';

// The official SDK, from the server workspace that depends on it, exactly as the app uses it.
const require = createRequire(new URL('../../server/package.json', import.meta.url));
const Stripe = require('stripe') as typeof import('stripe').default;

const SECRET = 'whsec_stand_in_test_secret';

interface Received {
  raw: string;
  signature: string;
}

/** A webhook endpoint that keeps the raw bodies; answers the queued statuses first, then 200. */
async function startReceiver() {
  const received: Received[] = [];
  const statuses: number[] = [];
  const server = http.createServer((request, response) => {
    const chunks: Buffer[] = [];
    request.on('data', (chunk: Buffer) => chunks.push(chunk));
    request.on('end', () => {
      received.push({
        raw: Buffer.concat(chunks).toString('utf8'),
        signature: String(request.headers['stripe-signature']),
      });
      response.writeHead(statuses.shift() ?? 200).end('{"received":true}');
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', () => resolve()));
  const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}/api/webhooks/stripe`;
  return { url, received, statuses, stop: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}

void describe('payment stand-in', () => {
  let standIn: StripeStandIn;
  let receiver: Awaited<ReturnType<typeof startReceiver>>;
  let stripe: InstanceType<typeof Stripe>;
  const sdkFor = (key: string, port: number) =>
    new Stripe(key, { host: '127.0.0.1', port, protocol: 'http', maxNetworkRetries: 0, telemetry: false });
  // What the app sends for an invoice with $48.30 owed (contract: one price_data line, metadata on both objects).
  const invoiceCheckout = (extra: Record<string, unknown> = {}) =>
    stripe.checkout.sessions.create({
      mode: 'payment',
      line_items: [
        {
          quantity: 1,
          price_data: { currency: 'usd', unit_amount: 4830, product_data: { name: 'Invoice KR-2026-0007 <demo>' } },
        },
      ],
      customer_email: 'client@demo.keenroute.test',
      client_reference_id: 'invoice-1',
      metadata: { invoiceId: 'invoice-1', invoiceNumber: 'KR-2026-0007' },
      payment_intent_data: { metadata: { invoiceId: 'invoice-1', invoiceNumber: 'KR-2026-0007' } },
      success_url: 'http://127.0.0.1:3000/pay/tok/done?session_id={CHECKOUT_SESSION_ID}',
      cancel_url: 'http://127.0.0.1:3000/pay/tok',
      ...extra,
    });
  const press = (id: string, action: string) =>
    fetch(`${standIn.url}/checkout/${id}`, {
      method: 'POST',
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
      body: `action=${action}`,
      redirect: 'manual',
    });

  before(async () => {
    receiver = await startReceiver();
    standIn = await startStripeStandIn({ port: 0, host: '127.0.0.1', webhookUrl: receiver.url, webhookSecret: SECRET });
    stripe = sdkFor('sk_test_keenroute_local_stand_in', standIn.port);
  });
  after(async () => {
    await standIn.stop();
    await receiver.stop();
  });
  beforeEach(() => {
    receiver.received.length = 0;
    receiver.statuses.length = 0;
  });

  void it('creates and retrieves a Checkout Session through the official SDK', async () => {
    const session = await invoiceCheckout();
    assert.match(session.id, /^cs_test_[0-9a-f]+$/);
    assert.equal(session.object, 'checkout.session');
    assert.deepEqual(
      [session.status, session.payment_status, session.amount_total, session.currency, session.payment_intent],
      ['open', 'unpaid', 4830, 'usd', null],
    );
    assert.deepEqual(session.metadata, { invoiceId: 'invoice-1', invoiceNumber: 'KR-2026-0007' });
    assert.equal(session.client_reference_id, 'invoice-1');
    assert.equal(session.customer_email, 'client@demo.keenroute.test');
    assert.equal(session.url, `${standIn.url}/checkout/${session.id}`);
    assert.ok(session.expires_at - session.created === 24 * 3600);
    const again = await stripe.checkout.sessions.retrieve(session.id, { expand: ['line_items'] });
    assert.equal(again.id, session.id);
    assert.deepEqual(
      again.line_items?.data.map((line) => [line.description, line.amount_total]),
      [['Invoice KR-2026-0007 <demo>', 4830]],
    );
  });

  void it('refuses a missing, wrong or live key with 401 as the service does', async () => {
    const sdkError = (promise: Promise<unknown>) =>
      promise.then(
        () => assert.fail('expected a refusal'),
        (e) => e,
      );
    const live = await sdkError(sdkFor('sk_live_abc', standIn.port).checkout.sessions.retrieve('cs_test_x'));
    assert.equal(live.type, 'StripeAuthenticationError');
    assert.equal(live.statusCode, 401);
    const none = await fetch(`${standIn.url}/v1/checkout/sessions/cs_test_x`);
    assert.equal(none.status, 401);
    assert.match(((await none.json()) as { error: { message: string } }).error.message, /did not provide an API key/);
  });

  void it('refuses bad parameters with the param named, like the service', async () => {
    const refusal = async (extra: Record<string, unknown>) => {
      const error = await invoiceCheckout(extra).then(
        () => assert.fail('expected a refusal'),
        (e) => e,
      );
      assert.equal(error.type, 'StripeInvalidRequestError');
      return error.param as string;
    };
    assert.equal(await refusal({ success_url: undefined }), 'success_url');
    assert.equal(await refusal({ shipping_options: [{ shipping_rate: 'shr_1' }] }), 'shipping_options');
    assert.equal(await refusal({ mode: 'subscription' }), 'mode');
    const cents = (unit_amount: number, currency = 'usd') => ({
      line_items: [{ quantity: 1, price_data: { currency, unit_amount, product_data: { name: 'x' } } }],
    });
    assert.equal(await refusal(cents(49)), 'line_items'); // below the $0.50 minimum
    assert.equal(await refusal(cents(-1)), 'line_items[0][price_data][unit_amount]');
    assert.equal(await refusal(cents(100, 'USD')), 'line_items[0][price_data][currency]');
    const missing = await stripe.checkout.sessions.retrieve('cs_test_nope').catch((e: { statusCode: number }) => e);
    assert.equal((missing as { statusCode: number }).statusCode, 404);
  });

  void it('shows a phone-sized checkout page that says it is a stand-in, with the amount, Pay, Decline and Back', async () => {
    const session = await invoiceCheckout();
    const response = await fetch(session.url!);
    assert.equal(response.status, 200);
    const html = await response.text();
    assert.match(html, /<meta name="viewport" content="width=device-width, initial-scale=1">/);
    assert.match(html, /Local payment stand-in — no real money/);
    assert.match(html, /<span>Total<\/span><span>\$48\.30<\/span>/);
    assert.match(html, /Invoice KR-2026-0007 &#60;demo&#62;/); // the line's name is escaped, never markup
    assert.match(html, /<button[^>]*value="pay"[^>]*>Pay<\/button>/);
    assert.match(html, /<button[^>]*value="decline"[^>]*>Decline<\/button>/);
    assert.match(html, /<a href="http:\/\/127\.0\.0\.1:3000\/pay\/tok">Back<\/a>/);
    assert.equal((await fetch(`${standIn.url}/checkout/cs_test_unknown`)).status, 404);
  });

  void it('declines without closing the session or sending anything', async () => {
    const session = await invoiceCheckout();
    const declined = await press(session.id, 'decline');
    assert.equal(declined.status, 303);
    const again = await fetch(new URL(declined.headers.get('location')!, standIn.url));
    assert.match(await again.text(), /role="alert">Your card was declined/);
    assert.equal((await stripe.checkout.sessions.retrieve(session.id)).status, 'open');
    assert.equal(receiver.received.length, 0);
  });

  void it('pays: signed checkout.session.completed the SDK accepts, then 303 to the success URL', async () => {
    const session = await invoiceCheckout();
    const paid = await press(session.id, 'pay');
    assert.equal(paid.status, 303);
    assert.equal(paid.headers.get('location'), `http://127.0.0.1:3000/pay/tok/done?session_id=${session.id}`);
    assert.equal(receiver.received.length, 1, 'the webhook arrives before the redirect');
    const [{ raw, signature }] = receiver.received as [Received];
    assert.match(signature, /^t=\d+,v1=[0-9a-f]{64}$/);
    const event = stripe.webhooks.constructEvent(raw, signature, SECRET);
    assert.equal(event.type, 'checkout.session.completed');
    assert.equal(event.livemode, false);
    const object = event.data.object as { id: string; payment_status: string; payment_intent: string };
    assert.equal(object.id, session.id);
    assert.equal(object.payment_status, 'paid');
    assert.match(object.payment_intent, /^pi_/);
    assert.throws(
      () => stripe.webhooks.constructEvent(raw, signature, 'whsec_some_other_secret'),
      (error: Error) => error.constructor.name === 'StripeSignatureVerificationError',
    );
    assert.throws(() => stripe.webhooks.constructEvent(raw.replace('4830', '4831'), signature, SECRET));
    const retrieved = await stripe.checkout.sessions.retrieve(session.id);
    assert.deepEqual([retrieved.status, retrieved.payment_status, retrieved.url], ['complete', 'paid', null]);

    const twice = await press(session.id, 'pay'); // a double tap pays nothing more
    assert.equal(twice.headers.get('location'), paid.headers.get('location'));
    assert.equal(receiver.received.length, 1);
  });

  void it("signs exactly like the SDK's own test header (the documented t.payload HMAC-SHA256 scheme)", () => {
    const payload = JSON.stringify({ id: 'evt_1', object: 'event' });
    const timestamp = 1_765_065_600;
    assert.equal(
      signWebhookPayload(payload, SECRET, timestamp),
      stripe.webhooks.generateTestHeaderString({ payload, secret: SECRET, timestamp }),
    );
  });

  void it('retries a delivery the endpoint refused', async () => {
    const session = await invoiceCheckout();
    receiver.statuses.push(500);
    await press(session.id, 'pay');
    const record = standIn.events().find((candidate) => candidate.event.data.object.id === session.id)!;
    for (let i = 0; i < 40 && record.deliveries.length < 2; i++) await new Promise((r) => setTimeout(r, 50));
    assert.deepEqual(
      record.deliveries.map((delivery) => delivery.status),
      [500, 200],
    );
    assert.equal(receiver.received[0]!.raw, receiver.received[1]!.raw, 'a retry sends the same event');
  });

  void it('expires through the SDK (with its event) and refuses a second expiry', async () => {
    const session = await invoiceCheckout();
    const expired = await stripe.checkout.sessions.expire(session.id);
    assert.equal(expired.status, 'expired');
    const event = stripe.webhooks.constructEvent(receiver.received[0]!.raw, receiver.received[0]!.signature, SECRET);
    assert.equal(event.type, 'checkout.session.expired');
    await assert.rejects(stripe.checkout.sessions.expire(session.id), /can be expired/);
    assert.match(await (await fetch(session.url!)).text(), /This checkout has expired/);
  });

  void it('resends an event and sends a late "expired" for a paid session on request (fault tests)', async () => {
    const session = await invoiceCheckout();
    await press(session.id, 'pay');
    const completed = standIn.events().at(-1)!;
    const resent = await fetch(`${standIn.url}/__stand-in/events/${completed.id}/resend`, { method: 'POST' });
    assert.equal(resent.status, 200);
    const late = await fetch(`${standIn.url}/__stand-in/sessions/${session.id}/expire-event`, { method: 'POST' });
    assert.equal(late.status, 200);
    const ids = receiver.received.map(({ raw, signature }) => stripe.webhooks.constructEvent(raw, signature, SECRET));
    assert.deepEqual(
      ids.map((event) => event.type),
      ['checkout.session.completed', 'checkout.session.completed', 'checkout.session.expired'],
    );
    assert.equal(ids[0]!.id, ids[1]!.id);
    assert.equal((await stripe.checkout.sessions.retrieve(session.id)).status, 'complete');
    const listed = (await (await fetch(`${standIn.url}/__stand-in/events`)).json()) as { items: { id: string }[] };
    assert.ok(listed.items.some((item) => item.id === completed.id));
  });

  void it('answers a repeated idempotency key with the first answer', async () => {
    const create = () =>
      fetch(`${standIn.url}/v1/checkout/sessions`, {
        method: 'POST',
        headers: { authorization: 'Bearer sk_test_x', 'idempotency-key': 'same-click' },
        body: new URLSearchParams({
          mode: 'payment',
          'line_items[0][quantity]': '2',
          'line_items[0][price_data][currency]': 'usd',
          'line_items[0][price_data][unit_amount]': '1250',
          'line_items[0][price_data][product_data][name]': 'Shear sharpening',
          success_url: 'http://127.0.0.1:3000/done',
        }),
      }).then((response) => response.json() as Promise<{ id: string; amount_total: number }>);
    const [first, second] = [await create(), await create()];
    assert.equal(first.id, second.id);
    assert.equal(first.amount_total, 2500);
  });

  void it('reads nested form keys and refuses ambiguous or unsafe ones', () => {
    assert.deepEqual(parseFormBody('a[0][b]=1&a[1][b]=2&m[k]=v%20w&s=x'), {
      a: [{ b: '1' }, { b: '2' }],
      m: { k: 'v w' },
      s: 'x',
    });
    assert.throws(() => parseFormBody('s=1&s=2'), /sent twice/);
    assert.throws(() => parseFormBody('m[__proto__][x]=1'), /Could not read/);
    assert.throws(() => parseFormBody('a[]=1'), /Could not read/);
  });

  void it('formats amounts in the minor unit of their currency', () => {
    assert.equal(formatAmount(4830, 'usd'), '$48.30');
    assert.equal(formatAmount(500, 'jpy'), '¥500'); // yen has no minor unit (ISO 4217)
  });

  void it('refuses a port already taken with a message that says what to do', async () => {
    await assert.rejects(
      startStripeStandIn({ port: standIn.port, webhookSecret: SECRET }),
      /Port \d+ on 127\.0\.0\.1 is already taken[\s\S]*STRIPE_STAND_IN_PORT/,
    );
  });
});
