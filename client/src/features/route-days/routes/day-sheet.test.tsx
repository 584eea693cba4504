import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { routeDay, sheet, week } from '../testing/fixtures';
import { DaySheetRoute } from './day-sheet';
import { TodayRoute } from './today';

function renderSheet(id = 'rd-mon-sasha') {
  return renderWithProviders(
    <Routes>
      <Route path="/route-days/:routeDayId/sheet" element={<DaySheetRoute />} />
    </Routes>,
    { route: `/route-days/${id}/sheet` },
  );
}

describe('the day sheet', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('sharpener');
    URL.createObjectURL = vi.fn(() => 'blob:keenroute-sheet');
    URL.revokeObjectURL = vi.fn();
  });
  afterEach(() => {
    vi.restoreAllMocks();
  });

  it('shows the day, then the stops in order with windows, access notes, contacts and customers', async () => {
    mockApi({ 'GET /api/route-days/rd-mon-sasha/sheet': { status: 200, body: sheet() } });
    renderSheet();

    expect(await screen.findByRole('heading', { level: 1, name: 'Monday, Mar 3' })).toBeInTheDocument();
    expect(screen.getByText('Sasha Hone')).toBeInTheDocument();
    expect(screen.getByLabelText('Departure and finish')).toHaveTextContent('08:00 → 11:25');
    expect(screen.getByText('24.6 km')).toBeInTheDocument();
    expect(screen.getByText('1 h 55 min')).toBeInTheDocument();

    const stops = within(screen.getByRole('list', { name: 'Stops in order' })).getAllByRole('listitem', {
      name: /./,
    });
    expect(stops.map((item) => within(item).getByRole('heading').textContent)).toEqual([
      'Maple Street Salon',
      'Paws and Polish',
    ]);
    const [maple, paws] = stops as [HTMLElement, HTMLElement];
    expect(maple).toHaveTextContent('Arrive 08:15–09:15');
    expect(paws).toHaveTextContent('Arrive 10:00–11:00');
    expect(maple).toHaveTextContent('12 Maple Street');
    expect(maple).toHaveTextContent('97000 Riverton');
    expect(maple).toHaveTextContent('Behind the bakery');
    expect(maple).toHaveTextContent('Side door, ring twice');
    expect(maple).toHaveTextContent('Before 11');
    expect(maple).toHaveTextContent('1 h 10 min at the bench');
    expect(maple).toHaveTextContent('5 pairs expected');
    expect(within(maple).getByRole('link', { name: 'Call Maple Street Salon: +1 555 0100' })).toHaveAttribute(
      'href',
      'tel:+15550100',
    );
    expect(within(maple).getByRole('link', { name: /^E-mail Maple Street Salon/ })).toHaveAttribute(
      'href',
      'mailto:desk@maple.demo.keenroute.test',
    );
    const customers = within(maple).getByRole('list', { name: 'Customers at Maple Street Salon' });
    expect(customers).toHaveTextContent('Ada Clipper (3 shears)');
    expect(within(customers).getByRole('link', { name: 'Call Ada Clipper: +1 555 0111' })).toHaveAttribute(
      'href',
      'tel:+15550111',
    );
    expect(paws).not.toHaveTextContent('Parking');
    expect(
      within(paws)
        .getAllByRole('link')
        .map((link) => link.getAttribute('aria-label')),
    ).toEqual(['Work Paws and Polish']);
    expect(within(maple).getByRole('link', { name: 'Work Maple Street Salon' })).toHaveAttribute(
      'href',
      '/route-days/rd-mon-sasha/stops/s-maple',
    );
    expect(maple).toHaveTextContent('Cy Groomer');
    expect(maple).toHaveTextContent('Left in the blue case');
    expect(paws).toHaveTextContent('No drop-offs booked for this stop.');

    const cautions = screen.getByRole('region', { name: 'At the bench' });
    expect(cautions).toHaveTextContent('Wear a dust mask or use extraction at the grinder.');
  });

  it('fetches the printable sheet as a PDF with the sign-in', async () => {
    const open = vi.spyOn(window, 'open').mockReturnValue(window);
    const server = mockApi({
      'GET /api/route-days/rd-mon-sasha/sheet': (request) =>
        request.search.get('format') === 'pdf' ? { status: 200, body: '%PDF' } : { status: 200, body: sheet() },
    });
    const { user } = renderSheet();
    await user.click(await screen.findByRole('button', { name: 'Print / PDF' }));
    await waitFor(() => expect(open).toHaveBeenCalledWith('blob:keenroute-sheet', '_blank'));
    const pdfCall = server
      .callsTo('GET', '/api/route-days/rd-mon-sasha/sheet')
      .find((call) => call.search.get('format'));
    expect(pdfCall?.search.get('format')).toBe('pdf');
    expect(pdfCall?.headers.get('Authorization')).toBe('Bearer token-sharpener');
  });

  it('says when the route day does not exist', async () => {
    mockApi({
      'GET /api/route-days/rd-gone/sheet': { status: 404, body: { statusCode: 404, message: 'No such route day.' } },
    });
    renderSheet('rd-gone');
    expect(await screen.findByText('No such route day')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Open the week' })).toHaveAttribute('href', '/week');
  });
});

describe('Today', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('sharpener');
  });

  it('opens the caller’s own route day for the business’s today', async () => {
    const server = mockApi({
      'GET /api/route-days': {
        status: 200,
        body: week({
          today: '2025-03-04',
          days: [
            routeDay({
              id: 'rd-tue-rowan',
              day: '2025-03-04',
              weekday: 'tue',
              sharpener: { id: 'u-owner', name: 'Rowan' },
            }),
            routeDay(),
            routeDay({ id: 'rd-tue-sasha', day: '2025-03-04', weekday: 'tue' }),
          ],
        }),
      },
      'GET /api/route-days/rd-tue-sasha/sheet': {
        status: 200,
        body: sheet({ routeDay: routeDay({ id: 'rd-tue-sasha', day: '2025-03-04', weekday: 'tue' }) }),
      },
    });
    renderWithProviders(<TodayRoute />, { route: '/today' });
    expect(await screen.findByRole('heading', { level: 1, name: 'Tuesday, Mar 4' })).toBeInTheDocument();
    expect(server.callsTo('GET', '/api/route-days/rd-tue-sasha/sheet')).toHaveLength(1);
  });

  it('says when there is no route day today and links to My week', async () => {
    mockApi({ 'GET /api/route-days': { status: 200, body: week({ today: '2025-03-06' }) } });
    renderWithProviders(<TodayRoute />, { route: '/today' });
    expect(await screen.findByText('No route day today')).toBeInTheDocument();
    expect(screen.getByText('Mar 6, 2025 has no route day for you.')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'See my week' })).toHaveAttribute('href', '/week');
  });
});
