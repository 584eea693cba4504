import { Controller, Get, Post, type INestApplication } from '@nestjs/common';
import { ROLES, type Role } from '@keenroute/shared';
import request from 'supertest';
import type { App } from 'supertest/types';
import { Public } from '../../src/auth/decorators/public.decorator';
import { Roles } from '../../src/auth/decorators/roles.decorator';
import { createTestApp, createUser, signIn } from '../utils/test-app';
import {
  allRoutes,
  controllersInApp,
  controllersOf,
  madeUpPath,
  routeName,
  routesOf,
  type RouteInfo,
} from '../utils/security/routes';
import { forgedTokens } from '../utils/security/tokens';

/**
 * Every route the controllers declare, called signed out, with forged tokens and as each role, against what its own
 * decorator says. Ids in paths are made up, so an allowed role may well get a 400 or 404: what matters is that the
 * guard let it through (no 401/403) and nothing broke (no 5xx). A route with neither @Public() nor @Roles() fails here.
 */
const routes = allRoutes();

function expectation(route: RouteInfo): string {
  if (route.rule.kind === 'public') return 'public, the same answer signed out and for every role';
  if (route.rule.kind === 'undeclared') return 'declares neither @Public() nor @Roles()';
  const allowed = route.rule.roles;
  const denied = ROLES.filter((role) => !allowed.includes(role));
  return [`signed out 401`, `${allowed.join(', ')} let through`, denied.length ? `${denied.join(', ')} 403` : '']
    .filter(Boolean)
    .join('; ');
}

const isOpen = (status: number, signedOut: number | undefined) =>
  status !== 403 && status < 500 && status === signedOut;

describe('route-by-role matrix (e2e)', () => {
  let app: INestApplication<App>;
  const tokens = {} as Record<Role, string>;
  let forged: Record<string, string>;

  const call = (route: RouteInfo, headers: Record<string, string>) => {
    const pending = request(app.getHttpServer())[route.verb](madeUpPath(route.path)).set(headers);
    return ['post', 'put', 'patch'].includes(route.verb) ? pending.send({}) : pending;
  };
  const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
  const outcome = (who: string, response: request.Response) =>
    `${who} → ${response.status} ${(response.body as { message?: string } | undefined)?.message ?? ''}`.trim();

  beforeAll(async () => {
    app = await createTestApp();
    for (const role of ROLES) {
      const user = await createUser(app, role);
      tokens[role] = (await signIn(app, user.email)).token;
      if (role === 'owner') forged = forgedTokens(app, user.id);
    }
  });
  afterAll(async () => {
    await app.close();
  });

  it('walks the same controllers Nest registered', () => {
    const names = (list: { name: string }[]) => list.map((controller) => controller.name).sort();
    expect(names(controllersOf())).toEqual(names(controllersInApp(app)));
    expect(routes.length).toBeGreaterThan(0);
  });

  it('refuses every kind of forged token, each naming a real owner', async () => {
    const answers = [];
    for (const token of Object.values(forged)) {
      answers.push((await request(app.getHttpServer()).get('/api/auth/me').set(bearer(token))).status);
    }
    expect(answers).toEqual(Object.values(forged).map(() => 401));
    await request(app.getHttpServer()).get('/api/auth/me').set(bearer(tokens.owner)).expect(200);
  });

  it('reads rules as the access guard does, and sees a route that declares none', () => {
    @Roles('owner')
    @Controller('sample')
    class SampleController {
      @Get()
      list() {}
      @Public()
      @Post('open')
      open() {}
    }
    @Controller('forgotten')
    class ForgottenController {
      @Get(':id')
      get() {}
    }
    const rules = routesOf([SampleController, ForgottenController]).map((route) => [routeName(route), route.rule]);
    expect(rules).toEqual([
      ['GET /api/forgotten/:id', { kind: 'undeclared' }],
      ['GET /api/sample', { kind: 'roles', roles: ['owner'] }],
      ['POST /api/sample/open', { kind: 'public' }],
    ]);
  });

  it.each(routes.map((route) => [`${routeName(route)}: ${expectation(route)}`, route] as const))(
    '%s',
    async (_name, route) => {
      const rule = route.rule;
      if (rule.kind === 'undeclared') {
        throw new Error(
          `${routeName(route)} (${route.controller.name}.${route.handler}) must say who may call it: ` +
            'add @Roles(...) or, for an open route, @Public().',
        );
      }
      const wrong: string[] = [];
      // An open route answers the same to everyone (the refresh route's own 401 without a cookie included).
      let openAnswer: number | undefined;
      // One forged token per route, in turn, keeps the run short; the test below tries them all on one route.
      const [what, token] = Object.entries(forged)[routes.indexOf(route) % Object.keys(forged).length]!;
      const signedOut: [string, Record<string, string>][] = [
        ['no token', {}],
        [`token with ${what}`, bearer(token)],
      ];
      for (const [who, headers] of signedOut) {
        const response = await call(route, headers);
        openAnswer ??= response.status;
        const ok = rule.kind === 'public' ? isOpen(response.status, openAnswer) : response.status === 401;
        if (!ok) wrong.push(outcome(who, response));
      }
      for (const role of ROLES) {
        const response = await call(route, bearer(tokens[role]));
        const ok =
          rule.kind === 'public'
            ? isOpen(response.status, openAnswer)
            : rule.roles.includes(role)
              ? ![401, 403].includes(response.status) && response.status < 500
              : response.status === 403;
        if (!ok) wrong.push(outcome(role, response));
      }
      expect(wrong).toEqual([]);
    },
  );
});
