import { screen, waitFor, within } from '@testing-library/react';
import type { UserEvent } from '@testing-library/user-event';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { session } from '@/lib/session';
import { mockApi, type MockRequest } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { FULL_DAY, LATER_DAY, OPEN_DAY, publicBooking, publicStop, quote } from '../testing/fixtures';
import { BookRoute } from './book';

const stop = publicStop();

function renderBook(route = '/book') {
  return renderWithProviders(
    <Routes>
      <Route
        path="/book"
        element={
          <>
            <BookRoute />
            <LocationProbe />
          </>
        }
      />
    </Routes>,
    { route },
  );
}

function bookingApi(extra: Record<string, Parameters<typeof mockApi>[0][string]> = {}) {
  return mockApi({
    'GET /api/public/stops': { status: 200, body: { items: [stop] } },
    'GET /api/public/stops/s-maple': { status: 200, body: stop },
    'POST /api/public/bookings/quote': { status: 200, body: quote() },
    ...extra,
  });
}

// Pasted rather than typed: one change per field keeps these tests quick on a busy machine.
async function enter(user: UserEvent, name: string, text: string) {
  await user.click(screen.getByRole('textbox', { name }));
  await user.paste(text);
}

async function fillIn(user: UserEvent) {
  await user.click(await screen.findByRole('radio', { name: /Tuesday, Mar 4, 09:00–10:00/ }));
  await enter(user, 'Your name', 'Jordan Clipper');
  await enter(user, 'E-mail', 'jordan@paws.test');
  await enter(user, 'Phone', '541 555 0134');
  await user.click(screen.getByRole('checkbox', { name: /booking e-mails and visit notices/ }));
}

const submitButton = () => screen.getByRole('button', { name: 'Book the drop-off' });
const bodyOf = (call: MockRequest | undefined) => call?.body as Record<string, unknown>;

// Generous: the whole suite runs these in parallel on two cores.
describe('the Book a drop-off page', { timeout: 20_000 }, () => {
  beforeEach(() => {
    session.end('never-signed-in');
  });

  it('finds the stop by name or town and shows its days, the full one disabled with why, and mail-in', async () => {
    const server = bookingApi();
    const { user } = renderBook();
    await user.type(screen.getByRole('searchbox', { name: 'Stop name or town' }), 'river');

    const result = await screen.findByRole('button', { name: /Maple Street Salon/ });
    expect(result).toHaveTextContent('Riverton · Next: Tuesday, Mar 4, 09:00–10:00');
    // Debounced: the letters typed make one search, not five.
    expect(server.callsTo('GET', '/api/public/stops').map((call) => call.search.get('q'))).toEqual(['river']);

    await user.click(result);
    expect(screen.getByTestId('location')).toHaveTextContent('/book?stop=s-maple');
    const open = await screen.findByRole('radio', { name: 'Tuesday, Mar 4, 09:00–10:00' });
    expect(open).toBeEnabled();
    const full = screen.getByRole('radio', { name: 'Tuesday, Apr 1, 10:00–11:00' });
    expect(full).toBeDisabled();
    expect(full).toHaveTextContent('Full: no bench time left on this day.');

    await user.click(screen.getByRole('radio', { name: 'Mail in' }));
    expect(screen.getByTestId('mail-in-address')).toHaveTextContent('4 Bench Lane, Riverton OR 97000');
  });

  it('preselects the stop and day of a visit notice link', async () => {
    bookingApi();
    renderBook(`/book?stop=s-maple&day=${OPEN_DAY.day}`);
    expect(await screen.findByRole('radio', { name: /Tuesday, Mar 4/ })).toBeChecked();
    expect(screen.getByText('Maple Street Salon')).toBeInTheDocument();
  });

  it('says when the linked day can no longer be booked', async () => {
    bookingApi();
    renderBook(`/book?stop=s-maple&day=${FULL_DAY.day}`);
    expect(await screen.findByText(/Tuesday, Apr 1, the day in your link, is no longer open/)).toBeInTheDocument();
    expect(screen.getByRole('radio', { name: /Tuesday, Mar 4/ })).not.toBeChecked();
  });

  it('shows a clear message on every field it refuses, and sends nothing', async () => {
    const server = bookingApi();
    const { user } = renderBook('/book?stop=s-maple');
    const count = await screen.findByRole('textbox', { name: 'Pairs' });
    await user.clear(count);
    await enter(user, 'E-mail', 'jordan@paws');
    await enter(user, 'Phone', '12');
    await user.click(submitButton());

    expect(screen.getByText('Choose a route day, or mail-in.')).toBeInTheDocument();
    expect(screen.getByText(/Enter how many pairs, a whole number from 1 to 50/)).toBeInTheDocument();
    expect(screen.getByText(/Enter your name, so the sharpener knows/)).toBeInTheDocument();
    expect(screen.getByText('Enter an e-mail address like name@salon.com.')).toBeInTheDocument();
    expect(screen.getByText(/Enter a phone number of 7 to 15 digits/)).toBeInTheDocument();
    expect(screen.getByText(/Tick the box so we may send the booking e-mails/)).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/public/bookings')).toHaveLength(0);
  });

  it('shows the live estimate from the quote, labelled as an estimate with the tax note', async () => {
    const server = bookingApi({
      'POST /api/public/bookings/quote': (request) => {
        const items = (request.body as { items: { count: number }[] }).items;
        const pairs = items.reduce((sum, item) => sum + item.count, 0);
        return { status: 200, body: quote({ estimateCents: 3500 * pairs, benchMinutes: 15 * pairs }) };
      },
    });
    const { user } = renderBook('/book?stop=s-maple');
    // The estimate waits for a pause in typing before it asks.
    expect(await screen.findByTestId('estimate-total', {}, { timeout: 4000 })).toHaveTextContent('$35.00');
    const estimate = screen.getByLabelText('Estimate');
    expect(estimate).toHaveTextContent('estimate');
    expect(estimate).toHaveTextContent('Before sales tax, added at the stop’s rate.');
    expect(estimate).toHaveTextContent('About 15 min of bench time.');

    const count = screen.getByRole('textbox', { name: 'Pairs' });
    await user.clear(count);
    await user.type(count, '3');
    await waitFor(() => expect(screen.getByTestId('estimate-total')).toHaveTextContent('$105.00'), { timeout: 4000 });
    const asked = server.callsTo('POST', '/api/public/bookings/quote').map((call) => call.body);
    expect(asked.at(-1)).toEqual({
      stopId: 's-maple',
      items: [{ toolKind: 'straight', edgeType: 'convex', count: 3 }],
    });
  });

  it('adds and removes rows of shears', async () => {
    bookingApi();
    const { user } = renderBook('/book?stop=s-maple');
    await user.click(await screen.findByRole('button', { name: 'Add another kind' }));
    expect(screen.getAllByRole('group', { name: /Shears row/ })).toHaveLength(2);
    await user.click(screen.getByRole('button', { name: 'Remove row 1' }));
    expect(screen.getAllByRole('group', { name: /Shears row/ })).toHaveLength(1);
    expect(screen.getByRole('button', { name: 'Remove row 1' })).toBeDisabled();
  });

  it('hides the honeypot from people but sends it', async () => {
    const server = bookingApi({ 'POST /api/public/bookings': { status: 201, body: { booking: publicBooking() } } });
    const { user } = renderBook('/book?stop=s-maple');
    await screen.findByRole('radio', { name: /Tuesday, Mar 4/ });
    const honeypot = document.querySelector<HTMLInputElement>('input[name="website"]');
    expect(honeypot).not.toBeNull();
    expect(honeypot).toHaveAttribute('tabindex', '-1');
    expect(honeypot).toHaveAttribute('autocomplete', 'off');
    expect(screen.getByTestId('honeypot')).toHaveAttribute('aria-hidden', 'true');
    expect(screen.queryByRole('textbox', { name: 'Website' })).not.toBeInTheDocument();

    await fillIn(user);
    await user.click(submitButton());
    await screen.findByRole('status', { name: 'Drop-off booked' });
    expect(bodyOf(server.callsTo('POST', '/api/public/bookings')[0])).toMatchObject({ website: '' });
  });

  it('books once for a double click, and a retry after a failure reuses the same idempotency key', async () => {
    let attempts = 0;
    const server = bookingApi({
      'POST /api/public/bookings': async () => {
        attempts += 1;
        await new Promise((resolve) => setTimeout(resolve, 50));
        return attempts === 1
          ? { status: 503, body: { statusCode: 503, message: 'The database is not reachable right now.' } }
          : { status: 201, body: { booking: publicBooking(), manageUrl: 'http://x/drop-off/t' } };
      },
    });
    const { user } = renderBook('/book?stop=s-maple');
    await fillIn(user);
    await user.dblClick(submitButton());
    expect(await screen.findByText('The database is not reachable right now.')).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/public/bookings')).toHaveLength(1);

    await user.click(submitButton());
    await screen.findByRole('status', { name: 'Drop-off booked' });
    const [first, second] = server.callsTo('POST', '/api/public/bookings').map(bodyOf);
    expect(first?.idempotencyKey).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    expect(second?.idempotencyKey).toBe(first?.idempotencyKey);
    expect(first).toEqual({
      stopId: 's-maple',
      routeDayId: OPEN_DAY.routeDayId,
      mailIn: false,
      name: 'Jordan Clipper',
      email: 'jordan@paws.test',
      phone: '541 555 0134',
      consent: true,
      items: [{ toolKind: 'straight', edgeType: 'convex', count: 1 }],
      website: '',
      idempotencyKey: first?.idempotencyKey,
    });
  });

  it('offers the next day that fits when the day is full, and books it', async () => {
    const server = bookingApi({
      'POST /api/public/bookings': (request) =>
        (request.body as { routeDayId: string }).routeDayId === OPEN_DAY.routeDayId
          ? {
              status: 409,
              body: {
                statusCode: 409,
                code: 'conflict',
                message: 'Tuesday, Mar 4 has no bench time left for 1 pair.',
                fields: { routeDayId: ['That day is full.'] },
                nextDay: LATER_DAY,
              },
            }
          : { status: 201, body: { booking: publicBooking({ day: LATER_DAY.day }) } },
    });
    const { user } = renderBook('/book?stop=s-maple');
    await fillIn(user);
    await user.click(submitButton());

    expect(await screen.findByText('Tuesday, Mar 4 has no bench time left for 1 pair.')).toBeInTheDocument();
    expect(screen.getByText('That day is full.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Choose Tuesday, Apr 29, 09:15–10:15 instead' }));
    expect(screen.getByRole('radio', { name: 'Tuesday, Apr 29, 09:15–10:15' })).toBeChecked();

    await user.click(submitButton());
    const confirmation = await screen.findByRole('status', { name: 'Drop-off booked' });
    expect(confirmation).toHaveTextContent('Tuesday, Apr 29');
    const calls = server.callsTo('POST', '/api/public/bookings').map(bodyOf);
    expect(calls.map((body) => body.routeDayId)).toEqual([OPEN_DAY.routeDayId, LATER_DAY.routeDayId]);
  });

  it('shows only the message when a refusal names no next day', async () => {
    bookingApi({
      'POST /api/public/bookings': {
        status: 409,
        body: { statusCode: 409, message: 'Booking for this day closed at 18:00 yesterday.', nextDay: null },
      },
    });
    const { user } = renderBook('/book?stop=s-maple');
    await fillIn(user);
    await user.click(submitButton());
    expect(await screen.findByText('Booking for this day closed at 18:00 yesterday.')).toBeInTheDocument();
    expect(screen.getByText('Choose another day above, or mail-in.')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /instead$/ })).not.toBeInTheDocument();
  });

  it('puts the server’s field errors on the fields', async () => {
    bookingApi({
      'POST /api/public/bookings': {
        status: 400,
        body: {
          statusCode: 400,
          message: 'Check the fields.',
          fields: { email: ['This e-mail address cannot receive mail.'], 'items.0.count': ['At most 50 pairs.'] },
        },
      },
    });
    const { user } = renderBook('/book?stop=s-maple');
    await fillIn(user);
    await user.click(submitButton());
    expect(await screen.findByText('This e-mail address cannot receive mail.')).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'E-mail' })).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText('At most 50 pairs.')).toBeInTheDocument();
  });

  it('confirms what was booked and that an e-mail with the change link is on its way', async () => {
    bookingApi({ 'POST /api/public/bookings': { status: 201, body: { booking: publicBooking() } } });
    const { user } = renderBook('/book?stop=s-maple');
    await fillIn(user);
    await user.click(submitButton());
    const panel = within(await screen.findByRole('status', { name: 'Drop-off booked' }));
    expect(panel.getByText('Tuesday, Mar 4, sharpener expected 09:00–10:00')).toBeInTheDocument();
    expect(panel.getByText('2 × convex straight shear')).toBeInTheDocument();
    expect(panel.getByText('1 × beveled curved shear')).toBeInTheDocument();
    expect(panel.getByText(/\$105\.00/)).toBeInTheDocument();
    expect(
      panel.getByText('We sent a confirmation e-mail to jordan@paws.test with a link to change or cancel.'),
    ).toBeInTheDocument();
  });

  it('fills in a signed-in client’s name and e-mail and books as them', async () => {
    signInAs('client');
    const server = bookingApi({ 'POST /api/public/bookings': { status: 201, body: { booking: publicBooking() } } });
    const { user } = renderBook('/book?stop=s-maple');
    expect(await screen.findByRole('textbox', { name: 'Your name' })).toHaveValue('Casey Groomer');
    expect(screen.getByRole('textbox', { name: 'E-mail' })).toHaveValue('client@demo.keenroute.test');
    await user.click(screen.getByRole('radio', { name: /Tuesday, Mar 4/ }));
    await enter(user, 'Phone', '541 555 0199');
    await user.click(screen.getByRole('checkbox', { name: /booking e-mails and visit notices/ }));
    await user.click(submitButton());
    await screen.findByRole('status', { name: 'Drop-off booked' });
    expect(server.callsTo('POST', '/api/public/bookings')[0]?.headers.get('Authorization')).toBe('Bearer token-client');
  });
});
