import type { INestApplication } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import request from 'supertest';
import type { App } from 'supertest/types';
import { createTestApp, createUser, refreshCookie, signIn, TEST_PASSWORD } from './utils/test-app';

describe('auth (e2e)', () => {
  let app: INestApplication<App>;
  const http = () => request(app.getHttpServer());

  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => {
    await app.close();
  });

  describe('POST /api/auth/login', () => {
    it('signs in with the right password, in any letter case, and sets an httpOnly SameSite=Strict cookie', async () => {
      const user = await createUser(app, 'office');
      const response = await http()
        .post('/api/auth/login')
        .send({ email: `  ${user.email.toUpperCase()} `, password: TEST_PASSWORD })
        .expect(200);
      expect(response.body).toEqual({
        accessToken: expect.any(String),
        user: { id: user.id, email: user.email, name: user.name, role: 'office' },
      });
      const cookie = ([] as string[]).concat(response.headers['set-cookie'] ?? []).join(';');
      expect(cookie).toMatch(/kr_refresh=/);
      expect(cookie).toMatch(/HttpOnly/);
      expect(cookie).toMatch(/SameSite=Strict/);
      expect(cookie).toMatch(/Path=\/api\/auth/);
    });

    it('answers a wrong password and an unknown e-mail with the same 401', async () => {
      const user = await createUser(app, 'sharpener');
      const wrong = await http().post('/api/auth/login').send({ email: user.email, password: 'not-the-password' });
      const unknown = await http()
        .post('/api/auth/login')
        .send({ email: 'nobody-here@e2e.keenroute.test', password: 'not-the-password' });
      expect(wrong.status).toBe(401);
      expect(unknown.status).toBe(401);
      expect(wrong.body.message).toBe('Wrong e-mail or password.');
      expect(unknown.body.message).toBe(wrong.body.message);
      expect(wrong.headers['set-cookie']).toBeUndefined();
    });

    it('refuses a deactivated user and an invited user without a password', async () => {
      const deactivated = await createUser(app, 'client', { active: false });
      const invited = await createUser(app, 'client', { passwordHash: null });
      for (const user of [deactivated, invited]) {
        await http().post('/api/auth/login').send({ email: user.email, password: TEST_PASSWORD }).expect(401);
      }
    });

    it('answers bad input with 400 and a message per field', async () => {
      const response = await http()
        .post('/api/auth/login')
        .send({ email: 'not-an-email', password: '', role: 'owner' })
        .expect(400);
      expect(response.body).toMatchObject({
        statusCode: 400,
        message: 'Some fields need attention.',
        fields: {
          email: ['Enter a valid e-mail address.'],
          password: ['Enter your password.'],
          role: ['property role should not exist'],
        },
        requestId: expect.any(String),
      });
    });

    it('rate-limits repeated attempts for one e-mail with 429', async () => {
      const email = 'hammering@e2e.keenroute.test';
      const limit = Number(process.env.AUTH_RATE_LIMIT ?? 10);
      for (let attempt = 0; attempt < limit; attempt += 1) {
        await http().post('/api/auth/login').send({ email, password: 'guess-guess' }).expect(401);
      }
      const blocked = await http().post('/api/auth/login').send({ email, password: 'guess-guess' }).expect(429);
      expect(blocked.body.message).toMatch(/Too many attempts/);
      // Another person signing in from the same address is not locked out.
      const other = await createUser(app, 'office');
      await signIn(app, other.email);
    });
  });

  describe('access tokens', () => {
    it('GET /api/auth/me answers who is signed in, and 401 without a token', async () => {
      const user = await createUser(app, 'client');
      const { token } = await signIn(app, user.email);
      const me = await http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(200);
      expect(me.body).toEqual({ id: user.id, email: user.email, name: user.name, role: 'client' });
      await http().get('/api/auth/me').expect(401);
    });

    it('refuses a token with another algorithm, issuer or audience, or signed with another secret', async () => {
      const user = await createUser(app, 'owner');
      const jwt = app.get(JwtService);
      const forged = [
        jwt.sign({ sub: user.id }, { algorithm: 'HS512' }),
        jwt.sign({ sub: user.id }, { issuer: 'someone-else' }),
        jwt.sign({ sub: user.id }, { audience: 'another-api' }),
        jwt.sign({ sub: user.id }, { secret: 'x'.repeat(40) }),
        `${Buffer.from('{"alg":"none","typ":"JWT"}').toString('base64url')}.${Buffer.from(
          JSON.stringify({ sub: user.id, iss: 'keenroute', aud: 'keenroute-api' }),
        ).toString('base64url')}.`,
      ];
      for (const token of forged) {
        await http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(401);
      }
    });

    it('stops working at once when the user is deactivated', async () => {
      const owner = await createUser(app, 'owner');
      const victim = await createUser(app, 'sharpener');
      const ownerSession = await signIn(app, owner.email);
      const victimSession = await signIn(app, victim.email);
      await http()
        .patch(`/api/users/${victim.id}`)
        .set('Authorization', `Bearer ${ownerSession.token}`)
        .send({ active: false })
        .expect(200);
      await http().get('/api/auth/me').set('Authorization', `Bearer ${victimSession.token}`).expect(401);
      await http().post('/api/auth/refresh').set('Cookie', victimSession.cookie).expect(401);
    });
  });

  describe('POST /api/auth/refresh', () => {
    it('rotates the refresh token: the new one works, the old one is refused after use', async () => {
      const user = await createUser(app, 'office');
      const first = await signIn(app, user.email);

      const rotated = await http().post('/api/auth/refresh').set('Cookie', first.cookie).expect(200);
      const second = refreshCookie(rotated);
      expect(second).not.toBe(first.cookie);
      await http().get('/api/auth/me').set('Authorization', `Bearer ${rotated.body.accessToken}`).expect(200);

      await http().post('/api/auth/refresh').set('Cookie', first.cookie).expect(401);
      // Reusing a spent token means it was copied: the whole family is revoked, the new one too.
      await http().post('/api/auth/refresh').set('Cookie', second).expect(401);
    });

    it('refuses a missing or made-up cookie', async () => {
      await http().post('/api/auth/refresh').expect(401);
      await http().post('/api/auth/refresh').set('Cookie', 'kr_refresh=made-up').expect(401);
    });

    it('logout revokes the refresh token', async () => {
      const user = await createUser(app, 'client');
      const session = await signIn(app, user.email);
      await http().post('/api/auth/logout').set('Cookie', session.cookie).expect(204);
      await http().post('/api/auth/refresh').set('Cookie', session.cookie).expect(401);
    });
  });

  describe('errors', () => {
    it('answers unknown routes with a JSON 404 and never leaks internals', async () => {
      const user = await createUser(app, 'owner');
      const { token } = await signIn(app, user.email);
      const response = await http().get('/api/no-such-thing').set('Authorization', `Bearer ${token}`).expect(404);
      expect(JSON.stringify(response.body)).not.toMatch(/at .*\.ts|SELECT|stack/i);
    });

    it('answers a malformed JSON body with 400, not 500', async () => {
      const response = await http()
        .post('/api/auth/login')
        .set('Content-Type', 'application/json')
        .send('{"email": ')
        .expect(400);
      expect(response.body.statusCode).toBe(400);
    });
  });
});
