/**
 * The rate limits hold across API instances: two apps on one database count the same attempts, where the
 * throttler's own per-process memory would let each instance allow the whole limit.
 */
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { createTestApp } from './utils/test-app';

describe('rate limits across instances (e2e)', () => {
  let first: INestApplication<App>;
  let second: INestApplication<App>;

  beforeAll(async () => {
    first = await createTestApp();
    second = await createTestApp();
  });

  afterAll(async () => {
    await first?.close();
    await second?.close();
  });

  const login = (app: INestApplication<App>, email: string) =>
    request(app.getHttpServer()).post('/api/auth/login').send({ email, password: 'guess-guess' });

  it('refuses the attempt past the limit whichever instance the attempts went to', async () => {
    const email = `shared-limit-${Date.now()}@e2e.keenroute.test`;
    const limit = Number(process.env.AUTH_RATE_LIMIT ?? 10);
    const statuses: number[] = [];
    for (let attempt = 0; attempt < limit; attempt += 1) {
      statuses.push((await login(attempt % 2 === 0 ? first : second, email)).status);
    }
    expect(statuses).toEqual(Array.from({ length: limit }, () => 401));
    const blockedOnFirst = await login(first, email).expect(429);
    expect(blockedOnFirst.body.message).toMatch(/Too many attempts/);
    expect(Number(blockedOnFirst.headers['retry-after-auth'])).toBeGreaterThan(0);
    await login(second, email).expect(429);
  });

  it('opens a new window once the old one has passed', async () => {
    const email = `window-${Date.now()}@e2e.keenroute.test`;
    const limit = Number(process.env.AUTH_RATE_LIMIT ?? 10);
    for (let attempt = 0; attempt <= limit; attempt += 1) await login(second, email);
    await login(first, email).expect(429);
    // Move the counter's window and block into the past, as a minute's wait would.
    await first.get(DataSource).query(
      `UPDATE rate_limit_hits SET window_ends_at = now() - interval '1 second',
                blocked_until = now() - interval '1 second'`,
    );
    await login(first, email).expect(401);
    await login(second, email).expect(401);
  });
});
