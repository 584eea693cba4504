import type { INestApplication } from '@nestjs/common';
import { addDays, DEFAULT_CADENCE_WEEKS, type Role } from '@keenroute/shared';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { StopsService } from '../src/stops/stops.service';
import { createTestApp, createUser, signIn } from './utils/test-app';

/**
 * Stops against the real app and database. Look-ups go to whatever GEOCODER_URL says (npm test starts the stand-in);
 * nothing here depends on their outcome, which test/geocoding.e2e-spec.ts covers.
 */
describe('stops (e2e)', () => {
  let app: INestApplication<App>;
  const http = () => request(app.getHttpServer());
  const tokens = {} as Record<Role | 'otherSharpener', string>;
  const ids = {} as Record<Role | 'otherSharpener', string>;
  const bearer = (who: keyof typeof tokens) => ({ Authorization: `Bearer ${tokens[who]}` });
  const tag = () => randomUUID().slice(0, 8);
  let today: string;
  let serial = 100;

  type StopBody = Record<string, unknown>;
  const stopBody = (label: string, overrides: StopBody = {}): StopBody => ({
    name: `Salon ${label}`,
    kind: 'salon',
    street: `${serial++} ${label} Street`,
    city: 'Larkhaven',
    postalCode: '55901',
    latitude: 44.81,
    longitude: -92.4,
    ...overrides,
  });
  const createStop = async (label: string, overrides: StopBody = {}) =>
    (await http().post('/api/stops').set(bearer('office')).send(stopBody(label, overrides)).expect(201)).body;
  const recordVisit = (stopId: string, daysAgo: number) =>
    http()
      .post(`/api/stops/${stopId}/visits`)
      .set(bearer('office'))
      .send({ workedOn: addDays(today, -daysAgo) })
      .expect(201);
  const names = (response: request.Response) => response.body.items.map((item: { name: string }) => item.name);

  beforeAll(async () => {
    app = await createTestApp();
    for (const role of ['owner', 'office', 'sharpener', 'client', 'otherSharpener'] as const) {
      const user = await createUser(app, role === 'otherSharpener' ? 'sharpener' : role);
      ids[role] = user.id;
      tokens[role] = (await signIn(app, user.email)).token;
    }
    today = app.get(StopsService).today();
  });
  afterAll(async () => {
    await app.close();
  });

  describe('create, read, update', () => {
    it('creates a stop with every field and reads it back as a detail', async () => {
      const label = tag();
      const created = await http()
        .post('/api/stops')
        .set(bearer('office'))
        .send(
          stopBody(label, {
            region: 'Lakeshore',
            country: 'us',
            phone: ' 555-0142 ',
            email: 'Front.Desk@Demo.Keenroute.test',
            openingHours: { tue: [{ opens: '09:00', closes: '17:00' }] },
            closedDates: ['2026-12-25', '2026-01-01', '2026-12-25'],
            cadenceWeeks: 7,
            preferredWeekdays: ['thu', 'tue'],
            billingMode: 'stop',
            taxRateBp: 825,
            accessParking: 'Behind the bakery',
            accessDoor: 'Side door',
            accessBestTime: 'Before 10:00',
            assignedSharpenerId: ids.sharpener,
            managerUserId: ids.client,
          }),
        )
        .expect(201);
      expect(created.body).toEqual({
        id: expect.any(String),
        name: `Salon ${label}`,
        kind: 'salon',
        street: expect.stringContaining(label),
        city: 'Larkhaven',
        region: 'Lakeshore',
        postalCode: '55901',
        country: 'US',
        latitude: 44.81,
        longitude: -92.4,
        geocodeStatus: 'manual',
        phone: '555-0142',
        email: 'front.desk@demo.keenroute.test',
        cadenceWeeks: 7,
        billingMode: 'stop',
        assignedSharpener: { id: ids.sharpener, name: 'E2E sharpener' },
        active: true,
        lastVisitOn: null,
        nextDueOn: today,
        daysOverdue: 0,
        customerCount: 0,
        openingHours: { tue: [{ opens: '09:00', closes: '17:00' }] },
        closedDates: ['2026-01-01', '2026-12-25'],
        preferredWeekdays: ['tue', 'thu'],
        taxRateBp: 825,
        accessParking: 'Behind the bakery',
        accessDoor: 'Side door',
        accessBestTime: 'Before 10:00',
        manager: { id: ids.client, name: 'E2E client' },
        createdAt: expect.any(String),
        updatedAt: expect.any(String),
        geocoding: { status: 'manual', message: null, candidates: [] },
      });
      const detail = { ...created.body };
      delete detail.geocoding;
      const read = await http().get(`/api/stops/${created.body.id}`).set(bearer('owner')).expect(200);
      expect(read.body).toEqual(detail);
    });

    it('takes the default cadence for the kind and sensible defaults for the rest', async () => {
      const body = stopBody(tag(), { kind: 'grooming-shop' });
      const created = (await http().post('/api/stops').set(bearer('owner')).send(body).expect(201)).body;
      expect(created).toMatchObject({
        cadenceWeeks: DEFAULT_CADENCE_WEEKS['grooming-shop'],
        billingMode: 'customer',
        taxRateBp: 0,
        country: 'US',
        region: '',
        phone: null,
        email: null,
        openingHours: {},
        closedDates: [],
        preferredWeekdays: [],
        assignedSharpener: null,
        manager: null,
      });
    });

    it('updates only the fields sent, clears nullable ones with null, and refuses null for required ones', async () => {
      const stop = await createStop(tag(), { phone: '555-0100', assignedSharpenerId: ids.sharpener });
      const updated = await http()
        .patch(`/api/stops/${stop.id}`)
        .set(bearer('owner'))
        .send({ cadenceWeeks: 10, phone: null, assignedSharpenerId: null, active: false, taxRateBp: 0 })
        .expect(200);
      expect(updated.body).toMatchObject({
        name: stop.name,
        street: stop.street,
        cadenceWeeks: 10,
        phone: null,
        assignedSharpener: null,
        active: false,
        latitude: stop.latitude,
        geocoding: { status: 'unchanged', message: null, candidates: [] },
      });
      const refused = await http().patch(`/api/stops/${stop.id}`).set(bearer('owner')).send({ name: null }).expect(400);
      expect(refused.body.fields.name).toEqual(expect.arrayContaining([expect.stringMatching(/Enter a name/)]));
    });

    it('counts the active customers at the stop', async () => {
      const stop = await createStop(tag());
      await app
        .get(DataSource)
        .query(
          `INSERT INTO customers (name, stop_id, active) VALUES ('A', $1, true), ('B', $1, true), ('C', $1, false)`,
          [stop.id],
        );
      const read = await http().get(`/api/stops/${stop.id}`).set(bearer('office')).expect(200);
      expect(read.body.customerCount).toBe(2);
      const list = await http().get('/api/stops').query({ q: stop.name }).set(bearer('office')).expect(200);
      expect(list.body.items.map((item: { customerCount: number }) => item.customerCount)).toEqual([2]);
    });

    it('answers an unknown id with 404 and a malformed one with 400', async () => {
      await http().get(`/api/stops/${randomUUID()}`).set(bearer('office')).expect(404);
      await http().patch(`/api/stops/${randomUUID()}`).set(bearer('office')).send({ cadenceWeeks: 4 }).expect(404);
      await http().get('/api/stops/not-a-uuid').set(bearer('office')).expect(400);
    });

    it('refuses a second stop with the same name and address (any case) with 409 on name', async () => {
      const stop = await createStop(tag());
      const again = await http()
        .post('/api/stops')
        .set(bearer('office'))
        .send(stopBody('x', { name: stop.name.toUpperCase(), street: stop.street.toLowerCase() }))
        .expect(409);
      expect(again.body.fields.name).toEqual(['A stop with this name at this address already exists.']);
      const other = await createStop(tag());
      const renamed = await http()
        .patch(`/api/stops/${other.id}`)
        .set(bearer('office'))
        .send({ name: stop.name, street: stop.street })
        .expect(409);
      expect(renamed.body.fields).toHaveProperty('name');
    });
  });

  describe('validation', () => {
    const refused = async (overrides: StopBody, field: string, message: RegExp) => {
      const response = await http().post('/api/stops').set(bearer('office')).send(stopBody(tag(), overrides));
      expect(response.status).toBe(400);
      expect(response.body.fields?.[field]).toEqual(expect.arrayContaining([expect.stringMatching(message)]));
    };

    it.each([
      [{ name: '  ' }, 'name', /Enter a name of 1 to 120 characters/],
      [{ name: 'A<b>' }, 'name', /angle brackets/],
      [{ kind: 'spa' }, 'kind', /Choose a kind: salon, barbershop/],
      [{ street: undefined }, 'street', /Enter the street address/],
      [{ city: '' }, 'city', /Enter the city/],
      [{ country: 'USA' }, 'country', /two-letter code/],
      [{ latitude: 91 }, 'latitude', /Latitude is a number from -90 to 90/],
      [{ longitude: -181 }, 'longitude', /Longitude is a number from -180 to 180/],
      [{ longitude: undefined }, 'latitude', /together, or neither/],
      [{ latitude: undefined }, 'longitude', /together, or neither/],
      [{ email: 'front desk' }, 'email', /valid e-mail/],
      [{ phone: 'x'.repeat(41) }, 'phone', /up to 40/],
      [{ cadenceWeeks: 0 }, 'cadenceWeeks', /whole number of weeks from 1 to 52/],
      [{ cadenceWeeks: 53 }, 'cadenceWeeks', /whole number of weeks from 1 to 52/],
      [{ cadenceWeeks: 2.5 }, 'cadenceWeeks', /whole number of weeks/],
      [{ taxRateBp: 3001 }, 'taxRateBp', /basis points from 0 to 3000/],
      [{ taxRateBp: -1 }, 'taxRateBp', /basis points from 0 to 3000/],
      [{ preferredWeekdays: ['mon', 'funday'] }, 'preferredWeekdays', /mon, tue, wed, thu, fri, sat, sun/],
      [{ closedDates: ['2026-02-30'] }, 'closedDates', /calendar dates like/],
      [{ closedDates: '2026-12-25' }, 'closedDates', /list of dates/],
      [{ billingMode: 'monthly' }, 'billingMode', /customer, stop/],
      [{ accessDoor: 'x'.repeat(501) }, 'accessDoor', /up to 500/],
      [{ openingHours: 'weekdays' }, 'openingHours', /windows per weekday/],
      [{ assignedSharpenerId: 'someone' }, 'assignedSharpenerId', /from the list/],
      [{ geocodeChoice: 'guessed' }, 'geocodeChoice', /picked, manual/],
    ])('%j: 400 on %s', (overrides, field, message) => refused(overrides, field, message));

    it('checks opening hours with the shared rules and names the window at fault', async () => {
      await refused(
        { openingHours: { mon: [{ opens: '17:00', closes: '09:00' }] } },
        'openingHours.mon[0]',
        /must close after it opens/,
      );
      await refused({ openingHours: { someday: [] } }, 'openingHours', /not a weekday/);
    });

    it('checks the people a stop points at', async () => {
      const retired = await createUser(app, 'sharpener', { active: false });
      await refused({ assignedSharpenerId: ids.client }, 'assignedSharpenerId', /active sharpener or owner/);
      await refused({ assignedSharpenerId: retired.id }, 'assignedSharpenerId', /active sharpener or owner/);
      await refused({ assignedSharpenerId: randomUUID() }, 'assignedSharpenerId', /active sharpener or owner/);
      await refused({ managerUserId: ids.sharpener }, 'managerUserId', /client's account/);
      await createStop(tag(), { assignedSharpenerId: ids.owner });
    });

    it('refuses geocodeChoice without coordinates and fields it does not know', async () => {
      await refused(
        { geocodeChoice: 'picked', latitude: undefined, longitude: undefined },
        'geocodeChoice',
        /goes with/,
      );
      await refused({ colour: 'teal' }, 'colour', /should not exist/);
    });
  });

  describe('listing', () => {
    it('pages on the server with the total, and searches by name or by address', async () => {
      const label = tag();
      for (const name of ['Bramble', 'Alder', 'Cinder']) {
        await createStop(label, { name: `${name} ${label}`, street: `${serial++} ${name} Yard ${label}` });
      }
      const query = { q: label, sort: 'name', pageSize: 2 };
      const first = await http()
        .get('/api/stops')
        .query({ ...query, page: 1 })
        .set(bearer('office'))
        .expect(200);
      const second = await http()
        .get('/api/stops')
        .query({ ...query, page: 2 })
        .set(bearer('office'))
        .expect(200);
      expect([first.body.total, second.body.total]).toEqual([3, 3]);
      expect(names(first)).toEqual([`Alder ${label}`, `Bramble ${label}`]);
      expect(names(second)).toEqual([`Cinder ${label}`]);

      const desc = await http()
        .get('/api/stops')
        .query({ ...query, order: 'desc' })
        .set(bearer('office'))
        .expect(200);
      expect(names(desc)).toEqual([`Cinder ${label}`, `Bramble ${label}`]);

      const byName = await http()
        .get('/api/stops')
        .query({ q: `bramble ${label}` })
        .set(bearer('office'));
      expect(names(byName)).toEqual([`Bramble ${label}`]);
      // Street and city read as one line of address, as the trigram index has it.
      const byAddress = await http()
        .get('/api/stops')
        .query({ q: `cinder yard ${label} larkhaven` })
        .set(bearer('office'));
      expect(names(byAddress)).toEqual([`Cinder ${label}`]);
    });

    it('filters by kind, sharpener and active', async () => {
      const label = tag();
      await createStop(label, { name: `Barber ${label}`, kind: 'barbershop', assignedSharpenerId: ids.owner });
      await createStop(label, { name: `Closed ${label}`, active: false });
      const list = (query: Record<string, string>) =>
        http()
          .get('/api/stops')
          .query({ q: label, ...query })
          .set(bearer('office'))
          .expect(200)
          .then(names);
      expect(await list({ kind: 'barbershop' })).toEqual([`Barber ${label}`]);
      expect(await list({ sharpenerId: ids.owner })).toEqual([`Barber ${label}`]);
      expect(await list({ active: 'false' })).toEqual([`Closed ${label}`]);
      expect(await list({ active: 'true' })).toEqual([`Barber ${label}`]);
      const bad = await http().get('/api/stops').query({ active: 'maybe', sort: 'owner' }).set(bearer('office'));
      expect(bad.status).toBe(400);
      expect(Object.keys(bad.body.fields).sort()).toEqual(['active', 'sort']);
    });
  });

  describe('visits and coming due', () => {
    // Overdue: visited 60 days ago on a 4-week cadence. Never visited: due today. Recent: visited a week ago, 8 weeks.
    let sharpener: { id: string; token: string };
    let label: string;
    const stops = {} as Record<'overdue' | 'never' | 'recent' | 'inactive', { id: string; name: string }>;

    beforeAll(async () => {
      const user = await createUser(app, 'sharpener');
      sharpener = { id: user.id, token: (await signIn(app, user.email)).token };
      label = tag();
      const common = { assignedSharpenerId: sharpener.id };
      stops.overdue = await createStop(label, { ...common, name: `Overdue ${label}`, cadenceWeeks: 4 });
      stops.never = await createStop(label, { ...common, name: `Never ${label}` });
      stops.recent = await createStop(label, { ...common, name: `Recent ${label}`, cadenceWeeks: 8 });
      stops.inactive = await createStop(label, { ...common, name: `Inactive ${label}`, active: false });
      await recordVisit(stops.overdue.id, 90);
      await recordVisit(stops.overdue.id, 60);
      await recordVisit(stops.recent.id, 7);
      await recordVisit(stops.inactive.id, 365);
    });

    it('records visits and lists them newest first; the stop shows its last visit and next due date', async () => {
      const visits = await http().get(`/api/stops/${stops.overdue.id}/visits`).set(bearer('office')).expect(200);
      expect(visits.body).toEqual({
        items: [
          {
            id: expect.any(String),
            workedOn: addDays(today, -60),
            sharpener: { id: sharpener.id, name: 'E2E sharpener' },
          },
          {
            id: expect.any(String),
            workedOn: addDays(today, -90),
            sharpener: { id: sharpener.id, name: 'E2E sharpener' },
          },
        ],
        total: 2,
      });
      const stop = await http().get(`/api/stops/${stops.overdue.id}`).set(bearer('office')).expect(200);
      expect(stop.body).toMatchObject({
        lastVisitOn: addDays(today, -60),
        nextDueOn: addDays(today, -32),
        daysOverdue: 32,
      });
    });

    it('names who worked a visit when asked, and refuses future days, duplicates and non-sharpeners', async () => {
      const stop = await createStop(tag());
      const worked = await http()
        .post(`/api/stops/${stop.id}/visits`)
        .set(bearer('owner'))
        .send({ workedOn: today, sharpenerId: ids.owner })
        .expect(201);
      expect(worked.body).toEqual({
        id: expect.any(String),
        workedOn: today,
        sharpener: { id: ids.owner, name: 'E2E owner' },
      });
      const post = (body: Record<string, unknown>) =>
        http().post(`/api/stops/${stop.id}/visits`).set(bearer('office')).send(body);
      expect((await post({ workedOn: today })).status).toBe(409);
      const future = await post({ workedOn: addDays(today, 1) });
      expect(future.status).toBe(400);
      expect(future.body.fields.workedOn[0]).toMatch(/today or an earlier day/);
      expect(
        (await post({ workedOn: addDays(today, -1), sharpenerId: ids.client })).body.fields.sharpenerId,
      ).toBeDefined();
      expect((await post({ workedOn: '2026-13-01' })).body.fields.workedOn[0]).toMatch(/date like/);
    });

    it('sorts the list by next due date', async () => {
      const list = (order: string) =>
        http().get('/api/stops').query({ q: label, sort: 'nextDueOn', order, active: 'true' }).set(bearer('office'));
      expect(names(await list('asc'))).toEqual([`Overdue ${label}`, `Never ${label}`, `Recent ${label}`]);
      expect(names(await list('desc'))).toEqual([`Recent ${label}`, `Never ${label}`, `Overdue ${label}`]);
    });

    it("lists active stops due by the week's Sunday, most overdue first, with days overdue", async () => {
      const comingDue = (query: Record<string, string>, token = tokens.office) =>
        http()
          .get('/api/stops/coming-due')
          .query({ sharpenerId: sharpener.id, ...query })
          .set({ Authorization: `Bearer ${token}` })
          .expect(200);
      const thisWeek = await comingDue({});
      expect(thisWeek.body.total).toBe(2);
      expect(thisWeek.body.items.map((s: { name: string; daysOverdue: number }) => [s.name, s.daysOverdue])).toEqual([
        [`Overdue ${label}`, 32],
        [`Never ${label}`, 0],
      ]);
      const recentDue = addDays(today, 49);
      const later = await comingDue({ week: recentDue });
      expect(names(later)).toEqual([`Overdue ${label}`, `Never ${label}`, `Recent ${label}`]);
      expect(later.body.items[2]).toMatchObject({ nextDueOn: recentDue, daysOverdue: -49 });
      expect((await comingDue({ week: addDays(today, -365) })).body.total).toBe(0);
      const paged = await comingDue({ week: recentDue, pageSize: '1', page: '2' });
      expect([paged.body.total, names(paged)]).toEqual([3, [`Never ${label}`]]);

      // A sharpener sees only their own stops coming due.
      const own = await comingDue({}, sharpener.token);
      expect(names(own)).toEqual([`Overdue ${label}`, `Never ${label}`]);
      expect((await comingDue({}, tokens.otherSharpener)).body.total).toBe(0);
      const bad = await http().get('/api/stops/coming-due').query({ week: 'soon', q: 'x' }).set(bearer('office'));
      expect(bad.status).toBe(400);
      expect(Object.keys(bad.body.fields).sort()).toEqual(['q', 'week']);
    });
  });

  describe('who may do what', () => {
    let own: { id: string; name: string };
    let others: { id: string; name: string };
    let label: string;

    beforeAll(async () => {
      label = tag();
      own = await createStop(label, { name: `Own ${label}`, assignedSharpenerId: ids.sharpener });
      others = await createStop(label, { name: `Others ${label}`, assignedSharpenerId: ids.otherSharpener });
    });

    it('a sharpener reads only their own stops and edits only their access notes', async () => {
      const list = await http().get('/api/stops').query({ q: label }).set(bearer('sharpener')).expect(200);
      expect([list.body.total, names(list)]).toEqual([1, [`Own ${label}`]]);
      await http().get(`/api/stops/${own.id}`).set(bearer('sharpener')).expect(200);
      await http().get(`/api/stops/${others.id}`).set(bearer('sharpener')).expect(404);
      await http().get(`/api/stops/${own.id}/visits`).set(bearer('sharpener')).expect(200);
      await http().get(`/api/stops/${others.id}/visits`).set(bearer('sharpener')).expect(404);

      const notes = { accessParking: 'Loading bay', accessDoor: 'Back door, knock', accessBestTime: 'After 14:00' };
      const edited = await http()
        .patch(`/api/stops/${own.id}/access-notes`)
        .set(bearer('sharpener'))
        .send(notes)
        .expect(200);
      expect(edited.body).toMatchObject({ ...notes, name: own.name });
      expect(edited.body).not.toHaveProperty('geocoding');
      await http().patch(`/api/stops/${others.id}/access-notes`).set(bearer('sharpener')).send(notes).expect(404);
      const tooLong = await http()
        .patch(`/api/stops/${own.id}/access-notes`)
        .set(bearer('sharpener'))
        .send({ accessDoor: 'x'.repeat(501), name: 'Renamed' })
        .expect(400);
      expect(Object.keys(tooLong.body.fields).sort()).toEqual(['accessDoor', 'name']);

      await http().post('/api/stops').set(bearer('sharpener')).send(stopBody(tag())).expect(403);
      await http().patch(`/api/stops/${own.id}`).set(bearer('sharpener')).send({ name: 'Mine now' }).expect(403);
      await http().post(`/api/stops/${own.id}/visits`).set(bearer('sharpener')).send({ workedOn: today }).expect(403);
    });

    it('owner and office may edit access notes on any stop', async () => {
      for (const role of ['owner', 'office'] as const) {
        await http()
          .patch(`/api/stops/${others.id}/access-notes`)
          .set(bearer(role))
          .send({ accessDoor: role })
          .expect(200);
      }
    });

    it('a client gets 403 and a caller without a token 401 on every stops route', async () => {
      const routes = [
        () => http().get('/api/stops'),
        () => http().get('/api/stops/coming-due'),
        () => http().get(`/api/stops/${own.id}`),
        () => http().post('/api/stops').send(stopBody(tag())),
        () => http().patch(`/api/stops/${own.id}`).send({ cadenceWeeks: 3 }),
        () => http().patch(`/api/stops/${own.id}/access-notes`).send({ accessDoor: 'x' }),
        () => http().get(`/api/stops/${own.id}/visits`),
        () => http().post(`/api/stops/${own.id}/visits`).send({ workedOn: today }),
      ];
      for (const route of routes) {
        expect((await route().set(bearer('client'))).status).toBe(403);
        expect((await route()).status).toBe(401);
      }
    });
  });
});
