import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { staffBooking } from '../testing/fixtures';
import { BookingCards } from '../components/bookings-list';
import { DropOffsRoute } from './drop-offs';

const bookings = [
  staffBooking(),
  staffBooking({
    id: 'b-2',
    name: 'Sam Shearwater',
    phone: '+1 541 555 0177',
    mailIn: true,
    day: null,
    routeDayId: null,
    status: 'cancelled',
    items: [{ toolKind: 'thinning', edgeType: 'beveled', count: 1 }],
    benchMinutes: 20,
  }),
];

function renderDropOffs(route = '/drop-offs') {
  return renderWithProviders(
    <Routes>
      <Route path="/drop-offs" element={<DropOffsRoute />} />
    </Routes>,
    { route },
  );
}

describe('the Drop-offs page', { timeout: 20_000 }, () => {
  beforeEach(() => {
    signInAs('office');
  });

  it('lists the bookings with day, stop, name, shears, bench minutes and status', async () => {
    mockApi({ 'GET /api/bookings': { status: 200, body: { items: bookings, total: 2 } } });
    renderDropOffs();
    const jordan = (await screen.findByText('Jordan Clipper')).closest('tr')!;
    const row = within(jordan);
    expect(row.getByRole('link', { name: 'Tuesday, Mar 4' })).toHaveAttribute('href', '/route-days/rd-0304/sheet');
    expect(jordan).toHaveTextContent('Maple Street Salon');
    expect(jordan).toHaveTextContent('2 pairs: 2 × convex straight shear');
    expect(jordan).toHaveTextContent('30');
    expect(jordan).toHaveTextContent('Booked');
    const sam = screen.getByText('Sam Shearwater').closest('tr')!;
    expect(sam).toHaveTextContent('Mail-in');
    expect(sam).toHaveTextContent('Cancelled');
    expect(within(sam).getByRole('link', { name: '+1 541 555 0177' })).toHaveAttribute('href', 'tel:+15415550177');
    expect(screen.getByText('2 drop-offs')).toBeInTheDocument();
  });

  it('asks the server for the day and status chosen, kept in the URL', async () => {
    const server = mockApi({ 'GET /api/bookings': { status: 200, body: { items: bookings, total: 2 } } });
    const { user } = renderDropOffs('/drop-offs?day=2025-03-04&stopId=s-maple');
    await screen.findByText('Jordan Clipper');
    expect(Object.fromEntries(server.callsTo('GET', '/api/bookings')[0]!.search)).toEqual({
      day: '2025-03-04',
      stopId: 's-maple',
    });
    await user.click(screen.getByRole('combobox', { name: 'Status' }));
    await user.click(await screen.findByRole('option', { name: 'Cancelled' }));
    await waitFor(() => expect(server.callsTo('GET', '/api/bookings').at(-1)?.search.get('status')).toBe('cancelled'));
  });

  it('reads a plain array as well as a page', async () => {
    mockApi({ 'GET /api/bookings': { status: 200, body: [bookings[0]] } });
    renderDropOffs();
    expect(await screen.findByText('Jordan Clipper')).toBeInTheDocument();
    expect(screen.getByText('1 drop-off')).toBeInTheDocument();
  });

  it('says when nothing matches', async () => {
    mockApi({ 'GET /api/bookings': { status: 200, body: { items: [], total: 0 } } });
    renderDropOffs('/drop-offs?status=checked-in');
    expect(await screen.findByText('No drop-offs match these filters.')).toBeInTheDocument();
  });

  it('shows a phone one card per drop-off, with a tap-to-call number', () => {
    renderWithProviders(<BookingCards bookings={bookings} role="sharpener" />);
    const cards = screen.getAllByRole('listitem');
    expect(cards).toHaveLength(2);
    const first = within(cards[0]!);
    expect(first.getByText('Jordan Clipper')).toBeInTheDocument();
    expect(first.getByRole('link', { name: 'Tuesday, Mar 4' })).toHaveAttribute('href', '/route-days/rd-0304/sheet');
    expect(first.getByRole('link', { name: '541 555 0134' })).toHaveAttribute('href', 'tel:5415550134');
    expect(cards[1]).toHaveTextContent('Mail-in');
  });
});
