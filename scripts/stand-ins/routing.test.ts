import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import { gridKm, startRouting, STAND_IN_SPEED_KMH, type Routing } from './routing.js';

void describe('routing stand-in', () => {
  let routing: Routing;
  const table = (path: string) => fetch(`${routing.url}${path}`);

  before(async () => {
    routing = await startRouting({ port: 0, host: '127.0.0.1' });
  });
  after(() => routing.stop());

  void it('answers a square table of seconds and metres in the usual form', async () => {
    const response = await table(
      '/table/v1/driving/-92.40,44.81;-92.41,44.82;-92.38,44.80?annotations=duration,distance',
    );
    assert.equal(response.status, 200);
    const body = (await response.json()) as { code: string; durations: number[][]; distances: number[][] };
    assert.equal(body.code, 'Ok');
    assert.equal(body.durations.length, 3);
    assert.ok(body.durations.every((row, i) => row.length === 3 && row[i] === 0));
    // 0.01 degree of latitude is 1.113 km (111.32 km per degree, from memory) plus 0.01 degree of longitude at 44.8 N.
    const km = gridKm([-92.4, 44.81], [-92.41, 44.82]);
    assert.ok(Math.abs(km - (1.1132 + 1.1132 * Math.cos((44.815 * Math.PI) / 180))) < 1e-3);
    assert.ok(Math.abs(body.distances[0]![1]! - km * 1000) < 1);
    assert.ok(Math.abs(body.durations[0]![1]! - (km / STAND_IN_SPEED_KMH) * 3600) < 1);
  });

  void it('refuses what it does not understand, with a code', async () => {
    const bad = await table('/table/v1/driving/not-a-place');
    assert.equal(bad.status, 400);
    assert.equal(((await bad.json()) as { code: string }).code, 'InvalidQuery');
    assert.equal((await table('/route/v1/driving/1,2;3,4')).status, 400);
  });
});
