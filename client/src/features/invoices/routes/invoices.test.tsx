import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { catchDownloads } from '@/testing/downloads';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { invoiceSummary } from '../testing/fixtures';
import { InvoicesRoute } from './invoices';

const rows = [
  invoiceSummary({ status: 'part-paid', overdue: true, daysOverdue: 12, balanceCents: 4871 }),
  invoiceSummary({
    id: 'inv-2',
    number: null,
    status: 'draft',
    billTo: 'customer',
    billToName: 'Ana Groomer',
    issueDate: null,
    dueDate: null,
    totalCents: 5000,
    balanceCents: 5000,
  }),
];

function renderList(route = '/invoices') {
  return renderWithProviders(
    <Routes>
      <Route path="/invoices" element={<InvoicesRoute />} />
    </Routes>,
    { route },
  );
}

describe('the invoices list', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('office');
  });
  afterEach(() => {
    vi.restoreAllMocks();
  });

  it('shows number or Draft, who pays, status with days overdue, balance and total, each linking to the invoice', async () => {
    mockApi({ 'GET /api/invoices': { status: 200, body: { items: rows, total: 2, page: 1, pageSize: 25 } } });
    renderList();

    const table = await screen.findByRole('table', { name: 'Invoices' });
    const [, overdueRow, draftRow] = within(table).getAllByRole('row');
    expect(within(overdueRow!).getByRole('link', { name: 'KR-2026-0007' })).toHaveAttribute('href', '/invoices/inv-1');
    expect(overdueRow).toHaveTextContent('Pine Street Salon (demo)');
    expect(overdueRow).toHaveTextContent('Part paid');
    expect(overdueRow).toHaveTextContent('12 days overdue');
    expect(overdueRow).toHaveTextContent('$48.71');
    expect(overdueRow).toHaveTextContent('$97.42');
    expect(overdueRow).toHaveTextContent('Mar 16, 2026');
    expect(within(draftRow!).getByRole('link', { name: 'Draft' })).toHaveAttribute('href', '/invoices/inv-2');
    expect(draftRow).toHaveTextContent('$50.00');
    expect(screen.getByRole('link', { name: 'New invoice' })).toHaveAttribute('href', '/invoices/new');
    expect(screen.getByRole('link', { name: 'Business profile' })).toHaveAttribute('href', '/settings/business');
  });

  it('asks the server by status chip, sends overdue as its own flag, searches and pages', async () => {
    const server = mockApi({
      'GET /api/invoices': { status: 200, body: { items: rows, total: 60, page: 1, pageSize: 25 } },
    });
    const { user } = renderList();
    await screen.findByRole('table', { name: 'Invoices' });
    expect(server.calls[0]?.search.get('page')).toBe('1');
    expect(server.calls[0]?.search.has('status')).toBe(false);

    await user.click(screen.getByRole('radio', { name: 'Paid' }));
    await waitFor(() => expect(server.calls.at(-1)?.search.get('status')).toBe('paid'));

    await user.click(screen.getByRole('radio', { name: 'Overdue' }));
    await waitFor(() => expect(server.calls.at(-1)?.search.get('overdue')).toBe('true'));
    expect(server.calls.at(-1)?.search.has('status')).toBe(false);

    await user.type(screen.getByRole('searchbox', { name: 'Search invoices' }), 'pine{Enter}');
    await waitFor(() => expect(server.calls.at(-1)?.search.get('q')).toBe('pine'));

    await user.click(screen.getByRole('button', { name: '2' }));
    await waitFor(() => expect(server.calls.at(-1)?.search.get('page')).toBe('2'));
    expect(server.calls.at(-1)?.search.get('q')).toBe('pine');
  });

  it('says when nothing matches and clears the filters', async () => {
    const server = mockApi({
      'GET /api/invoices': (request) => ({
        status: 200,
        body: { items: request.search.has('status') ? [] : rows, total: 0, page: 1, pageSize: 25 },
      }),
    });
    const { user } = renderList('/invoices?status=void');
    expect(await screen.findByText('No invoice matches these filters.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Show all invoices' }));
    await screen.findByRole('table', { name: 'Invoices' });
    expect(server.calls.at(-1)?.search.has('status')).toBe(false);
  });

  it('downloads the invoices and payments CSV for a period with the sign-in token', async () => {
    const downloads = catchDownloads();
    const server = mockApi({
      'GET /api/invoices': { status: 200, body: { items: rows, total: 2, page: 1, pageSize: 25 } },
      'GET /api/invoices/export.csv': { status: 200, body: 'number,status' },
      'GET /api/payments/export.csv': { status: 200, body: 'date,invoice number' },
    });
    const { user } = renderList();
    await screen.findByRole('table', { name: 'Invoices' });
    await user.click(screen.getByRole('button', { name: 'Export CSV' }));
    const dialog = await screen.findByRole('dialog', { name: 'Export for the books' });

    const from = within(dialog).getByLabelText('From');
    const to = within(dialog).getByLabelText('To');
    await user.clear(from);
    await user.type(from, '2026-04-01');
    await user.clear(to);
    await user.type(to, '2026-03-01');
    expect(within(dialog).getByRole('alert')).toHaveTextContent('The first day must come before the last.');
    expect(within(dialog).getByRole('button', { name: 'Invoices CSV' })).toBeDisabled();

    await user.clear(from);
    await user.type(from, '2026-01-01');
    await user.click(within(dialog).getByRole('button', { name: 'Invoices CSV' }));
    await waitFor(() => expect(downloads.names).toEqual(['keenroute-invoices-2026-01-01-to-2026-03-01.csv']));
    const [call] = server.callsTo('GET', '/api/invoices/export.csv');
    expect(call?.headers.get('Authorization')).toBe('Bearer token-office');
    expect(call?.search.get('from')).toBe('2026-01-01');
    expect(call?.search.get('to')).toBe('2026-03-01');
    expect(await downloads.blobs[0]!.text()).toContain('number,status');

    await user.click(within(dialog).getByRole('button', { name: 'Payments CSV' }));
    await waitFor(() => expect(downloads.names).toHaveLength(2));
    expect(downloads.names[1]).toBe('keenroute-payments-2026-01-01-to-2026-03-01.csv');
    expect(server.callsTo('GET', '/api/payments/export.csv')[0]?.headers.get('Authorization')).toBe(
      'Bearer token-office',
    );
  });

  it('sends the due reminders now, says what happened and fetches the list again', async () => {
    const server = mockApi({
      'GET /api/invoices': { status: 200, body: { items: rows, total: 2, page: 1, pageSize: 25 } },
      'POST /api/invoices/reminders/run': {
        status: 200,
        body: { today: '2026-03-31', queued: 2, sent: 2, skipped: 1, cancelled: 0, failed: 0 },
      },
    });
    const { user } = renderList();
    await screen.findByRole('table', { name: 'Invoices' });
    const listFetches = server.callsTo('GET', '/api/invoices').length;

    await user.click(screen.getByRole('button', { name: 'Send due reminders' }));
    expect(
      await screen.findByText('Reminders: 2 sent, 1 skipped (a later stage was due), 0 stopped (paid or void)'),
    ).toBeInTheDocument();
    const [run] = server.callsTo('POST', '/api/invoices/reminders/run');
    expect(run?.headers.get('Authorization')).toBe('Bearer token-office');
    await waitFor(() => expect(server.callsTo('GET', '/api/invoices').length).toBeGreaterThan(listFetches));
  });
});
