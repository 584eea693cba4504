import { describe, expect, it } from 'vitest';
import { session } from '@/lib/session';
import { mockApi } from '@/testing/mock-api';
import { signInAs } from '@/testing/session';
import { LATER_DAY } from '../testing/fixtures';
import { PublicApiError, publicRequest } from './public-request';

async function refusal(promise: Promise<unknown>): Promise<PublicApiError> {
  try {
    await promise;
  } catch (error) {
    if (error instanceof PublicApiError) return error;
    throw error;
  }
  throw new Error('The request did not fail');
}

describe('the public booking requests', () => {
  it('reads the next day that fits from a full day’s refusal', async () => {
    mockApi({
      'POST /api/public/bookings': {
        status: 409,
        body: { statusCode: 409, message: 'That day is full.', fields: { routeDayId: ['Full.'] }, nextDay: LATER_DAY },
      },
    });
    const error = await refusal(publicRequest('/public/bookings', { method: 'POST', body: {} }));
    expect(error.status).toBe(409);
    expect(error.message).toBe('That day is full.');
    expect(error.nextDay).toEqual(LATER_DAY);
    expect(error.nextRouteDayId).toBe(LATER_DAY.routeDayId);
    expect(error.fields).toEqual({ routeDayId: ['Full.'] });
  });

  it('falls back to a next route day named among the fields, and to none', async () => {
    mockApi({
      'POST /api/public/bookings': {
        status: 409,
        body: { statusCode: 409, message: 'Full.', fields: { nextRouteDayId: ['rd-0429'] } },
      },
      'PATCH /api/public/bookings/t': { status: 409, body: { statusCode: 409, message: 'Closed.', nextDay: null } },
    });
    const named = await refusal(publicRequest('/public/bookings', { method: 'POST', body: {} }));
    expect(named.nextDay).toBeNull();
    expect(named.nextRouteDayId).toBe('rd-0429');
    const none = await refusal(publicRequest('/public/bookings/t', { method: 'PATCH', body: {} }));
    expect(none.nextRouteDayId).toBeNull();
  });

  it('sends no token unless asked, and never signs anyone out on a 401', async () => {
    signInAs('client');
    const server = mockApi({
      'GET /api/public/stops': { status: 200, body: { items: [] } },
      'GET /api/public/bookings/x': { status: 401, body: { statusCode: 401, message: 'No.' } },
    });
    await publicRequest('/public/stops', { query: { q: 'ma', empty: '' } });
    await publicRequest('/public/stops', { withSession: true });
    const [plain, withSession] = server.callsTo('GET', '/api/public/stops');
    expect(plain?.headers.get('Authorization')).toBeNull();
    expect(Object.fromEntries(plain!.search)).toEqual({ q: 'ma' });
    expect(withSession?.headers.get('Authorization')).toBe('Bearer token-client');
    expect((await refusal(publicRequest('/public/bookings/x'))).status).toBe(401);
    expect(session.getState().status).toBe('signed-in');
  });
});
