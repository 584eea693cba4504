/**
 * Helmet's headers and the content security policy on API answers, and the refresh cookie's flags, over http and https.
 * The client's page gets the same middleware; its headers are checked on the built server by the browser test
 * (client/e2e/security-headers.e2e.test.ts), since serve-static registers nothing in a Nest testing module (it picks
 * its loader before the test's HTTP adapter exists).
 */
import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { Test } from '@nestjs/testing';
import request from 'supertest';
import type { App } from 'supertest/types';
import { AppModule } from '../src/app.module';
import { configureApp } from '../src/app.setup';
import { validateEnvironment, type AppConfig } from '../src/config/environment';
import { createUser } from './utils/test-app';

/** The app as main.ts builds it, with some settings changed (APP_URL), the rest from the environment. */
async function createAppWith(changes: Partial<AppConfig>): Promise<INestApplication<App>> {
  const settings = { ...validateEnvironment(process.env), ...changes };
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] })
    .overrideProvider(ConfigService)
    .useValue({ get: (key: keyof AppConfig) => settings[key] })
    .compile();
  const app = moduleRef.createNestApplication<INestApplication<App>>({ rawBody: true, logger: false });
  configureApp(app);
  await app.init();
  return app;
}

function directives(header: string | undefined): Record<string, string> {
  return Object.fromEntries(
    (header ?? '')
      .split(';')
      .map((part) => part.trim())
      .filter(Boolean)
      .map((part) => {
        const [name, ...values] = part.split(/\s+/);
        return [name!, values.join(' ')];
      }),
  );
}

const EXPECTED_POLICY = {
  'default-src': "'self'",
  'base-uri': "'self'",
  'script-src': "'self'",
  'script-src-attr': "'none'",
  'style-src': "'self' 'unsafe-inline'",
  'img-src': "'self' data: blob:",
  'font-src': "'self'",
  'connect-src': "'self'",
  'object-src': "'none'",
  'form-action': "'self'",
  'frame-ancestors': "'none'",
};

function expectHelmetHeaders(headers: Record<string, string>, https: boolean) {
  expect(directives(headers['content-security-policy'])).toEqual(
    https ? { ...EXPECTED_POLICY, 'upgrade-insecure-requests': '' } : EXPECTED_POLICY,
  );
  expect(headers).toMatchObject({
    'x-content-type-options': 'nosniff',
    'x-frame-options': 'SAMEORIGIN',
    'referrer-policy': 'no-referrer',
    'cross-origin-opener-policy': 'same-origin',
    'cross-origin-resource-policy': 'same-origin',
    'x-dns-prefetch-control': 'off',
    'x-permitted-cross-domain-policies': 'none',
    'origin-agent-cluster': '?1',
  });
  expect(headers['x-powered-by']).toBeUndefined();
  if (https) expect(headers['strict-transport-security']).toMatch(/^max-age=\d{7,}; includeSubDomains$/);
  else expect(headers['strict-transport-security']).toBeUndefined();
}

describe.each([
  { scheme: 'http', appUrl: 'http://127.0.0.1:3000', https: false },
  { scheme: 'https', appUrl: 'https://route.keenroute.example', https: true },
])('security headers over $scheme (e2e)', ({ appUrl, https }) => {
  let app: INestApplication<App>;
  const http = () => request(app.getHttpServer());

  beforeAll(async () => {
    app = await createAppWith({ APP_URL: appUrl });
  });
  afterAll(async () => {
    await app.close();
  });

  it('sends them on an API answer, a refusal and an error body alike', async () => {
    expectHelmetHeaders((await http().get('/api/health').expect(200)).headers, https);
    expectHelmetHeaders((await http().get('/api/stops').expect(401)).headers, https);
    expectHelmetHeaders((await http().post('/api/auth/login').send({}).expect(400)).headers, https);
  });

  it('sets the refresh cookie HttpOnly, SameSite=Strict, on the auth path only, and Secure exactly when served over https', async () => {
    const user = await createUser(app, 'office');
    const login = await http().post('/api/auth/login').send({ email: user.email, password: user.password }).expect(200);
    const cookie = ([] as string[]).concat(login.headers['set-cookie'] ?? []).find((c) => c.startsWith('kr_refresh='));
    const flags = cookie!.split(';').map((part) => part.trim().toLowerCase());
    expect(flags).toEqual(expect.arrayContaining(['httponly', 'samesite=strict', 'path=/api/auth']));
    expect(flags.includes('secure')).toBe(https);

    const out = await http().post('/api/auth/logout').set('cookie', cookie!.split(';')[0]!).expect(204);
    const cleared = ([] as string[]).concat(out.headers['set-cookie'] ?? []).find((c) => c.startsWith('kr_refresh='));
    expect(cleared).toMatch(/Expires=Thu, 01 Jan 1970/);
    expect(cleared!.toLowerCase().includes('secure')).toBe(https);
  });
});
