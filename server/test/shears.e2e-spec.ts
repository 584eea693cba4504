import type { INestApplication } from '@nestjs/common';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { ShearHistoryEntry } from '../src/shears/entities/shear-history-entry.entity';
import { Shear } from '../src/shears/entities/shear.entity';
import { Stop } from '../src/stops/entities/stop.entity';
import { createTestApp, createUser, signIn } from './utils/test-app';
import { binary } from './utils/binary';

interface ShearBody {
  id: string;
  tagCode: string;
  history: { kind: string; summary: string; happenedOn: string }[];
  [key: string]: unknown;
}

const serialOf = (tagCode: string) => Number(tagCode.slice(3));

describe('shears (e2e)', () => {
  let app: INestApplication<App>;
  const http = () => request(app.getHttpServer());
  const tokens: Record<string, string> = {};
  const as = (who: string) => ({ Authorization: `Bearer ${tokens[who]}` });
  const tag = randomUUID().slice(0, 6);
  const ids: Record<string, string> = {};
  const shears: Record<string, ShearBody> = {};

  async function makeStop(name: string, overrides: Partial<Stop> = {}): Promise<string> {
    const repo = app.get(DataSource).getRepository(Stop);
    const stop = await repo.save(
      repo.create({
        name: `${name} ${tag}`,
        kind: 'salon',
        street: `${randomUUID().slice(0, 4)} Oak Ave`,
        city: 'Demo City',
        cadenceWeeks: 6,
        ...overrides,
      }),
    );
    return stop.id;
  }

  async function makeCustomer(body: Record<string, unknown>): Promise<string> {
    return (await http().post('/api/customers').set(as('office')).send(body).expect(201)).body.id as string;
  }

  async function makeShear(body: Record<string, unknown>): Promise<ShearBody> {
    const response = await http()
      .post('/api/shears')
      .set(as('office'))
      .send({ lengthIn: 6, edgeType: 'convex', toolKind: 'straight', ...body })
      .expect(201);
    return response.body as ShearBody;
  }

  beforeAll(async () => {
    app = await createTestApp();
    const people = {
      owner: await createUser(app, 'owner'),
      office: await createUser(app, 'office'),
      sharpener: await createUser(app, 'sharpener'),
      client: await createUser(app, 'client'),
      otherClient: await createUser(app, 'client'),
      manager: await createUser(app, 'client'),
    };
    for (const [who, user] of Object.entries(people)) {
      tokens[who] = (await signIn(app, user.email)).token;
      ids[who] = user.id;
    }
    ids.stopA = await makeStop('Harbor Salon', { assignedSharpenerId: people.sharpener.id });
    ids.stopB = await makeStop('Paws Grooming', { kind: 'grooming-shop', managerUserId: people.manager.id });
    ids.stopC = await makeStop('Corner Barbers', { kind: 'barbershop' });
    ids.mine = await makeCustomer({ name: `Mara Quill ${tag}`, stopId: ids.stopA, userId: people.client.id });
    ids.theirs = await makeCustomer({ name: `Otto Rand ${tag}`, stopId: ids.stopC, userId: people.otherClient.id });
    ids.atB = await makeCustomer({ name: `Bryn Shop ${tag}`, stopId: ids.stopB });
    shears.mine = await makeShear({ customerId: ids.mine, make: `Corvane${tag}`, model: 'Series 7', lengthIn: 6.5 });
    shears.theirs = await makeShear({
      customerId: ids.theirs,
      make: 'Otto Make',
      edgeType: 'beveled',
      toolKind: 'thinning',
    });
    shears.atB = await makeShear({ customerId: ids.atB, use: 'grooming', toolKind: 'curved', lengthIn: 8 });
  });
  afterAll(async () => {
    await app.close();
  });

  describe('POST /api/shears', () => {
    it('registers a shear with a new tag code, the defaults and a "registered" history line', () => {
      expect(shears.mine).toEqual({
        id: expect.any(String),
        tagCode: expect.stringMatching(/^KR-\d{6,}$/),
        make: `Corvane${tag}`,
        model: 'Series 7',
        lengthIn: 6.5,
        edgeType: 'convex',
        toolKind: 'straight',
        handedness: 'right',
        use: 'hair',
        status: 'in-service',
        customer: { id: ids.mine, name: `Mara Quill ${tag}` },
        stop: { id: ids.stopA, name: `Harbor Salon ${tag}` },
        photoCount: 0,
        lastServicedOn: null,
        sharpeningCount: 0,
        notes: '',
        photos: [],
        history: [
          {
            id: expect.any(String),
            happenedOn: expect.stringMatching(/^\d{4}-\d{2}-\d{2}$/),
            kind: 'registered',
            summary: `Registered to Mara Quill ${tag}`,
          },
        ],
        createdAt: expect.any(String),
        updatedAt: expect.any(String),
      });
    });

    it('hands out tag codes that only go up and are never the same', async () => {
      const made: string[] = [];
      for (let i = 0; i < 4; i++) made.push((await makeShear({ customerId: ids.atB })).tagCode);
      const serials = made.map(serialOf);
      expect(new Set(made).size).toBe(made.length);
      serials.slice(1).forEach((serial, i) => expect(serial).toBeGreaterThan(serials[i]!));
      expect(serials[0]).toBeGreaterThan(serialOf(shears.atB!.tagCode));
      // Ten at once still get ten different codes.
      const parallel = await Promise.all(Array.from({ length: 10 }, () => makeShear({ customerId: ids.atB })));
      expect(new Set(parallel.map((s) => s.tagCode)).size).toBe(10);
    });

    it('refuses a length off the quarter-inch steps with the shared rule message on lengthIn', async () => {
      const response = await http()
        .post('/api/shears')
        .set(as('office'))
        .send({ customerId: ids.mine, lengthIn: 6.3, edgeType: 'convex', toolKind: 'straight' })
        .expect(400);
      expect(response.body.fields).toEqual({ lengthIn: [expect.stringMatching(/quarter inches.*got 6\.3/)] });
      const tooLong = await http()
        .post('/api/shears')
        .set(as('office'))
        .send({ customerId: ids.mine, lengthIn: 14, edgeType: 'convex', toolKind: 'straight' })
        .expect(400);
      expect(tooLong.body.fields.lengthIn[0]).toMatch(/3 to 12 inches/);
    });

    it('refuses an unknown edge type, tool kind and handedness per field', async () => {
      const response = await http()
        .post('/api/shears')
        .set(as('office'))
        .send({ customerId: ids.mine, lengthIn: 6, edgeType: 'laser', toolKind: 'spoon', handedness: 'both' })
        .expect(400);
      expect(response.body.fields.edgeType[0]).toMatch(/beveled, convex, semi-convex, serrated/);
      expect(response.body.fields.toolKind[0]).toMatch(/straight/);
      expect(response.body.fields.handedness).toBeDefined();
    });

    it('refuses an unknown customer on the customerId field', async () => {
      const response = await http()
        .post('/api/shears')
        .set(as('office'))
        .send({ customerId: randomUUID(), lengthIn: 6, edgeType: 'convex', toolKind: 'straight' })
        .expect(400);
      expect(response.body.fields.customerId[0]).toMatch(/customer does not exist/);
    });
  });

  describe('PATCH /api/shears/:id', () => {
    it('records status changes and moves in the history, newest first', async () => {
      const shear = await makeShear({ customerId: ids.mine, make: 'Mover' });
      const lost = await http().patch(`/api/shears/${shear.id}`).set(as('office')).send({ status: 'lost' }).expect(200);
      expect(lost.body.status).toBe('lost');
      expect(lost.body.history.map((h: ShearBody['history'][0]) => [h.kind, h.summary])).toEqual([
        ['status', 'Marked lost'],
        ['registered', `Registered to Mara Quill ${tag}`],
      ]);
      await http()
        .patch(`/api/shears/${shear.id}`)
        .set(as('owner'))
        .send({ status: 'in-service', notes: 'Found' })
        .expect(200);
      const moved = await http()
        .patch(`/api/shears/${shear.id}`)
        .set(as('office'))
        .send({ customerId: ids.atB, model: 'X2' })
        .expect(200);
      expect(moved.body).toMatchObject({
        customer: { id: ids.atB, name: `Bryn Shop ${tag}` },
        stop: { id: ids.stopB },
        model: 'X2',
        notes: 'Found',
        tagCode: shear.tagCode,
      });
      expect(moved.body.history.slice(0, 2).map((h: ShearBody['history'][0]) => h.summary)).toEqual([
        `Moved from Mara Quill ${tag} to Bryn Shop ${tag}`,
        'Back in service',
      ]);
      // A save that changes neither adds no line.
      const again = await http().patch(`/api/shears/${shear.id}`).set(as('office')).send({ status: 'in-service' });
      expect(again.body.history).toHaveLength(4);
    });

    it('checks the merged shear with the shared rules and refuses clearing required fields', async () => {
      const offStep = await http().patch(`/api/shears/${shears.mine!.id}`).set(as('office')).send({ lengthIn: 7.1 });
      expect(offStep.status).toBe(400);
      expect(offStep.body.fields.lengthIn[0]).toMatch(/quarter inches/);
      const cleared = await http().patch(`/api/shears/${shears.mine!.id}`).set(as('office')).send({ edgeType: null });
      expect(cleared.status).toBe(400);
      expect(cleared.body.fields.edgeType).toBeDefined();
      const unknown = await http()
        .patch(`/api/shears/${shears.mine!.id}`)
        .set(as('office'))
        .send({ customerId: randomUUID() });
      expect(unknown.status).toBe(400);
      const status = await http().patch(`/api/shears/${shears.mine!.id}`).set(as('office')).send({ status: 'broken' });
      expect(status.body.fields.status).toBeDefined();
      await http().patch(`/api/shears/${randomUUID()}`).set(as('office')).send({ notes: 'x' }).expect(404);
    });
  });

  describe('GET /api/shears', () => {
    const search = async (q: string, who = 'office') =>
      (await http().get('/api/shears').query({ q, pageSize: 100 }).set(as(who)).expect(200)).body as {
        items: ShearBody[];
        total: number;
      };

    it('finds a shear by its tag code however it is typed, the exact code first', async () => {
      const code = shears.mine!.tagCode;
      const serial = serialOf(code);
      for (const form of [code, code.toLowerCase(), `kr ${serial}`, `KR${serial}`, String(serial), code.slice(3)]) {
        const found = await search(form);
        expect(found.items[0]?.id).toBe(shears.mine!.id);
      }
      const byTag = await http()
        .get(`/api/shears/by-tag/${encodeURIComponent(`kr ${serial}`)}`)
        .set(as('office'));
      expect(byTag.status).toBe(200);
      expect(byTag.body).toMatchObject({ id: shears.mine!.id, tagCode: code, history: expect.any(Array) });
      await http().get('/api/shears/by-tag/KR-999999999').set(as('office')).expect(404);
      await http().get('/api/shears/by-tag/not-a-code').set(as('office')).expect(404);
    });

    it('searches by make, model and customer name', async () => {
      expect((await search(`corvane${tag}`)).items.map((s) => s.id)).toEqual([shears.mine!.id]);
      const byCustomer = await search(`otto rand ${tag}`);
      expect(byCustomer.items.map((s) => s.id)).toEqual([shears.theirs!.id]);
      expect(byCustomer.items[0]).toMatchObject({ customer: { name: `Otto Rand ${tag}` }, stop: { id: ids.stopC } });
    });

    it('filters by customer, stop, edge type, tool kind and status, and pages', async () => {
      const stopId = await makeStop('Filter Studio');
      const customerId = await makeCustomer({ name: `Fil Ter ${tag}`, stopId });
      const made: ShearBody[] = [];
      for (const [edgeType, toolKind] of [
        ['convex', 'straight'],
        ['beveled', 'thinning'],
        ['convex', 'curved'],
        ['serrated', 'straight'],
        ['semi-convex', 'blending'],
        ['beveled', 'chunker'],
      ]) {
        made.push(await makeShear({ customerId, edgeType, toolKind }));
      }
      await http().patch(`/api/shears/${made[5]!.id}`).set(as('office')).send({ status: 'retired' }).expect(200);
      const list = async (query: Record<string, string | number>) =>
        (await http().get('/api/shears').query(query).set(as('office')).expect(200)).body as {
          items: ShearBody[];
          total: number;
        };
      const idsOf = (page: { items: ShearBody[] }) => page.items.map((s) => s.id);

      const atStop = await list({ stopId, pageSize: 100 });
      expect(atStop.total).toBe(6);
      expect(atStop.items.every((s) => (s.stop as { id: string }).id === stopId)).toBe(true);
      expect(idsOf(await list({ customerId, edgeType: 'convex' }))).toEqual([made[0]!.id, made[2]!.id]);
      expect(idsOf(await list({ stopId, toolKind: 'straight', edgeType: 'serrated' }))).toEqual([made[3]!.id]);
      expect(idsOf(await list({ customerId, status: 'retired' }))).toEqual([made[5]!.id]);
      expect((await list({ customerId, status: 'in-service' })).total).toBe(5);

      const page1 = await list({ customerId, pageSize: 4, page: 1, sort: 'tagCode' });
      const page2 = await list({ customerId, pageSize: 4, page: 2, sort: 'tagCode' });
      expect(page1.total).toBe(6);
      expect([...idsOf(page1), ...idsOf(page2)]).toEqual(made.map((s) => s.id));
      const desc = await list({ customerId, sort: 'tagCode', order: 'desc', pageSize: 2 });
      expect(idsOf(desc)).toEqual([made[5]!.id, made[4]!.id]);
      const byEdge = await list({ customerId, sort: 'edgeType', pageSize: 100 });
      expect(byEdge.items.map((s) => s.edgeType)).toEqual([
        'beveled',
        'beveled',
        'convex',
        'convex',
        'semi-convex',
        'serrated',
      ]);

      const bad = await http().get('/api/shears').query({ edgeType: 'x', sort: 'price' }).set(as('office'));
      expect(bad.status).toBe(400);
      expect(Object.keys(bad.body.fields).sort()).toEqual(['edgeType', 'sort']);
    });

    it('reports the last serviced date from the history and the photo count', async () => {
      const repo = app.get(DataSource).getRepository(ShearHistoryEntry);
      for (const happenedOn of ['2025-02-03', '2025-04-28', '2025-03-10']) {
        await repo.insert({ shearId: shears.theirs!.id, kind: 'serviced', happenedOn, summary: 'Sharpened' });
      }
      await repo.insert({ shearId: shears.theirs!.id, kind: 'note', happenedOn: '2025-06-01', summary: 'Chipped tip' });
      const found = await http().get(`/api/shears/${shears.theirs!.id}`).set(as('office')).expect(200);
      expect(found.body).toMatchObject({ lastServicedOn: '2025-04-28', photoCount: 0 });
      const listed = await search(`otto rand ${tag}`);
      expect(listed.items[0]?.lastServicedOn).toBe('2025-04-28');
    });
  });

  describe('who reads and writes which shear', () => {
    const visible = async (who: string) =>
      (
        (await http().get('/api/shears').query({ q: tag, pageSize: 100 }).set(as(who)).expect(200)).body
          .items as ShearBody[]
      ).map((s) => s.id);

    it('answers 401 without a token', async () => {
      await http().get('/api/shears').expect(401);
      await http().get(`/api/shears/${shears.mine!.id}`).expect(401);
      await http().get('/api/shears/labels.pdf').query({ customerId: ids.mine }).expect(401);
    });

    it("keeps the staff's notes from the client who owns the shear", async () => {
      await http().patch(`/api/shears/${shears.mine!.id}`).set(as('office')).send({ notes: 'Nicked tip, warned her' });
      const staff = await http().get(`/api/shears/${shears.mine!.id}`).set(as('office')).expect(200);
      expect(staff.body.notes).toBe('Nicked tip, warned her');
      const own = await http().get(`/api/shears/${shears.mine!.id}`).set(as('client')).expect(200);
      expect(own.body.notes).toBe('');
      const byTag = await http().get(`/api/shears/by-tag/${shears.mine!.tagCode}`).set(as('client')).expect(200);
      expect(byTag.body.notes).toBe('');
    });

    it('lets only owner and office write', async () => {
      for (const who of ['sharpener', 'client', 'manager']) {
        await http()
          .post('/api/shears')
          .set(as(who))
          .send({ customerId: ids.mine, lengthIn: 6, edgeType: 'convex', toolKind: 'straight' })
          .expect(403);
        await http().patch(`/api/shears/${shears.mine!.id}`).set(as(who)).send({ notes: 'mine now' }).expect(403);
      }
    });

    it('shows a sharpener the shears at their own stops, and 404 for others', async () => {
      const seen = await visible('sharpener');
      expect(seen).toContain(shears.mine!.id);
      expect(seen).not.toContain(shears.theirs!.id);
      await http().get(`/api/shears/${shears.mine!.id}`).set(as('sharpener')).expect(200);
      await http().get(`/api/shears/${shears.theirs!.id}`).set(as('sharpener')).expect(404);
    });

    it("shows a client their own shears, and answers another client's id or tag code with 404 and no data", async () => {
      const seen = await visible('client');
      expect(seen).toContain(shears.mine!.id);
      expect(seen).not.toContain(shears.theirs!.id);
      expect(seen).not.toContain(shears.atB!.id);
      await http().get(`/api/shears/${shears.mine!.id}`).set(as('client')).expect(200);
      const byId = await http().get(`/api/shears/${shears.theirs!.id}`).set(as('client')).expect(404);
      const byTag = await http().get(`/api/shears/by-tag/${shears.theirs!.tagCode}`).set(as('client')).expect(404);
      for (const response of [byId, byTag]) {
        expect(response.body.message).toBe('The shear was not found.');
        expect(JSON.stringify(response.body)).not.toMatch(/Otto|KR-/);
      }
      const unknown = await http().get('/api/shears/by-tag/KR-999999999').set(as('client')).expect(404);
      expect(unknown.body.message).toBe(byTag.body.message);
      const searched = await http().get('/api/shears').query({ q: shears.theirs!.tagCode }).set(as('client'));
      expect(searched.body.total).toBe(0);
    });

    it("shows a shop manager the shears of their stop's customers", async () => {
      const seen = await visible('manager');
      expect(seen).toContain(shears.atB!.id);
      expect(seen).not.toContain(shears.mine!.id);
      await http().get(`/api/shears/by-tag/${shears.atB!.tagCode}`).set(as('manager')).expect(200);
      await http().get(`/api/shears/${shears.theirs!.id}`).set(as('manager')).expect(404);
    });
  });

  describe('GET /api/shears/labels.pdf', () => {
    const labels = (query: Record<string, string | undefined>, who = 'office') =>
      http().get('/api/shears/labels.pdf').query(query).set(as(who)).buffer(true).parse(binary);
    const pages = (pdf: Buffer) => (pdf.toString('latin1').match(/\/Type \/Page\b(?!s)/g) ?? []).length;

    it('prints the chosen shears as a PDF attachment', async () => {
      const response = await labels({ ids: [shears.mine!.id, shears.theirs!.id].join(',') }).expect(200);
      expect(response.headers['content-type']).toBe('application/pdf');
      expect(response.headers['content-disposition']).toMatch(
        /^attachment; filename="keenroute-shear-labels-\d{4}-\d{2}-\d{2}\.pdf"$/,
      );
      const pdf = response.body as Buffer;
      expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
      expect(pages(pdf)).toBe(1);
      expect(pdf.toString('latin1')).toMatch(/Inter/);
    });

    it('prints by customer and by stop, thirty labels to a sheet', async () => {
      const customerId = await makeCustomer({ name: `Sheet Filler ${tag}`, stopId: ids.stopC });
      // Thirty-one rows straight in the table (codes from the same sequence) keep this test quick.
      await app
        .get(DataSource)
        .getRepository(Shear)
        .insert(
          Array.from({ length: 31 }, (_, i) => ({
            tagCode: () => "'KR-' || lpad(nextval('shear_tag_serial')::text, 6, '0')",
            customerId,
            lengthIn: 5 + (i % 4) / 4,
            edgeType: 'beveled' as const,
            toolKind: 'thinning' as const,
          })),
        );
      const byCustomer = await labels({ customerId }).expect(200);
      expect(pages(byCustomer.body as Buffer)).toBe(2);
      const byStop = await labels({ stopId: ids.stopC }).expect(200);
      expect(pages(byStop.body as Buffer)).toBe(2);
      expect((byStop.body as Buffer).subarray(0, 4).toString()).toBe('%PDF');
    }, 120_000);

    it('answers 400 when nothing matches or nothing is chosen', async () => {
      const empty = await makeCustomer({ name: `No Shears ${tag}` });
      for (const query of [{ customerId: empty }, { ids: randomUUID() }, {}, { ids: 'nope' }]) {
        const response = await http().get('/api/shears/labels.pdf').query(query).set(as('office'));
        expect(response.status).toBe(400);
        expect(response.body.message).toEqual(expect.any(String));
      }
    });

    it('is for owner and office only', async () => {
      await labels({ customerId: ids.mine }, 'owner').expect(200);
      for (const who of ['sharpener', 'client', 'manager']) {
        await http().get('/api/shears/labels.pdf').query({ customerId: ids.mine }).set(as(who)).expect(403);
      }
    });
  });
});
