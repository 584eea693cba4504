import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { auditEntry } from '../testing/fixtures';
import { AuditLogRoute } from './audit-log';

const rows = [
  auditEntry(),
  auditEntry({
    id: 'entry-2',
    actorId: null,
    actorEmail: null,
    action: 'payment-recorded',
    subjectType: 'invoice',
    subjectId: 'inv-3',
    detail: { paymentId: 'p-1', invoiceNumber: 'KR-2026-0003', method: 'online', amountCents: 5000, reference: 'pi_1' },
    ip: null,
  }),
];
const page = (items = rows, total = items.length) => ({ status: 200, body: { items, total, page: 1, pageSize: 50 } });

function renderLog(route = '/audit') {
  return renderWithProviders(
    <>
      <Routes>
        <Route path="/audit" element={<AuditLogRoute />} />
      </Routes>
      <LocationProbe />
    </>,
    { route },
  );
}

describe('the audit log page', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('owner');
  });
  afterEach(() => {
    vi.restoreAllMocks();
  });

  it('shows when, who, the kind, what changed, a link to it and the address, with the owner’s token', async () => {
    const server = mockApi({ 'GET /api/audit': page() });
    renderLog();

    const table = await screen.findByRole('table', { name: 'Audit log' });
    const [, override, payment] = within(table).getAllByRole('row');
    expect(override).toHaveTextContent('office@demo.keenroute.test');
    expect(override).toHaveTextContent('Price set by hand');
    expect(override).toHaveTextContent('$42.00 → $27.50 · Loyal shop');
    expect(override).toHaveTextContent('203.0.113.9');
    expect(within(override!).getByRole('link', { name: 'Ticket' })).toHaveAttribute('href', '/tickets/ticket-7');
    expect(payment).toHaveTextContent('Payment service');
    expect(payment).toHaveTextContent('$50.00 online · on KR-2026-0003');
    expect(within(payment!).getByRole('link', { name: 'KR-2026-0003' })).toHaveAttribute('href', '/invoices/inv-3');
    expect(server.calls[0]?.headers.get('Authorization')).toBe('Bearer token-owner');
    expect(server.calls[0]?.search.get('pageSize')).toBe('50');
  });

  it('asks the server by kind, who and days, keeps them in the URL, and pages', async () => {
    const server = mockApi({ 'GET /api/audit': page(rows, 120) });
    const { user } = renderLog();
    await screen.findByRole('table', { name: 'Audit log' });
    expect(server.calls[0]?.search.has('action')).toBe(false);

    await user.click(screen.getByRole('combobox', { name: 'Kind' }));
    await user.click(await screen.findByRole('option', { name: 'Sign-in refused' }));
    await waitFor(() => expect(server.calls.at(-1)?.search.get('action')).toBe('sign-in-failed'));

    await user.type(screen.getByRole('searchbox', { name: 'Who' }), 'office{Enter}');
    await waitFor(() => expect(server.calls.at(-1)?.search.get('actor')).toBe('office'));

    await user.type(screen.getByLabelText('From'), '2026-03-01');
    await waitFor(() => expect(server.calls.at(-1)?.search.get('from')).toBe('2026-03-01'));
    expect(server.calls.at(-1)?.search.get('action')).toBe('sign-in-failed');

    await user.click(screen.getByRole('button', { name: '2' }));
    await waitFor(() => expect(server.calls.at(-1)?.search.get('page')).toBe('2'));
    expect(screen.getByTestId('location')).toHaveTextContent(
      '/audit?action=sign-in-failed&actor=office&from=2026-03-01&page=2',
    );
  });

  it('reads its filters from the URL, and says when nothing matches', async () => {
    const server = mockApi({ 'GET /api/audit': page([]) });
    const { user } = renderLog('/audit?action=invoice-voided&from=2026-01-01&to=2026-01-31');
    expect(await screen.findByText('No entry matches these filters.')).toBeInTheDocument();
    const [call] = server.calls;
    expect(call?.search.get('action')).toBe('invoice-voided');
    expect(call?.search.get('from')).toBe('2026-01-01');
    expect(call?.search.get('to')).toBe('2026-01-31');

    await user.click(screen.getByRole('button', { name: 'Show every entry' }));
    await waitFor(() => expect(server.calls.at(-1)?.search.has('action')).toBe(false));
    expect(server.calls.at(-1)?.search.has('from')).toBe(false);
  });

  it('does not ask with the days the wrong way round, and says why', async () => {
    const server = mockApi({ 'GET /api/audit': page() });
    renderLog('/audit?from=2026-04-01&to=2026-03-01');
    expect(await screen.findByRole('alert')).toHaveTextContent('The first day must come before the last.');
    expect(server.calls).toHaveLength(0);
  });

  it('shows the server’s refusal with a way to try again', async () => {
    mockApi({ 'GET /api/audit': { status: 403, body: { statusCode: 403, message: 'Your role may not do this.' } } });
    renderLog();
    const alert = (await screen.findByText('The audit log could not be loaded')).closest<HTMLElement>('[role="alert"]');
    expect(within(alert!).getByText('Your role may not do this.')).toBeInTheDocument();
    expect(within(alert!).getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});
