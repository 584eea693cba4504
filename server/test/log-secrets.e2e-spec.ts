/** What the server logs during a sign-in and a payment, read back line by line: no password, token or key in it. */
import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { Test } from '@nestjs/testing';
import { PARAMS_PROVIDER_TOKEN } from 'nestjs-pino';
import { Writable } from 'node:stream';
import Stripe from 'stripe';
import request from 'supertest';
import type { App } from 'supertest/types';
import { AppModule } from '../src/app.module';
import { configureApp } from '../src/app.setup';
import type { AppConfig } from '../src/config/environment';
import { loggerParams } from '../src/config/logger';
import type { InvoiceDto } from '../src/invoices/dto/invoice-response.dto';
import {
  createCustomer,
  createIssuedInvoice,
  createStop,
  createToInvoiceTicket,
  ensureRateCard,
  invoiceActors,
} from './utils/invoice-fixtures';
import { createUser, refreshCookie, TEST_PASSWORD } from './utils/test-app';

interface StandInRecord {
  type: string;
  payload: string;
  event: { data: { object: { id: string } } };
}

/** Every line the app writes: its pino output at the most verbose level, and anything printed to stdout or stderr. */
class LogCapture {
  readonly lines: string[] = [];
  readonly stream = new Writable({
    write: (chunk: Buffer, _encoding, done) => {
      this.lines.push(chunk.toString('utf8'));
      done();
    },
  });
  get text(): string {
    return this.lines.join('');
  }
}

async function createLoggedApp(capture: LogCapture): Promise<INestApplication<App>> {
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] })
    .overrideProvider(PARAMS_PROVIDER_TOKEN)
    .useFactory({ factory: () => loggerParams('trace', capture.stream) })
    .compile();
  const app = moduleRef.createNestApplication<INestApplication<App>>({ rawBody: true });
  configureApp(app);
  await app.init();
  return app;
}

describe('secrets in the logs (e2e)', () => {
  const capture = new LogCapture();
  let app: INestApplication<App>;
  let config: ConfigService<AppConfig, true>;
  const printed: string[] = [];
  const spies: jest.SpyInstance[] = [];
  const http = () => request(app.getHttpServer());

  beforeAll(async () => {
    for (const stream of [process.stdout, process.stderr]) {
      const original = stream.write.bind(stream) as (chunk: unknown, ...rest: unknown[]) => boolean;
      spies.push(
        jest.spyOn(stream, 'write').mockImplementation((chunk: unknown, ...rest: unknown[]) => {
          printed.push(String(chunk));
          return original(chunk, ...rest);
        }),
      );
    }
    app = await createLoggedApp(capture);
    config = app.get(ConfigService);
  });
  afterAll(async () => {
    spies.forEach((spy) => spy.mockRestore());
    await app.close();
  });

  const everything = () => capture.text + printed.join('');
  const expectAbsent = (secrets: Record<string, string>) => {
    const text = everything();
    const found = Object.entries(secrets)
      .filter(([, secret]) => secret.length >= 8 && text.includes(secret))
      .map(([name]) => name);
    expect(found).toEqual([]);
  };

  it('logs a sign-in, a refresh, a refused password and a signed-in request without the password, token or cookie', async () => {
    const user = await createUser(app, 'office');
    const login = await http().post('/api/auth/login').send({ email: user.email, password: user.password }).expect(200);
    const accessToken = (login.body as { accessToken: string }).accessToken;
    const cookie = refreshCookie(login);
    await http().get('/api/auth/me').set('authorization', `Bearer ${accessToken}`).expect(200);
    const refreshed = await http().post('/api/auth/refresh').set('cookie', cookie).expect(200);
    const wrongPassword = `${TEST_PASSWORD}-wrong`;
    await http().post('/api/auth/login').send({ email: user.email, password: wrongPassword }).expect(401);
    // A body the validation refuses: its message must not echo the password back into the log.
    await http().post('/api/auth/login').send({ email: 'not-an-address', password: TEST_PASSWORD }).expect(400);

    expect(capture.text).toMatch(/"url":"\/api\/auth\/login"/);
    expect(capture.text).toMatch(/"statusCode":401/);
    expect(capture.text).toMatch(/request refused/);
    expectAbsent({
      password: TEST_PASSWORD,
      accessToken,
      'access token signature': accessToken.split('.')[2]!,
      refreshCookie: cookie.split('=')[1]!,
      rotatedCookie: refreshCookie(refreshed).split('=')[1]!,
      rotatedAccessToken: (refreshed.body as { accessToken: string }).accessToken,
      jwtSecret: config.get('JWT_SECRET', { infer: true }),
    });
  });

  it('logs a card checkout, its signed webhook, a forged one and a payment by hand without keys or signatures', async () => {
    const actors = await invoiceActors(app, ['owner', 'office']);
    await ensureRateCard(app, actors.tokens.owner);
    const stop = await createStop(app, actors.tokens.office, { name: 'Tern Row Barbers', taxRateBp: 825 });
    const customer = await createCustomer(app, actors.tokens.office, { name: 'Ida Quill', stopId: stop.id });
    const issue = async (): Promise<InvoiceDto> =>
      createIssuedInvoice(app, actors.tokens.office, [
        (await createToInvoiceTicket(app, actors.tokens.office, { customerId: customer.id })).id,
      ]);

    const online = await issue();
    const payToken = online.payUrl!.split('/pay/')[1]!;
    const { url } = (await http().post(`/api/public/invoices/${payToken}/checkout`).expect(200)).body as {
      url: string;
    };
    const sessionId = url.split('/checkout/')[1]!;
    await fetch(url, {
      method: 'POST',
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
      body: 'action=pay',
      redirect: 'manual',
    });
    const standIn = config.get('STRIPE_API_URL', { infer: true });
    const events = (await (await fetch(`${standIn}/__stand-in/events`)).json()) as { items: StandInRecord[] };
    const completed = events.items.find(
      (record) => record.type === 'checkout.session.completed' && record.event.data.object.id === sessionId,
    )!;
    const webhookSecret = config.get('STRIPE_WEBHOOK_SECRET', { infer: true });
    const signature = new Stripe('sk_test_x').webhooks.generateTestHeaderString({
      payload: completed.payload,
      secret: webhookSecret,
    });
    const deliver = (header: string) =>
      http()
        .post('/api/webhooks/stripe')
        .set('content-type', 'application/json; charset=utf-8')
        .set('stripe-signature', header)
        .send(completed.payload);
    const forged = new Stripe('sk_test_x').webhooks.generateTestHeaderString({
      payload: completed.payload,
      secret: 'whsec_someone_elses_endpoint_secret',
    });
    await deliver(forged).expect(400);
    await deliver(signature).expect(200);
    expect((await http().get(`/api/public/invoices/${payToken}/status`).expect(200)).body.status).toBe('paid');

    const byHand = await issue();
    await http()
      .post(`/api/invoices/${byHand.id}/payments`)
      .set(actors.as('office'))
      .send({ method: 'cheque', amountCents: byHand.totalCents, reference: '5512', sendReceipt: true })
      .expect(201);

    expect(capture.text).toMatch(/"url":"\/api\/webhooks\/stripe"/);
    expect(capture.text).toMatch(/"statusCode":400/);
    expectAbsent({
      webhookSecret,
      'webhook signature': /v1=([0-9a-f]+)/.exec(signature)![1]!,
      'forged signature': /v1=([0-9a-f]+)/.exec(forged)![1]!,
      stripeSecretKey: config.get('STRIPE_SECRET_KEY', { infer: true }),
      officeToken: actors.tokens.office,
      ownerToken: actors.tokens.owner,
    });
  });
});
