import type { INestApplication } from '@nestjs/common';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { BIDI_CONTROL_MESSAGE } from '../../src/common/validation/unsafe-input';
import { createTestApp, createUser, signIn } from '../utils/test-app';

/**
 * Text that is odd but valid (emoji, right-to-left script, SQL and script fragments, combining marks) is either
 * stored exactly as sent or refused with a message on its field; NUL never reaches PostgreSQL, whether it comes in a
 * JSON body or inside an imported CSV file (refused there as not UTF-8 text), and direction overrides, which make a
 * name show other than it reads, are refused on their field. Rows are counted around every request.
 */
const ODD_TEXT: [string, string][] = [
  ['emoji', 'Shear Shack ✂️💈 (demo)'],
  ['right-to-left script', 'صالون ✂️ מספרה'],
  ['SQL', "O'Brien's'); DROP TABLE stops; --"],
  ['script', '<script>alert(1)</script>'],
  ['combining marks and a zero-width space', 'Cafe\u0301\u200B Row'],
  ['a character outside the basic plane', 'Salon 𠀋'],
];

describe('odd text (e2e)', () => {
  let app: INestApplication<App>;
  let as: { Authorization: string };
  const http = () => request(app.getHttpServer());
  const count = async (table: string) =>
    (await app.get(DataSource).query<{ n: number }[]>(`SELECT count(*)::int AS n FROM ${table}`))[0]!.n;
  const tag = () => randomUUID().slice(0, 6);

  /** Sends a create, and checks it was stored as sent (one more row) or refused on the field (no more rows). */
  async function storedOrRefused(table: string, path: string, body: Record<string, string>, field: string) {
    const before = await count(table);
    const response = await http().post(path).set(as).send(body);
    if (response.status === 400) {
      expect(Object.keys(response.body.fields ?? {})).toContain(field);
      expect(await count(table)).toBe(before);
      return;
    }
    expect(response.status).toBe(201);
    expect(await count(table)).toBe(before + 1);
    const stored = await http()
      .get(`${path}/${response.body.id as string}`)
      .set(as)
      .expect(200);
    expect(stored.body[field]).toBe(body[field]!.trim());
  }

  beforeAll(async () => {
    app = await createTestApp();
    as = { Authorization: `Bearer ${(await signIn(app, (await createUser(app, 'office')).email)).token}` };
  });
  afterAll(async () => {
    await app.close();
  });

  it.each(ODD_TEXT)('stores a stop name with %s as sent, or refuses it on the field', async (_what, text) => {
    const body = { name: `${text} ${tag()}`, kind: 'salon', street: '1 Odd Row', city: 'Larkhaven' };
    await storedOrRefused('stops', '/api/stops', body, 'name');
  });

  it.each(ODD_TEXT)('stores a customer name and notes with %s as sent, or refuses them', async (_what, text) => {
    await storedOrRefused('customers', '/api/customers', { name: `${text} ${tag()}` }, 'name');
    await storedOrRefused('customers', '/api/customers', { name: `Notes ${tag()}`, notes: text }, 'notes');
  });

  it('refuses NUL in an otherwise valid body on its field, writing nothing', async () => {
    const before = await count('stops');
    const response = await http()
      .post('/api/stops')
      .set(as)
      .send({ name: `Nul\u0000Salon ${tag()}`, kind: 'salon', street: '1 Odd Row', city: 'Larkhaven' })
      .expect(400);
    expect(response.body.fields).toEqual({ name: ['Text cannot contain NUL characters.'] });
    expect(await count('stops')).toBe(before);
  });

  it.each([
    ['a right-to-left override', '\u202E'],
    ['a right-to-left isolate', '\u2067'],
  ])('refuses a stop name with %s on its field, writing nothing', async (_what, control) => {
    const before = await count('stops');
    const response = await http()
      .post('/api/stops')
      .set(as)
      .send({ name: `Salon ${control}gnp.exe ${tag()}`, kind: 'salon', street: '1 Odd Row', city: 'Larkhaven' })
      .expect(400);
    expect(response.body.fields).toEqual({ name: [BIDI_CONTROL_MESSAGE] });
    expect(await count('stops')).toBe(before);
  });

  it.each([
    ['a NUL byte', Buffer.from('Nul\u0000Salon')],
    ['bytes that are not UTF-8', Buffer.from([0x42, 0xed, 0xa0, 0x80, 0xff, 0x43])],
  ])('refuses a stops CSV with %s in a name with a message, importing nothing', async (_what, bytes) => {
    const file = Buffer.concat([
      Buffer.from(`name,kind,street,city\nImported ${tag()} `),
      bytes,
      Buffer.from(',salon,1 Odd Row,Larkhaven\n'),
    ]);
    const [stops, imports] = [await count('stops'), await count('csv_imports')];
    const preview = await http()
      .post('/api/imports')
      .set(as)
      .field('kind', 'stops')
      .attach('file', file, 'stops.csv')
      .expect(400);
    expect(preview.body.message).toMatch(/UTF-8/);
    expect([await count('stops'), await count('csv_imports')]).toEqual([stops, imports]);
  });
});
