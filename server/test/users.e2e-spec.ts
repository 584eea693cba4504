import type { INestApplication } from '@nestjs/common';
import type { Role } from '@keenroute/shared';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { linkToken, mailTo, waitForMail } from './utils/mail-catcher';
import { createTestApp, createUser, refreshCookie, signIn } from './utils/test-app';

describe('users, invitations and password resets (e2e)', () => {
  let app: INestApplication<App>;
  const http = () => request(app.getHttpServer());
  const tokens = {} as Record<Role, string>;
  const bearer = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });
  const newEmail = (label: string) => `${label}-${randomUUID().slice(0, 8)}@e2e.keenroute.test`;

  beforeAll(async () => {
    app = await createTestApp();
    for (const role of ['owner', 'office', 'sharpener', 'client'] as const) {
      tokens[role] = (await signIn(app, (await createUser(app, role)).email)).token;
    }
  });
  afterAll(async () => {
    await app.close();
  });

  describe('who may call the users routes', () => {
    type Headers = Record<string, string>;
    const routes = [
      { name: 'GET /api/users', call: (headers: Headers) => http().get('/api/users').set(headers) },
      {
        name: 'POST /api/users/invitations',
        call: (headers: Headers) =>
          http()
            .post('/api/users/invitations')
            .set(headers)
            .send({ email: newEmail('x'), name: 'X', role: 'client' }),
      },
      {
        name: 'PATCH /api/users/:id',
        call: async (headers: Headers) =>
          http()
            .patch(`/api/users/${(await createUser(app, 'client')).id}`)
            .set(headers)
            .send({ name: 'Y' }),
      },
    ];

    it.each(routes)(
      '$name: 401 signed out, 403 for sharpener and client, allowed for owner and office',
      async (route) => {
        expect((await route.call({})).status).toBe(401);
        for (const role of ['sharpener', 'client'] as const) expect((await route.call(bearer(role))).status).toBe(403);
        for (const role of ['owner', 'office'] as const) {
          expect([200, 201]).toContain((await route.call(bearer(role))).status);
        }
      },
    );
  });

  describe('GET /api/users', () => {
    it('pages, searches and sorts on the server', async () => {
      const tag = randomUUID().slice(0, 6);
      for (const name of ['Bram', 'Alia', 'Cato']) await createUser(app, 'client', { name: `${name} ${tag}` });
      const page = await http()
        .get('/api/users')
        .query({ q: tag, sort: 'name', order: 'desc', pageSize: 2, page: 1 })
        .set(bearer('office'))
        .expect(200);
      expect(page.body.total).toBe(3);
      expect(page.body.items.map((u: { name: string }) => u.name)).toEqual([`Cato ${tag}`, `Bram ${tag}`]);
      expect(page.body.items[0]).toEqual({
        id: expect.any(String),
        email: expect.any(String),
        name: `Cato ${tag}`,
        role: 'client',
        status: 'active',
        createdAt: expect.any(String),
        lastSignInAt: null,
      });
      expect(page.body.items[0]).not.toHaveProperty('passwordHash');
    });

    it('keeps only the roles a picker asks for', async () => {
      const tag = randomUUID().slice(0, 6);
      await createUser(app, 'client', { name: `Manager ${tag}` });
      await createUser(app, 'sharpener', { name: `Sharpener ${tag}` });
      await createUser(app, 'office', { name: `Office ${tag}` });
      const pick = async (roles: string) =>
        (await http().get('/api/users').query({ q: tag, roles }).set(bearer('office')).expect(200)).body.items.map(
          (u: { role: string }) => u.role,
        );
      expect(await pick('client')).toEqual(['client']);
      expect((await pick('sharpener, office')).sort()).toEqual(['office', 'sharpener']);
      const bad = await http().get('/api/users').query({ roles: 'client,chef' }).set(bearer('office')).expect(400);
      expect(bad.body.fields.roles[0]).toMatch(/roles lists roles from/);
    });

    it('answers bad paging with 400 and field messages', async () => {
      const response = await http().get('/api/users').query({ pageSize: 1000, sort: 'password' }).set(bearer('owner'));
      expect(response.status).toBe(400);
      expect(Object.keys(response.body.fields)).toEqual(expect.arrayContaining(['pageSize', 'sort']));
    });

    it('answers an unknown id with 404 and a malformed one with 400', async () => {
      await http().get(`/api/users/${randomUUID()}`).set(bearer('owner')).expect(404);
      await http().get('/api/users/not-a-uuid').set(bearer('owner')).expect(400);
    });
  });

  describe('invitations', () => {
    it('e-mails a link that sets a password once, signs the invitee in, and then refuses the link', async () => {
      const email = newEmail('invitee');
      const invited = await http()
        .post('/api/users/invitations')
        .set(bearer('office'))
        .send({ email: email.toUpperCase(), name: 'Robin Vale', role: 'sharpener' })
        .expect(201);
      expect(invited.body).toMatchObject({ email, role: 'sharpener', status: 'invited' });

      const mail = await waitForMail(email, /invited to Keenroute/);
      const token = linkToken(mail);
      expect(mail.text).toContain(`${process.env.APP_URL}/set-password?token=`);

      const info = await http().get(`/api/auth/tokens/${token}`).expect(200);
      expect(info.body).toEqual({ purpose: 'invite', email, name: 'Robin Vale' });

      const weak = await http().post('/api/auth/password').send({ token, password: 'password123' }).expect(400);
      expect(weak.body.fields.password[0]).toMatch(/common passwords/);
      const short = await http().post('/api/auth/password').send({ token, password: 'hone-9' }).expect(400);
      expect(short.body.fields.password[0]).toMatch(/at least 10/);

      const set = await http()
        .post('/api/auth/password')
        .send({ token, password: 'teal-brass-bench-5521' })
        .expect(200);
      expect(set.body.user).toMatchObject({ email, role: 'sharpener' });
      refreshCookie(set);

      await http().post('/api/auth/password').send({ token, password: 'another-long-pass-88' }).expect(404);
      await http().get(`/api/auth/tokens/${token}`).expect(404);
      await signIn(app, email, 'teal-brass-bench-5521');
    });

    it('lets only an owner invite an owner, and refuses an e-mail already in use', async () => {
      const office = await http()
        .post('/api/users/invitations')
        .set(bearer('office'))
        .send({ email: newEmail('boss'), name: 'New Boss', role: 'owner' })
        .expect(403);
      expect(office.body.message).toMatch(/may not invite/);
      await http()
        .post('/api/users/invitations')
        .set(bearer('owner'))
        .send({ email: newEmail('boss'), name: 'New Boss', role: 'owner' })
        .expect(201);
      const existing = await createUser(app, 'client');
      const duplicate = await http()
        .post('/api/users/invitations')
        .set(bearer('owner'))
        .send({ email: existing.email.toUpperCase(), name: 'Again', role: 'client' })
        .expect(409);
      expect(duplicate.body.fields.email).toBeDefined();
    });

    it('validates the invitation with a message per field', async () => {
      const response = await http()
        .post('/api/users/invitations')
        .set(bearer('owner'))
        .send({ email: 'nope', name: 'Line\r\nBcc: victim@example.test', role: 'admin' })
        .expect(400);
      expect(Object.keys(response.body.fields).sort()).toEqual(['email', 'name', 'role']);
    });

    it('a resent invitation replaces the earlier link', async () => {
      const email = newEmail('resend');
      const invited = await http()
        .post('/api/users/invitations')
        .set(bearer('owner'))
        .send({ email, name: 'Resend Me', role: 'client' })
        .expect(201);
      const first = linkToken(await waitForMail(email, /invited/));
      await http().post(`/api/users/${invited.body.id}/invitations`).set(bearer('owner')).expect(202);
      const deadline = Date.now() + 5000;
      while ((await mailTo(email)).length < 2 && Date.now() < deadline) await new Promise((r) => setTimeout(r, 100));
      const second = (await mailTo(email)).map(linkToken).find((token) => token !== first);
      expect(second).toBeDefined();
      await http().get(`/api/auth/tokens/${first}`).expect(404);
      await http().get(`/api/auth/tokens/${second}`).expect(200);
    });
  });

  describe('password reset', () => {
    it('answers the same whether or not the e-mail exists, and mails only real users', async () => {
      const user = await createUser(app, 'client');
      const unknown = newEmail('ghost');
      const a = await http().post('/api/auth/password-reset').send({ email: user.email }).expect(202);
      const b = await http().post('/api/auth/password-reset').send({ email: unknown }).expect(202);
      expect(a.body).toEqual(b.body);
      await waitForMail(user.email, /Reset your Keenroute password/);
      expect(await mailTo(unknown)).toHaveLength(0);
    });

    it('the link sets a new password exactly once; the old password stops working', async () => {
      const user = await createUser(app, 'sharpener');
      const before = await signIn(app, user.email);
      await http().post('/api/auth/password-reset').send({ email: user.email }).expect(202);
      const token = linkToken(await waitForMail(user.email, /Reset/));
      expect((await http().get(`/api/auth/tokens/${token}`).expect(200)).body.purpose).toBe('reset');

      await http().post('/api/auth/password').send({ token, password: 'fresh-convex-edge-42' }).expect(200);
      await http().post('/api/auth/password').send({ token, password: 'fresh-convex-edge-43' }).expect(404);
      await http().post('/api/auth/login').send({ email: user.email, password: user.password }).expect(401);
      await signIn(app, user.email, 'fresh-convex-edge-42');
      // Sessions from before the reset are ended.
      await http().post('/api/auth/refresh').set('Cookie', before.cookie).expect(401);
    });

    it('refuses an expired link', async () => {
      const user = await createUser(app, 'client');
      await http().post('/api/auth/password-reset').send({ email: user.email }).expect(202);
      const token = linkToken(await waitForMail(user.email, /Reset/));
      await app
        .get(DataSource)
        .query(`UPDATE user_tokens SET expires_at = now() - interval '1 minute' WHERE user_id = $1`, [user.id]);
      await http().post('/api/auth/password').send({ token, password: 'too-late-for-this-1' }).expect(404);
    });
  });

  describe('PATCH /api/users/:id', () => {
    it('changes a role and deactivates; the office may not touch an owner; nobody demotes themselves', async () => {
      const user = await createUser(app, 'client');
      const changed = await http()
        .patch(`/api/users/${user.id}`)
        .set(bearer('office'))
        .send({ role: 'sharpener' })
        .expect(200);
      expect(changed.body.role).toBe('sharpener');

      const off = await http().patch(`/api/users/${user.id}`).set(bearer('office')).send({ active: false }).expect(200);
      expect(off.body.status).toBe('deactivated');
      await http().post('/api/auth/login').send({ email: user.email, password: user.password }).expect(401);

      const owner = await createUser(app, 'owner');
      await http().patch(`/api/users/${owner.id}`).set(bearer('office')).send({ name: 'Renamed' }).expect(403);
      await http().patch(`/api/users/${user.id}`).set(bearer('office')).send({ role: 'owner' }).expect(403);

      const self = await createUser(app, 'owner');
      const selfToken = (await signIn(app, self.email)).token;
      await http()
        .patch(`/api/users/${self.id}`)
        .set({ Authorization: `Bearer ${selfToken}` })
        .send({ active: false })
        .expect(403);
    });
  });

  describe('GET /api/dev/outbox', () => {
    it('shows the caught e-mails to an owner only', async () => {
      const response = await http().get('/api/dev/outbox').set(bearer('owner')).expect(200);
      expect(response.body.items.length).toBeGreaterThan(0);
      expect(response.body.items[0]).toEqual(
        expect.objectContaining({ id: expect.any(String), subject: expect.any(String), to: expect.any(Array) }),
      );
      await http().get('/api/dev/outbox').set(bearer('office')).expect(403);
      await http().get('/api/dev/outbox').expect(401);
    });
  });
});
