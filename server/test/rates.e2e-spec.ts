import type { INestApplication } from '@nestjs/common';
import { DEMO_RATE_CARD, priceTicket, type Role, type TicketLine } from '@keenroute/shared';
import request from 'supertest';
import type { App } from 'supertest/types';
import { createTestApp, createUser, signIn } from './utils/test-app';

describe('rates (e2e)', () => {
  let app: INestApplication<App>;
  const http = () => request(app.getHttpServer());
  const tokens = {} as Record<Role, string>;
  const bearer = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });

  const lines: TicketLine[] = [
    {
      shear: { edgeType: 'convex', toolKind: 'straight', lengthIn: 6.5, handedness: 'left' },
      addOns: ['inside-edge-hone'],
    },
    { shear: { edgeType: 'beveled', toolKind: 'thinning', lengthIn: 7.5, handedness: 'right', use: 'grooming' } },
    {
      shear: { edgeType: 'serrated', toolKind: 'curved', lengthIn: 8, handedness: 'right' },
      addOns: ['tension-adjustment'],
    },
  ];

  beforeAll(async () => {
    app = await createTestApp();
    for (const role of ['owner', 'office', 'sharpener', 'client'] as const) {
      tokens[role] = (await signIn(app, (await createUser(app, role)).email)).token;
    }
    await http().put('/api/rates').set(bearer('owner')).send({ card: DEMO_RATE_CARD }).expect(200);
  });
  afterAll(async () => {
    await app.close();
  });

  it('POST /api/rates/quote answers exactly what the shared package computes for the same input', async () => {
    const response = await http()
      .post('/api/rates/quote')
      .set(bearer('sharpener'))
      .send({ lines, taxRateBp: 825, chargeTrip: true })
      .expect(200);
    const expected = priceTicket(lines, DEMO_RATE_CARD, { taxRateBp: 825, chargeTrip: true });
    expect(response.body.price).toEqual(JSON.parse(JSON.stringify(expected)));
    expect(response.body.price.lines[0].explanation).toMatch(/convex/);
  });

  it('refuses the quote to clients and to signed-out callers', async () => {
    await http().post('/api/rates/quote').send({ lines, taxRateBp: 0 }).expect(401);
    await http().post('/api/rates/quote').set(bearer('client')).send({ lines, taxRateBp: 0 }).expect(403);
  });

  it('answers bad shears with 400 and the field, including the rules package checks', async () => {
    const tooLong = await http()
      .post('/api/rates/quote')
      .set(bearer('office'))
      .send({ lines: [{ shear: { ...lines[0]!.shear, lengthIn: 14 } }], taxRateBp: 825 })
      .expect(400);
    expect(tooLong.body.fields['lines.0.shear.lengthIn']).toBeDefined();
    // 6.3 in is inside the range but not a quarter-inch step: the shared rules refuse it.
    const offStep = await http()
      .post('/api/rates/quote')
      .set(bearer('office'))
      .send({ lines: [{ shear: { ...lines[0]!.shear, lengthIn: 6.3 } }], taxRateBp: 825 })
      .expect(400);
    expect(offStep.body.message).toMatch(/quarter/i);
    await http().post('/api/rates/quote').set(bearer('office')).send({ lines: [], taxRateBp: 825 }).expect(400);
  });

  it('only the owner saves a card; a change adds a version and keeps the earlier ones', async () => {
    const before = await http().get('/api/rates').set(bearer('office')).expect(200);
    const card = { ...DEMO_RATE_CARD, tripChargeCents: DEMO_RATE_CARD.tripChargeCents + 500 };
    await http().put('/api/rates').set(bearer('office')).send({ card }).expect(403);
    const saved = await http().put('/api/rates').set(bearer('owner')).send({ card }).expect(200);
    expect(saved.body.version).toBeGreaterThan(before.body.version);
    const history = await http().get('/api/rates/history').set(bearer('owner')).expect(200);
    const versions = history.body.items.map((item: { version: number }) => item.version);
    expect(versions).toEqual(expect.arrayContaining([before.body.version, saved.body.version]));
    const old = history.body.items.find((item: { version: number }) => item.version === before.body.version);
    expect(old.card.tripChargeCents).toBe(before.body.card.tripChargeCents);
  });

  it('refuses a broken card with a message per field', async () => {
    const response = await http()
      .put('/api/rates')
      .set(bearer('owner'))
      .send({ card: { ...DEMO_RATE_CARD, tripChargeCents: -5, currency: 'dollars' } })
      .expect(400);
    expect(Object.keys(response.body.fields)).toEqual(
      expect.arrayContaining(['card.tripChargeCents', 'card.currency']),
    );
  });
});
