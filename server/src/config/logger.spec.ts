import { Writable } from 'node:stream';
import pino from 'pino';
import type { Options } from 'pino-http';
import { loggerParams } from './logger';

/** The pino options the app uses, writing into an array of parsed lines. */
function loggerWithAppOptions() {
  const lines: Record<string, unknown>[] = [];
  const stream = new Writable({
    write(chunk: Buffer, _encoding, done) {
      lines.push(JSON.parse(chunk.toString('utf8')) as Record<string, unknown>);
      done();
    },
  });
  const [options] = loggerParams('trace', stream).pinoHttp as [Options, Writable];
  return { sut: pino({ level: options.level, redact: options.redact }, stream), lines };
}

describe('loggerParams', () => {
  it('censors credentials in headers and secrets in logged bodies, and keeps the rest', () => {
    const { sut, lines } = loggerWithAppOptions();
    sut.info(
      {
        req: { method: 'POST', headers: { authorization: 'Bearer eyJ.abc.def', cookie: 'kr_refresh=r1', host: 'h' } },
        res: { headers: { 'set-cookie': 'kr_refresh=r2' } },
        err: {
          config: { headers: { Authorization: 'Bearer sk_test_123' } },
          headers: { 'stripe-signature': 't=1,v1=ab' },
        },
        body: { email: 'a@b.test', password: 'hunter2-hunter2', token: 'reset-token' },
        password: 'top-level',
        session: { accessToken: 'a1', refreshToken: 'r3' },
      },
      'request',
    );
    const [line] = lines;
    expect(line).toMatchObject({
      req: { method: 'POST', headers: { authorization: '[redacted]', cookie: '[redacted]', host: 'h' } },
      res: { headers: { 'set-cookie': '[redacted]' } },
      err: {
        config: { headers: { Authorization: '[redacted]' } },
        headers: { 'stripe-signature': '[redacted]' },
      },
      body: { email: 'a@b.test', password: '[redacted]', token: '[redacted]' },
      password: '[redacted]',
      session: { accessToken: '[redacted]', refreshToken: '[redacted]' },
    });
  });

  it('logs a request as its id, method and url, and a response as its status only', () => {
    const [options] = loggerParams('info', new Writable()).pinoHttp as [Options, Writable];
    const serializers = options.serializers as Record<string, (value: unknown) => unknown>;
    expect(
      serializers.req!({ id: 'r-1', method: 'GET', url: '/api/me', headers: { authorization: 'Bearer x' }, body: {} }),
    ).toEqual({ id: 'r-1', method: 'GET', url: '/api/me' });
    expect(serializers.res!({ statusCode: 200, headers: { 'set-cookie': 'x' } })).toEqual({ statusCode: 200 });
  });
});
