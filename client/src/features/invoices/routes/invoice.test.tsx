import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { catchDownloads } from '@/testing/downloads';
import { mockApi } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { invoice } from '../testing/fixtures';
import type { Invoice, InvoiceMail } from '../types';
import { InvoiceRoute } from './invoice';

const MAILS: InvoiceMail[] = [
  {
    id: 'm-2',
    kind: 'reminder',
    toEmail: 'frontdesk@pine.demo.keenroute.test',
    subject: 'Reminder: invoice KR-2026-0007',
    status: 'failed',
    error: 'Mailbox unavailable',
    createdAt: '2026-03-24T08:15:00Z',
  },
];

function renderInvoice() {
  return renderWithProviders(
    <>
      <Routes>
        <Route path="/invoices" element={<p>invoices list</p>} />
        <Route path="/invoices/:invoiceId" element={<InvoiceRoute />} />
      </Routes>
      <LocationProbe />
    </>,
    { route: '/invoices/inv-1' },
  );
}

const detailRoutes = (record: Invoice) => ({
  'GET /api/invoices/inv-1': { status: 200, body: record },
  'GET /api/invoices/inv-1/mails': { status: 200, body: MAILS },
});

describe('an invoice', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('office');
  });
  afterEach(() => {
    vi.restoreAllMocks();
  });

  it('shows who pays, the lines, discount, tax per rate, total and balance, and the send log', async () => {
    mockApi(detailRoutes(invoice({ overdue: true, daysOverdue: 8 })));
    renderInvoice();

    expect(await screen.findByRole('heading', { level: 1, name: 'Invoice KR-2026-0007' })).toBeInTheDocument();
    expect(screen.getByText('8 days overdue')).toBeInTheDocument();
    expect(
      screen.getByText('14 Pine Street Riverton 97001', { normalizer: (text) => text.replace(/\s+/g, ' ') }),
    ).toBeInTheDocument();
    const lines = screen.getByRole('table', { name: 'Invoice lines' });
    expect(within(lines).getAllByRole('row')).toHaveLength(3);
    expect(lines).toHaveTextContent('KR-000123 Demo Forge Cobalt 65, convex straight');
    expect(lines).toHaveTextContent('$42.00');
    const totals = screen.getByLabelText('Totals');
    expect(totals).toHaveTextContent('Lines$80.00');
    expect(totals).toHaveTextContent('Discount (10%)-$8.00');
    expect(totals).toHaveTextContent('Subtotal$72.00');
    expect(totals).toHaveTextContent('Tax 8.25% on $72.00$5.94');
    expect(totals).toHaveTextContent('Total$77.94');
    expect(totals).toHaveTextContent('Balance due$77.94');

    const log = await screen.findByRole('list', { name: 'Send log' });
    expect(log).toHaveTextContent('Reminder');
    expect(log).toHaveTextContent('Failed');
    expect(log).toHaveTextContent('Mailbox unavailable');
  });

  it('shows a queued e-mail as queued, and reads the log again until it went', async () => {
    let status: InvoiceMail['status'] = 'queued';
    const server = mockApi({
      'GET /api/invoices/inv-1': { status: 200, body: invoice() },
      'GET /api/invoices/inv-1/mails': () => ({
        status: 200,
        body: [{ ...MAILS[0]!, kind: 'invoice', status, error: null }],
      }),
    });
    renderInvoice();
    const log = await screen.findByRole('list', { name: 'Send log' });
    expect(log).toHaveTextContent('Queued');
    status = 'sent';
    await waitFor(() => expect(log).toHaveTextContent('Sent'), { timeout: 8000 });
    expect(server.callsTo('GET', '/api/invoices/inv-1/mails').length).toBeGreaterThanOrEqual(2);
  });

  it('records a part payment by cheque, asking for the cheque number, with a receipt', async () => {
    const paid = invoice({
      status: 'part-paid',
      paidCents: 5000,
      balanceCents: 2794,
      payments: [
        {
          id: 'p-1',
          method: 'cheque',
          amountCents: 5000,
          reference: '1042',
          recordedAt: '2026-03-05T10:00:00Z',
          onSite: false,
        },
      ],
    });
    const server = mockApi({
      ...detailRoutes(invoice()),
      'POST /api/invoices/inv-1/payments': { status: 201, body: paid },
    });
    const { user } = renderInvoice();
    await user.click(await screen.findByRole('button', { name: 'Record payment' }));
    const dialog = await screen.findByRole('dialog', { name: 'Record a payment' });
    const amount = within(dialog).getByRole('textbox', { name: 'Amount' });
    expect(amount).toHaveValue('77.94');
    expect(within(dialog).getByRole('checkbox', { name: /E-mail a receipt to frontdesk@/ })).toBeChecked();

    await user.clear(amount);
    await user.type(amount, '80');
    await user.click(within(dialog).getByRole('radio', { name: 'Cheque' }));
    await user.click(within(dialog).getByRole('button', { name: 'Record payment' }));
    expect(await within(dialog).findByText('That is more than is owed ($77.94).')).toBeInTheDocument();
    expect(within(dialog).getByText('Write down the cheque number.')).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/invoices/inv-1/payments')).toHaveLength(0);

    await user.clear(amount);
    await user.type(amount, '50');
    await user.type(within(dialog).getByRole('textbox', { name: 'Cheque number' }), '1042');
    await user.click(within(dialog).getByRole('button', { name: 'Record payment' }));

    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(server.callsTo('POST', '/api/invoices/inv-1/payments')[0]?.body).toEqual({
      method: 'cheque',
      amountCents: 5000,
      reference: '1042',
      sendReceipt: true,
    });
    expect(screen.getByText('Part paid')).toBeInTheDocument();
    expect(screen.getByLabelText('Balance due')).toHaveTextContent('$27.94');
    expect(screen.getByRole('list', { name: 'Payments' })).toHaveTextContent('1042');
  });

  it('sends to the address on the invoice or another, and keeps the dialog open when the mail server fails', async () => {
    let fail = true;
    const server = mockApi({
      ...detailRoutes(invoice()),
      'POST /api/invoices/inv-1/send': () =>
        fail
          ? { status: 502, body: { statusCode: 502, message: 'The mail server refused the message: try again.' } }
          : { status: 200, body: invoice({ sentAt: '2026-03-02T10:05:00Z' }) },
    });
    const { user } = renderInvoice();
    await user.click(await screen.findByRole('button', { name: 'Send by e-mail' }));
    const dialog = await screen.findByRole('dialog', { name: 'Send the invoice' });
    const to = within(dialog).getByRole('textbox', { name: 'To' });
    expect(to).toHaveValue('frontdesk@pine.demo.keenroute.test');
    await user.clear(to);
    await user.type(to, 'owner@pine.demo.keenroute.test');
    await user.click(within(dialog).getByRole('button', { name: 'Send' }));
    expect(await screen.findByText('The mail server refused the message: try again.')).toBeInTheDocument();
    expect(screen.getByRole('dialog', { name: 'Send the invoice' })).toBeInTheDocument();

    fail = false;
    await user.click(within(dialog).getByRole('button', { name: 'Send' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(server.callsTo('POST', '/api/invoices/inv-1/send').map((call) => call.body)).toEqual([
      { to: 'owner@pine.demo.keenroute.test' },
      { to: 'owner@pine.demo.keenroute.test' },
    ]);
    expect(await screen.findByRole('button', { name: 'Resend by e-mail' })).toBeInTheDocument();
    // The failed attempt wrote a log row too, so the log is read again after each try.
    expect(server.callsTo('GET', '/api/invoices/inv-1/mails').length).toBeGreaterThanOrEqual(3);
  });

  it('voids with a reason and makes a credit note within what is left to credit', async () => {
    const server = mockApi({
      ...detailRoutes(invoice()),
      'POST /api/invoices/inv-1/void': {
        status: 200,
        body: invoice({ status: 'void', voidReason: 'Billed to the wrong stop', payUrl: null }),
      },
      'POST /api/invoices/inv-1/credit-notes': { status: 201, body: invoice({ creditedCents: 1000 }) },
    });
    const { user } = renderInvoice();

    await user.click(await screen.findByRole('button', { name: 'Credit note' }));
    const credit = await screen.findByRole('dialog', { name: 'Credit note' });
    const amount = within(credit).getByRole('textbox', { name: 'Amount' });
    await user.clear(amount);
    await user.type(amount, '100');
    await user.click(within(credit).getByRole('button', { name: 'Make the credit note' }));
    expect(await within(credit).findByText(/at most \$77\.94/)).toBeInTheDocument();
    expect(within(credit).getByText('Say why, for the record and the customer.')).toBeInTheDocument();
    await user.clear(amount);
    await user.type(amount, '10');
    await user.type(within(credit).getByRole('textbox', { name: 'Reason' }), 'One pair was not done');
    await user.click(within(credit).getByRole('button', { name: 'Make the credit note' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(server.callsTo('POST', '/api/invoices/inv-1/credit-notes')[0]?.body).toEqual({
      amountCents: 1000,
      reason: 'One pair was not done',
      refundMethod: 'none',
    });

    await user.click(screen.getByRole('button', { name: 'Void' }));
    const dialog = await screen.findByRole('dialog', { name: 'Void KR-2026-0007' });
    await user.click(within(dialog).getByRole('button', { name: 'Void the invoice' }));
    expect(await within(dialog).findByText('Say why it is void, for the record.')).toBeInTheDocument();
    await user.type(within(dialog).getByRole('textbox', { name: 'Reason' }), 'Billed to the wrong stop');
    await user.click(within(dialog).getByRole('button', { name: 'Void the invoice' }));
    expect(await screen.findByText('This invoice is void')).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/invoices/inv-1/void')[0]?.body).toEqual({ reason: 'Billed to the wrong stop' });
    expect(screen.queryByRole('button', { name: 'Record payment' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Void' })).not.toBeInTheDocument();
  });

  it('issues a draft: it gets its number and can no longer be deleted', async () => {
    const draft = invoice({ status: 'draft', number: null, issueDate: null, dueDate: null, payUrl: null });
    const server = mockApi({
      ...detailRoutes(draft),
      'POST /api/invoices/inv-1/issue': { status: 200, body: invoice() },
      'DELETE /api/invoices/inv-1': { status: 204 },
    });
    const { user } = renderInvoice();
    expect(await screen.findByRole('heading', { level: 1, name: 'Draft invoice' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Record payment' })).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Issue' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Invoice KR-2026-0007' })).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/invoices/inv-1/issue')).toHaveLength(1);
    expect(screen.queryByRole('button', { name: 'Delete draft' })).not.toBeInTheDocument();
  });

  it('deletes a draft and goes back to the list', async () => {
    const draft = invoice({ status: 'draft', number: null, issueDate: null, dueDate: null, payUrl: null });
    const server = mockApi({ ...detailRoutes(draft), 'DELETE /api/invoices/inv-1': { status: 204 } });
    const { user } = renderInvoice();
    await user.click(await screen.findByRole('button', { name: 'Delete draft' }));
    const dialog = await screen.findByRole('dialog', { name: 'Delete the draft' });
    await user.click(within(dialog).getByRole('button', { name: 'Delete the draft' }));
    await waitFor(() => expect(screen.getByTestId('location').textContent).toBe('/invoices'));
    expect(server.callsTo('DELETE', '/api/invoices/inv-1')).toHaveLength(1);
  });

  it('edits a draft’s discount, sending the version and clearing the other kind', async () => {
    const draft = invoice({ status: 'draft', number: null, payUrl: null });
    const server = mockApi({
      ...detailRoutes(draft),
      'PATCH /api/invoices/inv-1': { status: 200, body: { ...draft, discountBp: 0, discountCents: 500 } },
    });
    const { user } = renderInvoice();
    await user.click(await screen.findByRole('button', { name: 'Discount and note' }));
    const dialog = await screen.findByRole('dialog', { name: 'Discount and note' });
    expect(within(dialog).getByRole('textbox', { name: 'Discount (%)' })).toHaveValue('10');
    await user.click(within(dialog).getByRole('radio', { name: 'Amount' }));
    await user.type(within(dialog).getByRole('textbox', { name: 'Discount (USD)' }), '90');
    await user.click(within(dialog).getByRole('button', { name: 'Save the draft' }));
    expect(await within(dialog).findByText('That is more than the lines come to ($80.00).')).toBeInTheDocument();
    const field = within(dialog).getByRole('textbox', { name: 'Discount (USD)' });
    await user.clear(field);
    await user.type(field, '5');
    await user.click(within(dialog).getByRole('button', { name: 'Save the draft' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(server.callsTo('PATCH', '/api/invoices/inv-1')[0]?.body).toEqual({
      version: 3,
      notes: '',
      discountBp: 0,
      discountCents: 500,
    });
  });

  it('downloads the PDF with the sign-in token under the invoice number', async () => {
    const downloads = catchDownloads();
    const server = mockApi({
      ...detailRoutes(invoice()),
      'GET /api/invoices/inv-1/pdf': { status: 200, body: '%PDF' },
    });
    const { user } = renderInvoice();
    await user.click(await screen.findByRole('button', { name: 'Download PDF' }));
    await waitFor(() => expect(downloads.names).toEqual(['KR-2026-0007.pdf']));
    expect(server.callsTo('GET', '/api/invoices/inv-1/pdf')[0]?.headers.get('Authorization')).toBe(
      'Bearer token-office',
    );
  });

  it('copies the pay link', async () => {
    mockApi(detailRoutes(invoice()));
    // user-event puts a clipboard stand-in on navigator; it reads back what was written.
    const { user } = renderInvoice();
    await user.click(await screen.findByRole('button', { name: 'Copy pay link' }));
    await expect(navigator.clipboard.readText()).resolves.toBe('http://keenroute.test/pay/tok-123');
    expect(await screen.findByRole('button', { name: 'Pay link copied' })).toBeInTheDocument();
  });

  it('lets a sharpener record a payment and download, nothing more, and reads no send log', async () => {
    signInAs('sharpener');
    // No mock for the send log: asking for it would fail the test.
    mockApi({ 'GET /api/invoices/inv-1': { status: 200, body: invoice() } });
    renderInvoice();
    const actions = await screen.findByRole('region', { name: 'Actions' });
    expect(
      within(actions)
        .getAllByRole('button')
        .map((button) => button.textContent),
    ).toEqual(['Record payment', 'Download PDF']);
  });

  it('gives a client the PDF and the pay link', async () => {
    signInAs('client');
    mockApi({ 'GET /api/invoices/inv-1': { status: 200, body: invoice() } });
    renderInvoice();
    const actions = await screen.findByRole('region', { name: 'Actions' });
    expect(within(actions).getByRole('link', { name: 'Pay online' })).toHaveAttribute(
      'href',
      'http://keenroute.test/pay/tok-123',
    );
    expect(
      within(actions)
        .getAllByRole('button')
        .map((button) => button.textContent),
    ).toEqual(['Download PDF']);
    expect(screen.getByRole('link', { name: 'My invoices' })).toHaveAttribute('href', '/my-invoices');
  });

  it('says so when the invoice is not there or not theirs', async () => {
    mockApi({ 'GET /api/invoices/inv-1': { status: 404, body: { statusCode: 404, message: 'Invoice not found.' } } });
    renderInvoice();
    expect(await screen.findByText('This invoice was not found')).toBeInTheDocument();
  });
});
