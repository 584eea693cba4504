import type { INestApplication } from '@nestjs/common';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { CustomerStopHistory } from '../src/customers/entities/customer-stop-history.entity';
import { Stop } from '../src/stops/entities/stop.entity';
import { createTestApp, createUser, signIn } from './utils/test-app';

describe('customers (e2e)', () => {
  let app: INestApplication<App>;
  const http = () => request(app.getHttpServer());
  const tokens: Record<string, string> = {};
  const as = (who: string) => ({ Authorization: `Bearer ${tokens[who]}` });
  const tag = randomUUID().slice(0, 6);
  const email = (label: string) => `${label}-${randomUUID().slice(0, 8)}@e2e.keenroute.test`;
  const ids: Record<string, string> = {};

  async function makeStop(name: string, overrides: Partial<Stop> = {}): Promise<Stop> {
    const repo = app.get(DataSource).getRepository(Stop);
    return repo.save(
      repo.create({
        name: `${name} ${tag}`,
        kind: 'salon',
        street: `${randomUUID().slice(0, 4)} Elm St`,
        city: 'Demo City',
        cadenceWeeks: 8,
        ...overrides,
      }),
    );
  }

  async function makeCustomer(body: Record<string, unknown>): Promise<{ id: string }> {
    const response = await http().post('/api/customers').set(as('office')).send(body).expect(201);
    return response.body as { id: string };
  }

  beforeAll(async () => {
    app = await createTestApp();
    const people = {
      owner: await createUser(app, 'owner'),
      office: await createUser(app, 'office'),
      sharpener: await createUser(app, 'sharpener'),
      otherSharpener: await createUser(app, 'sharpener'),
      client: await createUser(app, 'client'),
      otherClient: await createUser(app, 'client'),
      manager: await createUser(app, 'client'),
    };
    for (const [who, user] of Object.entries(people)) {
      tokens[who] = (await signIn(app, user.email)).token;
      ids[who] = user.id;
    }
    ids.stopA = (await makeStop('North Salon', { assignedSharpenerId: people.sharpener.id })).id;
    ids.stopB = (await makeStop('South Grooming', { kind: 'grooming-shop', managerUserId: people.manager.id })).id;
    ids.stopC = (await makeStop('East Barbers', { kind: 'barbershop' })).id;
    ids.mine = (await makeCustomer({ name: `Mina Own ${tag}`, stopId: ids.stopA, userId: people.client.id })).id;
    ids.theirs = (
      await makeCustomer({ name: `Theo Other ${tag}`, stopId: ids.stopC, userId: people.otherClient.id })
    ).id;
    ids.atB = (await makeCustomer({ name: `Bea Shop ${tag}`, stopId: ids.stopB })).id;
  });
  afterAll(async () => {
    await app.close();
  });

  describe('POST /api/customers', () => {
    it('creates a customer at a stop, stores the e-mail lower-cased and opens the first stop history row', async () => {
      const address = email('Avery.Lind').toUpperCase();
      const response = await http()
        .post('/api/customers')
        .set(as('owner'))
        .send({
          name: `  Avery Lind ${tag} `,
          email: address,
          phone: '555-0142',
          stopId: ids.stopA,
          visitNoticeConsent: true,
        })
        .expect(201);
      expect(response.body).toEqual({
        id: expect.any(String),
        name: `Avery Lind ${tag}`,
        email: address.toLowerCase(),
        phone: '555-0142',
        stop: { id: ids.stopA, name: `North Salon ${tag}` },
        shearCount: 0,
        visitNoticeConsent: true,
        active: true,
        hasAccount: false,
        notes: '',
        user: null,
        stopHistory: [
          { stop: { id: ids.stopA, name: `North Salon ${tag}` }, startedAt: expect.any(String), endedAt: null },
        ],
        createdAt: expect.any(String),
        updatedAt: expect.any(String),
      });
    });

    it('creates a mail-in customer with no stop and no history', async () => {
      const response = await http()
        .post('/api/customers')
        .set(as('office'))
        .send({ name: `Mail In ${tag}` })
        .expect(201);
      expect(response.body).toMatchObject({ stop: null, stopHistory: [], email: null });
    });

    it('refuses an e-mail another customer has, whatever its case, with 409 on the field', async () => {
      const address = email('dup');
      await makeCustomer({ name: `First ${tag}`, email: address });
      const response = await http()
        .post('/api/customers')
        .set(as('office'))
        .send({ name: `Second ${tag}`, email: address.toUpperCase() })
        .expect(409);
      expect(response.body.fields.email[0]).toMatch(/already has that e-mail/);
    });

    it('answers bad input with 400 and a message per field', async () => {
      const response = await http()
        .post('/api/customers')
        .set(as('office'))
        .send({ name: '', email: 'not-an-address', stopId: 'nope', visitNoticeConsent: 'yes' })
        .expect(400);
      expect(response.body.fields).toEqual({
        name: [expect.stringMatching(/1 to 120/)],
        email: ['Enter a valid e-mail address.'],
        stopId: ['Choose a stop from the list.'],
        visitNoticeConsent: ['visitNoticeConsent must be true or false.'],
      });
      const extra = await http()
        .post('/api/customers')
        .set(as('office'))
        .send({ name: 'X', role: 'owner' })
        .expect(400);
      expect(extra.body.fields.role).toBeDefined();
    });

    it('refuses a stop that does not exist', async () => {
      const response = await http()
        .post('/api/customers')
        .set(as('office'))
        .send({ name: `Ghost ${tag}`, stopId: randomUUID() })
        .expect(400);
      expect(response.body.fields.stopId[0]).toMatch(/does not exist/);
    });

    it('links only a client account, and only to one customer', async () => {
      const notClient = await http()
        .post('/api/customers')
        .set(as('office'))
        .send({ name: `Linked ${tag}`, userId: ids.sharpener })
        .expect(400);
      expect(notClient.body.fields.userId[0]).toMatch(/not a client/);
      const unknown = await http().post('/api/customers').set(as('office')).send({ name: 'L', userId: randomUUID() });
      expect(unknown.status).toBe(400);
      const taken = await http()
        .post('/api/customers')
        .set(as('office'))
        .send({ name: `Linked ${tag}`, userId: ids.client })
        .expect(409);
      expect(taken.body.fields.userId[0]).toMatch(/already belongs/);
      const fresh = await createUser(app, 'client');
      const linked = await makeCustomer({ name: `Linked ${tag}`, userId: fresh.id });
      const detail = await http().get(`/api/customers/${linked.id}`).set(as('office')).expect(200);
      expect(detail.body).toMatchObject({ hasAccount: true, user: { id: fresh.id, email: fresh.email } });
    });
  });

  describe('PATCH /api/customers/:id', () => {
    it('moves a customer: closes the open history row and opens one at the new stop, in one change', async () => {
      const { id } = await makeCustomer({ name: `Mover ${tag}`, stopId: ids.stopA });
      const moved = await http()
        .patch(`/api/customers/${id}`)
        .set(as('office'))
        .send({ stopId: ids.stopB })
        .expect(200);
      expect(moved.body.stop).toEqual({ id: ids.stopB, name: `South Grooming ${tag}` });
      expect(moved.body.stopHistory).toEqual([
        { stop: { id: ids.stopB, name: `South Grooming ${tag}` }, startedAt: expect.any(String), endedAt: null },
        {
          stop: { id: ids.stopA, name: `North Salon ${tag}` },
          startedAt: expect.any(String),
          endedAt: expect.any(String),
        },
      ]);
      const [now, before] = moved.body.stopHistory;
      expect(before.endedAt).toBe(now.startedAt);
      expect(Date.parse(before.endedAt)).toBeGreaterThanOrEqual(Date.parse(before.startedAt));

      // Saving again without a move leaves the history alone; a move to no stop (mail-in) only closes the row.
      await http()
        .patch(`/api/customers/${id}`)
        .set(as('office'))
        .send({ stopId: ids.stopB, notes: 'Left side chair' })
        .expect(200);
      const mailIn = await http().patch(`/api/customers/${id}`).set(as('owner')).send({ stopId: null }).expect(200);
      expect(mailIn.body.stop).toBeNull();
      expect(mailIn.body.notes).toBe('Left side chair');
      const cleared = await http().patch(`/api/customers/${id}`).set(as('office')).send({ notes: null }).expect(200);
      expect(cleared.body.notes).toBe('');
      const rows = await app.get(DataSource).getRepository(CustomerStopHistory).findBy({ customerId: id });
      expect(rows).toHaveLength(2);
      expect(rows.every((row) => row.endedAt !== null)).toBe(true);
    });

    it('refuses a move to an unknown stop and changes nothing', async () => {
      const { id } = await makeCustomer({ name: `Stayer ${tag}`, stopId: ids.stopA });
      await http()
        .patch(`/api/customers/${id}`)
        .set(as('office'))
        .send({ stopId: randomUUID(), name: 'Renamed' })
        .expect(400);
      const detail = await http().get(`/api/customers/${id}`).set(as('office')).expect(200);
      expect(detail.body).toMatchObject({ name: `Stayer ${tag}`, stop: { id: ids.stopA } });
      expect(detail.body.stopHistory).toHaveLength(1);
    });

    it("refuses another customer's e-mail but keeps one's own, and refuses a null name", async () => {
      const taken = email('taken');
      await makeCustomer({ name: `Holder ${tag}`, email: taken });
      const { id } = await makeCustomer({ name: `Changer ${tag}`, email: email('mine') });
      const conflict = await http()
        .patch(`/api/customers/${id}`)
        .set(as('office'))
        .send({ email: taken.toUpperCase() });
      expect(conflict.status).toBe(409);
      expect(conflict.body.fields.email).toBeDefined();
      const detail = await http().get(`/api/customers/${id}`).set(as('office')).expect(200);
      await http().patch(`/api/customers/${id}`).set(as('office')).send({ email: detail.body.email }).expect(200);
      const nullName = await http().patch(`/api/customers/${id}`).set(as('office')).send({ name: null }).expect(400);
      expect(nullName.body.fields.name).toBeDefined();
      const cleared = await http().patch(`/api/customers/${id}`).set(as('office')).send({ email: '' }).expect(200);
      expect(cleared.body.email).toBeNull();
    });

    it('deactivates instead of deleting', async () => {
      const { id } = await makeCustomer({ name: `Leaver ${tag}`, stopId: ids.stopC });
      const off = await http().patch(`/api/customers/${id}`).set(as('office')).send({ active: false }).expect(200);
      expect(off.body.active).toBe(false);
      const inactive = await http()
        .get('/api/customers')
        .query({ q: `Leaver ${tag}`, active: 'false' })
        .set(as('office'));
      expect(inactive.body.items.map((c: { id: string }) => c.id)).toEqual([id]);
      const active = await http()
        .get('/api/customers')
        .query({ q: `Leaver ${tag}`, active: 'true' })
        .set(as('office'));
      expect(active.body.total).toBe(0);
      await http().delete(`/api/customers/${id}`).set(as('owner')).expect(404);
    });
  });

  describe('GET /api/customers', () => {
    it('pages, sorts and searches by name or e-mail on the server', async () => {
      const group = randomUUID().slice(0, 6);
      for (const name of ['Cleo', 'Ada', 'Bo']) {
        await makeCustomer({
          name: `${name} Pager ${group}`,
          email: email(`${name.toLowerCase()}-${group}`),
          stopId: ids.stopC,
        });
      }
      const first = await http()
        .get('/api/customers')
        .query({ q: `pager ${group}`, sort: 'name', order: 'desc', pageSize: 2, page: 1 })
        .set(as('office'))
        .expect(200);
      expect(first.body.total).toBe(3);
      expect(first.body.items.map((c: { name: string }) => c.name)).toEqual([
        `Cleo Pager ${group}`,
        `Bo Pager ${group}`,
      ]);
      expect(first.body.items[0]).toEqual({
        id: expect.any(String),
        name: `Cleo Pager ${group}`,
        email: expect.stringContaining(`cleo-${group}`),
        phone: null,
        stop: { id: ids.stopC, name: `East Barbers ${tag}` },
        shearCount: 0,
        visitNoticeConsent: false,
        active: true,
        hasAccount: false,
      });
      const second = await http()
        .get('/api/customers')
        .query({ q: `pager ${group}`, sort: 'name', order: 'desc', pageSize: 2, page: 2 })
        .set(as('office'));
      expect(second.body.items.map((c: { name: string }) => c.name)).toEqual([`Ada Pager ${group}`]);

      const byEmail = await http()
        .get('/api/customers')
        .query({ q: `BO-${group}` })
        .set(as('office'));
      expect(byEmail.body.items.map((c: { name: string }) => c.name)).toEqual([`Bo Pager ${group}`]);
      const wildcard = await http().get('/api/customers').query({ q: '%' }).set(as('office'));
      expect(wildcard.body.total).toBe(0);
    });

    it('filters by stop, sorts by stop, and counts shears with a subquery', async () => {
      const { id } = await makeCustomer({ name: `Counter ${tag}`, stopId: ids.stopB });
      for (const lengthIn of [5.5, 6]) {
        await http()
          .post('/api/shears')
          .set(as('office'))
          .send({ customerId: id, lengthIn, edgeType: 'convex', toolKind: 'straight' })
          .expect(201);
      }
      const atB = await http().get('/api/customers').query({ stopId: ids.stopB, pageSize: 100 }).set(as('office'));
      expect(atB.body.items.every((c: { stop: { id: string } }) => c.stop.id === ids.stopB)).toBe(true);
      expect(atB.body.items.find((c: { id: string }) => c.id === id).shearCount).toBe(2);
      const sorted = await http()
        .get('/api/customers')
        .query({ q: tag, sort: 'stop', pageSize: 100 })
        .set(as('office'));
      const stops = sorted.body.items.map((c: { stop: { name: string } | null }) => c.stop?.name ?? '~');
      expect(stops).toEqual(
        [...stops].sort((a: string, b: string) => (a === '~' ? 1 : b === '~' ? -1 : a.localeCompare(b))),
      );
      const bad = await http()
        .get('/api/customers')
        .query({ sort: 'phone', active: 'maybe', stopId: 'x' })
        .set(as('office'));
      expect(bad.status).toBe(400);
      expect(Object.keys(bad.body.fields).sort()).toEqual(['active', 'sort', 'stopId']);
    });
  });

  describe('who reads and writes which customer', () => {
    const listed = async (who: string) => {
      const response = await http().get('/api/customers').query({ q: tag, pageSize: 100 }).set(as(who)).expect(200);
      return response.body.items.map((c: { id: string }) => c.id) as string[];
    };

    it('answers 401 without a token', async () => {
      await http().get('/api/customers').expect(401);
      await http().get(`/api/customers/${ids.mine}`).expect(401);
      await http().post('/api/customers').send({ name: 'X' }).expect(401);
    });

    it('lets owner and office write, and refuses writes to sharpeners and clients with 403', async () => {
      for (const who of ['sharpener', 'client', 'manager']) {
        await http()
          .post('/api/customers')
          .set(as(who))
          .send({ name: `Nope ${tag}` })
          .expect(403);
        await http().patch(`/api/customers/${ids.mine}`).set(as(who)).send({ name: 'Nope' }).expect(403);
      }
      await http().patch(`/api/customers/${ids.mine}`).set(as('owner')).send({ phone: '555-0100' }).expect(200);
    });

    it('shows a sharpener the customers at their own stops only, and 404 for the rest', async () => {
      const seen = await listed('sharpener');
      expect(seen).toContain(ids.mine);
      expect(seen).not.toContain(ids.theirs);
      expect(seen).not.toContain(ids.atB);
      await http().get(`/api/customers/${ids.mine}`).set(as('sharpener')).expect(200);
      await http().get(`/api/customers/${ids.theirs}`).set(as('sharpener')).expect(404);
      expect(await listed('otherSharpener')).toEqual([]);
    });

    it("shows a client their own record only, and answers 404 for another client's", async () => {
      expect(await listed('client')).toEqual([ids.mine]);
      const own = await http().get(`/api/customers/${ids.mine}`).set(as('client')).expect(200);
      expect(own.body.user).toEqual({ id: ids.client, email: expect.any(String) });
      const other = await http().get(`/api/customers/${ids.theirs}`).set(as('client')).expect(404);
      expect(JSON.stringify(other.body)).not.toContain('Theo');
      await http().get(`/api/customers/${randomUUID()}`).set(as('client')).expect(404);
    });

    it("shows a shop manager every customer of their stop, and nobody else's", async () => {
      const seen = await listed('manager');
      expect(seen).toContain(ids.atB);
      expect(seen).not.toContain(ids.mine);
      expect(seen).not.toContain(ids.theirs);
      await http().get(`/api/customers/${ids.atB}`).set(as('manager')).expect(200);
      await http().get(`/api/customers/${ids.mine}`).set(as('manager')).expect(404);
    });
  });
});
