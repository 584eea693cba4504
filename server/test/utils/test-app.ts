import type { INestApplication } from '@nestjs/common';
import { Test } from '@nestjs/testing';
import type { Role } from '@keenroute/shared';
import { hash } from 'bcryptjs';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { AppModule } from '../../src/app.module';
import { configureApp } from '../../src/app.setup';
import { User } from '../../src/users/entities/user.entity';

export const TEST_PASSWORD = 'bench-test-password-7731';
let passwordHash: Promise<string> | undefined;

/** The whole app, configured exactly as main.ts does, against the real test database. */
export async function createTestApp(): Promise<INestApplication<App>> {
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).compile();
  const app = moduleRef.createNestApplication<INestApplication<App>>({ rawBody: true, logger: false });
  configureApp(app);
  await app.init();
  // The rate limits count in the database for every instance alike; each test app starts with no attempts counted,
  // as one fresh server would, so one test file's sign-ins and bookings do not use up the next one's.
  await app.get(DataSource).query('DELETE FROM rate_limit_hits');
  return app;
}

/** A user straight in the database, with a unique e-mail so test files never collide. */
export async function createUser(
  app: INestApplication,
  role: Role,
  overrides: Partial<User> = {},
): Promise<User & { password: string }> {
  passwordHash ??= hash(TEST_PASSWORD, 4);
  const repo = app.get(DataSource).getRepository(User);
  const user = await repo.save(
    repo.create({
      email: `${role}-${randomUUID().slice(0, 8)}@e2e.keenroute.test`,
      name: `E2E ${role}`,
      role,
      passwordHash: await passwordHash,
      active: true,
      ...overrides,
    }),
  );
  return Object.assign(user, { password: TEST_PASSWORD });
}

export async function signIn(app: INestApplication<App>, email: string, password = TEST_PASSWORD) {
  const response = await request(app.getHttpServer()).post('/api/auth/login').send({ email, password }).expect(200);
  return { token: (response.body as { accessToken: string }).accessToken, cookie: refreshCookie(response) };
}

/** The refresh cookie's `name=value` pair from a response, ready to send back. */
export function refreshCookie(response: request.Response): string {
  const cookies = ([] as string[]).concat(response.headers['set-cookie'] ?? []);
  const cookie = cookies.find((c) => c.startsWith('kr_refresh='));
  if (!cookie) throw new Error('The response set no refresh cookie.');
  return cookie.split(';')[0]!;
}
