import { screen, waitFor } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { pageOf } from '@/features/customers/testing/fixtures';
import { mockApi, type MockRequest } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { shearConvex, shearThinner } from '../testing/fixtures';
import { ShearsRoute } from './shears';

// The search waits for a pause in typing; on a busy machine the answer takes a while longer.
const SLOW = { timeout: 5000 };

function renderShears(route = '/shears') {
  return renderWithProviders(
    <Routes>
      <Route
        path="/shears"
        element={
          <>
            <ShearsRoute />
            <LocationProbe />
          </>
        }
      />
      <Route path="/shears/:shearId" element={<LocationProbe />} />
    </Routes>,
    { route },
  );
}

// The server finds a tag code in any form; this stand-in does the same for the two demo shears.
function searchShears(request: MockRequest) {
  const q = request.search.get('q');
  if (q === '123' || q === 'KR-000123') return pageOf([shearConvex]);
  if (q === '12') return pageOf([shearConvex]);
  return pageOf([shearConvex, shearThinner], 2);
}

describe('the Shears page', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('office');
  });

  it('asks for the search, filters, sort and page that are in the URL', async () => {
    const server = mockApi({ 'GET /api/shears': pageOf([shearConvex], 30) });
    renderShears('/shears?q=forge&edgeType=convex&toolKind=straight&status=in-service&sort=make&order=desc&page=2');

    expect(await screen.findByText('KR-000123')).toBeInTheDocument();
    expect(Object.fromEntries(server.callsTo('GET', '/api/shears')[0]?.search ?? [])).toEqual({
      q: 'forge',
      edgeType: 'convex',
      toolKind: 'straight',
      status: 'in-service',
      sort: 'make',
      order: 'desc',
      page: '2',
      pageSize: '25',
    });
    expect(screen.getByRole('searchbox', { name: 'Find by tag code, make or customer' })).toHaveValue('forge');
    expect(screen.getByText('26–30 of 30')).toBeInTheDocument();
  });

  it('shows each shear’s tag code, kind, left-handed badge, owner and stop', async () => {
    mockApi({ 'GET /api/shears': pageOf([shearConvex, shearThinner]) });
    renderShears();
    const row = (await screen.findByRole('link', { name: 'Open KR-000123' })).closest('tr');
    expect(row).toHaveTextContent('Demo Forge Cobalt 65');
    expect(row).toHaveTextContent('6.5 in');
    expect(row).toHaveTextContent('Convex');
    expect(row).toHaveTextContent('Left-handed');
    expect(row).toHaveTextContent('Mira Stylist');
    expect(row).toHaveTextContent('Riverside Cuts');
    expect(row).toHaveTextContent('In service');
    const other = screen.getByRole('link', { name: 'Open KR-000045' }).closest('tr');
    expect(other).not.toHaveTextContent('Left-handed');
    expect(other).toHaveTextContent('Retired');
  });

  it('keeps the typed search and a filter in the URL, back at page 1', async () => {
    const server = mockApi({ 'GET /api/shears': searchShears });
    const { user } = renderShears('/shears?page=2');
    await screen.findByText('KR-000045');

    await user.type(screen.getByRole('searchbox', { name: /find by tag code/i }), 'forge');
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/shears?q=forge'), SLOW);
    await waitFor(() => expect(server.callsTo('GET', '/api/shears').at(-1)?.search.get('q')).toBe('forge'));

    await user.click(screen.getByRole('combobox', { name: 'Status' }));
    await user.click(await screen.findByRole('option', { name: 'Lost' }, SLOW));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/shears?q=forge&status=lost'), SLOW);
  });

  it('offers a shortcut to the shear when the search is its tag code, and Enter opens it', async () => {
    mockApi({ 'GET /api/shears': searchShears });
    const { user } = renderShears();
    await screen.findByText('KR-000045');
    const box = screen.getByRole('searchbox', { name: /find by tag code/i });

    await user.type(box, '123');
    const shortcut = await screen.findByRole('link', { name: 'Go to KR-000123' }, SLOW);
    expect(shortcut).toHaveAttribute('href', '/shears/sh-123');
    await user.type(box, '{Enter}');
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/shears/sh-123'), SLOW);
  });

  it('offers no shortcut when no shear has the typed tag code', async () => {
    mockApi({ 'GET /api/shears': searchShears });
    renderShears('/shears?q=12');
    // KR-000123 contains "12", but its tag code is not KR-000012.
    expect(await screen.findByText('KR-000123')).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: /^Go to KR-/ })).not.toBeInTheDocument();
  });

  it('says when nothing matches and clears the search', async () => {
    const server = mockApi({
      'GET /api/shears': (request) => (request.search.get('q') ? pageOf([]) : pageOf([shearThinner])),
    });
    const { user } = renderShears('/shears?q=nothing&edgeType=serrated');
    expect(await screen.findByText('No shear matches “nothing”.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Clear the search and filters' }));
    expect(await screen.findByText('KR-000045')).toBeInTheDocument();
    expect(screen.getByTestId('location')).toHaveTextContent(/^\/shears$/);
    expect(server.callsTo('GET', '/api/shears').at(-1)?.search.has('edgeType')).toBe(false);
  });

  it('shows cards instead of the table on a phone', async () => {
    const matchMedia = window.matchMedia;
    vi.spyOn(window, 'matchMedia').mockImplementation((query) => ({
      ...matchMedia(query),
      matches: query.includes('max-width'),
    }));
    mockApi({ 'GET /api/shears': pageOf([shearConvex]) });
    renderShears();
    const card = await screen.findByRole('link', { name: /KR-000123/ });
    expect(card).toHaveAttribute('href', '/shears/sh-123');
    expect(card).toHaveTextContent('Convex straight shear, 6.5 in, left-handed');
    expect(card).toHaveTextContent('Mira Stylist · Riverside Cuts');
    expect(screen.queryByRole('table')).not.toBeInTheDocument();
    expect(screen.getByRole('combobox', { name: 'Sort shears' })).toBeInTheDocument();
    vi.restoreAllMocks();
  });

  it('shows a loading state, then says when the list cannot be loaded and tries again', async () => {
    let attempts = 0;
    mockApi({
      'GET /api/shears': () => {
        attempts += 1;
        return attempts === 1
          ? { status: 500, body: { statusCode: 500, message: 'Database is resting.', requestId: 'r1' } }
          : pageOf([shearConvex]);
      },
    });
    const { user } = renderShears();
    expect(screen.getByRole('status', { name: 'Loading shears' })).toBeInTheDocument();
    expect(await screen.findByText('The shears could not be loaded')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByText('KR-000123')).toBeInTheDocument();
  });
});
