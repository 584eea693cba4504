import type { INestApplication } from '@nestjs/common';
import { EDGE_TYPES, isTagCode, TOOL_KINDS, type Role } from '@keenroute/shared';
import { randomUUID } from 'node:crypto';
import Papa from 'papaparse';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { Customer } from '../src/customers/entities/customer.entity';
import { Stop } from '../src/stops/entities/stop.entity';
import { createTestApp, createUser, signIn } from './utils/test-app';

type Row = Partial<Record<string, string>>;

describe('CSV imports (e2e)', () => {
  let app: INestApplication<App>;
  let dataSource: DataSource;
  const http = () => request(app.getHttpServer());
  const tokens = {} as Record<Role, string>;
  const userIds = {} as Record<Role, string>;
  const bearer = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });
  // Each run uses its own names and e-mails, so reruns against the same database never collide.
  const run = randomUUID().slice(0, 8);
  const email = (label: string) => `${label}-${run}@e2e.keenroute.test`;

  // Every column any row uses (Papa.unparse alone takes the first row's keys as the header).
  const csv = (rows: Row[]) => {
    const fields = [...new Set(rows.flatMap((row) => Object.keys(row)))];
    return Papa.unparse({ fields, data: rows.map((row) => fields.map((field) => row[field] ?? '')) });
  };
  const upload = (kind: string, text: string, role: Role = 'office', fileName = `${kind}.csv`) =>
    http().post('/api/imports').set(bearer(role)).field('kind', kind).attach('file', Buffer.from(text), fileName);
  const commit = (id: string, role: Role = 'office') => http().post(`/api/imports/${id}/commit`).set(bearer(role));
  const count = async (table: string) =>
    Number((await dataSource.query<{ n: string }[]>(`SELECT count(*) AS n FROM ${table}`))[0]!.n);

  async function makeStop(name: string, street = '10 Brassmill Road'): Promise<Stop> {
    const stops = dataSource.getRepository(Stop);
    return stops.save(
      stops.create({ name, kind: 'salon', street, city: 'Larkhaven', postalCode: '55901', cadenceWeeks: 8 }),
    );
  }
  async function makeCustomer(label: string, stopId: string | null = null): Promise<Customer> {
    const customers = dataSource.getRepository(Customer);
    return customers.save(customers.create({ name: `E2E ${label}`, email: email(label), stopId }));
  }

  beforeAll(async () => {
    app = await createTestApp();
    // Listening on a real port lets the concurrency test hold several requests open at once.
    await app.listen(0, '127.0.0.1');
    dataSource = app.get(DataSource);
    for (const role of ['owner', 'office', 'sharpener', 'client'] as const) {
      const user = await createUser(app, role);
      userIds[role] = user.id;
      tokens[role] = (await signIn(app, user.email)).token;
    }
  });
  afterAll(async () => {
    await app.close();
  });

  describe('templates', () => {
    it.each([
      ['stops', 'name,kind,street,city,region,postal_code'],
      ['customers', 'name,email,phone,stop_name,stop_street,notes,visit_notice_consent'],
      ['shears', 'customer_email,make,model,length_in,edge_type,tool_kind,handedness,use,notes'],
    ])('GET /api/imports/templates/%s answers a CSV with the header and one example row', async (kind, header) => {
      const response = await http().get(`/api/imports/templates/${kind}`).set(bearer('office')).expect(200);
      expect(response.headers['content-type']).toMatch(/^text\/csv/);
      expect(response.headers['content-disposition']).toBe(`attachment; filename="keenroute-${kind}-template.csv"`);
      const lines = response.text.trimEnd().split('\r\n');
      expect(lines).toHaveLength(2);
      expect(lines[0]!.startsWith(header)).toBe(true);
      if (kind === 'stops') expect(lines[1]).toContain('Larkhaven');
    });

    it('refuses a kind it does not know', async () => {
      await http().get('/api/imports/templates/invoices').set(bearer('office')).expect(400);
    });
  });

  describe('good files', () => {
    it('imports stops: the defaults apply and typed coordinates are kept', async () => {
      const rows = [
        { name: `Heron Lane Grooming ${run}`, kind: 'grooming-shop', street: '12 Heron Lane', city: 'Larkhaven' },
        {
          name: `Cutler Street Barbers ${run}`,
          kind: 'barbershop',
          street: '220 Cutler Street',
          city: 'Larkhaven',
          cadence_weeks: '4',
          billing_mode: 'stop',
          tax_rate_bp: '825',
          latitude: '44.8063',
          longitude: '-92.4001',
        },
      ];
      const preview = await upload('stops', csv(rows)).expect(201);
      expect(preview.body).toMatchObject({
        kind: 'stops',
        fileName: 'stops.csv',
        rowCount: 2,
        validCount: 2,
        errors: [],
        canCommit: true,
      });
      expect(preview.body.sample[1]).toMatchObject({ name: rows[1]!.name, tax_rate_bp: '825' });

      await commit(preview.body.id).expect(200, { kind: 'stops', created: 2 });
      const saved = await dataSource
        .getRepository(Stop)
        .find({ where: [{ name: rows[0]!.name }, { name: rows[1]!.name }] });
      const byName = new Map(saved.map((stop) => [stop.name, stop]));
      expect(byName.get(rows[0]!.name)).toMatchObject({
        cadenceWeeks: 5,
        billingMode: 'customer',
        geocodeStatus: 'none',
      });
      expect(byName.get(rows[1]!.name)).toMatchObject({
        cadenceWeeks: 4,
        billingMode: 'stop',
        taxRateBp: 825,
        latitude: 44.8063,
        geocodeStatus: 'manual',
      });

      const again = await commit(preview.body.id).expect(409);
      expect(again.body.message).toMatch(/already been imported/);
    });

    it('imports customers at the stops they name and opens their stop history', async () => {
      const stop = await makeStop(`Brassmill Cuts ${run}`);
      const rows = [
        {
          name: 'Robin Example',
          email: email('Robin'),
          stop_name: stop.name.toUpperCase(),
          visit_notice_consent: 'yes',
        },
        { name: 'Mail-in Example', email: email('mailin'), stop_name: '', visit_notice_consent: 'no' },
      ];
      const preview = await upload('customers', csv(rows)).expect(201);
      expect(preview.body).toMatchObject({ rowCount: 2, validCount: 2, canCommit: true });
      await commit(preview.body.id).expect(200, { kind: 'customers', created: 2 });

      const robin = await dataSource.getRepository(Customer).findOneByOrFail({ email: email('robin') });
      expect(robin).toMatchObject({ stopId: stop.id, visitNoticeConsent: true });
      const history = await dataSource.query(
        `SELECT stop_id, ended_at FROM customer_stop_history WHERE customer_id = $1`,
        [robin.id],
      );
      expect(history).toEqual([{ stop_id: stop.id, ended_at: null }]);
      const mailIn = await dataSource.getRepository(Customer).findOneByOrFail({ email: email('mailin') });
      expect(mailIn.stopId).toBeNull();
    });

    it('imports shears with new tag codes and a "registered" history line each', async () => {
      const customer = await makeCustomer('shear-owner');
      const rows = [
        { customer_email: customer.email!.toUpperCase(), length_in: '6.5', edge_type: 'convex', tool_kind: 'straight' },
        {
          customer_email: customer.email!,
          make: 'Example Works',
          length_in: '7',
          edge_type: 'beveled',
          tool_kind: 'thinning',
          handedness: 'left',
          use: 'grooming',
        },
      ];
      const preview = await upload('shears', csv(rows)).expect(201);
      await commit(preview.body.id).expect(200, { kind: 'shears', created: 2 });

      const shears = await dataSource.query<{ id: string; tag_code: string; handedness: string }[]>(
        `SELECT id, tag_code, handedness FROM shears WHERE customer_id = $1 ORDER BY tag_code`,
        [customer.id],
      );
      expect(shears).toHaveLength(2);
      expect(shears.every((shear) => isTagCode(shear.tag_code))).toBe(true);
      expect(shears[1]!.handedness).toBe('left');
      const history = await dataSource.query<{ kind: string; recorded_by: string }[]>(
        `SELECT kind, recorded_by FROM shear_history WHERE shear_id = ANY($1::uuid[])`,
        [shears.map((shear) => shear.id)],
      );
      expect(history).toEqual([
        { kind: 'registered', recorded_by: userIds.office },
        { kind: 'registered', recorded_by: userIds.office },
      ]);
    });
  });

  describe('bad rows', () => {
    it('reports each bad row and imports nothing, even when asked to commit', async () => {
      const customer = await makeCustomer('bad-rows');
      const good = { customer_email: customer.email!, length_in: '6', edge_type: 'convex', tool_kind: 'straight' };
      const rows = [
        good,
        { ...good, length_in: '6.3' },
        { ...good, customer_email: email('nobody') },
        { ...good, edge_type: 'wavy', tool_kind: 'spoon' },
      ];
      const before = await count('shears');
      const preview = await upload('shears', csv(rows)).expect(201);
      expect(preview.body).toMatchObject({ rowCount: 4, validCount: 1, canCommit: false });
      expect(preview.body.errors).toEqual([
        { row: 2, column: 'length_in', message: expect.stringMatching(/quarter inches/) },
        { row: 3, column: 'customer_email', message: expect.stringMatching(/No customer has the e-mail/) },
        { row: 4, column: 'edge_type', message: expect.stringMatching(/beveled, convex/) },
        { row: 4, column: 'tool_kind', message: expect.stringMatching(/straight, curved/) },
      ]);

      const refused = await commit(preview.body.id).expect(400);
      expect(refused.body.message).toMatch(/3 of 4 rows have problems, so nothing was imported/);
      expect(Object.keys(refused.body.fields)).toEqual([
        'rows.2.length_in',
        'rows.3.customer_email',
        'rows.4.edge_type',
        'rows.4.tool_kind',
      ]);
      expect(await count('shears')).toBe(before);
    });

    it('checks again at commit: a customer added since the preview makes the file a duplicate', async () => {
      const rows = [
        { name: 'Early Example', email: email('early') },
        { name: 'Late Example', email: email('late') },
      ];
      const preview = await upload('customers', csv(rows)).expect(201);
      expect(preview.body.canCommit).toBe(true);
      await makeCustomer('late');
      const before = await count('customers');

      const refused = await commit(preview.body.id).expect(400);
      expect(refused.body.fields).toEqual({ 'rows.2.email': [expect.stringMatching(/already in Keenroute/)] });
      expect(await count('customers')).toBe(before);
    });

    it('counts duplicate stops in the file and against the database as row errors', async () => {
      const existing = await makeStop(`Tanner Boulevard Salon ${run}`, '40 Tanner Boulevard');
      const fresh = {
        name: `Quarry Hill Pets ${run}`,
        kind: 'grooming-shop',
        street: '8 Quarry Hill Road',
        city: 'Larkhaven',
      };
      const rows = [
        fresh,
        { ...fresh, name: fresh.name.toLowerCase(), street: '8 QUARRY HILL ROAD' },
        { name: existing.name, kind: 'salon', street: existing.street, city: 'larkhaven', postal_code: '55901' },
      ];
      const preview = await upload('stops', csv(rows)).expect(201);
      expect(preview.body.errors).toEqual([
        { row: 2, column: 'name', message: 'Same name and address as row 1.' },
        { row: 3, column: 'name', message: expect.stringMatching(/already in Keenroute/) },
      ]);
    });

    it('counts duplicate customer e-mails in the file and against the database as row errors', async () => {
      const existing = await makeCustomer('existing');
      const rows = [
        { name: 'One', email: email('twice') },
        { name: 'Two', email: email('twice').toUpperCase() },
        { name: 'Three', email: existing.email! },
        { name: 'Four', stop_name: `No such stop ${run}` },
      ];
      const preview = await upload('customers', csv(rows)).expect(201);
      expect(preview.body.errors).toEqual([
        { row: 2, column: 'email', message: 'Same e-mail as row 1.' },
        { row: 3, column: 'email', message: expect.stringMatching(/already in Keenroute/) },
        { row: 4, column: 'stop_name', message: expect.stringMatching(/No stop is named/) },
      ]);
    });
  });

  describe('files refused whole', () => {
    it('names unknown and missing columns with a 400', async () => {
      const unknown = await upload(
        'shears',
        'customer_email,length_in,edge_type,tool_kind,colour\na@b.test,6,convex,straight,red\n',
      ).expect(400);
      expect(unknown.body.message).toMatch(/not part of a shears file: colour/);
      const missing = await upload('stops', 'name,kind\nA,salon\n').expect(400);
      expect(missing.body.message).toMatch(/missing: street, city/);
    });

    it('refuses a missing file, an unknown kind and a file over 5 MB', async () => {
      await http().post('/api/imports').set(bearer('office')).field('kind', 'shears').expect(400);
      await upload('tickets', 'name\nA\n').expect(400);
      const tooBig = `customer_email\n${'x'.repeat(5 * 1024 * 1024)}\n`;
      await upload('shears', tooBig).expect(413);
    });
  });

  it('previews and commits a 5,000-row shear file while the server keeps answering', async () => {
    const customers = await Promise.all(Array.from({ length: 25 }, (_, i) => makeCustomer(`bulk-${i}`)));
    const rows = Array.from({ length: 5000 }, (_, i) => ({
      customer_email: customers[i % customers.length]!.email!,
      make: 'Example Works',
      model: `K-${i}`,
      length_in: String(5 + (i % 13) * 0.25),
      edge_type: EDGE_TYPES[i % EDGE_TYPES.length]!,
      tool_kind: TOOL_KINDS[i % TOOL_KINDS.length]!,
      handedness: i % 10 === 0 ? 'left' : 'right',
      use: i % 3 === 0 ? 'grooming' : 'hair',
      notes: `Bulk row ${i}, invented for the test`,
    }));
    const preview = await upload('shears', csv(rows)).expect(201);
    expect(preview.body).toMatchObject({ rowCount: 5000, validCount: 5000, canCommit: true });
    expect(preview.body.sample).toHaveLength(20);

    const before = await count('shears');
    let committed = false;
    const committing = commit(preview.body.id).then((response) => {
      committed = true;
      return response;
    });
    // Health checks go out one after another while the commit runs; several answering before it ends show that
    // the commit leaves the event loop free for other requests.
    const answeredDuringCommit: number[] = [];
    while (!committed) {
      const health = await http().get('/api/health');
      if (!committed) answeredDuringCommit.push(health.status);
    }
    const response = await committing;
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ kind: 'shears', created: 5000 });
    expect(answeredDuringCommit.length).toBeGreaterThanOrEqual(2);
    expect(answeredDuringCommit.every((status) => status === 200)).toBe(true);
    expect(await count('shears')).toBe(before + 5000);
  });

  describe('who may import', () => {
    it('refuses sharpeners and clients (403) and signed-out callers (401)', async () => {
      const preview = await upload(
        'stops',
        csv([{ name: `Who ${run}`, kind: 'salon', street: '1 Alder Row', city: 'Larkhaven' }]),
      ).expect(201);
      for (const role of ['sharpener', 'client'] as const) {
        await http().get('/api/imports/templates/stops').set(bearer(role)).expect(403);
        await upload('stops', 'name,kind,street,city\nA,salon,1 Alder Row,Larkhaven\n', role).expect(403);
        await commit(preview.body.id, role).expect(403);
      }
      await http().get('/api/imports/templates/stops').expect(401);
      await http()
        .post('/api/imports')
        .field('kind', 'stops')
        .attach('file', Buffer.from('name\n'), 'x.csv')
        .expect(401);
      await http().post(`/api/imports/${preview.body.id}/commit`).expect(401);
      // The owner may, like the office.
      await commit(preview.body.id, 'owner').expect(200, { kind: 'stops', created: 1 });
    });
  });
});
