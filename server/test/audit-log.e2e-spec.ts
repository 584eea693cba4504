import type { INestApplication } from '@nestjs/common';
import { addDays } from '@keenroute/shared';
import { randomBytes } from 'node:crypto';
import Stripe from 'stripe';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import type { AuditEntryDto, AuditListDto } from '../src/audit/dto/audit-entry-response.dto';
import type { InvoiceDto } from '../src/invoices/dto/invoice-response.dto';
import {
  businessToday,
  createCustomer,
  createIssuedInvoice,
  createStop,
  createToInvoiceTicket,
  ensureRateCard,
  invoiceActors,
  type CustomerRef,
} from './utils/invoice-fixtures';
import { createTestApp, createUser, TEST_PASSWORD } from './utils/test-app';

const SECRET = process.env.STRIPE_WEBHOOK_SECRET ?? 'whsec_keenroute_local_stand_in_secret';
// Only for its webhook helpers (signing test payloads); no request goes anywhere.
const stripe = new Stripe('sk_test_keenroute_audit_spec');
const id = (prefix: string) => `${prefix}${randomBytes(12).toString('hex')}`;

/**
 * The owner's audit log, driven through the API: sign-ins (and failed ones, without the password), invitations, role
 * changes and deactivations, price overrides, voids, credit notes and payments (on site, by hand, and the payment
 * service's webhook); who may read it; its filters and pages; and that an entry exists exactly when its change does.
 */
describe('audit log (e2e)', () => {
  let app: INestApplication<App>;
  let db: DataSource;
  let actors: Awaited<ReturnType<typeof invoiceActors>>;
  let customer: CustomerRef;
  const http = () => request(app.getHttpServer());
  const office = () => actors.as('office');

  const log = async (query: Record<string, string | number>) =>
    (await http().get('/api/audit').query(query).set(actors.as('owner')).expect(200)).body as AuditListDto;
  const about = async (subjectId: string) => (await log({ subjectId, pageSize: 100 })).items;
  const issued = async (): Promise<InvoiceDto> => {
    const ticket = await createToInvoiceTicket(app, actors.tokens.office, { customerId: customer.id });
    return createIssuedInvoice(app, actors.tokens.office, [ticket.id]);
  };
  const invoiceStatus = async (invoiceId: string) =>
    ((await http().get(`/api/invoices/${invoiceId}`).set(office()).expect(200)).body as InvoiceDto).status;

  beforeAll(async () => {
    app = await createTestApp();
    db = app.get(DataSource);
    actors = await invoiceActors(app, ['owner', 'office', 'sharpener', 'client']);
    await ensureRateCard(app, actors.tokens.owner);
    const stop = await createStop(app, actors.tokens.office, { name: 'Ledger Row Salon', taxRateBp: 825 });
    customer = await createCustomer(app, actors.tokens.office, { name: 'Ines Marlow', stopId: stop.id });
  });
  afterAll(async () => {
    await app.close();
  });

  it('is the owner’s: office, sharpener and client get 403, signed out 401', async () => {
    for (const role of ['office', 'sharpener', 'client'] as const) {
      const refused = await http().get('/api/audit').set(actors.as(role)).expect(403);
      expect(refused.body.message).toBe('Your role may not do this.');
    }
    await http().get('/api/audit').expect(401);
    await http().get('/api/audit').set(actors.as('owner')).expect(200);
  });

  it('records a sign-in with the caller’s address, and failed ones by the e-mail typed, never the password', async () => {
    const person = await createUser(app, 'sharpener');
    const wrong = 'Not-the-password-5521';
    const signedIn = await http().post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD });
    expect(signedIn.status).toBe(200);
    await http().post('/api/auth/login').send({ email: person.email, password: wrong }).expect(401);
    const stranger = `nobody-${id('')}@e2e.keenroute.test`;
    await http().post('/api/auth/login').send({ email: stranger.toUpperCase(), password: wrong }).expect(401);

    const [failed, signIn] = await about(person.id);
    expect(signIn).toMatchObject({
      action: 'sign-in',
      actorId: person.id,
      actorEmail: person.email,
      subjectType: 'user',
      detail: { via: 'password', role: 'sharpener' },
    });
    expect(signIn!.ip).toMatch(/127\.0\.0\.1|::1/);
    expect(failed).toMatchObject({
      action: 'sign-in-failed',
      actorId: null,
      actorEmail: person.email,
      detail: { reason: 'wrong-password' },
    });
    const unknown = (await log({ action: 'sign-in-failed', actor: stranger })).items;
    expect(unknown).toEqual([
      expect.objectContaining({ actorEmail: stranger, subjectId: null, detail: { reason: 'unknown-email' } }),
    ]);

    const stored = JSON.stringify(
      await db.query(`SELECT * FROM audit_entries WHERE actor_email IN ($1, $2)`, [person.email, stranger]),
    );
    const { accessToken } = signedIn.body as { accessToken: string };
    for (const secret of [TEST_PASSWORD, wrong, accessToken]) expect(stored).not.toContain(secret);
  });

  it('records an invitation, a role change and a deactivation with from → to, not a rename', async () => {
    const email = `audit-invitee-${id('')}@e2e.keenroute.test`;
    const invited = await http()
      .post('/api/users/invitations')
      .set(office())
      .send({ email, name: 'Tobin Vale', role: 'client' })
      .expect(201);
    const userId = invited.body.id as string;
    await http().patch(`/api/users/${userId}`).set(office()).send({ role: 'sharpener' }).expect(200);
    await http().patch(`/api/users/${userId}`).set(office()).send({ name: 'Tobin Vale-Ashe' }).expect(200);
    await http().patch(`/api/users/${userId}`).set(office()).send({ active: false }).expect(200);

    const entries = await about(userId);
    expect(entries.map((e) => [e.action, e.detail])).toEqual([
      ['user-deactivated', { email, role: 'sharpener' }],
      ['role-changed', { email, from: 'client', to: 'sharpener' }],
      ['user-invited', { email, role: 'client' }],
    ]);
    for (const entry of entries) {
      expect(entry).toMatchObject({ actorId: actors.ids.office, actorEmail: actors.emails.office });
    }
  });

  it('records a price override with the price in force before and the new one, in cents', async () => {
    const ticket = await createToInvoiceTicket(app, actors.tokens.office, {
      customerId: customer.id,
      shears: [{ overrideCents: 2750 }],
    });
    const line = ticket.lines[0]!;
    const [entry] = await about(ticket.id);
    expect(entry).toMatchObject({
      action: 'price-override',
      actorId: actors.ids.office,
      subjectType: 'ticket',
      detail: {
        lineId: line.id,
        shearId: line.shear.id,
        fromCents: line.priceCents,
        toCents: 2750,
        reason: 'E2E price set by hand',
      },
    });
    expect(line.priceCents).not.toBe(2750);
  });

  it('records payments on site, by hand against an invoice, and online from the webhook with no actor', async () => {
    const onSite = await createToInvoiceTicket(app, actors.tokens.office, {
      customerId: customer.id,
      paidOnSiteCents: 1000,
    });
    const [cash] = await about(onSite.id);
    expect(cash).toMatchObject({
      action: 'payment-recorded',
      actorId: actors.ids.office,
      subjectType: 'ticket',
      detail: { method: 'cash', amountCents: 1000, reference: '' },
    });

    const invoice = await issued();
    await http()
      .post(`/api/invoices/${invoice.id}/payments`)
      .set(office())
      .send({ method: 'cheque', amountCents: 1500, reference: '2207' })
      .expect(201);
    const [cheque] = await about(invoice.id);
    expect(cheque).toMatchObject({
      action: 'payment-recorded',
      actorId: actors.ids.office,
      subjectType: 'invoice',
      detail: { invoiceNumber: invoice.number, method: 'cheque', amountCents: 1500, reference: '2207' },
    });
    const [payment] = await db.query<{ id: string }[]>(`SELECT id FROM payments WHERE invoice_id = $1`, [invoice.id]);
    expect(cheque!.detail.paymentId).toBe(payment!.id);

    const intent = id('pi_');
    const event = {
      id: id('evt_'),
      object: 'event',
      created: Math.floor(Date.now() / 1000),
      type: 'checkout.session.completed',
      data: {
        object: {
          id: id('cs_test_'),
          object: 'checkout.session',
          payment_status: 'paid',
          amount_total: 500,
          metadata: { invoiceId: invoice.id },
          payment_intent: intent,
        },
      },
    };
    const payload = JSON.stringify(event);
    const header = stripe.webhooks.generateTestHeaderString({ payload, secret: SECRET });
    const send = () =>
      http()
        .post('/api/webhooks/stripe')
        .set('content-type', 'application/json')
        .set('stripe-signature', header)
        .send(payload)
        .expect(200);
    await send();
    await send();
    const online = (await about(invoice.id)).filter((e) => e.detail.method === 'online');
    expect(online).toEqual([
      expect.objectContaining({
        action: 'payment-recorded',
        actorId: null,
        actorEmail: null,
        detail: expect.objectContaining({ amountCents: 500, reference: intent }) as object,
      }),
    ]);
  });

  it('records a credit note and a void with their numbers, amounts and reasons', async () => {
    const credited = await issued();
    const afterCredit = await http()
      .post(`/api/invoices/${credited.id}/credit-notes`)
      .set(office())
      .send({ amountCents: 800, reason: 'Tip chipped on return', refundMethod: 'cash' })
      .expect(201);
    const [note] = await about(credited.id);
    expect(note).toMatchObject({
      action: 'credit-note-issued',
      subjectType: 'invoice',
      detail: {
        invoiceNumber: credited.number,
        amountCents: 800,
        refundMethod: 'cash',
        reason: 'Tip chipped on return',
      },
    });
    expect(note!.detail.number).toMatch(/^CN-/);
    expect((afterCredit.body as InvoiceDto).creditedCents).toBe(800);

    const voided = await issued();
    await http().post(`/api/invoices/${voided.id}/void`).set(office()).send({ reason: 'Billed twice' }).expect(200);
    const [entry] = await about(voided.id);
    expect(entry).toMatchObject({
      action: 'invoice-voided',
      actorId: actors.ids.office,
      detail: { number: voided.number, from: 'sent', totalCents: voided.totalCents, reason: 'Billed twice' },
    });
  });

  describe('an entry exists exactly when its change does', () => {
    const voidIt = (invoiceId: string) =>
      http().post(`/api/invoices/${invoiceId}/void`).set(office()).send({ reason: 'Audit rollback check' });

    it('a refused void writes no entry', async () => {
      const invoice = await issued();
      await http()
        .post(`/api/invoices/${invoice.id}/payments`)
        .set(office())
        .send({ method: 'cash', amountCents: 100 })
        .expect(201);
      await voidIt(invoice.id).expect(409);
      expect((await about(invoice.id)).map((e) => e.action)).toEqual(['payment-recorded']);
    });

    it('a void that fails after its entry is written takes the entry back with it', async () => {
      const invoice = await issued();
      // Fails the void's own UPDATE, which runs after the entry's INSERT in the same transaction.
      await db.query(`CREATE FUNCTION audit_spec_refuse() RETURNS trigger LANGUAGE plpgsql AS $$
        BEGIN RAISE EXCEPTION 'refused by the audit spec'; END $$`);
      await db.query(`CREATE TRIGGER audit_spec_refuse_void BEFORE UPDATE ON invoices FOR EACH ROW
        WHEN (NEW.id = '${invoice.id}' AND NEW.status = 'void') EXECUTE FUNCTION audit_spec_refuse()`);
      try {
        await voidIt(invoice.id).expect(500);
      } finally {
        await db.query(`DROP TRIGGER audit_spec_refuse_void ON invoices`);
        await db.query(`DROP FUNCTION audit_spec_refuse()`);
      }
      expect(await about(invoice.id)).toEqual([]);
      expect(await invoiceStatus(invoice.id)).toBe('sent');
    });

    it('a void whose entry cannot be written does not happen', async () => {
      const invoice = await issued();
      await db.query(`CREATE FUNCTION audit_spec_refuse() RETURNS trigger LANGUAGE plpgsql AS $$
        BEGIN RAISE EXCEPTION 'refused by the audit spec'; END $$`);
      await db.query(`CREATE TRIGGER audit_spec_refuse_entry BEFORE INSERT ON audit_entries FOR EACH ROW
        WHEN (NEW.subject_id = '${invoice.id}') EXECUTE FUNCTION audit_spec_refuse()`);
      try {
        await voidIt(invoice.id).expect(500);
      } finally {
        await db.query(`DROP TRIGGER audit_spec_refuse_entry ON audit_entries`);
        await db.query(`DROP FUNCTION audit_spec_refuse()`);
      }
      expect(await invoiceStatus(invoice.id)).toBe('sent');
      const [tickets] = await db.query<{ n: number }[]>(
        `SELECT count(*)::int AS n FROM tickets WHERE invoice_id = $1`,
        [invoice.id],
      );
      expect(tickets!.n).toBe(1);
    });

    it('cannot be changed or removed afterwards', async () => {
      await expect(db.query(`UPDATE audit_entries SET action = 'sign-in' WHERE true`)).rejects.toThrow(/append-only/);
      await expect(db.query(`DELETE FROM audit_entries`)).rejects.toThrow(/append-only/);
      await expect(db.query(`TRUNCATE audit_entries`)).rejects.toThrow(/append-only/);
    });
  });

  describe('reading', () => {
    it('filters by kind, actor and business days, newest first, in pages', async () => {
      const overrides = await log({ action: 'price-override', actorId: actors.ids.office, pageSize: 100 });
      expect(overrides.total).toBeGreaterThanOrEqual(1);
      expect(overrides.items.every((e) => e.action === 'price-override' && e.actorId === actors.ids.office)).toBe(true);

      const byEmail = await log({ actor: actors.emails.office.split('@')[0]!.toUpperCase(), pageSize: 100 });
      expect(byEmail.total).toBeGreaterThanOrEqual(8);
      expect(byEmail.items.every((e) => e.actorEmail === actors.emails.office)).toBe(true);
      const times = byEmail.items.map((e) => e.at);
      expect([...times].sort().reverse()).toEqual(times);

      const today = businessToday(app);
      const mine = { actorId: actors.ids.office, pageSize: 100 };
      expect((await log({ ...mine, from: today, to: today })).total).toBe(byEmail.total);
      expect((await log({ ...mine, from: addDays(today, 1) })).total).toBe(0);
      expect((await log({ ...mine, to: addDays(today, -1) })).total).toBe(0);

      const first = await log({ actorId: actors.ids.office, pageSize: 2, page: 1 });
      const second = await log({ actorId: actors.ids.office, pageSize: 2, page: 2 });
      expect(first).toMatchObject({ total: byEmail.total, page: 1, pageSize: 2 });
      expect(second.items).toHaveLength(2);
      const ids = (page: AuditEntryDto[]) => page.map((e) => e.id);
      expect(ids(first.items)).toEqual(ids(byEmail.items).slice(0, 2));
      expect(ids(second.items)).toEqual(ids(byEmail.items).slice(2, 4));
    });

    it('answers bad filters with 400 and a message naming the field', async () => {
      const bad = async (query: Record<string, string>) =>
        (await http().get('/api/audit').query(query).set(actors.as('owner')).expect(400)).body as {
          message: string;
          fields: Record<string, string[]>;
        };
      expect((await bad({ action: 'sign-out' })).fields.action![0]).toContain('action is one of: sign-in,');
      expect((await bad({ actorId: 'nobody' })).fields.actorId).toEqual(['actorId must be a user id.']);
      expect((await bad({ from: '2026-02-30' })).fields.from).toEqual(['from is a date like 2026-01-01.']);
      expect((await bad({ actor: 'x'.repeat(300) })).fields.actor).toBeDefined();
      expect((await bad({ pageSize: '500' })).fields.pageSize).toBeDefined();
      expect((await bad({ sort: 'at' })).fields.sort).toBeDefined();
      const backwards = await bad({ from: '2026-03-02', to: '2026-03-01' });
      expect(backwards.message).toBe('The range starts (2026-03-02) after it ends (2026-03-01).');
    });
  });
});
