import { createHmac } from 'node:crypto';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { pathToFileURL } from 'node:url';
import { parseArgs } from 'node:util';
import { checkoutPage, page, successUrl } from './stripe-page.js';
import {
  ApiError,
  createSession,
  newId,
  now,
  parseFormBody,
  withLineItems,
  type CheckoutSession,
  type Stored,
} from './stripe-sessions.js';

export { formatAmount, parseFormBody, type CheckoutSession, type FormValue } from './stripe-sessions.js';

/**
 * The local stand-in for the payment service's hosted checkout. It speaks only the part of the service's HTTP API
 * Keenroute calls (Checkout Sessions: create, retrieve, expire), shows a checkout page with Pay and Decline, and POSTs
 * webhooks signed with the service's documented scheme (`Stripe-Signature: t=<unix seconds>,v1=<hex HMAC-SHA256 of
 * "<t>.<payload>">`), so the official SDK and its webhook check work against it unchanged. No money ever moves.
 */

export interface StripeStandInOptions {
  /** 0 picks a free port. */
  port: number;
  host?: '127.0.0.1';
  /** Where events are POSTed; unset: they are only recorded (tests that post their own webhooks). */
  webhookUrl?: string;
  /** The webhook endpoint's signing secret (whsec_…), the one the app verifies with. */
  webhookSecret: string;
  /** The origin a browser reaches the checkout page at; default: the stand-in's own URL. */
  publicUrl?: string;
}

export interface StandInEvent {
  id: string;
  object: 'event';
  api_version: string;
  created: number;
  data: { object: CheckoutSession };
  livemode: false;
  pending_webhooks: number;
  request: { id: null; idempotency_key: null };
  type: 'checkout.session.completed' | 'checkout.session.expired';
}

export interface WebhookDelivery {
  at: string;
  url: string;
  /** The endpoint's HTTP status; null when it could not be reached. */
  status: number | null;
  error: string | null;
}

export interface StandInEventRecord {
  id: string;
  type: StandInEvent['type'];
  event: StandInEvent;
  /** The exact bytes signed and posted. */
  payload: string;
  deliveries: WebhookDelivery[];
}

export interface StripeStandIn {
  readonly url: string;
  readonly port: number;
  stop(): Promise<void>;
  setWebhookUrl(url: string | undefined): void;
  /** Every event made so far, oldest first, with its delivery attempts. */
  events(): StandInEventRecord[];
}

/** The API version the installed SDK (stripe 23.1.0, its apiVersion.js) asks for; events carry it like the service's. */
export const STAND_IN_API_VERSION = '2026-10-28.endive';
const RETRY_DELAYS_MS = [500, 2000, 5000];

/** The `t=…,v1=…` header value for a payload, by the service's documented signing scheme. */
export function signWebhookPayload(payload: string, secret: string, timestamp = Math.floor(Date.now() / 1000)): string {
  const signature = createHmac('sha256', secret).update(`${timestamp}.${payload}`, 'utf8').digest('hex');
  return `t=${timestamp},v1=${signature}`;
}

function sendJson(response: http.ServerResponse, status: number, body: unknown): void {
  response.writeHead(status, { 'content-type': 'application/json; charset=utf-8', 'cache-control': 'no-store' });
  response.end(JSON.stringify(body));
}

function sendHtml(response: http.ServerResponse, status: number, html: string): void {
  response.writeHead(status, { 'content-type': 'text/html; charset=utf-8', 'cache-control': 'no-store' });
  response.end(html);
}

async function readBody(request: http.IncomingMessage): Promise<string> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of request as AsyncIterable<Buffer>) {
    size += chunk.length;
    if (size > 1024 * 1024) throw new ApiError(413, 'The request body is larger than 1 MB.');
    chunks.push(chunk);
  }
  return Buffer.concat(chunks).toString('utf8');
}

function listenError(error: NodeJS.ErrnoException, port: number): Error {
  if (error.code === 'EADDRINUSE') {
    return new Error(
      `Port ${port} on 127.0.0.1 is already taken, so the payment stand-in cannot start there.\n` +
        `  See what holds it:  ss -ltnp 'sport = :${port}'\n` +
        `  Stop that program, or choose another port (STRIPE_STAND_IN_PORT).`,
    );
  }
  return error;
}

export async function startStripeStandIn(options: StripeStandInOptions): Promise<StripeStandIn> {
  const host = options.host ?? '127.0.0.1';
  if (!/^whsec_[A-Za-z0-9_]+$/.test(options.webhookSecret))
    throw new Error('The payment stand-in needs a webhook signing secret like whsec_… (letters, digits and _).');
  let webhookUrl = options.webhookUrl;
  let stopped = false;
  const sessions = new Map<string, Stored>();
  const records: StandInEventRecord[] = [];
  const idempotent = new Map<string, { status: number; body: unknown }>();
  const timers = new Set<NodeJS.Timeout>();
  let pageBase = options.publicUrl?.replace(/\/$/, '') ?? '';

  async function deliverOnce(record: StandInEventRecord): Promise<WebhookDelivery | null> {
    const target = webhookUrl;
    if (!target || stopped) return null;
    const delivery: WebhookDelivery = { at: new Date().toISOString(), url: target, status: null, error: null };
    try {
      const response = await fetch(target, {
        method: 'POST',
        headers: {
          'content-type': 'application/json; charset=utf-8',
          'stripe-signature': signWebhookPayload(record.payload, options.webhookSecret),
          'user-agent': 'Keenroute-payment-stand-in/1.0',
        },
        body: record.payload,
        signal: AbortSignal.timeout(10_000),
      });
      await response.arrayBuffer();
      delivery.status = response.status;
      if (!response.ok) delivery.error = `The endpoint answered HTTP ${response.status}.`;
    } catch (error) {
      delivery.error = error instanceof Error ? error.message : String(error);
    }
    record.deliveries.push(delivery);
    return delivery;
  }

  // The first attempt is awaited so a browser lands on the success page after the app has heard; retries follow.
  async function deliver(record: StandInEventRecord, attempt = 0): Promise<void> {
    const delivery = await deliverOnce(record);
    if (!delivery || delivery.error === null || attempt >= RETRY_DELAYS_MS.length) return;
    const timer = setTimeout(() => {
      timers.delete(timer);
      void deliver(record, attempt + 1);
    }, RETRY_DELAYS_MS[attempt]);
    timers.add(timer);
  }

  function recordEvent(type: StandInEvent['type'], session: CheckoutSession): StandInEventRecord {
    const event: StandInEvent = {
      id: newId('evt_'),
      object: 'event',
      api_version: STAND_IN_API_VERSION,
      created: now(),
      data: { object: structuredClone(session) },
      livemode: false,
      pending_webhooks: webhookUrl ? 1 : 0,
      request: { id: null, idempotency_key: null },
      type,
    };
    // Pretty-printed like the service's own payloads, so a server that re-serialises instead of using the raw body fails.
    const record = { id: event.id, type, event, payload: JSON.stringify(event, null, 2), deliveries: [] };
    records.push(record);
    return record;
  }

  function expire(stored: Stored): StandInEventRecord {
    stored.session.status = 'expired';
    stored.session.url = null;
    return recordEvent('checkout.session.expired', stored.session);
  }

  /** The session, expired first when its time is up (the service does that on its own clock). */
  async function find(id: string): Promise<Stored | undefined> {
    const stored = sessions.get(id);
    if (stored?.session.status === 'open' && now() >= stored.session.expires_at) await deliver(expire(stored));
    return stored;
  }

  async function pay(stored: Stored): Promise<void> {
    const { session } = stored;
    session.status = 'complete';
    session.payment_status = 'paid';
    session.payment_intent = newId('pi_');
    session.customer_details = { email: session.customer_email };
    session.url = null;
    await deliver(recordEvent('checkout.session.completed', session));
  }

  async function api(request: http.IncomingMessage, response: http.ServerResponse, path: string, query: string) {
    const auth = request.headers.authorization ?? '';
    if (!/^Bearer (sk|rk)_test_[A-Za-z0-9_]+$/.test(auth)) {
      const message = auth
        ? 'Invalid API Key provided: this local stand-in takes test keys only (Bearer sk_test_…).'
        : 'You did not provide an API key. Send it as Authorization: Bearer sk_test_….';
      return sendJson(response, 401, { error: { type: 'invalid_request_error', message } });
    }
    const key = request.headers['idempotency-key'];
    const cacheKey = typeof key === 'string' && request.method === 'POST' ? `${auth} ${path} ${key}` : undefined;
    const cached = cacheKey ? idempotent.get(cacheKey) : undefined;
    if (cached) return sendJson(response, cached.status, cached.body);
    const answer = (status: number, body: unknown) => {
      if (cacheKey) idempotent.set(cacheKey, { status, body });
      sendJson(response, status, body);
    };
    const params = parseFormBody(request.method === 'POST' ? await readBody(request) : query);
    const match = /^\/v1\/checkout\/sessions(?:\/([^/]+))?(\/expire)?$/.exec(path);
    const id = match?.[1];
    if (match && !id && request.method === 'POST') {
      const stored = createSession(params, pageBase);
      sessions.set(stored.session.id, stored);
      return answer(200, withLineItems(stored, params.expand));
    }
    if (!match || !id || request.method !== (match[2] ? 'POST' : 'GET'))
      throw new ApiError(
        404,
        `Unrecognized request URL (${request.method} ${path}): this stand-in speaks only Checkout Sessions create, retrieve and expire.`,
      );
    const stored = await find(id);
    if (!stored) throw new ApiError(404, `No such checkout.session: '${id}'`, 'session', 'resource_missing');
    if (match[2]) {
      if (stored.session.status !== 'open')
        throw new ApiError(
          400,
          'Only Checkout Sessions with a status in ["open"] can be expired.',
          undefined,
          'checkout_session_not_open',
        );
      await deliver(expire(stored));
    }
    answer(200, withLineItems(stored, params.expand));
  }

  async function control(request: http.IncomingMessage, response: http.ServerResponse, path: string) {
    if (request.method === 'GET' && path === '/__stand-in/events') return sendJson(response, 200, { items: records });
    const resend = /^\/__stand-in\/events\/([^/]+)\/resend$/.exec(path);
    const expireEvent = /^\/__stand-in\/sessions\/([^/]+)\/expire-event$/.exec(path);
    if (request.method !== 'POST' || (!resend && !expireEvent))
      throw new ApiError(
        404,
        'Try GET /__stand-in/events, POST /__stand-in/events/:id/resend or POST /__stand-in/sessions/:id/expire-event.',
      );
    if (!webhookUrl) throw new ApiError(409, 'This stand-in has no webhook target, so there is nothing to send to.');
    let record: StandInEventRecord | undefined;
    if (resend) {
      record = records.find((candidate) => candidate.id === resend[1]);
      if (!record) throw new ApiError(404, `No event ${resend[1]} was made by this stand-in.`);
    } else {
      const stored = await find(expireEvent![1]!);
      if (!stored) throw new ApiError(404, `No such checkout.session: '${expireEvent![1]}'`);
      // An open session really expires; a paid one gets a late, out-of-order "expired" event and stays paid here.
      record =
        stored.session.status === 'open'
          ? expire(stored)
          : recordEvent('checkout.session.expired', { ...stored.session, status: 'expired', url: null });
    }
    const delivery = await deliverOnce(record);
    sendJson(response, 200, { event: record.event, delivery });
  }

  async function checkout(request: http.IncomingMessage, response: http.ServerResponse, id: string, url: URL) {
    const stored = await find(id);
    if (!stored)
      return sendHtml(
        response,
        404,
        page(
          'No such checkout',
          '<h1>No such checkout</h1><p>This link is not known here (the stand-in forgets everything when it stops).</p>',
        ),
      );
    if (request.method === 'GET')
      return sendHtml(response, 200, checkoutPage(stored, url.searchParams.has('declined')));
    const action = new URLSearchParams(await readBody(request)).get('action');
    if (stored.session.status === 'open' && action === 'pay') await pay(stored);
    const declined = stored.session.status === 'open' && action === 'decline';
    const location =
      stored.session.status === 'complete'
        ? successUrl(stored.session)
        : `/checkout/${id}${declined ? '?declined=1' : ''}`;
    response.writeHead(303, { location, 'cache-control': 'no-store' }).end();
  }

  const server = http.createServer((request, response) => {
    const url = new URL(request.url ?? '/', 'http://localhost');
    const checkoutMatch = /^\/checkout\/([A-Za-z0-9_]+)$/.exec(url.pathname);
    const handled = url.pathname.startsWith('/v1/')
      ? api(request, response, url.pathname, url.search.slice(1))
      : url.pathname.startsWith('/__stand-in/')
        ? control(request, response, url.pathname)
        : checkoutMatch && (request.method === 'GET' || request.method === 'POST')
          ? checkout(request, response, checkoutMatch[1]!, url)
          : Promise.reject(
              new ApiError(404, 'Try POST /v1/checkout/sessions, GET /checkout/:id or GET /__stand-in/events.'),
            );
    handled.catch((error: unknown) => {
      if (response.headersSent) return response.destroy();
      if (!(error instanceof ApiError)) console.error('[payment stand-in]', error);
      const known =
        error instanceof ApiError ? error : new ApiError(500, 'The payment stand-in failed; see its output.');
      const { status, message, param, code } = known;
      sendJson(response, status, {
        error: { type: status >= 500 ? 'api_error' : 'invalid_request_error', message, param, code },
      });
    });
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', (error) => reject(listenError(error, options.port)));
    server.listen(options.port, host, () => resolve());
  });
  server.on('error', (error) => console.error(`[payment stand-in] ${error.message}`));
  const port = (server.address() as AddressInfo).port;
  pageBase ||= `http://${host}:${port}`;
  let stopping: Promise<void> | undefined;
  return {
    port,
    url: `http://${host}:${port}`,
    setWebhookUrl(next) {
      webhookUrl = next;
    },
    events: () => [...records],
    stop() {
      stopped = true;
      for (const timer of timers) clearTimeout(timer);
      stopping ??= new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      });
      return stopping;
    },
  };
}

async function runStandalone(): Promise<void> {
  const { values } = parseArgs({
    options: {
      port: { type: 'string', default: process.env.STRIPE_STAND_IN_PORT ?? '12111' },
      'webhook-url': { type: 'string', default: process.env.STRIPE_WEBHOOK_URL },
      'webhook-secret': {
        type: 'string',
        default: process.env.STRIPE_WEBHOOK_SECRET ?? 'whsec_keenroute_local_stand_in_secret',
      },
    },
  });
  const standIn = await startStripeStandIn({
    port: Number(values.port),
    webhookUrl: values['webhook-url'],
    webhookSecret: values['webhook-secret'],
  });
  console.log(
    `Payment stand-in: STRIPE_API_URL=${standIn.url}, webhooks to ${values['webhook-url'] ?? 'nowhere (--webhook-url)'} (Ctrl-C stops it).`,
  );
  for (const signal of ['SIGINT', 'SIGTERM'] as const) {
    process.once(signal, () => void standIn.stop().then(() => process.exit(0)));
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  runStandalone().catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
}
