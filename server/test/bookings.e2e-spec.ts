import type { INestApplication } from '@nestjs/common';
import {
  DEMO_RATE_CARD,
  addDays,
  arrivalWindow,
  bookedBenchMinutes,
  bookingCutoff,
  type BookingItem,
  type Role,
} from '@keenroute/shared';
import { createHash, randomUUID } from 'node:crypto';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { BookingClock, businessMoment } from '../src/bookings/booking-clock';
import { estimateBooking } from '../src/bookings/booking-estimate';
import type {
  BookingDto,
  CreatedBookingDto,
  PublicBookingDto,
  PublicStopDto,
} from '../src/bookings/dto/booking-response.dto';
import { RouteDayStop } from '../src/route-days/entities/route-day-stop.entity';
import { RouteDay } from '../src/route-days/entities/route-day.entity';
import type { DaySheetDto } from '../src/route-days/day-sheet/day-sheet.dto';
import { mailTo, waitForMail, type CaughtMail } from './utils/mail-catcher';
import { createTestApp, createUser, signIn } from './utils/test-app';

/**
 * Drop-offs end to end: booking, the confirmation e-mail and its private link, capacity per route day with the next
 * day that fits, double submits, racing bookings, the cutoff, the staff list's role matrix and the day sheet.
 * Route days are made straight in the database with their figures chosen so the bookable minutes are known.
 */
describe('bookings (e2e)', () => {
  let app: INestApplication<App>;
  const http = () => request(app.getHttpServer());
  type Who = Role | 'otherSharpener';
  const tokens = {} as Record<Who, string>;
  const users = {} as Record<Who, { id: string; email: string }>;
  const bearer = (who: Who) => ({ Authorization: `Bearer ${tokens[who]}` });
  const TIME_ZONE = process.env.BUSINESS_TIME_ZONE ?? 'America/Chicago';
  const SETTINGS = {
    baseLabel: 'E2E workshop, 1 Bench Lane, Larkhaven',
    baseLatitude: 44.8,
    baseLongitude: -92.4,
    workWeekdays: ['mon', 'tue', 'wed', 'thu', 'fri'],
    shiftStart: 480,
    latestFinish: 1080,
    lunchEarliest: 690,
    lunchLatest: 810,
    lunchMinutes: 30,
    circuity: 1.3,
    averageSpeedKmh: 40,
    noticeDays: 3,
    solveSeconds: 1,
    bookingCutoffDaysBefore: 1,
    bookingCutoffHour: 18,
  };
  const stop = { a: '', b: '' };
  const day = {} as Record<'a1' | 'a2' | 'other' | 'race', { id: string; day: string }>;
  let today: string;

  const makeStop = async (label: string, taxRateBp: number) => {
    const body = {
      name: `Bookings e2e ${label} ${randomUUID().slice(0, 6)}`,
      kind: 'salon',
      street: '12 Drop-off Row',
      city: 'Larkhaven',
      latitude: 44.81,
      longitude: -92.41,
      taxRateBp,
    };
    return ((await http().post('/api/stops').set(bearer('office')).send(body).expect(201)).body as { id: string }).id;
  };

  /** A route day whose bookable minutes are latestFinish − 480 − driveMinutes − 10 per stop (no break). */
  const makeDay = async (sharpenerId: string, date: string, stopIds: string[], latestFinish: number, drive: number) => {
    const ds = app.get(DataSource);
    const saved = await ds.getRepository(RouteDay).save(
      ds.getRepository(RouteDay).create({
        sharpenerId,
        day: date,
        startLabel: 'E2E base',
        startLatitude: 44.8,
        startLongitude: -92.4,
        shiftStart: 480,
        latestFinish,
        lunchEarliest: 690,
        lunchLatest: 810,
        lunchMinutes: 0,
        lunchStart: null,
        lunchAfter: null,
        departure: 480,
        finish: 480 + drive + 10 * stopIds.length,
        distanceKm: 12,
        driveMinutes: drive,
        benchMinutes: 10 * stopIds.length,
      }),
    );
    await ds.getRepository(RouteDayStop).save(
      stopIds.map((stopId, position) =>
        ds.getRepository(RouteDayStop).create({
          routeDayId: saved.id,
          stopId,
          position,
          arrival: 500 + position * 37,
          start: 500 + position * 37,
          leave: 510 + position * 37,
          benchMinutes: 10,
          driveMinutesBefore: 10,
          kmBefore: 4,
          problem: null,
          locked: false,
          positionLocked: false,
        }),
      ),
    );
    return { id: saved.id, day: date };
  };

  const booking = (overrides: Record<string, unknown> = {}) => ({
    stopId: stop.a,
    routeDayId: day.a2.id,
    mailIn: false,
    name: 'Robin Vale',
    email: `groomer-${randomUUID().slice(0, 8)}@e2e.keenroute.test`,
    phone: '555-0142',
    notes: 'Bumper on the left pair is loose.',
    consent: true,
    items: [{ toolKind: 'straight', edgeType: 'beveled', count: 1 }],
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
  const tokenOf = (url: string) => /\/drop-off\/([A-Za-z0-9_-]{43})$/.exec(url)![1]!;
  const linkIn = (mail: CaughtMail) => /\/drop-off\/([A-Za-z0-9_-]{43})/.exec(mail.text)?.[1];
  const rowsWithKey = async (key: string) =>
    (
      await app
        .get(DataSource)
        .query<{ n: number }[]>(`SELECT count(*)::int AS n FROM bookings WHERE idempotency_key = $1`, [key])
    )[0]!.n;
  const clock = () => app.get(BookingClock);
  /** The instant the business clock reads `date` at `minute`, found by correcting a UTC guess by the zone's offset. */
  const instantOf = (date: string, minute: number) => {
    const target = Date.parse(`${date}T00:00:00Z`) + minute * 60_000;
    let guess = target;
    for (let i = 0; i < 3; i++) {
      const seen = businessMoment(TIME_ZONE, new Date(guess));
      guess += target - (Date.parse(`${seen.date}T00:00:00Z`) + seen.minute * 60_000);
    }
    return new Date(guess);
  };

  beforeAll(async () => {
    app = await createTestApp();
    await app.listen(0, '127.0.0.1');
    for (const role of ['owner', 'office', 'sharpener', 'client', 'otherSharpener'] as const) {
      const user = await createUser(app, role === 'otherSharpener' ? 'sharpener' : role);
      users[role] = { id: user.id, email: user.email };
      tokens[role] = (await signIn(app, user.email)).token;
    }
    await http().put('/api/route-days/settings').set(bearer('owner')).send(SETTINGS).expect(200);
    await http().put('/api/rates').set(bearer('owner')).send({ card: DEMO_RATE_CARD }).expect(200);
    today = clock().moment().date;
    stop.a = await makeStop('A', 825);
    stop.b = await makeStop('B', 0);
    day.a1 = await makeDay(users.sharpener.id, addDays(today, 5), [stop.a, stop.b], 600, 20); // 120 − 20 − 20 = 80
    day.a2 = await makeDay(users.sharpener.id, addDays(today, 6), [stop.a], 1080, 30); // 600 − 30 − 10 = 560
    day.race = await makeDay(users.sharpener.id, addDays(today, 7), [stop.a], 540, 20); // 60 − 20 − 10 = 30
    day.other = await makeDay(users.otherSharpener.id, addDays(today, 5), [stop.b], 1080, 30);
  });
  afterAll(async () => {
    await app.close();
  });
  afterEach(() => jest.restoreAllMocks());

  it('keeps the booking cutoff in the planning settings', async () => {
    const read = await http().get('/api/route-days/settings').set(bearer('office')).expect(200);
    expect(read.body).toMatchObject({ bookingCutoffDaysBefore: 1, bookingCutoffHour: 18 });
    const bad = await http()
      .put('/api/route-days/settings')
      .set(bearer('owner'))
      .send({ ...SETTINGS, bookingCutoffHour: 24 })
      .expect(400);
    expect(bad.body.fields.bookingCutoffHour).toBeDefined();
  });

  describe('booking and the private link', () => {
    let token: string;
    let created: CreatedBookingDto;
    const items: BookingItem[] = [
      { toolKind: 'straight', edgeType: 'convex', count: 2 },
      { toolKind: 'thinning', edgeType: 'beveled', count: 1 },
    ];

    beforeAll(async () => {
      const response = await book(booking({ email: users.client.email, items })).expect(201);
      created = response.body as CreatedBookingDto;
      token = tokenOf(created.manageUrl);
    });

    it('answers 201 with the booking: its day, arrival window, bench minutes, estimate and cutoff', () => {
      const arrival = 500; // stop A is first on the day
      expect(created.manageUrl).toBe(`${process.env.APP_URL}/drop-off/${token}`);
      expect(created.booking).toMatchObject({
        status: 'booked',
        stop: { id: stop.a, city: 'Larkhaven' },
        day: day.a2.day,
        routeDayId: day.a2.id,
        arrivalWindow: arrivalWindow(arrival),
        mailIn: false,
        email: users.client.email,
        items,
        benchMinutes: bookedBenchMinutes(items),
        estimateCents: estimateBooking(items, DEMO_RATE_CARD, 825).estimateCents,
        cutoff: bookingCutoff(day.a2.day, { daysBefore: 1, hour: 18 }),
        changeable: true,
      });
      expect(created.booking.benchMinutes).toBe(2 * 18 + 12);
    });

    it('e-mails the private link, and keeps only its sha256', async () => {
      const mail = await waitForMail(users.client.email, /Your drop-off at Bookings e2e A/);
      expect(linkIn(mail)).toBe(token);
      expect(mail.text).toMatch(/estimate/i);
      expect(mail.text).toContain('18:00');
      const [row] = await app
        .get(DataSource)
        .query<Record<string, unknown>[]>(`SELECT * FROM bookings WHERE id = $1`, [created.booking.id]);
      expect(row!.manage_token_hash).toBe(createHash('sha256').update(token).digest('hex'));
      expect(JSON.stringify(row)).not.toContain(token);
    });

    it('reads, changes and cancels through the link', async () => {
      const read = await http().get(`/api/public/bookings/${token}`).expect(200);
      expect((read.body as PublicBookingDto).id).toBe(created.booking.id);

      const newItems = [{ toolKind: 'straight', edgeType: 'beveled', count: 1 }] as BookingItem[];
      const changed = (
        await http()
          .patch(`/api/public/bookings/${token}`)
          .send({ items: newItems, phone: '555 0199', routeDayId: day.a1.id })
          .expect(200)
      ).body as PublicBookingDto;
      expect(changed).toMatchObject({
        items: newItems,
        phone: '555 0199',
        benchMinutes: 10,
        routeDayId: day.a1.id,
        day: day.a1.day,
        estimateCents: estimateBooking(newItems, DEMO_RATE_CARD, 825).estimateCents,
      });

      const cancelled = (await http().post(`/api/public/bookings/${token}/cancel`).expect(200))
        .body as PublicBookingDto;
      expect(cancelled).toMatchObject({ status: 'cancelled', changeable: false });
      await http().patch(`/api/public/bookings/${token}`).send({ notes: 'again' }).expect(409);
    });

    it('answers 404 to a link that is not one', async () => {
      await http()
        .get(`/api/public/bookings/${'x'.repeat(43)}`)
        .expect(404);
      await http().get('/api/public/bookings/short').expect(404);
      await http()
        .post(`/api/public/bookings/${'y'.repeat(43)}/cancel`)
        .expect(404);
    });
  });

  it('books a mail-in with no day and no cutoff', async () => {
    const mailIn = (await book(booking({ mailIn: true, routeDayId: null })).expect(201)).body as CreatedBookingDto;
    expect(mailIn.booking).toMatchObject({ mailIn: true, day: null, cutoff: null, changeable: true });
  });

  describe('a double submit makes one booking', () => {
    it('answers the same idempotencyKey again with 200 and the same booking and link', async () => {
      const body = booking();
      const first = (await book(body).expect(201)).body as CreatedBookingDto;
      const again = (await book(body).expect(200)).body as CreatedBookingDto;
      expect(again.booking.id).toBe(first.booking.id);
      expect(again.manageUrl).toBe(first.manageUrl);
      expect(await rowsWithKey(body.idempotencyKey)).toBe(1);
    });

    it('makes one booking and sends one e-mail when the same form arrives twice at once', async () => {
      const body = booking();
      const responses = await Promise.all([book(body), book(body)]);
      expect(responses.map((r) => r.status).sort()).toEqual([200, 201]);
      expect(new Set(responses.map((r) => (r.body as CreatedBookingDto).booking.id)).size).toBe(1);
      expect(await rowsWithKey(body.idempotencyKey)).toBe(1);
      await waitForMail(body.email, /Your drop-off/);
      await new Promise((resolve) => setTimeout(resolve, 300));
      expect(await mailTo(body.email)).toHaveLength(1);
    });
  });

  describe('capacity', () => {
    it('refuses a booking that would overfill the day and offers the next day that fits', async () => {
      // Day A1 takes 80 minutes of bookings: 4 convex straight shears (72) leave 8.
      await book(
        booking({ routeDayId: day.a1.id, items: [{ toolKind: 'straight', edgeType: 'convex', count: 4 }] }),
      ).expect(201);
      const listed = (await http().get(`/api/public/stops/${stop.a}`).expect(200)).body as PublicStopDto;
      expect(listed.nextDays.find((d) => d.routeDayId === day.a1.id)!.bookableMinutesLeft).toBe(8);

      const refused = await book(booking({ routeDayId: day.a1.id })).expect(409);
      expect(refused.body).toMatchObject({ statusCode: 409, code: 'conflict' });
      expect(refused.body.nextDay).toMatchObject({ routeDayId: day.a2.id, day: day.a2.day, open: true });
      expect(refused.body.fields.routeDayId[0]).toMatch(/fully booked/);
    });

    it('offers no day when none has room', async () => {
      const items = [
        { toolKind: 'straight', edgeType: 'convex', count: 30 },
        { toolKind: 'curved', edgeType: 'convex', count: 30 },
      ];
      const refused = await book(booking({ routeDayId: day.a1.id, items })).expect(409);
      expect(refused.body.nextDay).toBeNull();
    });

    it('lets only one of two bookings racing for the last minutes through', async () => {
      // Day "race" takes 30 minutes: one convex shear (18) fits, two do not.
      const one = [{ toolKind: 'straight', edgeType: 'convex', count: 1 }];
      const responses = await Promise.all([
        book(booking({ routeDayId: day.race.id, items: one })),
        book(booking({ routeDayId: day.race.id, items: one })),
      ]);
      expect(responses.map((r) => r.status).sort()).toEqual([201, 409]);
      const [held] = await app
        .get(DataSource)
        .query<{ minutes: number }[]>(
          `SELECT coalesce(sum(bench_minutes), 0)::int AS minutes FROM bookings WHERE route_day_id = $1 AND status <> 'cancelled'`,
          [day.race.id],
        );
      expect(held!.minutes).toBe(18);
    });
  });

  describe('the cutoff', () => {
    it('allows changes until the evening before, then refuses changes, cancels and new bookings for that day', async () => {
      const created = (await book(booking()).expect(201)).body as CreatedBookingDto;
      const token = tokenOf(created.manageUrl);
      const cutoff = bookingCutoff(day.a2.day, { daysBefore: 1, hour: 18 });
      const now = jest.spyOn(clock(), 'now');

      now.mockReturnValue(new Date(instantOf(cutoff.date, cutoff.minute).getTime() - 60_000));
      await http().patch(`/api/public/bookings/${token}`).send({ notes: 'One more pair maybe.' }).expect(200);

      now.mockReturnValue(instantOf(cutoff.date, cutoff.minute));
      const late = await http().patch(`/api/public/bookings/${token}`).send({ notes: 'Too late.' }).expect(409);
      expect(late.body.message).toMatch(/closed at 18:00/);
      await http().post(`/api/public/bookings/${token}/cancel`).expect(409);
      const read = (await http().get(`/api/public/bookings/${token}`).expect(200)).body as PublicBookingDto;
      expect(read).toMatchObject({ status: 'booked', changeable: false, notes: 'One more pair maybe.' });

      const refused = await book(booking()).expect(409);
      expect(refused.body.fields.routeDayId[0]).toMatch(/closed at 18:00/);
      const listed = (await http().get(`/api/public/stops/${stop.a}`).expect(200)).body as PublicStopDto;
      expect(listed.nextDays.map((d) => d.routeDayId)).not.toContain(day.a2.id);
      expect(listed.nextDays.map((d) => d.routeDayId)).toContain(day.race.id);
    });
  });

  describe("a signed-in client's own shears", () => {
    let shears: { own: string; notOwn: string };
    let customerId: string;
    beforeAll(async () => {
      const customer = async (userId: string | null) =>
        (
          (
            await http()
              .post('/api/customers')
              .set(bearer('office'))
              .send({ name: `Bookings e2e customer ${randomUUID().slice(0, 6)}`, stopId: stop.a, userId })
              .expect(201)
          ).body as { id: string }
        ).id;
      const shear = async (owner: string) =>
        (
          (
            await http()
              .post('/api/shears')
              .set(bearer('office'))
              .send({ customerId: owner, lengthIn: 7, edgeType: 'semi-convex', toolKind: 'curved' })
              .expect(201)
          ).body as { id: string }
        ).id;
      customerId = await customer(users.client.id);
      shears = { own: await shear(customerId), notOwn: await shear(await customer(null)) };
    });

    it('books them by id, with the kind read from the registry and the booking on their customer record', async () => {
      const body = booking({
        items: [{ shearId: shears.own }, { toolKind: 'straight', edgeType: 'beveled', count: 1 }],
      });
      const created = (await book(body).set(bearer('client')).expect(201)).body as CreatedBookingDto;
      expect(created.booking.items).toEqual([
        { toolKind: 'curved', edgeType: 'semi-convex', count: 1 },
        { toolKind: 'straight', edgeType: 'beveled', count: 1 },
      ]);
      expect(created.booking.benchMinutes).toBe(18 + 10);
      const staff = (await http().get(`/api/bookings/${created.booking.id}`).set(bearer('office')).expect(200))
        .body as BookingDto;
      expect(staff.customerId).toBe(customerId);
      const [item] = await app
        .get(DataSource)
        .query<{ shear_id: string }[]>(`SELECT shear_id FROM booking_items WHERE booking_id = $1 AND position = 0`, [
          created.booking.id,
        ]);
      expect(item!.shear_id).toBe(shears.own);
    });

    it("refuses shears by id when signed out, and someone else's shear", async () => {
      const signedOut = await book(booking({ items: [{ shearId: shears.own }] })).expect(400);
      expect(signedOut.body.fields.items[0]).toMatch(/Sign in as a client/);
      const notOwn = await book(booking({ items: [{ shearId: shears.notOwn }] }))
        .set(bearer('client'))
        .expect(400);
      expect(notOwn.body.fields['items.0.shearId']).toEqual(['Choose one of your own shears in service.']);
    });
  });

  describe('who sees which bookings', () => {
    let onOther: string;
    beforeAll(async () => {
      const body = booking({ stopId: stop.b, routeDayId: day.other.id });
      onOther = ((await book(body).expect(201)).body as CreatedBookingDto).booking.id;
    });
    const list = async (who: Who, query: Record<string, string>) =>
      ((await http().get('/api/bookings').query(query).set(bearer(who)).expect(200)).body as { items: BookingDto[] })
        .items;

    it('refuses the signed-out', async () => {
      await http().get('/api/bookings').expect(401);
      await http().get(`/api/bookings/${onOther}`).expect(401);
    });

    it('shows owner and office every booking', async () => {
      for (const who of ['owner', 'office'] as const) {
        expect((await list(who, { routeDayId: day.other.id })).map((b) => b.id)).toEqual([onOther]);
        expect((await list(who, { stopId: stop.a })).length).toBeGreaterThanOrEqual(5);
        await http().get(`/api/bookings/${onOther}`).set(bearer(who)).expect(200);
      }
      const byDay = await list('office', { day: day.a1.day, stopId: stop.a, status: 'booked' });
      expect(byDay.every((b) => b.day === day.a1.day && b.status === 'booked')).toBe(true);
      expect(byDay.length).toBe(1);
    });

    it('shows a sharpener the bookings on their own route days only', async () => {
      const mine = await list('sharpener', {});
      expect(mine.length).toBeGreaterThan(0);
      expect(mine.every((b) => [day.a1.id, day.a2.id, day.race.id].includes(b.routeDayId!))).toBe(true);
      await http().get(`/api/bookings/${onOther}`).set(bearer('sharpener')).expect(404);
      expect((await list('otherSharpener', {})).map((b) => b.id)).toEqual([onOther]);
    });

    it("shows a client their own bookings only: by their account's e-mail or their customer record", async () => {
      const own = await list('client', {});
      expect(own).toHaveLength(2);
      expect(own.filter((b) => b.email === users.client.email)).toHaveLength(1);
      expect(own.filter((b) => b.email !== users.client.email && b.customerId !== null)).toHaveLength(1);
      await http().get(`/api/bookings/${onOther}`).set(bearer('client')).expect(404);
      for (const b of own) await http().get(`/api/bookings/${b.id}`).set(bearer('client')).expect(200);
    });
  });

  it("fills the day sheet's bookings per stop, leaving cancelled ones off", async () => {
    const sheet = (await http().get(`/api/route-days/${day.a1.id}/sheet`).set(bearer('sharpener')).expect(200))
      .body as DaySheetDto;
    const atA = sheet.stops.find((s) => s.stopId === stop.a)!;
    expect(atA.bookings).toHaveLength(1);
    expect(atA.bookings[0]).toMatchObject({
      status: 'booked',
      benchMinutes: 72,
      items: [{ toolKind: 'straight', edgeType: 'convex', count: 4 }],
      phone: '555-0142',
    });
    expect(sheet.stops.find((s) => s.stopId === stop.b)!.bookings).toEqual([]);
  });
});
