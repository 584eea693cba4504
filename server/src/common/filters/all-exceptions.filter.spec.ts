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
});
