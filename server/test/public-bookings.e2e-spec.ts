import type { INestApplication } from '@nestjs/common';
import { DEMO_RATE_CARD, addDays, arrivalWindow, bookingCutoff, type Role } from '@keenroute/shared';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { BookingClock } from '../src/bookings/booking-clock';
import { estimateBooking } from '../src/bookings/booking-estimate';
import type { BookingQuoteDto, PublicStopDto, PublicStopListDto } from '../src/bookings/dto/booking-response.dto';
import { RouteDayStop } from '../src/route-days/entities/route-day-stop.entity';
import { RouteDay } from '../src/route-days/entities/route-day.entity';
import { Stop } from '../src/stops/entities/stop.entity';
import { mailTo, waitForMail } from './utils/mail-catcher';
import { createTestApp, createUser, signIn } from './utils/test-app';

/**
 * The signed-out side of drop-offs: finding a stop and its next route days, the estimate, every field checked with a
 * clear message (no line break reaches an e-mail header), the honeypot, and the rate limit on the public routes.
 */
describe('public booking routes (e2e)', () => {
  let app: INestApplication<App>;
  const http = () => request(app.getHttpServer());
  const tokens = {} as Record<Role, string>;
  const bearer = (who: Role) => ({ Authorization: `Bearer ${tokens[who]}` });
  const town = `Quillbrook ${randomUUID().slice(0, 6)}`;
  const stop = { main: '', second: '', noCoordinates: '', inactive: '' };
  const days: { id: string; day: string }[] = [];
  let today: string;

  const makeStop = async (name: string, overrides: Record<string, unknown> = {}) => {
    const body = { name, kind: 'grooming-shop', street: '3 Kennel Way', city: town, latitude: 44.7, longitude: -92.3 };
    return (
      (
        await http()
          .post('/api/stops')
          .set(bearer('office'))
          .send({ ...body, ...overrides })
          .expect(201)
      ).body as {
        id: string;
      }
    ).id;
  };

  const makeDay = async (sharpenerId: string, date: string, stopId: string, arrival: number) => {
    const ds = app.get(DataSource);
    const saved = await ds.getRepository(RouteDay).save(
      ds.getRepository(RouteDay).create({
        sharpenerId,
        day: date,
        startLabel: 'E2E base',
        startLatitude: 44.8,
        startLongitude: -92.4,
        shiftStart: 480,
        latestFinish: 1080,
        lunchEarliest: 690,
        lunchLatest: 810,
        lunchMinutes: 30,
        lunchStart: null,
        lunchAfter: null,
        departure: 480,
        finish: 700,
        distanceKm: 30,
        driveMinutes: 40,
        benchMinutes: 10,
      }),
    );
    await ds.getRepository(RouteDayStop).save(
      ds.getRepository(RouteDayStop).create({
        routeDayId: saved.id,
        stopId,
        position: 0,
        arrival,
        start: arrival,
        leave: arrival + 10,
        benchMinutes: 10,
        driveMinutesBefore: 40,
        kmBefore: 15,
        problem: null,
        locked: false,
        positionLocked: false,
      }),
    );
    return { id: saved.id, day: date };
  };

  const booking = (overrides: Record<string, unknown> = {}) => ({
    stopId: stop.main,
    routeDayId: days[0]!.id,
    mailIn: false,
    name: 'Sam Okafor',
    email: `stylist-${randomUUID().slice(0, 8)}@e2e.keenroute.test`,
    phone: '+1 (555) 014-2000',
    consent: true,
    items: [{ toolKind: 'curved', edgeType: 'convex', count: 2 }],
    website: '',
    idempotencyKey: randomUUID(),
    ...overrides,
  });
  // The public route takes 20 booking requests a minute from one address: this file keeps under it.
  let bookingRequests = 0;
  const book = (body: Record<string, unknown>) => {
    if (++bookingRequests > 20) throw new Error('More than 20 booking requests in one file: split it (rate limit).');
    return http().post('/api/public/bookings').send(body);
  };
  const fieldsOf = async (body: Record<string, unknown>) =>
    ((await book(body).expect(400)).body as { fields: Record<string, string[]> }).fields;

  beforeAll(async () => {
    app = await createTestApp();
    for (const role of ['owner', 'office', 'sharpener'] as const) {
      const user = await createUser(app, role);
      tokens[role] = (await signIn(app, user.email)).token;
    }
    const sharpener = (await createUser(app, 'sharpener')).id;
    await http().put('/api/rates').set(bearer('owner')).send({ card: DEMO_RATE_CARD }).expect(200);
    today = app.get(BookingClock).moment().date;
    stop.main = await makeStop(`Pawsitive Grooming ${town}`, { taxRateBp: 700 });
    stop.second = await makeStop(`Second Shop ${town}`);
    stop.noCoordinates = await makeStop(`No Map Shop ${town}`, { latitude: null, longitude: null });
    stop.inactive = await makeStop(`Closed Shop ${town}`);
    await app.get(DataSource).getRepository(Stop).update(stop.inactive, { active: false });
    await makeDay(sharpener, addDays(today, -1), stop.main, 600);
    for (let i = 3; i <= 7; i++) days.push(await makeDay(sharpener, addDays(today, i), stop.main, 600 + i));
  });
  afterAll(async () => {
    await app.close();
  });

  describe('finding a stop', () => {
    it('searches active stops with coordinates by name or town, at most 20', async () => {
      const byTown = (await http().get('/api/public/stops').query({ q: town }).expect(200)).body as PublicStopListDto;
      expect(byTown.items.map((s) => s.id).sort()).toEqual([stop.main, stop.second].sort());
      const byName = (await http().get('/api/public/stops').query({ q: 'pawsitive grooming' }).expect(200))
        .body as PublicStopListDto;
      expect(byName.items.map((s) => s.id)).toContain(stop.main);
      expect(byName.items.map((s) => s.id)).not.toContain(stop.second);
      const all = (await http().get('/api/public/stops').expect(200)).body as PublicStopListDto;
      expect(all.items.length).toBeLessThanOrEqual(20);
      await http()
        .get('/api/public/stops')
        .query({ q: 'x'.repeat(101) })
        .expect(400);
    });

    it("shows a stop's next four route days from today with window, cutoff and room, and the mail-in address", async () => {
      const shown = (await http().get(`/api/public/stops/${stop.main}`).expect(200)).body as PublicStopDto;
      expect(shown).toMatchObject({ id: stop.main, street: '3 Kennel Way', city: town });
      expect(shown.nextDays.map((d) => d.routeDayId)).toEqual(days.slice(0, 4).map((d) => d.id));
      expect(shown.nextDays[0]).toEqual({
        routeDayId: days[0]!.id,
        day: days[0]!.day,
        arrivalWindow: arrivalWindow(603),
        // 600 minutes of shift − 30 break − 40 driving − 10 setup for the one stop.
        bookableMinutesLeft: 520,
        cutoff: bookingCutoff(days[0]!.day, { daysBefore: 1, hour: 18 }),
        open: true,
      });
      expect(typeof shown.mailIn.address).toBe('string');
      await http().get(`/api/public/stops/${stop.noCoordinates}`).expect(404);
      await http().get(`/api/public/stops/${stop.inactive}`).expect(404);
      await http().get('/api/public/stops/not-a-uuid').expect(400);
    });

    it('opens no other route to the signed-out', async () => {
      await http().get('/api/stops').expect(401);
      await http().get('/api/bookings').expect(401);
    });
  });

  it('quotes an estimate from the rate card in force, with lines that add up', async () => {
    const items = [
      { toolKind: 'curved', edgeType: 'convex', count: 2 },
      { toolKind: 'thinning', edgeType: 'beveled', count: 1 },
    ] as const;
    const quote = (await http().post('/api/public/bookings/quote').send({ stopId: stop.main, items }).expect(200))
      .body as BookingQuoteDto;
    expect(quote.estimateCents).toBe(estimateBooking(items, DEMO_RATE_CARD, 700).estimateCents);
    expect(quote.lines.reduce((sum, line) => sum + line.cents, 0)).toBe(quote.estimateCents);
    expect(quote).toMatchObject({ currency: DEMO_RATE_CARD.currency, benchMinutes: 2 * 18 + 12 });
    expect(quote.note).toMatch(/estimate/i);
    expect(quote.lines.filter((l) => /×/.test(l.label)).every((l) => l.label.endsWith('(estimate)'))).toBe(true);
    const bad = await http().post('/api/public/bookings/quote').send({ stopId: randomUUID(), items }).expect(400);
    expect(bad.body.fields.stopId).toEqual(['Choose a stop from the list.']);
  });

  describe('every field checked', () => {
    it('names every missing field with a message', async () => {
      const fields = await fieldsOf({});
      for (const name of ['stopId', 'mailIn', 'name', 'email', 'phone', 'consent', 'items', 'idempotencyKey']) {
        expect(fields[name]?.[0]).toEqual(expect.any(String));
      }
      expect(fields.consent).toEqual(['Tick the box to agree to be contacted about this drop-off.']);
    });

    it('refuses line breaks and control characters in name, e-mail and phone (no header injection)', async () => {
      expect((await fieldsOf(booking({ name: 'Sam\r\nBcc: victim@e2e.keenroute.test' }))).name).toEqual([
        'A name is one line, without < or >.',
      ]);
      expect((await fieldsOf(booking({ name: 'Sam <sam@e2e.keenroute.test>' }))).name).toBeDefined();
      expect(
        (await fieldsOf(booking({ email: 'sam@e2e.keenroute.test\r\nBcc: victim@e2e.keenroute.test' }))).email,
      ).toContain('Enter a valid e-mail address.');
      expect((await fieldsOf(booking({ phone: '555\n0142' }))).phone).toBeDefined();
    });

    it('checks the shears: kinds, edge types, 1 to 50 of a kind, at most 60 pairs', async () => {
      const fields = await fieldsOf(
        booking({
          items: [
            { toolKind: 'scissors', edgeType: 'convex', count: 1 },
            { toolKind: 'straight', edgeType: 'hollow', count: 0 },
            { toolKind: 'straight', edgeType: 'convex', count: 51 },
          ],
        }),
      );
      expect(fields['items.0.toolKind']![0]).toMatch(/toolKind is one of straight, curved/);
      expect(fields['items.1.edgeType']![0]).toMatch(/edgeType is one of beveled/);
      expect(fields['items.1.count']![0]).toMatch(/1 to 50/);
      expect(fields['items.2.count']![0]).toMatch(/1 to 50/);
      const tooMany = await book(
        booking({
          items: [
            { toolKind: 'straight', edgeType: 'convex', count: 40 },
            { toolKind: 'curved', edgeType: 'convex', count: 21 },
          ],
        }),
      ).expect(400);
      expect(tooMany.body.fields.items[0]).toMatch(/at most 60 pairs/);
      expect((await fieldsOf(booking({ items: [] }))).items).toBeDefined();
    });

    it('checks the stop, the day and unknown fields', async () => {
      expect((await fieldsOf(booking({ stopId: randomUUID() }))).stopId).toEqual(['Choose a stop from the list.']);
      expect((await fieldsOf(booking({ routeDayId: null }))).routeDayId).toEqual(['Choose a route day, or mail-in.']);
      expect((await fieldsOf(booking({ mailIn: true }))).routeDayId).toEqual(['A mail-in has no route day.']);
      expect((await fieldsOf(booking({ stopId: stop.second }))).routeDayId![0]).toMatch(/not on that route day/);
      await book({ ...booking(), isAdmin: true }).expect(400);
      expect((await fieldsOf(booking({ idempotencyKey: 'twice' }))).idempotencyKey).toBeDefined();
    });
  });

  it('refuses a filled-in honeypot and writes and sends nothing', async () => {
    const body = booking({ website: 'http://spam.example' });
    const refused = await book(body).expect(400);
    expect(refused.body.message).toMatch(/could not be sent/);
    const [row] = await app
      .get(DataSource)
      .query<{ n: number }[]>(`SELECT count(*)::int AS n FROM bookings WHERE idempotency_key = $1`, [
        body.idempotencyKey,
      ]);
    expect(row!.n).toBe(0);
    await new Promise((resolve) => setTimeout(resolve, 300));
    expect(await mailTo(body.email)).toHaveLength(0);
  });

  it('addresses the e-mail to exactly the one person, whatever punctuation the name holds', async () => {
    const body = booking({ name: 'O\'Brien, Zoë "Zo"' });
    await book(body).expect(201);
    const mail = await waitForMail(body.email, /Your drop-off/);
    expect(mail.to).toEqual([body.email]);
    expect(mail.text).toContain('Hello O\'Brien, Zoë "Zo",');
  });

  it('answers 429 past 20 booking requests a minute from one address, while reads go on', async () => {
    const fresh = await createTestApp();
    try {
      const statuses: number[] = [];
      for (let i = 0; i < 21; i++) {
        statuses.push((await request(fresh.getHttpServer()).post('/api/public/bookings').send({})).status);
      }
      expect(statuses.slice(0, 20).every((s) => s === 400)).toBe(true);
      expect(statuses[20]).toBe(429);
      const limited = await request(fresh.getHttpServer()).post('/api/public/bookings').send({}).expect(429);
      expect(limited.body.message).toMatch(/Wait a minute/);
      await request(fresh.getHttpServer()).get(`/api/public/stops/${stop.main}`).expect(200);
    } finally {
      await fresh.close();
    }
  });
});
