import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it, onTestFinished, vi } from 'vitest';
import type { CustomerSummary } from '@/features/customers/types';
import type { ShearSummary } from '@/features/shears/types';
import { mockApi, type MockRequest } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { detail } from '../testing/stop-fixtures';
import { StopDetailRoute } from './stop-detail';

const stopRef = { id: 's-maple', name: 'Maple Street Salon' };

const customers: CustomerSummary[] = [
  {
    id: 'c-ada',
    name: 'Ada Clipper',
    email: 'ada@demo.keenroute.test',
    phone: null,
    stop: stopRef,
    shearCount: 2,
    visitNoticeConsent: true,
    active: true,
    hasAccount: false,
  },
  {
    id: 'c-bo',
    name: 'Bo Trimmer',
    email: null,
    phone: null,
    stop: stopRef,
    shearCount: 0,
    visitNoticeConsent: false,
    active: true,
    hasAccount: false,
  },
];

const shear = (id: string, tagCode: string, make: string): ShearSummary => ({
  id,
  tagCode,
  make,
  model: null,
  lengthIn: 6,
  edgeType: 'convex',
  toolKind: 'straight',
  handedness: 'right',
  use: 'hair',
  status: 'in-service',
  customer: { id: 'c-ada', name: 'Ada Clipper' },
  stop: stopRef,
  photoCount: 0,
  lastServicedOn: null,
});

const shears = [shear('sh-2', 'KR-000002', 'Brand B'), shear('sh-1', 'KR-000001', 'Brand A')];

function routes(extra: Record<string, Parameters<typeof mockApi>[0][string]> = {}) {
  return mockApi({
    'GET /api/stops/s-maple': { status: 200, body: detail() },
    'GET /api/stops/s-maple/visits': {
      status: 200,
      body: {
        items: [{ id: 'v1', workedOn: '2025-01-06', sharpener: { id: 'u-sharpener', name: 'Sasha Hone' } }],
        total: 1,
      },
    },
    'GET /api/customers': { status: 200, body: { items: customers, total: 2 } },
    'GET /api/shears': { status: 200, body: { items: shears, total: 2 } },
    ...extra,
  });
}

function renderStop() {
  return renderWithProviders(
    <Routes>
      <Route path="/stops/:stopId" element={<StopDetailRoute />} />
    </Routes>,
    { route: '/stops/s-maple' },
  );
}

// Generous: the whole suite runs these in parallel on two cores.
describe('the stop page', { timeout: 20_000 }, () => {
  beforeEach(() => {
    signInAs('office');
  });

  it('shows the stop, its hours, visits and customers with their shears', async () => {
    const server = routes();
    renderStop();

    expect(await screen.findByRole('heading', { name: 'Maple Street Salon', level: 1 })).toBeInTheDocument();
    expect(screen.getByText('Salon · 12 Maple Street, Riverton, OR 97000')).toBeInTheDocument();
    expect(screen.getByText('12 days overdue')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Edit' })).toHaveAttribute('href', '/stops/s-maple/edit');

    const hours = screen.getByRole('region', { name: 'Opening hours' });
    expect(within(hours).getByRole('row', { name: 'Monday 09:00–17:00' })).toBeInTheDocument();
    expect(within(hours).getByRole('row', { name: 'Tuesday Closed' })).toBeInTheDocument();

    const visits = screen.getByRole('region', { name: 'Visits' });
    expect(await within(visits).findByText('Jan 6, 2025')).toBeInTheDocument();
    expect(within(visits).getByRole('button', { name: 'Record a visit' })).toBeInTheDocument();

    const people = screen.getByRole('region', { name: 'Customers and shears' });
    const ada = (await within(people).findByRole('link', { name: 'Ada Clipper' })).closest('li');
    if (!ada) throw new Error('Ada has no list item');
    const tags = within(ada).getAllByRole('link', { name: /^KR-/ });
    expect(tags.map((tag) => tag.textContent)).toEqual(['KR-000001', 'KR-000002']);
    expect(tags[0]).toHaveAttribute('href', '/shears/sh-1');
    expect(within(people).getByRole('button', { name: 'Add shear for Bo Trimmer' })).toBeInTheDocument();
    expect(within(people).getByRole('button', { name: 'Add customer' })).toBeInTheDocument();

    expect(Object.fromEntries(server.callsTo('GET', '/api/customers')[0]?.search ?? [])).toMatchObject({
      stopId: 's-maple',
      pageSize: '100',
    });
    expect(server.callsTo('GET', '/api/shears')[0]?.search.get('stopId')).toBe('s-maple');
  });

  it('lets a sharpener edit the access notes, with no Edit button and nothing to add', async () => {
    signInAs('sharpener');
    const server = routes({
      'PATCH /api/stops/s-maple/access-notes': (request: MockRequest) => ({
        status: 200,
        body: detail(request.body as Partial<ReturnType<typeof detail>>),
      }),
    });
    const { user } = renderStop();

    await screen.findByRole('heading', { name: 'Maple Street Salon', level: 1 });
    expect(screen.queryByRole('link', { name: 'Edit' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Record a visit' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Add customer' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Print tag labels' })).not.toBeInTheDocument();
    expect(await screen.findByRole('link', { name: 'KR-000001' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Add shear for/ })).not.toBeInTheDocument();

    const notes = screen.getByRole('region', { name: 'Access notes' });
    expect(within(notes).getByText('Side door, ring twice')).toBeInTheDocument();
    await user.click(within(notes).getByRole('button', { name: 'Edit the access notes' }));
    const door = within(notes).getByRole('textbox', { name: 'Door' });
    await user.clear(door);
    await user.type(door, 'Back door, code 1234');
    await user.click(within(notes).getByRole('button', { name: 'Save notes' }));

    await waitFor(() => expect(server.callsTo('PATCH', '/api/stops/s-maple/access-notes')).toHaveLength(1));
    expect(server.callsTo('PATCH', '/api/stops/s-maple/access-notes')[0]?.body).toEqual({
      accessParking: 'Behind the bakery',
      accessDoor: 'Back door, code 1234',
      accessBestTime: 'Before 11',
    });
    expect(await within(notes).findByText('Back door, code 1234')).toBeInTheDocument();
  });

  it('records a visit for the office', async () => {
    const server = routes({
      'GET /api/users': { status: 200, body: { items: [], total: 0 } },
      'POST /api/stops/s-maple/visits': { status: 201, body: { id: 'v2', workedOn: '2025-03-10', sharpener: null } },
    });
    const { user } = renderStop();
    await user.click(await screen.findByRole('button', { name: 'Record a visit' }));
    const dialog = await screen.findByRole('dialog', { name: 'Record a visit to Maple Street Salon' });
    await user.click(within(dialog).getByRole('button', { name: 'Record the visit' }));

    await waitFor(() => expect(server.callsTo('POST', '/api/stops/s-maple/visits')).toHaveLength(1));
    expect(server.callsTo('POST', '/api/stops/s-maple/visits')[0]?.body).toMatchObject({
      workedOn: expect.stringMatching(/^\d{4}-\d{2}-\d{2}$/) as unknown,
      sharpenerId: 'u-sharpener',
    });
    // The stop and its visits load again: next due has moved.
    await waitFor(() => expect(server.callsTo('GET', '/api/stops/s-maple/visits')).toHaveLength(2));
    expect(server.callsTo('GET', '/api/stops/s-maple')).toHaveLength(2);
  });

  it('fetches the tag labels of the stop as a PDF and opens it', async () => {
    const server = routes({ 'GET /api/shears/labels.pdf': { status: 200, body: 'pdf' } });
    // jsdom has no object URLs; put stand-ins on URL for this test only.
    const original = { create: URL.createObjectURL, revoke: URL.revokeObjectURL };
    URL.createObjectURL = vi.fn(() => 'blob:labels');
    URL.revokeObjectURL = vi.fn();
    onTestFinished(() => {
      URL.createObjectURL = original.create;
      URL.revokeObjectURL = original.revoke;
    });
    const open = vi.spyOn(window, 'open').mockReturnValue({} as Window);
    const { user } = renderStop();

    await screen.findByRole('link', { name: 'KR-000001' });
    await user.click(screen.getByRole('button', { name: 'Print tag labels' }));
    await waitFor(() => expect(open).toHaveBeenCalledWith('blob:labels', '_blank'));
    const call = server.callsTo('GET', '/api/shears/labels.pdf')[0];
    expect(call?.search.get('stopId')).toBe('s-maple');
    expect(call?.headers.get('Authorization')).toBe('Bearer token-office');
  });

  it('says when the stop is not there', async () => {
    mockApi({ 'GET /api/stops/s-maple': { status: 404, body: { statusCode: 404, message: 'Stop not found.' } } });
    renderStop();
    expect(await screen.findByText('This stop was not found.')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Back to the stops' })).toHaveAttribute('href', '/stops');
  });
});
