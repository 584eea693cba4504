/**
 * Building blocks for invoice, payment, document and reminder e2e tests: staff and clients with tokens, stops that bill
 * the customer or the stop, customers with e-mail, route days, and finished tickets left "to invoice" through the API
 * (so prices are the rules package's, as in production). Invented demo names only.
 *
 * Stable signatures (other test files import them):
 *   invoiceActors(app, names?)                         → { ids, emails, tokens, as(who) }
 *     (names: owner, office, sharpener, client, otherSharpener, otherClient; all six by default)
 *   ensureRateCard(app, ownerToken)                    → the rate card version in force (saves the demo card if none)
 *   createStop(app, token, { billingMode?, taxRateBp?, email?, name?, managerUserId?, street?, city? }) → StopRef
 *   createCustomer(app, token, { stopId?, email?, name?, userId? })  → CustomerRef  (email: null for none)
 *   createRouteDay(app, sharpenerId, stopIds, day?)    → route day id (today in the business time zone by default)
 *   createToInvoiceTicket(app, token, { customerId, stopId?, routeDayId?, shears?, paidOnSiteCents?, handBack?,
 *     settle? })                                       → TicketDto (finished, settlement 'to-invoice' unless settle:false)
 *   createInvoice(app, token, ticketIds, extra?)       → InvoiceDto (draft)
 *   issueInvoice(app, token, invoiceId)                → InvoiceDto (numbered)
 *   createIssuedInvoice(app, token, ticketIds, extra?) → InvoiceDto (both steps)
 *   businessToday(app)                                 → 'YYYY-MM-DD' in BUSINESS_TIME_ZONE
 * `token` is a bearer token of the owner or office unless a function says otherwise.
 */
import type { INestApplication } from '@nestjs/common';
import { DEMO_RATE_CARD, type Role, type Shear as RulesShear } from '@keenroute/shared';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import type { InvoiceDto } from '../../src/invoices/dto/invoice-response.dto';
import type { TicketDto } from '../../src/tickets/dto/ticket-response.dto';
import { TicketWriter } from '../../src/tickets/ticket-writer';
import { createUser, signIn } from './test-app';

type TestApp = INestApplication<App>;
export type ActorName = Role | 'otherSharpener' | 'otherClient';
export interface StopRef {
  id: string;
  name: string;
  email: string | null;
}
export interface CustomerRef {
  id: string;
  name: string;
  email: string | null;
}
export interface TicketShear extends Partial<RulesShear> {
  addOns?: string[];
  /** A price set by hand on this pair (owner/office token needed). */
  overrideCents?: number;
}

const http = (app: TestApp) => request(app.getHttpServer());
const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
const suffix = () => randomUUID().slice(0, 6);

/** One signed-in user per role (plus a second sharpener and client for the "not yours" checks). */
export async function invoiceActors(
  app: TestApp,
  names: readonly ActorName[] = ['owner', 'office', 'sharpener', 'otherSharpener', 'client', 'otherClient'],
) {
  const ids = {} as Record<ActorName, string>;
  const emails = {} as Record<ActorName, string>;
  const tokens = {} as Record<ActorName, string>;
  for (const name of names) {
    const role: Role = name === 'otherSharpener' ? 'sharpener' : name === 'otherClient' ? 'client' : name;
    const user = await createUser(app, role);
    ids[name] = user.id;
    emails[name] = user.email;
    tokens[name] = (await signIn(app, user.email)).token;
  }
  return { ids, emails, tokens, as: (name: ActorName) => bearer(tokens[name]) };
}

/** Tickets need a rate card; the demo one is saved when the database has none yet. */
export async function ensureRateCard(app: TestApp, ownerToken: string): Promise<number> {
  const current = await http(app).get('/api/rates').set(bearer(ownerToken)).expect(200);
  if (current.body.version) return current.body.version as number;
  const saved = await http(app).put('/api/rates').set(bearer(ownerToken)).send({ card: DEMO_RATE_CARD }).expect(200);
  return saved.body.version as number;
}

export async function createStop(
  app: TestApp,
  token: string,
  options: {
    billingMode?: 'customer' | 'stop';
    taxRateBp?: number;
    email?: string | null;
    name?: string;
    managerUserId?: string;
    street?: string;
    city?: string;
  } = {},
): Promise<StopRef> {
  const name = `${options.name ?? 'Invoice Salon'} ${suffix()}`;
  const email = options.email === undefined ? `front-desk-${suffix()}@e2e.keenroute.test` : options.email;
  const response = await http(app)
    .post('/api/stops')
    .set(bearer(token))
    .send({
      name,
      kind: 'salon',
      street: options.street ?? '12 Invoice Row',
      city: options.city ?? 'Larkhaven',
      taxRateBp: options.taxRateBp ?? 0,
      billingMode: options.billingMode ?? 'customer',
      email,
      managerUserId: options.managerUserId,
    })
    .expect(201);
  return { id: response.body.id as string, name, email };
}

export async function createCustomer(
  app: TestApp,
  token: string,
  options: { stopId?: string; email?: string | null; name?: string; userId?: string } = {},
): Promise<CustomerRef> {
  const name = `${options.name ?? 'Wren Talbot'} ${suffix()}`;
  const email = options.email === undefined ? `customer-${suffix()}@e2e.keenroute.test` : options.email;
  const response = await http(app)
    .post('/api/customers')
    .set(bearer(token))
    .send({ name, email, stopId: options.stopId, userId: options.userId })
    .expect(201);
  return { id: response.body.id as string, name, email };
}

export const businessToday = (app: TestApp) => app.get(TicketWriter).today();

/** A planned route day of a sharpener through the given stops, straight in the database (planning is not under test). */
export async function createRouteDay(
  app: TestApp,
  sharpenerId: string,
  stopIds: readonly string[],
  day = businessToday(app),
): Promise<string> {
  const db = app.get(DataSource);
  const [row] = await db.query<{ id: string }[]>(
    `INSERT INTO route_days (sharpener_id, day, start_label, start_latitude, start_longitude, shift_start,
       latest_finish, lunch_earliest, lunch_latest, lunch_minutes)
     VALUES ($1, $2, 'E2E workshop', 44.8, -92.4, 480, 1080, 690, 810, 30) RETURNING id`,
    [sharpenerId, day],
  );
  for (const [position, stopId] of stopIds.entries()) {
    await db.query(
      `INSERT INTO route_day_stops (route_day_id, stop_id, position, arrival, start, leave, bench_minutes)
       VALUES ($1, $2, $3, 540, 540, 600, 60)`,
      [row!.id, stopId, position],
    );
  }
  return row!.id;
}

/**
 * A ticket with the given shears (one convex 6.5 in straight shear by default), every pair made ready and the ticket
 * finished; then optionally part-paid in cash on site, and left for an invoice. With a routeDayId the ticket is on that
 * day (the stop must be on it); without, the office's default applies (today's day at the stop, if any).
 */
export async function createToInvoiceTicket(
  app: TestApp,
  token: string,
  options: {
    customerId: string;
    stopId?: string;
    routeDayId?: string;
    kind?: 'visit' | 'walk-up' | 'drop-off';
    shears?: TicketShear[];
    paidOnSiteCents?: number;
    handBack?: boolean;
    settle?: boolean;
  },
): Promise<TicketDto> {
  const as = bearer(token);
  const opened = await http(app)
    .post('/api/tickets')
    .set(as)
    .send({
      customerId: options.customerId,
      stopId: options.stopId,
      routeDayId: options.routeDayId,
      kind: options.kind ?? 'visit',
    })
    .expect(201);
  const ticketId = opened.body.id as string;
  let ticket: TicketDto;
  for (const shear of options.shears ?? [{}]) {
    const { addOns, overrideCents, ...shape } = shear;
    const created = await http(app)
      .post('/api/shears')
      .set(as)
      .send({ customerId: options.customerId, lengthIn: 6.5, edgeType: 'convex', toolKind: 'straight', ...shape })
      .expect(201);
    ticket = (
      await http(app)
        .post(`/api/tickets/${ticketId}/lines`)
        .set(as)
        .send({ shearId: created.body.id, addOns: addOns ?? [] })
        .expect(201)
    ).body as TicketDto;
    const line = ticket.lines[ticket.lines.length - 1]!;
    if (overrideCents !== undefined) {
      await http(app)
        .post(`/api/tickets/${ticketId}/lines/${line.id}/override`)
        .set(as)
        .send({ cents: overrideCents, reason: 'E2E price set by hand' })
        .expect(200);
    }
    for (const benchStatus of ['on-the-bench', 'ready']) {
      await http(app).patch(`/api/tickets/${ticketId}/lines/${line.id}`).set(as).send({ benchStatus }).expect(200);
    }
  }
  const close = options.handBack ? 'hand-back' : 'finish';
  ticket = (await http(app).post(`/api/tickets/${ticketId}/${close}`).set(as).expect(200)).body as TicketDto;
  if (options.paidOnSiteCents) {
    ticket = (
      await http(app)
        .post(`/api/tickets/${ticketId}/payments`)
        .set(as)
        .send({ method: 'cash', amountCents: options.paidOnSiteCents })
        .expect(201)
    ).body as TicketDto;
  }
  if (options.settle === false) return ticket;
  return (
    await http(app).post(`/api/tickets/${ticketId}/settle`).set(as).send({ settlement: 'to-invoice' }).expect(200)
  ).body as TicketDto;
}

export async function createInvoice(
  app: TestApp,
  token: string,
  ticketIds: string[],
  extra: { discountBp?: number; discountCents?: number; notes?: string } = {},
): Promise<InvoiceDto> {
  const response = await http(app)
    .post('/api/invoices')
    .set(bearer(token))
    .send({ ticketIds, ...extra })
    .expect(201);
  return response.body as InvoiceDto;
}

export async function issueInvoice(app: TestApp, token: string, invoiceId: string): Promise<InvoiceDto> {
  const response = await http(app).post(`/api/invoices/${invoiceId}/issue`).set(bearer(token)).expect(200);
  return response.body as InvoiceDto;
}

export async function createIssuedInvoice(
  app: TestApp,
  token: string,
  ticketIds: string[],
  extra: { discountBp?: number; discountCents?: number; notes?: string } = {},
): Promise<InvoiceDto> {
  const draft = await createInvoice(app, token, ticketIds, extra);
  return issueInvoice(app, token, draft.id);
}
