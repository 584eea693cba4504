import { beforeEach, describe, expect, it } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { PEOPLE, signInAs } from '@/testing/session';
import { api, restoreSession } from './api-client';
import { ApiError } from './api-error';
import { session } from './session';

const refreshed = { status: 200, body: { accessToken: 'token-fresh', user: PEOPLE.owner } };

describe('the API client', () => {
  beforeEach(() => {
    signInAs('owner', 'token-old');
  });

  it('sends the access token as a Bearer header', async () => {
    const server = mockApi({ 'GET /api/users': { status: 200, body: { items: [], total: 0 } } });
    await api.get('/users', { query: { page: 2, q: '' } });
    const [call] = server.callsTo('GET', '/api/users');
    expect(call?.headers.get('Authorization')).toBe('Bearer token-old');
    expect(call?.search.get('page')).toBe('2');
    expect(call?.search.has('q')).toBe(false);
  });

  it('refreshes once on a 401 and retries with the new token', async () => {
    const server = mockApi({
      'POST /api/auth/refresh': refreshed,
      'GET /api/users': (request) =>
        request.headers.get('Authorization') === 'Bearer token-fresh'
          ? { status: 200, body: { items: [], total: 7 } }
          : { status: 401, body: { statusCode: 401, message: 'Unauthorized' } },
    });

    await expect(api.get<{ total: number }>('/users')).resolves.toEqual({ items: [], total: 7 });
    expect(server.callsTo('POST', '/api/auth/refresh')).toHaveLength(1);
    expect(server.callsTo('GET', '/api/users')).toHaveLength(2);
    expect(session.getAccessToken()).toBe('token-fresh');
  });

  it('shares one refresh between two requests that fail together', async () => {
    let releaseRefresh: () => void = () => {};
    const refreshGate = new Promise<void>((resolve) => {
      releaseRefresh = resolve;
    });
    const server = mockApi({
      'POST /api/auth/refresh': async () => {
        await refreshGate;
        return refreshed;
      },
      'GET /api/users': (request) =>
        request.headers.get('Authorization') === 'Bearer token-fresh'
          ? { status: 200, body: { items: [], total: 1 } }
          : { status: 401 },
      'GET /api/dev/outbox': (request) =>
        request.headers.get('Authorization') === 'Bearer token-fresh'
          ? { status: 200, body: { items: [], total: 0 } }
          : { status: 401 },
    });

    const both = Promise.all([api.get('/users'), api.get('/dev/outbox')]);
    await new Promise((resolve) => setTimeout(resolve, 10));
    releaseRefresh();

    await expect(both).resolves.toEqual([
      { items: [], total: 1 },
      { items: [], total: 0 },
    ]);
    expect(server.callsTo('POST', '/api/auth/refresh')).toHaveLength(1);
  });

  it('reuses a token that another request refreshed meanwhile', async () => {
    let answerStaleRequest: () => void = () => {};
    const staleGate = new Promise<void>((resolve) => {
      answerStaleRequest = resolve;
    });
    const server = mockApi({
      'POST /api/auth/refresh': refreshed,
      'GET /api/users': async (request) => {
        if (request.headers.get('Authorization') === 'Bearer token-fresh') return { status: 200, body: { total: 3 } };
        await staleGate;
        return { status: 401 };
      },
    });

    const pending = api.get('/users');
    await new Promise((resolve) => setTimeout(resolve, 10));
    session.start({ accessToken: 'token-fresh', user: PEOPLE.owner });
    answerStaleRequest();

    await expect(pending).resolves.toEqual({ total: 3 });
    expect(server.callsTo('POST', '/api/auth/refresh')).toHaveLength(0);
  });

  it('ends the session as expired when the refresh is refused', async () => {
    const server = mockApi({
      'POST /api/auth/refresh': { status: 401, body: { statusCode: 401, message: 'Unauthorized' } },
      'GET /api/users': { status: 401 },
    });

    const failure = api.get('/users');
    await expect(failure).rejects.toBeInstanceOf(ApiError);
    await expect(failure).rejects.toMatchObject({ status: 401 });
    expect(session.getState()).toEqual({ status: 'signed-out', reason: 'expired' });
    expect(session.getAccessToken()).toBeNull();
    expect(server.callsTo('GET', '/api/users')).toHaveLength(1);
  });

  it('never refreshes for a signed-out call such as signing in', async () => {
    const server = mockApi({
      'POST /api/auth/login': { status: 401, body: { statusCode: 401, message: 'Wrong e-mail or password.' } },
    });
    const failure = api.post('/auth/login', { email: 'a@b.test', password: 'x' }, { auth: false });
    await expect(failure).rejects.toMatchObject({ status: 401, message: 'Wrong e-mail or password.' });
    expect(server.callsTo('POST', '/api/auth/refresh')).toHaveLength(0);
    expect(server.calls[0]?.headers.has('Authorization')).toBe(false);
  });

  it('turns an error body into an ApiError with its fields and request id', async () => {
    mockApi({
      'POST /api/users/invitations': {
        status: 400,
        body: {
          statusCode: 400,
          error: 'Bad Request',
          message: 'Some fields need attention.',
          fields: { email: ['email must be an email'] },
          requestId: 'req-42',
        },
      },
    });
    const failure = api.post('/users/invitations', { email: 'nope' });
    await expect(failure).rejects.toMatchObject({
      status: 400,
      message: 'Some fields need attention.',
      fields: { email: ['email must be an email'] },
      requestId: 'req-42',
      hasFieldErrors: true,
    });
  });

  it('restores the session from the refresh cookie on load', async () => {
    session.end('never-signed-in');
    mockApi({ 'POST /api/auth/refresh': refreshed });
    await restoreSession();
    expect(session.getState()).toEqual({ status: 'signed-in', user: PEOPLE.owner });
  });
});
