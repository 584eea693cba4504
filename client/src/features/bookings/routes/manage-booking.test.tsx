import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { session } from '@/lib/session';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { LATER_DAY, OPEN_DAY, publicBooking, publicStop, quote } from '../testing/fixtures';
import type { PublicBooking } from '../types';
import { ManageBookingRoute } from './manage-booking';

const TOKEN = 'tok-abc123';
const BOOKING_PATH = `/api/public/bookings/${TOKEN}`;

function renderManage() {
  return renderWithProviders(
    <Routes>
      <Route path="/drop-off/:token" element={<ManageBookingRoute />} />
    </Routes>,
    { route: `/drop-off/${TOKEN}` },
  );
}

function manageApi(booking: PublicBooking, extra: Parameters<typeof mockApi>[0] = {}) {
  return mockApi({
    [`GET ${BOOKING_PATH}`]: { status: 200, body: booking },
    'GET /api/public/stops/s-maple': { status: 200, body: publicStop({ nextDays: [OPEN_DAY, LATER_DAY] }) },
    'POST /api/public/bookings/quote': { status: 200, body: quote() },
    ...extra,
  });
}

describe('the page behind a booking’s private link', { timeout: 20_000 }, () => {
  beforeEach(() => {
    session.end('never-signed-in');
  });

  it('shows the booking: stop, day and window, shears, estimate and status', async () => {
    manageApi(publicBooking());
    renderManage();
    expect(await screen.findByText('Maple Street Salon, Riverton')).toBeInTheDocument();
    expect(screen.getByText('Tuesday, Mar 4, sharpener expected 09:00–10:00')).toBeInTheDocument();
    expect(screen.getByText('2 × convex straight shear')).toBeInTheDocument();
    expect(screen.getByText(/\$105\.00/)).toBeInTheDocument();
    expect(screen.getByText('Booked')).toBeInTheDocument();
    expect(screen.getByText('You can change or cancel until 18:00 on Monday, Mar 3.')).toBeInTheDocument();
  });

  it('sends only what changed: the phone, and a move to another open day', async () => {
    const server = manageApi(publicBooking(), {
      [`PATCH ${BOOKING_PATH}`]: (request) => ({
        status: 200,
        body: publicBooking({
          day: LATER_DAY.day,
          arrivalWindow: LATER_DAY.arrivalWindow,
          ...(request.body as object),
        }),
      }),
    });
    const { user } = renderManage();
    const current = await screen.findByRole('radio', { name: 'Tuesday, Mar 4, 09:00–10:00' });
    expect(current).toBeChecked();
    await user.click(screen.getByRole('radio', { name: 'Tuesday, Apr 29, 09:15–10:15' }));
    const phone = screen.getByRole('textbox', { name: 'Phone' });
    await user.clear(phone);
    await user.click(phone);
    await user.paste('541 555 0100');
    await user.click(screen.getByRole('button', { name: 'Save the changes' }));

    expect(await screen.findByText('Changes saved. The details above are up to date.')).toBeInTheDocument();
    expect(server.callsTo('PATCH', BOOKING_PATH).map((call) => call.body)).toEqual([
      { phone: '541 555 0100', routeDayId: LATER_DAY.routeDayId },
    ]);
    expect(screen.getByText('Tuesday, Apr 29, sharpener expected 09:15–10:15')).toBeInTheDocument();
  });

  it('changes the shears', async () => {
    const server = manageApi(publicBooking(), { [`PATCH ${BOOKING_PATH}`]: { status: 200, body: publicBooking() } });
    const { user } = renderManage();
    await user.click(await screen.findByRole('button', { name: 'Remove row 2' }));
    await user.click(screen.getByRole('button', { name: 'Save the changes' }));
    await screen.findByText('Changes saved. The details above are up to date.');
    expect(server.callsTo('PATCH', BOOKING_PATH)[0]?.body).toEqual({
      items: [{ toolKind: 'straight', edgeType: 'convex', count: 2 }],
    });
  });

  it('cancels after asking once more', async () => {
    const server = manageApi(publicBooking(), {
      [`POST ${BOOKING_PATH}/cancel`]: { status: 200, body: publicBooking({ status: 'cancelled', changeable: false }) },
    });
    const { user } = renderManage();
    await user.click(await screen.findByRole('button', { name: 'Cancel the drop-off' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'Cancel this drop-off?' }));
    await user.click(dialog.getByRole('button', { name: 'Keep it' }));
    expect(server.callsTo('POST', `${BOOKING_PATH}/cancel`)).toHaveLength(0);

    await user.click(screen.getByRole('button', { name: 'Cancel the drop-off' }));
    await user.click(await screen.findByRole('button', { name: 'Yes, cancel it' }));
    expect(await screen.findByText('This drop-off is cancelled')).toBeInTheDocument();
    expect(server.callsTo('POST', `${BOOKING_PATH}/cancel`)).toHaveLength(1);
    await waitFor(() => expect(screen.queryByRole('button', { name: 'Save the changes' })).not.toBeInTheDocument());
  });

  it('is read-only after the cutoff, and says why', async () => {
    const server = manageApi(publicBooking({ changeable: false }));
    renderManage();
    expect(await screen.findByText('Changes are closed')).toBeInTheDocument();
    expect(screen.getByText(/closed at 18:00 on Monday, Mar 3/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Save the changes' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Cancel the drop-off' })).not.toBeInTheDocument();
    expect(screen.getByText('2 × convex straight shear')).toBeInTheDocument();
    expect(server.callsTo('GET', '/api/public/stops/s-maple')).toHaveLength(0);
  });

  it('says plainly when the link is not valid or has expired', async () => {
    mockApi({ [`GET ${BOOKING_PATH}`]: { status: 404, body: { statusCode: 404, message: 'Not found' } } });
    renderManage();
    expect(await screen.findByText('This link is not valid or has expired')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Book a drop-off' })).toHaveAttribute('href', '/book');
  });
});
