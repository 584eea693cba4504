import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { sheet, ticket, ticketSummary, visitStop } from '../testing/fixtures';
import { StopVisitRoute } from './stop-visit';

function renderVisit() {
  return renderWithProviders(
    <>
      <Routes>
        <Route path="/route-days/:routeDayId/stops/:stopId" element={<StopVisitRoute />} />
        <Route path="*" element={null} />
      </Routes>
      <LocationProbe />
    </>,
    { route: '/route-days/rd-mon/stops/s-maple' },
  );
}

const noTickets = { status: 200, body: { items: [], total: 0 } };

const miraTicket = ticketSummary({ id: 't-mira' });

describe('the stop visit', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('sharpener');
  });

  it('shows the stop, its window and access notes, and asks for its tickets by day and stop', async () => {
    const server = mockApi({
      'GET /api/route-days/rd-mon/sheet': { status: 200, body: sheet() },
      'GET /api/tickets': noTickets,
    });
    renderVisit();
    expect(await screen.findByRole('heading', { level: 1, name: 'Maple Street Salon' })).toBeInTheDocument();
    expect(screen.getByText('Arrive 08:15–09:15')).toBeInTheDocument();
    const access = screen.getByLabelText('Access notes');
    expect(access).toHaveTextContent('Behind the bakery');
    expect(access).toHaveTextContent('Side door, ring twice');
    await waitFor(() => expect(server.callsTo('GET', '/api/tickets')).toHaveLength(1));
    const query = server.callsTo('GET', '/api/tickets')[0]?.search;
    expect(query?.get('routeDayId')).toBe('rd-mon');
    expect(query?.get('stopId')).toBe('s-maple');
  });

  it('opens a visit ticket for a customer and goes to it; a customer with one goes straight there', async () => {
    const server = mockApi({
      'GET /api/route-days/rd-mon/sheet': { status: 200, body: sheet() },
      'GET /api/tickets': { status: 200, body: { items: [miraTicket], total: 1 } },
      'POST /api/tickets': { status: 201, body: ticket({ id: 't-teo' }) },
    });
    const { user } = renderVisit();
    const mira = await screen.findByRole('link', { name: 'Go to Mira Stylist’s ticket' });
    expect(mira).toHaveAttribute('href', '/tickets/t-mira');

    await user.click(screen.getByRole('button', { name: 'Open a ticket for Teo Groomer' }));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/tickets/t-teo'));
    expect(server.callsTo('POST', '/api/tickets')[0]?.body).toEqual({
      customerId: 'c-teo',
      stopId: 's-maple',
      routeDayId: 'rd-mon',
      kind: 'visit',
    });
  });

  it('lists tickets of people not on the stop’s list, such as a checked-in drop-off', async () => {
    const lou = ticketSummary({ id: 't-lou', kind: 'drop-off', customer: { id: 'c-lou', name: 'Lou Groomer' } });
    mockApi({
      'GET /api/route-days/rd-mon/sheet': { status: 200, body: sheet() },
      'GET /api/tickets': { status: 200, body: { items: [miraTicket, lou], total: 2 } },
    });
    renderVisit();
    const others = await screen.findByRole('list', { name: 'Other tickets here' });
    expect(within(others).getByRole('link', { name: 'Go to Lou Groomer’s ticket' })).toHaveAttribute(
      'href',
      '/tickets/t-lou',
    );
    expect(others).not.toHaveTextContent('Mira Stylist');
  });

  it('checks in a booked drop-off and shows its shears', async () => {
    const stop = visitStop({
      bookings: [
        {
          id: 'b-1',
          name: 'Lou Groomer',
          phone: '555-0199',
          email: 'lou@demo.keenroute.test',
          notes: 'Leaves them at the desk',
          status: 'booked',
          items: [{ toolKind: 'straight', edgeType: 'convex', count: 2 }],
          benchMinutes: 30,
        },
        {
          id: 'b-2',
          name: 'Gone Away',
          phone: '555-0100',
          email: 'gone@demo.keenroute.test',
          notes: null,
          status: 'cancelled',
          items: [{ toolKind: 'curved', edgeType: 'beveled', count: 1 }],
          benchMinutes: 15,
        },
      ],
    });
    const server = mockApi({
      'GET /api/route-days/rd-mon/sheet': { status: 200, body: sheet(stop) },
      'GET /api/tickets': noTickets,
      'POST /api/bookings/b-1/check-in': { status: 201, body: ticket({ id: 't-lou', kind: 'drop-off' }) },
    });
    const { user } = renderVisit();
    const dropOffs = await screen.findByRole('list', { name: 'Drop-offs booked' });
    expect(dropOffs).toHaveTextContent('Booked: 2 × convex straight shear');
    expect(dropOffs).not.toHaveTextContent('Gone Away');
    await user.click(within(dropOffs).getByRole('button', { name: 'Check in Lou Groomer' }));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/tickets/t-lou'));
    expect(server.callsTo('POST', '/api/bookings/b-1/check-in')).toHaveLength(1);
  });

  it('adds a walk-up as a new customer of the stop and opens a walk-up ticket', async () => {
    const server = mockApi({
      'GET /api/route-days/rd-mon/sheet': { status: 200, body: sheet() },
      'GET /api/tickets': noTickets,
      'POST /api/tickets/walk-up': { status: 201, body: ticket({ id: 't-ari', kind: 'walk-up' }) },
    });
    const { user } = renderVisit();
    await user.click(await screen.findByRole('button', { name: 'Walk-up' }));
    const dialog = await screen.findByRole('dialog', { name: 'Walk-up at Maple Street Salon' });
    await user.click(within(dialog).getByRole('radio', { name: 'Someone new' }));
    await user.click(within(dialog).getByRole('button', { name: 'Add and open ticket' }));
    expect(await within(dialog).findByText('Enter their name.')).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/tickets/walk-up')).toHaveLength(0);

    await user.type(within(dialog).getByRole('textbox', { name: 'Name' }), 'Ari Barber');
    await user.type(within(dialog).getByRole('textbox', { name: 'Phone' }), '555-0123');
    await user.click(within(dialog).getByRole('button', { name: 'Add and open ticket' }));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/tickets/t-ari'));
    expect(server.callsTo('POST', '/api/tickets/walk-up')[0]?.body).toEqual({
      stopId: 's-maple',
      routeDayId: 'rd-mon',
      customer: { name: 'Ari Barber', phone: '555-0123' },
    });
  });

  it('opens a walk-up ticket for a customer already at the stop', async () => {
    const server = mockApi({
      'GET /api/route-days/rd-mon/sheet': { status: 200, body: sheet() },
      'GET /api/tickets': noTickets,
      'POST /api/tickets': { status: 201, body: ticket({ id: 't-w', kind: 'walk-up' }) },
    });
    const { user } = renderVisit();
    await user.click(await screen.findByRole('button', { name: 'Walk-up' }));
    const dialog = await screen.findByRole('dialog');
    await user.click(within(dialog).getByRole('button', { name: 'Open walk-up ticket' }));
    expect(await within(dialog).findByText('Choose who it is.')).toBeInTheDocument();
    await user.click(within(dialog).getByRole('radio', { name: 'Teo Groomer' }));
    await user.click(within(dialog).getByRole('button', { name: 'Open walk-up ticket' }));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/tickets/t-w'));
    expect(server.callsTo('POST', '/api/tickets')[0]?.body).toMatchObject({ customerId: 'c-teo', kind: 'walk-up' });
  });
});
