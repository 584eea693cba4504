import type { INestApplication } from '@nestjs/common';
import {
  DEMO_RATE_CARD,
  edgeRecipe,
  priceTicket,
  taxCents,
  type RateCard,
  type Role,
  type Shear as RulesShear,
} from '@keenroute/shared';
import { randomUUID } from 'node:crypto';
import sharp from 'sharp';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import type { TicketDto } from '../src/tickets/dto/ticket-response.dto';
import { TicketWriter } from '../src/tickets/ticket-writer';
import { createTestApp, createUser, signIn } from './utils/test-app';

type Who = Role | 'otherSharpener' | 'otherClient';

/**
 * Tickets through the API: prices against the rules package itself, overrides and their audit, bench status, the
 * service history, hand-back, payments on site, check-in of a booking, and who may see and do what.
 */
describe('tickets (e2e)', () => {
  let app: INestApplication<App>;
  let db: DataSource;
  const http = () => request(app.getHttpServer());
  const tokens = {} as Record<Who, string>;
  const ids = {} as Record<Who, string>;
  const as = (who: Who) => ({ Authorization: `Bearer ${tokens[who]}` });
  const tag = randomUUID().slice(0, 6);
  // The demo prices under another name: later files that read the current card see the same numbers.
  const card: RateCard = { ...DEMO_RATE_CARD, name: `Ticket e2e card ${tag}` };
  let today: string;
  const stop = { mine: '', elsewhere: '' };
  const customer = { mine: '', second: '', other: '', elsewhere: '' };
  let routeDayId: string;
  let otherRouteDayId: string;

  const createStop = async (name: string, taxRateBp: number) =>
    (
      await http()
        .post('/api/stops')
        .set(as('office'))
        .send({ name: `${name} ${tag}`, kind: 'salon', street: '4 Bench Lane', city: 'Larkhaven', taxRateBp })
        .expect(201)
    ).body.id as string;
  const createCustomer = async (name: string, stopId: string, userId?: string) =>
    (
      await http()
        .post('/api/customers')
        .set(as('office'))
        .send({ name: `${name} ${tag}`, stopId, userId })
        .expect(201)
    ).body.id as string;
  const createShear = async (customerId: string, shape: Partial<RulesShear> = {}) =>
    (
      await http()
        .post('/api/shears')
        .set(as('office'))
        .send({ customerId, lengthIn: 6.5, edgeType: 'convex', toolKind: 'straight', ...shape })
        .expect(201)
    ).body as { id: string; tagCode: string };
  const routeDay = async (sharpenerId: string, stopIds: string[]) => {
    const [row] = await db.query<{ id: string }[]>(
      `INSERT INTO route_days (sharpener_id, day, start_label, start_latitude, start_longitude, shift_start,
         latest_finish, lunch_earliest, lunch_latest, lunch_minutes)
       VALUES ($1, $2, 'E2E workshop', 44.8, -92.4, 480, 1080, 690, 810, 30) RETURNING id`,
      [sharpenerId, today],
    );
    for (const [position, stopId] of stopIds.entries()) {
      await db.query(
        `INSERT INTO route_day_stops (route_day_id, stop_id, position, arrival, start, leave, bench_minutes)
         VALUES ($1, $2, $3, 540, 540, 600, 60)`,
        [row!.id, stopId, position],
      );
    }
    return row!.id;
  };
  const open = async (who: Who, body: Record<string, unknown>, status = 201) =>
    (await http().post('/api/tickets').set(as(who)).send(body).expect(status)).body as TicketDto;
  const addShear = async (ticketId: string, body: Record<string, unknown>, who: Who = 'sharpener', status = 201) =>
    (await http().post(`/api/tickets/${ticketId}/lines`).set(as(who)).send(body).expect(status)).body as TicketDto;
  const bench = (ticketId: string, lineId: string, benchStatus: string, who: Who = 'sharpener') =>
    http().patch(`/api/tickets/${ticketId}/lines/${lineId}`).set(as(who)).send({ benchStatus });
  const allReady = async (ticket: TicketDto) => {
    for (const line of ticket.lines) {
      await bench(ticket.id, line.id, 'on-the-bench').expect(200);
      await bench(ticket.id, line.id, 'ready').expect(200);
    }
  };
  /** The rules package, called directly, over the rate card the ticket was opened on. */
  const rulesPrice = async (
    ticket: TicketDto,
    shears: { shear: RulesShear; addOns?: string[] }[],
    taxRateBp: number,
  ) => {
    const [version] = await db.query<{ card: RateCard }[]>('SELECT card FROM rate_cards WHERE version = $1', [
      ticket.price.rateCardVersion,
    ]);
    return priceTicket(shears as Parameters<typeof priceTicket>[0], version!.card, {
      taxRateBp,
      chargeTrip: ticket.price.chargeTrip,
    });
  };

  beforeAll(async () => {
    app = await createTestApp();
    db = app.get(DataSource);
    today = app.get(TicketWriter).today();
    for (const who of ['owner', 'office', 'sharpener', 'otherSharpener', 'client', 'otherClient'] as const) {
      const role: Role = who === 'otherSharpener' ? 'sharpener' : who === 'otherClient' ? 'client' : who;
      const user = await createUser(app, role);
      ids[who] = user.id;
      tokens[who] = (await signIn(app, user.email)).token;
    }
    await http().put('/api/rates').set(as('owner')).send({ card }).expect(200);
    stop.mine = await createStop('Ticket Salon', 825);
    stop.elsewhere = await createStop('Other Salon', 600);
    customer.mine = await createCustomer('Mara Quill', stop.mine, ids.client);
    customer.second = await createCustomer('Bryn Hale', stop.mine);
    customer.other = await createCustomer('Otto Fenn', stop.mine, ids.otherClient);
    customer.elsewhere = await createCustomer('Ines Varga', stop.elsewhere);
    routeDayId = await routeDay(ids.sharpener, [stop.mine]);
    otherRouteDayId = await routeDay(ids.otherSharpener, [stop.elsewhere]);
  });
  afterAll(async () => {
    await app.close();
  });

  describe('pricing', () => {
    it('prices the shears exactly as priceTicket does over the current card and the stop tax rate', async () => {
      const ticket = await open('office', { customerId: customer.mine, kind: 'visit' });
      expect(ticket).toMatchObject({ status: 'open', routeDayId, visitDay: today, stop: { id: stop.mine } });
      const shears: { shear: RulesShear; addOns: string[] }[] = [
        { shear: { edgeType: 'convex', toolKind: 'straight', lengthIn: 6.5, handedness: 'right' }, addOns: [] },
        {
          shear: { edgeType: 'semi-convex', toolKind: 'thinning', lengthIn: 7.5, handedness: 'left' },
          addOns: ['inside-edge-hone', 'tension-adjustment'],
        },
        { shear: { edgeType: 'beveled', toolKind: 'curved', lengthIn: 5.5, handedness: 'right' }, addOns: [] },
      ];
      let priced = ticket;
      for (const { shear, addOns } of shears) {
        const created = await createShear(customer.mine, shear);
        priced = await addShear(ticket.id, { shearId: created.id, addOns });
      }
      const rules = await rulesPrice(priced, shears, 825);
      expect(priced.price).toMatchObject({
        subtotalCents: rules.subtotalCents,
        taxCents: rules.taxCents,
        totalCents: rules.totalCents,
        summary: rules.summary,
      });
      expect(priced.lines.map((line) => line.priceCents)).toEqual(rules.lines.map((line) => line.totalCents));
      expect(priced.lines.map((line) => line.effectiveCents)).toEqual(rules.lines.map((line) => line.totalCents));
    });

    it('puts the trip charge on the first ticket of a stop visit only', async () => {
      const first = await open('office', { customerId: customer.elsewhere, kind: 'visit' });
      const second = await open('office', { customerId: customer.elsewhere, kind: 'walk-up' });
      expect(first.price.chargeTrip).toBe(true);
      expect(second.price.chargeTrip).toBe(false);
      const shear = { edgeType: 'beveled', toolKind: 'straight', lengthIn: 6.5, handedness: 'right' } as const;
      const a = await addShear(first.id, { shearId: (await createShear(customer.elsewhere, shear)).id }, 'office');
      const b = await addShear(second.id, { shearId: (await createShear(customer.elsewhere, shear)).id }, 'office');
      expect(a.price.subtotalCents - b.price.subtotalCents).toBe(card.tripChargeCents);
      expect(a.price.totalCents).toBe((await rulesPrice(a, [{ shear }], 600)).totalCents);
      expect(b.price.totalCents).toBe((await rulesPrice(b, [{ shear }], 600)).totalCents);
    });

    it("shows each line's edge recipe with its cautions", async () => {
      const ticket = await open('office', { customerId: customer.second, kind: 'visit' });
      const shear = { edgeType: 'convex', toolKind: 'straight', lengthIn: 6.5, handedness: 'right' } as const;
      const withHone = await addShear(ticket.id, {
        shearId: (await createShear(customer.second, shear)).id,
        addOns: ['inside-edge-hone'],
      });
      const recipe = edgeRecipe(shear, { insideEdge: true });
      expect(withHone.lines[0]!.recipe).toMatchObject({
        cautions: recipe.cautions,
        disassemble: true,
        benchMinutes: recipe.benchMinutes,
      });
      expect(withHone.lines[0]!.recipe!.steps).toHaveLength(recipe.steps.length + 2);
    });
  });

  describe('lines', () => {
    it("adds a shear by its tag code as typed; refuses a duplicate, an unknown code and another customer's shear", async () => {
      const ticket = await open('office', { customerId: customer.second, kind: 'walk-up' });
      const shear = await createShear(customer.second, { toolKind: 'curved' });
      const typed = shear.tagCode.toLowerCase().replace('-', ' ');
      const added = await addShear(ticket.id, { tagCode: typed });
      expect(added.lines.map((line) => line.shear.id)).toEqual([shear.id]);
      await addShear(ticket.id, { tagCode: shear.tagCode }, 'sharpener', 409);
      await addShear(ticket.id, { tagCode: 'KR-999999' }, 'sharpener', 404);
      const othersShear = await createShear(customer.other);
      await addShear(ticket.id, { shearId: othersShear.id }, 'sharpener', 409);
      await addShear(ticket.id, { addOns: ['sharpening-by-hand'] }, 'sharpener', 400);
    });

    it('lets the sharpener register a new shear to the customer as they add it', async () => {
      const ticket = await open('sharpener', { customerId: customer.second, kind: 'walk-up' });
      const added = await addShear(ticket.id, {
        newShear: { make: `Newmake${tag}`, lengthIn: 6, edgeType: 'beveled', toolKind: 'blending' },
        addOns: ['blade-polish'],
      });
      const line = added.lines[0]!;
      expect(line.shear).toMatchObject({
        make: `Newmake${tag}`,
        toolKind: 'blending',
        tagCode: expect.stringMatching(/^KR-/),
      });
      const registered = await http().get(`/api/shears/${line.shear.id}`).set(as('office')).expect(200);
      expect(registered.body.customer.id).toBe(customer.second);
      await addShear(
        ticket.id,
        { newShear: { lengthIn: 6, edgeType: 'beveled', toolKind: 'spoon' } },
        'sharpener',
        400,
      );
    });

    it('removes a line while open, prices the ticket again and keeps its shear count', async () => {
      // The reports add up the stored count instead of counting lines, so it must follow every change of lines.
      const storedCount = async () =>
        (await db.query<{ n: number }[]>(`SELECT shear_count AS n FROM tickets WHERE id = $1`, [ticket.id]))[0]!.n;
      const ticket = await open('office', { customerId: customer.second, kind: 'walk-up' });
      expect(await storedCount()).toBe(0);
      const one = await addShear(ticket.id, { shearId: (await createShear(customer.second)).id });
      const two = await addShear(ticket.id, { shearId: (await createShear(customer.second)).id });
      expect(two.price.subtotalCents).toBeGreaterThan(one.price.subtotalCents);
      expect(await storedCount()).toBe(2);
      const removed = await http()
        .delete(`/api/tickets/${ticket.id}/lines/${two.lines[1]!.id}`)
        .set(as('sharpener'))
        .expect(200);
      expect((removed.body as TicketDto).price.subtotalCents).toBe(one.price.subtotalCents);
      expect(await storedCount()).toBe(1);
    });
  });

  describe('overrides', () => {
    it('lets the office set a price with a reason, keeps an audit row, and refuses a sharpener', async () => {
      const ticket = await open('office', { customerId: customer.second, kind: 'walk-up' });
      const shear = { edgeType: 'convex', toolKind: 'straight', lengthIn: 6.5, handedness: 'right' } as const;
      const priced = await addShear(ticket.id, { shearId: (await createShear(customer.second, shear)).id });
      const line = priced.lines[0]!;
      const path = `/api/tickets/${ticket.id}/lines/${line.id}/override`;
      await http().post(path).set(as('sharpener')).send({ cents: 100, reason: 'Friend' }).expect(403);
      const noReason = await http().post(path).set(as('office')).send({ cents: 3000 }).expect(400);
      expect(noReason.body.fields.reason).toBeDefined();
      const set = (
        await http().post(path).set(as('office')).send({ cents: 3000, reason: 'Nicked tip, regular shop' }).expect(200)
      ).body as TicketDto;
      expect(set.lines[0]).toMatchObject({ overrideCents: 3000, effectiveCents: 3000, priceCents: line.priceCents });
      const subtotal = priced.price.subtotalCents - line.priceCents + 3000;
      expect(set.price.subtotalCents).toBe(subtotal);
      expect(set.price.totalCents).toBe(subtotal + taxCents(subtotal, 825));
      const audit = await db.query<{ from_cents: number; to_cents: number; reason: string; by_user: string }[]>(
        'SELECT from_cents, to_cents, reason, by_user FROM ticket_line_overrides WHERE ticket_line_id = $1',
        [line.id],
      );
      expect(audit).toEqual([
        { from_cents: line.priceCents, to_cents: 3000, reason: 'Nicked tip, regular shop', by_user: ids.office },
      ]);
    });
  });

  describe('bench, finishing and hand-back', () => {
    it('moves pairs one step at a time, writes the service history on finish, then hands back', async () => {
      const ticket = await open('sharpener', { customerId: customer.mine, stopId: stop.mine, kind: 'walk-up' });
      const shear = await createShear(customer.mine, { edgeType: 'convex', toolKind: 'straight', lengthIn: 6.5 });
      const withLine = await addShear(ticket.id, { shearId: shear.id });
      const lineId = withLine.lines[0]!.id;
      await bench(ticket.id, lineId, 'ready').expect(409);
      await http().post(`/api/tickets/${ticket.id}/finish`).set(as('sharpener')).expect(409);
      await bench(ticket.id, lineId, 'on-the-bench').expect(200);
      const ready = (await bench(ticket.id, lineId, 'ready').expect(200)).body as TicketDto;
      expect(ready.lines[0]!.benchStatus).toBe('ready');

      const finished = (await http().post(`/api/tickets/${ticket.id}/finish`).set(as('sharpener')).expect(200))
        .body as TicketDto;
      expect(finished).toMatchObject({ status: 'finished', finishedAt: expect.any(String) });
      await bench(ticket.id, lineId, 'on-the-bench').expect(409);
      await addShear(ticket.id, { shearId: (await createShear(customer.mine)).id }, 'sharpener', 409);
      const history = await db.query<{ kind: string; summary: string; happened_on: string }[]>(
        `SELECT kind, summary, to_char(happened_on, 'YYYY-MM-DD') AS happened_on FROM shear_history
          WHERE shear_id = $1 AND ticket_id = $2`,
        [shear.id, ticket.id],
      );
      expect(history).toEqual([
        { kind: 'serviced', summary: 'Sharpened: convex straight, 6.5 in', happened_on: today },
      ]);
      const read = await http().get(`/api/shears/${shear.id}`).set(as('office')).expect(200);
      expect(read.body).toMatchObject({ sharpeningCount: 1, lastServicedOn: today });
      // The stop counts as worked today, once, so its next due date moves on.
      const visits = await db.query<{ n: number }[]>(
        `SELECT count(*)::int AS n FROM stop_visits WHERE stop_id = $1 AND worked_on = $2::date`,
        [finished.stop!.id, today],
      );
      expect(visits[0]!.n).toBe(1);

      const back = (await http().post(`/api/tickets/${ticket.id}/hand-back`).set(as('sharpener')).expect(200))
        .body as TicketDto;
      expect(back).toMatchObject({ status: 'handed-back', handedBackAt: expect.any(String) });
      expect(back.lines.map((line) => line.benchStatus)).toEqual(['handed-back']);
      await http().post(`/api/tickets/${ticket.id}/hand-back`).set(as('sharpener')).expect(409);
    });

    it('counts every finished ticket as one more sharpening', async () => {
      const shear = await createShear(customer.second);
      for (let round = 0; round < 2; round++) {
        const ticket = await open('office', { customerId: customer.second, kind: 'walk-up' });
        await allReady(await addShear(ticket.id, { shearId: shear.id }));
        await http().post(`/api/tickets/${ticket.id}/hand-back`).set(as('office')).expect(200);
      }
      const listed = await http().get('/api/shears').query({ q: shear.tagCode }).set(as('office')).expect(200);
      expect(listed.body.items[0]).toMatchObject({ id: shear.id, sharpeningCount: 2 });
    });

    it('tags a before photo with the ticket line', async () => {
      const ticket = await open('office', { customerId: customer.second, kind: 'walk-up' });
      const withLine = await addShear(ticket.id, { shearId: (await createShear(customer.second)).id });
      const png = await sharp({ create: { width: 40, height: 30, channels: 3, background: '#1d5c63' } })
        .png()
        .toBuffer();
      const response = await http()
        .post(`/api/tickets/${ticket.id}/lines/${withLine.lines[0]!.id}/photos`)
        .set(as('sharpener'))
        .field('stage', 'before')
        .attach('photo', png, { filename: 'before.png', contentType: 'image/png' })
        .expect(201);
      const photos = (response.body as TicketDto).lines[0]!.photos;
      expect(photos).toEqual([
        { id: expect.any(String), stage: 'before', url: expect.stringMatching(/^\/api\/shears\//) },
      ]);
      await http()
        .post(`/api/tickets/${ticket.id}/lines/${withLine.lines[0]!.id}/photos`)
        .set(as('sharpener'))
        .field('stage', 'during')
        .attach('photo', png, { filename: 'x.png', contentType: 'image/png' })
        .expect(400);
    });
  });

  describe('payments on site', () => {
    const finishedTicket = async () => {
      const ticket = await open('office', { customerId: customer.second, kind: 'walk-up' });
      const withLine = await addShear(ticket.id, { shearId: (await createShear(customer.second)).id });
      await http()
        .post(`/api/tickets/${ticket.id}/payments`)
        .set(as('sharpener'))
        .send({ method: 'cash', amountCents: 100 })
        .expect(409);
      await allReady(withLine);
      return (await http().post(`/api/tickets/${ticket.id}/hand-back`).set(as('sharpener')).expect(200))
        .body as TicketDto;
    };
    const pay = (id: string, body: Record<string, unknown>, status: number) =>
      http().post(`/api/tickets/${id}/payments`).set(as('sharpener')).send(body).expect(status);

    it('takes a part payment in cash, then the rest on the card terminal: paid on site', async () => {
      const ticket = await finishedTicket();
      const total = ticket.price.totalCents;
      await pay(ticket.id, { method: 'cash', amountCents: 0 }, 400);
      await pay(ticket.id, { method: 'cheque', amountCents: 500 }, 400);
      await pay(ticket.id, { method: 'cash', amountCents: total + 1 }, 400);
      const part = (await pay(ticket.id, { method: 'cash', amountCents: 1000 }, 201)).body as TicketDto;
      expect(part).toMatchObject({ settlement: 'unpaid', balanceCents: total - 1000 });
      const paid = (
        await pay(ticket.id, { method: 'card-terminal', amountCents: total - 1000, reference: 'T-4471' }, 201)
      ).body as TicketDto;
      expect(paid).toMatchObject({ settlement: 'paid-on-site', balanceCents: 0 });
      expect(paid.payments.map((p) => [p.method, p.amountCents, p.reference])).toEqual([
        ['cash', 1000, ''],
        ['card-terminal', total - 1000, 'T-4471'],
      ]);
      await pay(ticket.id, { method: 'cash', amountCents: 1 }, 409);
      await http()
        .post(`/api/tickets/${ticket.id}/settle`)
        .set(as('sharpener'))
        .send({ settlement: 'to-invoice' })
        .expect(409);
    });

    it('records a cheque with its number, or leaves the ticket for an invoice', async () => {
      const byCheque = await finishedTicket();
      const paid = (
        await pay(byCheque.id, { method: 'cheque', amountCents: byCheque.price.totalCents, reference: '1042' }, 201)
      ).body as TicketDto;
      expect(paid.settlement).toBe('paid-on-site');

      const later = await finishedTicket();
      await http()
        .post(`/api/tickets/${later.id}/settle`)
        .set(as('sharpener'))
        .send({ settlement: 'paid' })
        .expect(400);
      const left = await http()
        .post(`/api/tickets/${later.id}/settle`)
        .set(as('sharpener'))
        .send({ settlement: 'to-invoice' })
        .expect(200);
      expect(left.body).toMatchObject({ settlement: 'to-invoice', balanceCents: later.price.totalCents });
      await pay(later.id, { method: 'cash', amountCents: 100 }, 409);
      const listed = await http()
        .get('/api/tickets')
        .query({ settlement: 'to-invoice', stopId: stop.mine })
        .set(as('office'));
      expect(listed.body.items.map((item: { id: string }) => item.id)).toContain(later.id);
    });
  });

  describe('checking in a booking', () => {
    const book = async (
      over: { routeDayId?: string | null; stopId?: string; email?: string; status?: string } = {},
    ) => {
      const shear = await createShear(customer.mine, { edgeType: 'semi-convex', toolKind: 'straight' });
      const [row] = await db.query<{ id: string }[]>(
        `INSERT INTO bookings (stop_id, route_day_id, day, status, name, email, phone, consent, customer_id,
           manage_token_hash, idempotency_key, bench_minutes)
         VALUES ($1, $2, $3, $4, $5, $6, '555-0100', true, $7, $8, gen_random_uuid(), 30) RETURNING id`,
        [
          over.stopId ?? stop.mine,
          over.routeDayId === undefined ? routeDayId : over.routeDayId,
          over.routeDayId === null ? null : today,
          over.status ?? 'booked',
          over.email ? `Walk In ${tag}` : `Mara Quill ${tag}`,
          over.email ?? `mara-${tag}@e2e.keenroute.test`,
          over.email ? null : customer.mine,
          randomUUID().replace(/-/g, '') + randomUUID().replace(/-/g, ''),
        ],
      );
      await db.query(
        `INSERT INTO booking_items (booking_id, position, tool_kind, edge_type, count, shear_id) VALUES
           ($1, 0, 'straight', 'semi-convex', 1, $2), ($1, 1, 'thinning', 'beveled', 2, NULL)`,
        [row!.id, over.email ? null : shear.id],
      );
      return { bookingId: row!.id, shear };
    };

    it('turns the booking into a ticket once: its own shears as lines, kinds as "to add"', async () => {
      const { bookingId, shear } = await book();
      const ticket = (await http().post(`/api/bookings/${bookingId}/check-in`).set(as('sharpener')).expect(200))
        .body as TicketDto;
      expect(ticket).toMatchObject({
        kind: 'drop-off',
        bookingId,
        routeDayId,
        customer: { id: customer.mine },
        expected: [{ toolKind: 'thinning', edgeType: 'beveled', count: 2 }],
      });
      expect(ticket.lines.map((line) => line.shear.id)).toEqual([shear.id]);
      const [booking] = await db.query<{ status: string; ticket_id: string }[]>(
        'SELECT status, ticket_id FROM bookings WHERE id = $1',
        [bookingId],
      );
      expect(booking).toEqual({ status: 'checked-in', ticket_id: ticket.id });
      const again = await http().post(`/api/bookings/${bookingId}/check-in`).set(as('office')).expect(200);
      expect(again.body.id).toBe(ticket.id);
      const [count] = await db.query<{ n: number }[]>('SELECT COUNT(*)::int AS n FROM tickets WHERE booking_id = $1', [
        bookingId,
      ]);
      expect(count!.n).toBe(1);

      const thinning = await createShear(customer.mine, { edgeType: 'beveled', toolKind: 'thinning' });
      const added = await addShear(ticket.id, { shearId: thinning.id });
      expect(added.expected).toEqual([{ toolKind: 'thinning', edgeType: 'beveled', count: 1 }]);
    });

    it('finds or makes the customer by the e-mail of a booking without one', async () => {
      const email = `walk-in-${tag}@e2e.keenroute.test`;
      const first = await book({ email });
      const ticket = (await http().post(`/api/bookings/${first.bookingId}/check-in`).set(as('office')).expect(200))
        .body as TicketDto;
      expect(ticket.customer).toMatchObject({ name: `Walk In ${tag}`, email });
      expect(ticket.lines).toEqual([]);
      expect(ticket.expected).toEqual([
        { toolKind: 'straight', edgeType: 'semi-convex', count: 1 },
        { toolKind: 'thinning', edgeType: 'beveled', count: 2 },
      ]);
      const second = await book({ email: email.toUpperCase() });
      const again = (await http().post(`/api/bookings/${second.bookingId}/check-in`).set(as('office')).expect(200))
        .body as TicketDto;
      expect(again.customer.id).toBe(ticket.customer.id);
    });

    it("refuses a cancelled booking, and hides another sharpener's booking", async () => {
      const cancelled = await book({ status: 'cancelled' });
      await http().post(`/api/bookings/${cancelled.bookingId}/check-in`).set(as('office')).expect(409);
      const { bookingId } = await book();
      await http().post(`/api/bookings/${bookingId}/check-in`).set(as('otherSharpener')).expect(404);
      await http().post(`/api/bookings/${bookingId}/check-in`).set(as('client')).expect(403);
      const mailIn = await book({ routeDayId: null });
      await http().post(`/api/bookings/${mailIn.bookingId}/check-in`).set(as('sharpener')).expect(404);
      await http().post(`/api/bookings/${randomUUID()}/check-in`).set(as('office')).expect(404);
    });
  });

  describe('who may see and do what', () => {
    let mine: TicketDto;
    let theirs: TicketDto;
    let elsewhere: TicketDto;
    beforeAll(async () => {
      mine = await open('office', { customerId: customer.mine, kind: 'visit' });
      theirs = await open('office', { customerId: customer.other, kind: 'visit' });
      elsewhere = await open('office', { customerId: customer.elsewhere, kind: 'visit' });
    });
    const listIds = async (who: Who, query: Record<string, string> = {}) =>
      ((await http().get('/api/tickets').query(query).set(as(who)).expect(200)).body.items as { id: string }[]).map(
        (item) => item.id,
      );

    it('shows a client only their own tickets and lets them change nothing', async () => {
      const shear = await createShear(customer.mine);
      const withLine = await addShear(mine.id, { shearId: shear.id }, 'office');
      await http()
        .patch(`/api/tickets/${mine.id}/lines/${withLine.lines[0]!.id}`)
        .set(as('sharpener'))
        .send({ notes: 'Nicked tip, told her' })
        .expect(200);
      const read = await http().get(`/api/tickets/${mine.id}`).set(as('client')).expect(200);
      expect(read.body.lines.map((line: { notes: string }) => line.notes)).toEqual(['']);
      await http()
        .patch(`/api/tickets/${mine.id}/lines/${withLine.lines[0]!.id}`)
        .set(as('client'))
        .send({ benchStatus: 'on-the-bench' })
        .expect(403);
      await http().get(`/api/tickets/${theirs.id}`).set(as('client')).expect(404);
      const listed = await listIds('client', { pageSize: '200' });
      expect(listed).toContain(mine.id);
      expect(listed).not.toContain(theirs.id);
      expect(listed).not.toContain(elsewhere.id);
      await http()
        .post('/api/tickets')
        .set(as('client'))
        .send({ customerId: customer.mine, kind: 'visit' })
        .expect(403);
      await http().post(`/api/tickets/${mine.id}/finish`).set(as('client')).expect(403);
    });

    it('shows a sharpener the tickets on their own route days only', async () => {
      await http().get(`/api/tickets/${theirs.id}`).set(as('sharpener')).expect(200);
      await http().get(`/api/tickets/${elsewhere.id}`).set(as('sharpener')).expect(404);
      await http().get(`/api/tickets/${mine.id}`).set(as('otherSharpener')).expect(404);
      await http().post(`/api/tickets/${mine.id}/finish`).set(as('otherSharpener')).expect(404);
      await bench(mine.id, randomUUID(), 'on-the-bench', 'otherSharpener').expect(404);
      const listed = await listIds('sharpener', { day: today });
      expect(listed).toEqual(expect.arrayContaining([mine.id, theirs.id]));
      expect(listed).not.toContain(elsewhere.id);
      expect(await listIds('owner', { routeDayId: otherRouteDayId })).toContain(elsewhere.id);
    });

    it('lets a sharpener open a walk-up only at a stop on their own day', async () => {
      const walkUp = await open('sharpener', { customerId: customer.second, kind: 'walk-up' });
      expect(walkUp).toMatchObject({ routeDayId, kind: 'walk-up', stop: { id: stop.mine } });
      await open('sharpener', { customerId: customer.elsewhere, kind: 'walk-up' }, 404);
      await open('otherSharpener', { customerId: customer.mine, stopId: stop.mine, kind: 'walk-up' }, 404);
      await open('sharpener', { customerId: customer.mine, kind: 'walk-up', routeDayId: otherRouteDayId }, 404);
      await open('otherSharpener', { customerId: customer.elsewhere, kind: 'walk-up' }, 201);
    });

    it("registers a new walk-up customer at the stop, but only on the sharpener's own day", async () => {
      const name = `Walk-up ${randomUUID().slice(0, 6)}`;
      const response = await http()
        .post('/api/tickets/walk-up')
        .set(as('sharpener'))
        .send({ stopId: stop.mine, customer: { name, phone: '555-0142' } })
        .expect(201);
      expect(response.body).toMatchObject({ kind: 'walk-up', routeDayId, customer: { name, phone: '555-0142' } });
      const refusedName = `Refused ${randomUUID().slice(0, 6)}`;
      await http()
        .post('/api/tickets/walk-up')
        .set(as('sharpener'))
        .send({ stopId: stop.elsewhere, customer: { name: refusedName } })
        .expect(403);
      const left = await db.query<{ n: number }[]>(`SELECT count(*)::int AS n FROM customers WHERE name = $1`, [
        refusedName,
      ]);
      expect(left[0]!.n).toBe(0);
      await http()
        .post('/api/tickets/walk-up')
        .set(as('sharpener'))
        .send({ stopId: stop.mine, customer: { name: '' } })
        .expect(400);
      await http()
        .post('/api/tickets/walk-up')
        .set(as('client'))
        .send({ stopId: stop.mine, customer: { name } })
        .expect(403);
    });

    it('answers 404 for an unknown ticket and 400 for a malformed id or filter', async () => {
      await http().get(`/api/tickets/${randomUUID()}`).set(as('owner')).expect(404);
      await http().get('/api/tickets/not-an-id').set(as('owner')).expect(400);
      await http().get('/api/tickets').query({ day: '12/09/2026' }).set(as('owner')).expect(400);
    });
  });
});
