import { ArgumentsHost, BadRequestException, Logger, NotFoundException } from '@nestjs/common';
import { DomainError } from '../errors/domain-error';
import { AllExceptionsFilter, type ErrorBody } from './all-exceptions.filter';

function hostCapturing(): { host: ArgumentsHost; sent: () => { status: number; body: ErrorBody } } {
  let status = 0;
  let body: ErrorBody | undefined;
  const response = {
    headersSent: false,
    status(code: number) {
      status = code;
      return this;
    },
    json(payload: ErrorBody) {
      body = payload;
    },
  };
  const request = { id: 'req-123', method: 'GET', originalUrl: '/api/x' };
  const host = {
    switchToHttp: () => ({ getRequest: () => request, getResponse: () => response }),
  } as unknown as ArgumentsHost;
  return { host, sent: () => ({ status, body: body! }) };
}

describe('AllExceptionsFilter', () => {
  const sut = new AllExceptionsFilter();
  beforeAll(() => Logger.overrideLogger(false));

  it('maps a domain error code to its status, with the fields and the request id', () => {
    const { host, sent } = hostCapturing();
    sut.catch(new DomainError('conflict', 'Taken.', { email: ['Taken.'] }), host);
    expect(sent()).toEqual({
      status: 409,
      body: {
        statusCode: 409,
        error: 'Conflict',
        message: 'Taken.',
        fields: { email: ['Taken.'] },
        requestId: 'req-123',
      },
    });
  });

  it('keeps the message and fields of Nest HTTP exceptions', () => {
    const { host, sent } = hostCapturing();
    sut.catch(new BadRequestException({ message: 'Some fields need attention.', fields: { a: ['b'] } }), host);
    expect(sent().body).toMatchObject({
      statusCode: 400,
      message: 'Some fields need attention.',
      fields: { a: ['b'] },
    });
    const second = hostCapturing();
    sut.catch(new NotFoundException(), second.host);
    expect(second.sent().body).toMatchObject({ statusCode: 404, error: 'Not Found' });
  });

  it('hides an unexpected error behind a 500 with no internals', () => {
    const { host, sent } = hostCapturing();
    sut.catch(new Error('relation "users" does not exist at SELECT * FROM users'), host);
    expect(sent().status).toBe(500);
    expect(JSON.stringify(sent().body)).not.toMatch(/relation|SELECT/);
  });

  it('answers 503 when the database connection is refused', () => {
    const { host, sent } = hostCapturing();
    sut.catch(Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:5432'), { code: 'ECONNREFUSED' }), host);
    expect(sent().status).toBe(503);
    expect(sent().body.message).toMatch(/database is not reachable/);
  });

  it('answers 503 when PostgreSQL went away in the middle of a transaction', () => {
    // TypeORM releases a transaction's connection when PostgreSQL ends it; the transaction's next query says so.
    const released = Object.assign(new Error('Query runner already released. Cannot run queries anymore.'), {
      name: 'QueryRunnerAlreadyReleasedError',
    });
    for (const error of [released, Object.assign(new Error('terminating connection'), { code: '57P01' })]) {
      const { host, sent } = hostCapturing();
      sut.catch(error, host);
      expect(sent().status).toBe(503);
    }
  });

  it("answers body-parser's over-size error with its 413, and never passes on a 5xx from middleware as the caller's", () => {
    const tooLarge = Object.assign(new Error('request entity too large'), {
      status: 413,
      expose: true,
      type: 'entity.too.large',
    });
    const { host, sent } = hostCapturing();
    sut.catch(tooLarge, host);
    expect(sent()).toMatchObject({ status: 413, body: { message: 'The request is too large.' } });
    const hidden = hostCapturing();
    sut.catch(Object.assign(new Error('socket hang up'), { status: 502, expose: false }), hidden.host);
    expect(hidden.sent().status).toBe(500);
  });

  it('answers 400 when PostgreSQL refuses text it cannot store', () => {
    const { host, sent } = hostCapturing();
    sut.catch(Object.assign(new Error('invalid byte sequence for encoding "UTF8": 0x00'), { code: '22021' }), host);
    expect(sent()).toMatchObject({ status: 400, body: { message: 'Text cannot contain NUL characters.' } });
    expect(JSON.stringify(sent().body)).not.toMatch(/UTF8|0x00/);
  });
});
