import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi, type MockInstance } from 'vitest';
import { CustomerDetailRoute } from '@/features/customers/routes/customer-detail';
import { miraDetail, pageOf } from '@/features/customers/testing/fixtures';
import { StopDetailRoute } from '@/features/stops/routes/stop-detail';
import { detail as stopDetail } from '@/features/stops/testing/stop-fixtures';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { statementFileName } from '../api/get-statement';
import { StatementButton } from './statement-button';

const pine = { kind: 'stop', id: 's-pine', name: 'Pine Street Salon (demo)' } as const;

async function openStatement(user: ReturnType<typeof renderWithProviders>['user']) {
  await user.click(await screen.findByRole('button', { name: 'Statement (PDF)' }));
  return within(await screen.findByRole('dialog', { name: 'Statement of account' }));
}

describe('the statement button', { timeout: 30_000 }, () => {
  let open: MockInstance<typeof window.open>;
  beforeEach(() => {
    signInAs('office');
    // Only Date is faked: the user-event clicks still need real timers.
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date(2026, 2, 31, 10, 0));
    Object.defineProperty(URL, 'createObjectURL', { configurable: true, value: vi.fn(() => 'blob:statement') });
    Object.defineProperty(URL, 'revokeObjectURL', { configurable: true, value: vi.fn() });
    open = vi.spyOn(window, 'open').mockReturnValue(window);
  });
  afterEach(() => {
    vi.useRealTimers();
    vi.restoreAllMocks();
  });

  it('offers 1 January of this year to today, and refuses a period that ends before it starts', async () => {
    mockApi({});
    const { user } = renderWithProviders(<StatementButton subject={pine} />);
    const dialog = await openStatement(user);
    expect(dialog.getByLabelText('From')).toHaveValue('2026-01-01');
    expect(dialog.getByLabelText('To')).toHaveValue('2026-03-31');
    expect(dialog.getByText(/For Pine Street Salon \(demo\)/)).toBeInTheDocument();

    await user.clear(dialog.getByLabelText('From'));
    await user.type(dialog.getByLabelText('From'), '2026-04-01');
    expect(dialog.getByRole('alert')).toHaveTextContent('The first day must come before the last.');
    expect(dialog.getByRole('button', { name: 'Get statement' })).toBeDisabled();
  });

  it('fetches the stop’s statement for the period with the sign-in token and opens the PDF', async () => {
    const server = mockApi({ 'GET /api/statements/stops/s-pine': { status: 200, body: '%PDF-statement' } });
    const { user } = renderWithProviders(<StatementButton subject={pine} />);
    const dialog = await openStatement(user);
    await user.clear(dialog.getByLabelText('From'));
    await user.type(dialog.getByLabelText('From'), '2026-02-01');
    await user.click(dialog.getByRole('button', { name: 'Get statement' }));

    await waitFor(() => expect(open).toHaveBeenCalledWith('blob:statement', '_blank'));
    const [call] = server.callsTo('GET', '/api/statements/stops/s-pine');
    expect(call?.headers.get('Authorization')).toBe('Bearer token-office');
    expect(call?.search.get('from')).toBe('2026-02-01');
    expect(call?.search.get('to')).toBe('2026-03-31');
  });

  it('says why when the server refuses the statement', async () => {
    mockApi({
      'GET /api/statements/customers/c-mira': {
        status: 403,
        body: { statusCode: 403, message: 'This statement belongs to another customer.' },
      },
    });
    const { user } = renderWithProviders(
      <StatementButton subject={{ kind: 'customer', id: 'c-mira', name: 'Mira' }} />,
    );
    const dialog = await openStatement(user);
    await user.click(dialog.getByRole('button', { name: 'Get statement' }));
    expect(await screen.findByText('This statement belongs to another customer.')).toBeInTheDocument();
    expect(open).not.toHaveBeenCalled();
  });

  it('names the saved file after whose statement and which period', () => {
    expect(statementFileName({ name: 'Pine Street Salon (demo)' }, { from: '2026-01-01', to: '2026-03-31' })).toBe(
      'statement-pine-street-salon-demo-2026-01-01-to-2026-03-31.pdf',
    );
  });
});

describe('where the statement button shows', { timeout: 30_000 }, () => {
  afterEach(() => {
    vi.restoreAllMocks();
  });

  const customerRoutes = {
    'GET /api/customers/c-mira': { status: 200, body: miraDetail },
    'GET /api/shears': pageOf([]),
  };
  const renderCustomer = () =>
    renderWithProviders(
      <Routes>
        <Route path="/customers/:customerId" element={<CustomerDetailRoute />} />
      </Routes>,
      { route: '/customers/c-mira' },
    );
  const stopRoutes = {
    'GET /api/stops/s-maple': { status: 200, body: stopDetail() },
    'GET /api/stops/s-maple/visits': pageOf([]),
    'GET /api/customers': pageOf([]),
    'GET /api/shears': pageOf([]),
  };
  const renderStop = () =>
    renderWithProviders(
      <Routes>
        <Route path="/stops/:stopId" element={<StopDetailRoute />} />
      </Routes>,
      { route: '/stops/s-maple' },
    );

  it('gives a client their own statement on their customer page, without the office’s buttons', async () => {
    signInAs('client');
    const server = mockApi({
      ...customerRoutes,
      'GET /api/statements/customers/c-mira': { status: 200, body: '%PDF' },
    });
    vi.spyOn(window, 'open').mockReturnValue(window);
    Object.defineProperty(URL, 'createObjectURL', { configurable: true, value: vi.fn(() => 'blob:statement') });
    Object.defineProperty(URL, 'revokeObjectURL', { configurable: true, value: vi.fn() });
    const { user } = renderCustomer();
    const dialog = await openStatement(user);
    expect(screen.queryByRole('button', { name: 'Edit' })).not.toBeInTheDocument();
    await user.click(dialog.getByRole('button', { name: 'Get statement' }));
    await waitFor(() => expect(server.callsTo('GET', '/api/statements/customers/c-mira')).toHaveLength(1));
    expect(server.calls.at(-1)?.headers.get('Authorization')).toBe('Bearer token-client');
  });

  it('shows on the customer page beside Edit for the office, and not at all for a sharpener', async () => {
    signInAs('owner');
    mockApi(customerRoutes);
    const first = renderCustomer();
    expect(await screen.findByRole('button', { name: 'Edit' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Statement (PDF)' })).toBeInTheDocument();
    first.unmount();

    signInAs('sharpener');
    renderCustomer();
    expect(await screen.findByRole('heading', { level: 1, name: 'Mira Stylist' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Statement (PDF)' })).not.toBeInTheDocument();
  });

  it('shows on the stop page for the office and not for a sharpener', async () => {
    signInAs('office');
    mockApi(stopRoutes);
    const first = renderStop();
    expect(await screen.findByRole('button', { name: 'Statement (PDF)' })).toBeInTheDocument();
    first.unmount();

    signInAs('sharpener');
    renderStop();
    expect(await screen.findByRole('heading', { level: 1, name: 'Maple Street Salon' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Statement (PDF)' })).not.toBeInTheDocument();
  });
});
