import { screen, waitFor } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { staffList, summary } from '../testing/stop-fixtures';
import type { StopSummary } from '../types';
import { StopsRoute } from './stops';

const stops: StopSummary[] = [
  summary(),
  summary({
    id: 's-paws',
    name: 'Paws and Polish',
    kind: 'grooming-shop',
    street: '3 Birch Road',
    nextDueOn: '2025-03-20',
    daysOverdue: -3,
    cadenceWeeks: 5,
    assignedSharpener: null,
    customerCount: 1,
  }),
];

const listOf = (items: StopSummary[], total = items.length) => ({ status: 200, body: { items, total } });

function renderStops(route = '/stops') {
  return renderWithProviders(
    <Routes>
      <Route
        path="/stops"
        element={
          <>
            <StopsRoute />
            <LocationProbe />
          </>
        }
      />
    </Routes>,
    { route },
  );
}

// Generous: the whole suite runs these in parallel on two cores.
describe('the Stops page', { timeout: 20_000 }, () => {
  beforeEach(() => {
    signInAs('office');
  });

  it('lists the stops with next due, cadence, sharpener and customers', async () => {
    mockApi({ 'GET /api/stops': listOf(stops), 'GET /api/users': staffList });
    renderStops();

    const maple = await screen.findByRole('link', { name: 'Maple Street Salon' });
    expect(maple).toHaveAttribute('href', '/stops/s-maple');
    const row = maple.closest('tr');
    expect(row).toHaveTextContent('Salon');
    expect(row).toHaveTextContent('12 Maple Street');
    expect(row).toHaveTextContent('Riverton, OR 97000');
    expect(row).toHaveTextContent('Mar 3, 2025');
    expect(row).toHaveTextContent('12 days overdue');
    expect(row).toHaveTextContent('every 8 weeks');
    expect(row).toHaveTextContent('Sasha Hone');
    expect(screen.getByRole('link', { name: 'Paws and Polish' }).closest('tr')).toHaveTextContent('due in 3 days');
    expect(screen.getByRole('link', { name: 'Add a stop' })).toHaveAttribute('href', '/stops/new');
    expect(screen.getByRole('combobox', { name: 'Sharpener' })).toBeInTheDocument();
  });

  it('keeps the search and filters in the URL and asks the server for them', async () => {
    const server = mockApi({ 'GET /api/stops': listOf(stops), 'GET /api/users': staffList });
    const { user } = renderStops('/stops?kind=salon&page=2');
    await screen.findByText('Maple Street Salon');
    expect(Object.fromEntries(server.callsTo('GET', '/api/stops')[0]?.search ?? [])).toEqual({
      page: '2',
      pageSize: '25',
      kind: 'salon',
      active: 'true',
      sort: 'name',
      order: 'asc',
    });

    await user.type(screen.getByRole('searchbox', { name: 'Search the stops' }), 'maple');
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/stops?kind=salon&q=maple'));
    await waitFor(() => expect(server.callsTo('GET', '/api/stops').at(-1)?.search.get('q')).toBe('maple'));
    expect(server.callsTo('GET', '/api/stops').at(-1)?.search.get('page')).toBe('1');
  });

  it('sends the chosen sharpener as sharpenerId', async () => {
    const server = mockApi({ 'GET /api/stops': listOf(stops), 'GET /api/users': staffList });
    renderStops('/stops?sharpener=u-sharpener&active=all');
    await screen.findByText('Maple Street Salon');
    const search = server.callsTo('GET', '/api/stops')[0]?.search;
    expect(search?.get('sharpenerId')).toBe('u-sharpener');
    expect(search?.has('active')).toBe(false);
  });

  it('offers to add the first stop when there are none', async () => {
    mockApi({ 'GET /api/stops': listOf([]), 'GET /api/users': staffList });
    renderStops();
    expect(await screen.findByText('No stops yet.')).toBeInTheDocument();
    expect(screen.getAllByRole('link', { name: 'Add a stop' })).toHaveLength(2);
  });

  it('says when no stop matches the filters and clears them', async () => {
    const server = mockApi({ 'GET /api/stops': listOf([]), 'GET /api/users': staffList });
    const { user } = renderStops('/stops?q=nowhere&kind=clinic');
    expect(await screen.findByText('No stops match these filters.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Clear the filters' }));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent(/^\/stops$/));
    await waitFor(() => expect(server.callsTo('GET', '/api/stops').at(-1)?.search.has('q')).toBe(false));
  });

  it('says when the list cannot be loaded and can try again', async () => {
    let attempts = 0;
    mockApi({
      'GET /api/users': staffList,
      'GET /api/stops': () => {
        attempts += 1;
        return attempts === 1
          ? { status: 500, body: { statusCode: 500, message: 'Database is resting.', requestId: 'r1' } }
          : listOf(stops);
      },
    });
    const { user } = renderStops();
    expect(await screen.findByText('The stops could not be loaded')).toBeInTheDocument();
    expect(screen.getAllByText('Database is resting.').length).toBeGreaterThan(0);
    await user.click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByText('Maple Street Salon')).toBeInTheDocument();
  });

  it('shows a sharpener their stops with no sharpener filter, no user list and nothing to add', async () => {
    signInAs('sharpener');
    const server = mockApi({ 'GET /api/stops': listOf(stops) });
    renderStops();
    await screen.findByText('Maple Street Salon');
    expect(screen.queryByRole('combobox', { name: 'Sharpener' })).not.toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Add a stop' })).not.toBeInTheDocument();
    expect(server.callsTo('GET', '/api/users')).toHaveLength(0);
  });

  it('shows one card per stop on a phone, with a sort picker in place of the table headers', async () => {
    const matchMedia = window.matchMedia;
    vi.spyOn(window, 'matchMedia').mockImplementation((query: string) => ({
      ...matchMedia(query),
      matches: query.includes('max-width'),
    }));
    const server = mockApi({ 'GET /api/stops': listOf(stops), 'GET /api/users': staffList });
    const { user } = renderStops();

    const card = (await screen.findByText('Maple Street Salon')).closest('a');
    expect(card).toHaveAttribute('href', '/stops/s-maple');
    expect(card).toHaveTextContent('12 days overdue');
    expect(screen.queryByRole('table')).not.toBeInTheDocument();
    await user.click(screen.getByRole('combobox', { name: 'Sort the stops' }));
    await user.click(await screen.findByRole('option', { name: 'Next due, soonest first' }));
    await waitFor(() => expect(server.callsTo('GET', '/api/stops').at(-1)?.search.get('sort')).toBe('nextDueOn'));
  });
});
