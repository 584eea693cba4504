import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { session } from '@/lib/session';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { leaveForCheckout } from '../leave-for-checkout';
import { recallPaidBefore } from '../paid-before';
import { TOKEN, publicInvoice } from '../testing/fixtures';
import type { PublicInvoice } from '../types';
import { PayRoute } from './pay';

vi.mock('../leave-for-checkout', () => ({ leaveForCheckout: vi.fn() }));

const INVOICE_PATH = `/api/public/invoices/${TOKEN}`;
const CHECKOUT_PATH = `${INVOICE_PATH}/checkout`;

function renderPay() {
  return renderWithProviders(
    <Routes>
      <Route path="/pay/:token" element={<PayRoute />} />
    </Routes>,
    { route: `/pay/${TOKEN}` },
  );
}

function payApi(invoice: PublicInvoice, extra: Parameters<typeof mockApi>[0] = {}) {
  return mockApi({ [`GET ${INVOICE_PATH}`]: { status: 200, body: invoice }, ...extra });
}

const amounts = () => within(screen.getByRole('region', { name: 'What it is for' }));
const amountOf = (label: string) => amounts().getByText(label).nextElementSibling?.textContent;

describe('the pay page behind an invoice’s private link', () => {
  beforeEach(() => {
    session.end('never-signed-in');
    window.sessionStorage.clear();
    vi.mocked(leaveForCheckout).mockClear();
  });

  it('shows an unpaid invoice in full: who from, dates, lines, discount, tax, total and the balance', async () => {
    payApi(publicInvoice());
    renderPay();
    expect(await screen.findByRole('heading', { name: 'Invoice KR-2026-0007' })).toBeInTheDocument();
    expect(screen.getAllByText('Teal Edge Sharpening (demo)').length).toBeGreaterThan(0);
    expect(screen.getByText('Unpaid')).toBeInTheDocument();
    expect(screen.getByText('Pine Street Salon')).toBeInTheDocument();
    expect(screen.getByText('Mar 2, 2026')).toBeInTheDocument();
    expect(screen.getByText('Mar 16, 2026')).toBeInTheDocument();
    expect(amountOf('Convex straight shear, 6.5 in (KR-000123)')).toBe('$30.00');
    expect(amountOf('Thinning shear (KR-000045)')).toBe('$18.00');
    // 4800 of lines + 356 of tax − 4676 total: the 10% discount the public invoice implies.
    expect(amountOf('Discount')).toBe('-$4.80');
    expect(amountOf('Tax')).toBe('$3.56');
    expect(amountOf('Total')).toBe('$46.76');
    expect(amountOf('Balance due')).toBe('$46.76');
    expect(amounts().queryByText('Paid')).not.toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Download PDF' })).toHaveAttribute('href', `${INVOICE_PATH}/pdf`);
    expect(screen.getByRole('link', { name: 'office@demo.keenroute.test' })).toHaveAttribute(
      'href',
      'mailto:office@demo.keenroute.test',
    );
    expect(screen.getByRole('link', { name: '+1 541 555 0142' })).toHaveAttribute('href', 'tel:+15415550142');
  });

  it('opens a checkout for the balance and leaves for its page, noting what was paid before', async () => {
    const server = payApi(publicInvoice({ status: 'part-paid', paidCents: 1000, balanceCents: 3676 }), {
      [`POST ${CHECKOUT_PATH}`]: { status: 200, body: { url: 'http://127.0.0.1:12111/checkout/cs_test_1' } },
    });
    const { user } = renderPay();
    await user.click(await screen.findByRole('button', { name: 'Pay $36.76 online' }));
    await waitFor(() => expect(leaveForCheckout).toHaveBeenCalledWith('http://127.0.0.1:12111/checkout/cs_test_1'));
    expect(server.callsTo('POST', CHECKOUT_PATH)).toHaveLength(1);
    expect(server.callsTo('POST', CHECKOUT_PATH)[0]?.headers.get('Authorization')).toBeNull();
    expect(recallPaidBefore(TOKEN)).toBe(1000);
    expect(screen.getByText('Opening the secure payment page…')).toBeInTheDocument();
    expect(amountOf('Paid')).toBe('-$10.00');
  });

  it('marks an overdue invoice and its due date', async () => {
    payApi(publicInvoice({ overdue: true }));
    renderPay();
    expect(await screen.findByText('Overdue')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Pay $46.76 online' })).toBeInTheDocument();
  });

  it('says a paid invoice is paid and offers no payment', async () => {
    payApi(publicInvoice({ status: 'paid', paidCents: 4676, balanceCents: 0, canPayOnline: false }));
    renderPay();
    expect(await screen.findByText('Paid in full')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /online/ })).not.toBeInTheDocument();
    expect(amountOf('Paid')).toBe('-$46.76');
    expect(amountOf('Balance due')).toBe('$0.00');
  });

  it('says a void invoice is void, owes nothing and offers no payment', async () => {
    payApi(publicInvoice({ status: 'void', canPayOnline: false }));
    renderPay();
    expect(await screen.findByText('This invoice is void')).toBeInTheDocument();
    expect(screen.getByText(/nothing is owed on it/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /online/ })).not.toBeInTheDocument();
    expect(screen.queryByText('Overdue')).not.toBeInTheDocument();
  });

  it('says when online payment is not open although something is owed', async () => {
    payApi(publicInvoice({ canPayOnline: false }));
    renderPay();
    expect(await screen.findByText('Online payment is not open for this invoice')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /online/ })).not.toBeInTheDocument();
  });

  it('says a bad link is not valid, without an error notice', async () => {
    mockApi({ [`GET ${INVOICE_PATH}`]: { status: 404, body: { statusCode: 404, message: 'Invoice not found.' } } });
    renderPay();
    expect(await screen.findByText('This pay link is not valid')).toBeInTheDocument();
    expect(screen.queryByText('Invoice not found.')).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /online/ })).not.toBeInTheDocument();
  });

  it('when the checkout is refused as already paid, reloads the invoice and shows it paid', async () => {
    let paidMeanwhile = false;
    const server = mockApi({
      [`GET ${INVOICE_PATH}`]: () => ({
        status: 200,
        body: paidMeanwhile
          ? publicInvoice({ status: 'paid', paidCents: 4676, balanceCents: 0, canPayOnline: false })
          : publicInvoice(),
      }),
      [`POST ${CHECKOUT_PATH}`]: () => {
        paidMeanwhile = true;
        return { status: 409, body: { statusCode: 409, message: 'Nothing is owed on this invoice.' } };
      },
    });
    const { user } = renderPay();
    await user.click(await screen.findByRole('button', { name: 'Pay $46.76 online' }));
    expect(await screen.findByText('Paid in full')).toBeInTheDocument();
    expect(server.callsTo('GET', INVOICE_PATH)).toHaveLength(2);
    expect(leaveForCheckout).not.toHaveBeenCalled();
  });
});
