import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { TOKEN, invoiceDetail, invoiceSummary } from '../testing/fixtures';
import type { InvoiceSummary } from '../types';
import { MyInvoicesRoute } from './my-invoices';

const OWED = invoiceSummary();
const PART_PAID_LATE = invoiceSummary({
  id: 'inv-5',
  number: 'KR-2026-0005',
  status: 'part-paid',
  overdue: true,
  daysOverdue: 9,
  billTo: 'stop',
  billToName: 'Pine Street Salon',
  totalCents: 9000,
  balanceCents: 4000,
});
const PAID = invoiceSummary({ id: 'inv-3', number: 'KR-2026-0003', status: 'paid', balanceCents: 0 });

function pageOf(items: InvoiceSummary[]) {
  return { status: 200, body: { items, total: items.length, page: 1, pageSize: 12 } };
}

function renderMine(route = '/my-invoices') {
  return renderWithProviders(
    <Routes>
      <Route
        path="/my-invoices"
        element={
          <>
            <MyInvoicesRoute />
            <LocationProbe />
          </>
        }
      />
    </Routes>,
    { route },
  );
}

const card = (number: string) => screen.getByRole('article', { name: number });

describe('My invoices', () => {
  beforeEach(() => {
    signInAs('client');
    URL.createObjectURL = vi.fn(() => 'blob:keenroute-invoice');
    URL.revokeObjectURL = vi.fn();
  });
  afterEach(() => {
    vi.restoreAllMocks();
  });

  it('lists the client’s invoices with what is owed, and a pay link on those still owed', async () => {
    const server = mockApi({
      'GET /api/invoices': pageOf([OWED, PART_PAID_LATE, PAID]),
      'GET /api/invoices/inv-7': { status: 200, body: invoiceDetail() },
      'GET /api/invoices/inv-5': { status: 200, body: invoiceDetail(PART_PAID_LATE) },
    });
    renderMine();
    await screen.findByRole('article', { name: 'KR-2026-0007' });
    expect(server.callsTo('GET', '/api/invoices')[0]?.search.get('page')).toBe('1');

    const owed = within(card('KR-2026-0007'));
    expect(owed.getByText('Unpaid')).toBeInTheDocument();
    expect(owed.getByText('Billed to Casey Groomer')).toBeInTheDocument();
    expect(owed.getByText('Issued Mar 2, 2026, due Mar 16, 2026')).toBeInTheDocument();
    expect(await owed.findByRole('link', { name: 'Pay $46.76 online' })).toHaveAttribute(
      'href',
      `http://keenroute.test/pay/${TOKEN}`,
    );

    const late = within(card('KR-2026-0005'));
    expect(late.getByText('Part paid')).toBeInTheDocument();
    expect(late.getByText('Overdue 9 days')).toBeInTheDocument();
    expect(late.getByText('Billed to Pine Street Salon (your shop)')).toBeInTheDocument();
    expect(await late.findByRole('link', { name: 'Pay $40.00 online' })).toBeInTheDocument();

    const paid = within(card('KR-2026-0003'));
    expect(paid.getByText('Paid')).toBeInTheDocument();
    expect(paid.getByText('$0.00')).toBeInTheDocument();
    expect(paid.queryByRole('link', { name: /online/ })).not.toBeInTheDocument();
    // Nothing owed, so no detail is fetched for a pay link.
    expect(server.callsTo('GET', '/api/invoices/inv-3')).toHaveLength(0);
  });

  it('opens the PDF with the sign-in token', async () => {
    const open = vi.spyOn(window, 'open').mockReturnValue(window);
    const server = mockApi({
      'GET /api/invoices': pageOf([PAID]),
      'GET /api/invoices/inv-3/pdf': { status: 200, body: '%PDF' },
    });
    const { user } = renderMine();
    await user.click(await screen.findByRole('button', { name: 'Open the PDF of KR-2026-0003' }));
    await waitFor(() => expect(open).toHaveBeenCalledWith('blob:keenroute-invoice', '_blank'));
    expect(server.callsTo('GET', '/api/invoices/inv-3/pdf')[0]?.headers.get('Authorization')).toBe(
      'Bearer token-client',
    );
  });

  it('shows an invoice’s details: lines, discount, tax per rate and the payments received', async () => {
    const detail = invoiceDetail({
      ...PART_PAID_LATE,
      paidCents: 5000,
      payments: [
        {
          id: 'p-1',
          method: 'cheque',
          amountCents: 3000,
          reference: '000184',
          recordedAt: '2026-03-05T17:00:00.000Z',
          onSite: false,
        },
        {
          id: 'p-2',
          method: 'cash',
          amountCents: 2000,
          reference: null,
          recordedAt: '2026-02-24T17:00:00.000Z',
          onSite: true,
        },
      ],
    });
    mockApi({
      'GET /api/invoices': pageOf([PART_PAID_LATE]),
      'GET /api/invoices/inv-5': { status: 200, body: detail },
    });
    const { user } = renderMine();
    await user.click(await screen.findByRole('button', { name: 'Details and payments of KR-2026-0005' }));
    expect(screen.getByTestId('location')).toHaveTextContent('/my-invoices?invoice=inv-5');

    const drawer = within(await screen.findByRole('dialog'));
    const amounts = within(await drawer.findByRole('region', { name: 'What it is for' }));
    const amountOf = (label: string) => amounts.getByText(label).nextElementSibling?.textContent;
    expect(amountOf('Convex straight shear, 6.5 in (KR-000123)')).toBe('$30.00');
    expect(amountOf('Discount (10%)')).toBe('-$4.80');
    expect(amountOf('Subtotal')).toBe('$43.20');
    expect(amountOf('Tax 8.25%')).toBe('$3.56');
    expect(amountOf('Paid')).toBe('-$50.00');
    expect(amountOf('Balance due')).toBe('$40.00');

    const received = within(drawer.getByRole('list', { name: 'Payments received' })).getAllByRole('listitem');
    expect(received.map((item) => item.textContent)).toEqual([
      'ChequeMar 5, 2026 · ref. 000184$30.00',
      'CashFeb 24, 2026 · taken at the stop$20.00',
    ]);
    expect(drawer.getByRole('link', { name: 'Pay $40.00 online' })).toHaveAttribute(
      'href',
      `http://keenroute.test/pay/${TOKEN}`,
    );

    await user.click(drawer.getByRole('button', { name: 'Close the invoice' }));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent(/^\/my-invoices$/));
  });

  it('says when there are no invoices yet', async () => {
    mockApi({ 'GET /api/invoices': pageOf([]) });
    renderMine();
    expect(await screen.findByText('No invoices yet')).toBeInTheDocument();
  });

  it('says when the invoices cannot be loaded', async () => {
    mockApi({ 'GET /api/invoices': { status: 503, body: { statusCode: 503, message: 'Back in a minute.' } } });
    renderMine();
    expect(screen.getByRole('status', { name: 'Loading your invoices' })).toBeInTheDocument();
    expect(await screen.findByText('Your invoices could not be loaded')).toBeInTheDocument();
  });
});
