import type { INestApplication } from '@nestjs/common';
import type { Role } from '@keenroute/shared';
import { randomUUID } from 'node:crypto';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DEMO_ADDRESSES, DEMO_CITY } from '../src/database/seeds/demo-city';
import { createTestApp, createUser, signIn } from './utils/test-app';

/**
 * Geocoding through the local stand-in (scripts/stand-ins/geocoder.ts), which the app reaches at GEOCODER_URL.
 * `npm test` starts the stand-in and passes GEOCODER_URL; by hand, start it and pass the same:
 *   npx tsx scripts/stand-ins/geocoder.ts --port 1090 &
 *   GEOCODER_URL=http://127.0.0.1:1090 <the usual e2e environment> npm run test:e2e -w server
 * (The stand-in lives in the ESM scripts package, outside the server's rootDir, so jest does not import it.)
 * The geocoder-down case builds a second app in an isolated module registry, since the configuration is validated
 * once when app.module loads.
 */
describe('geocoding (e2e)', () => {
  let app: INestApplication<App>;
  const api = () => request(app.getHttpServer());
  const tokens = {} as Record<Role, string>;
  const bearer = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });
  const demo = DEMO_ADDRESSES[3]!;
  const other = DEMO_ADDRESSES[4]!;
  const bareStreet = demo.street.replace(/^\d+ /, '');
  const onBareStreet = DEMO_ADDRESSES.filter((address) => address.street.endsWith(` ${bareStreet}`));
  const stopAt = (street: string, overrides: Record<string, unknown> = {}) => ({
    name: `Geo salon ${randomUUID().slice(0, 8)}`,
    kind: 'salon',
    street,
    city: DEMO_CITY,
    region: demo.region,
    postalCode: demo.postalCode,
    ...overrides,
  });

  beforeAll(async () => {
    if (!process.env.GEOCODER_URL) {
      throw new Error(
        'The geocoding e2e tests need GEOCODER_URL: run them through `npm test`, or start the stand-in ' +
          '(npx tsx scripts/stand-ins/geocoder.ts --port 1090) and pass GEOCODER_URL=http://127.0.0.1:1090.',
      );
    }
    app = await createTestApp();
    for (const role of ['owner', 'office', 'sharpener', 'client'] as const) {
      tokens[role] = (await signIn(app, (await createUser(app, role)).email)).token;
    }
  });
  afterAll(async () => {
    await app?.close();
  });

  describe('GET /api/geocoding/search', () => {
    const search = (q: string, role: Role = 'office') =>
      api().get('/api/geocoding/search').query({ q }).set(bearer(role));

    it('finds a demo address as one candidate with numeric coordinates', async () => {
      const response = await search(`${demo.street}, ${demo.city} ${demo.postalCode}`).expect(200);
      expect(response.body).toEqual({
        status: 'found',
        message: null,
        candidates: [
          { label: expect.stringContaining(demo.street), latitude: demo.latitude, longitude: demo.longitude },
        ],
      });
    });

    it('answers a bare street as ambiguous with its places as candidates', async () => {
      const response = await search(bareStreet, 'owner').expect(200);
      expect(response.body.status).toBe('ambiguous');
      expect(response.body.message).toMatch(/Pick one, or enter coordinates/);
      expect(response.body.candidates).toHaveLength(Math.min(onBareStreet.length, 5));
      expect(response.body.candidates[0]).toEqual({
        label: expect.stringContaining(bareStreet),
        latitude: onBareStreet[0]!.latitude,
        longitude: onBareStreet[0]!.longitude,
      });
    });

    it('fails with a message for an unknown address', async () => {
      const response = await search('1 Nowhere Street, Larkhaven').expect(200);
      expect(response.body).toEqual({
        status: 'failed',
        message: expect.stringMatching(/No place was found/),
        candidates: [],
      });
    });

    it('validates q and lets only owner and office search', async () => {
      const missing = await api().get('/api/geocoding/search').set(bearer('office')).expect(400);
      expect(missing.body.fields.q[0]).toMatch(/Enter an address/);
      await search(demo.street, 'sharpener').expect(403);
      await search(demo.street, 'client').expect(403);
      await api().get('/api/geocoding/search').query({ q: demo.street }).expect(401);
    });
  });

  describe('saving a stop', () => {
    it('places the pin from the geocoder when the address is found', async () => {
      const created = await api().post('/api/stops').set(bearer('office')).send(stopAt(demo.street)).expect(201);
      expect(created.body).toMatchObject({
        latitude: demo.latitude,
        longitude: demo.longitude,
        geocodeStatus: 'found',
        geocoding: {
          status: 'found',
          message: null,
          candidates: [expect.objectContaining({ latitude: demo.latitude })],
        },
      });
      const read = await api().get(`/api/stops/${created.body.id}`).set(bearer('office')).expect(200);
      expect(read.body).toMatchObject({ latitude: demo.latitude, longitude: demo.longitude, geocodeStatus: 'found' });
    });

    it('saves an ambiguous address without a pin and returns the candidates', async () => {
      const created = await api().post('/api/stops').set(bearer('office')).send(stopAt(bareStreet)).expect(201);
      expect(created.body).toMatchObject({ latitude: null, longitude: null, geocodeStatus: 'ambiguous' });
      expect(created.body.geocoding.status).toBe('ambiguous');
      expect(created.body.geocoding.candidates.length).toBeGreaterThan(1);

      // Picking a candidate sends its coordinates back, marked as picked.
      const [choice] = created.body.geocoding.candidates;
      const picked = await api()
        .patch(`/api/stops/${created.body.id}`)
        .set(bearer('office'))
        .send({ latitude: choice.latitude, longitude: choice.longitude, geocodeChoice: 'picked' })
        .expect(200);
      expect(picked.body).toMatchObject({
        latitude: choice.latitude,
        geocodeStatus: 'picked',
        geocoding: { status: 'picked' },
      });
    });

    it('saves an unknown address without a pin and says how to place it', async () => {
      const created = await api().post('/api/stops').set(bearer('office')).send(stopAt('1 Nowhere Street')).expect(201);
      expect(created.body).toMatchObject({ latitude: null, geocodeStatus: 'failed' });
      expect(created.body.geocoding).toEqual({
        status: 'failed',
        message: expect.stringMatching(/Enter coordinates to place the pin/),
        candidates: [],
      });
      await api().get(`/api/stops/${created.body.id}`).set(bearer('office')).expect(200);
    });

    it('looks up again only when the address changes, keeps typed coordinates, and clears the pin on nulls', async () => {
      const { body: stop } = await api().post('/api/stops').set(bearer('owner')).send(stopAt(demo.street)).expect(201);
      const patch = (body: Record<string, unknown>) =>
        api().patch(`/api/stops/${stop.id}`).set(bearer('owner')).send(body).expect(200);

      const renamed = await patch({ name: `${stop.name} (renamed)` });
      expect(renamed.body).toMatchObject({
        latitude: demo.latitude,
        geocodeStatus: 'found',
        geocoding: { status: 'unchanged' },
      });

      const moved = await patch({ street: other.street, postalCode: other.postalCode });
      expect(moved.body).toMatchObject({
        latitude: other.latitude,
        longitude: other.longitude,
        geocoding: { status: 'found' },
      });

      const typed = await patch({ street: '1 Nowhere Street', latitude: 44.5, longitude: -92.5 });
      expect(typed.body).toMatchObject({ latitude: 44.5, geocodeStatus: 'manual', geocoding: { status: 'manual' } });

      const cleared = await patch({ latitude: null, longitude: null });
      expect(cleared.body).toMatchObject({
        latitude: null,
        longitude: null,
        geocodeStatus: 'none',
        geocoding: { status: 'none' },
      });

      const lonely = await api()
        .patch(`/api/stops/${stop.id}`)
        .set(bearer('owner'))
        .send({ latitude: null })
        .expect(400);
      expect(lonely.body.fields.latitude[0]).toMatch(/together, or neither/);
    });
  });

  describe('with the geocoder down', () => {
    let downApp: INestApplication<App>;

    beforeAll(async () => {
      // A port that was free a moment ago and is closed now: connections are refused at once.
      const probe = http.createServer();
      await new Promise<void>((resolve) => probe.listen(0, '127.0.0.1', resolve));
      const closedPort = (probe.address() as AddressInfo).port;
      await new Promise((resolve) => probe.close(resolve));
      const saved = process.env.GEOCODER_URL;
      process.env.GEOCODER_URL = `http://127.0.0.1:${closedPort}`;
      try {
        let fresh: typeof import('./utils/test-app') | undefined;
        jest.isolateModules(() => {
          fresh = jest.requireActual<typeof import('./utils/test-app')>('./utils/test-app');
        });
        downApp = await fresh!.createTestApp();
      } finally {
        process.env.GEOCODER_URL = saved;
      }
    });
    afterAll(async () => {
      await downApp?.close();
    });

    it('still saves the stop, as failed, with a message to place the pin', async () => {
      const created = await request(downApp.getHttpServer())
        .post('/api/stops')
        .set(bearer('office'))
        .send(stopAt(demo.street))
        .expect(201);
      expect(created.body).toMatchObject({ latitude: null, longitude: null, geocodeStatus: 'failed' });
      expect(created.body.geocoding).toEqual({
        status: 'failed',
        message: 'The geocoder could not be reached. Enter coordinates to place the pin.',
        candidates: [],
      });
      const read = await api().get(`/api/stops/${created.body.id}`).set(bearer('office')).expect(200);
      expect(read.body).toMatchObject({ name: created.body.name, geocodeStatus: 'failed' });
    });

    it('answers a search as failed instead of an error', async () => {
      const response = await request(downApp.getHttpServer())
        .get('/api/geocoding/search')
        .query({ q: demo.street })
        .set(bearer('owner'))
        .expect(200);
      expect(response.body).toMatchObject({ status: 'failed', message: expect.stringMatching(/could not be reached/) });
    });
  });
});
