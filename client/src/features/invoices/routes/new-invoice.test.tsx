import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { invoice, readyGroups } from '../testing/fixtures';
import { NewInvoiceRoute } from './new-invoice';

function renderNew() {
  return renderWithProviders(
    <>
      <Routes>
        <Route path="/invoices/new" element={<NewInvoiceRoute />} />
        <Route path="/invoices/:invoiceId" element={<p>invoice page</p>} />
      </Routes>
      <LocationProbe />
    </>,
    { route: '/invoices/new' },
  );
}

describe('making a new invoice', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('office');
  });

  it('groups the tickets by who pays, all chosen at first, and drafts an invoice from the chosen ones', async () => {
    const server = mockApi({
      'GET /api/invoices/ready': { status: 200, body: readyGroups() },
      'POST /api/invoices': { status: 201, body: invoice({ id: 'inv-9', status: 'draft', number: null }) },
    });
    const { user } = renderNew();

    const pine = await screen.findByRole('region', { name: 'Pine Street Salon (demo)' });
    const ana = screen.getByRole('region', { name: 'Ana Groomer' });
    expect(pine).toHaveTextContent('The stop pays');
    expect(ana).toHaveTextContent('The customer pays');
    expect(ana).toHaveTextContent('No e-mail on file');
    const boxes = within(pine).getAllByRole('checkbox');
    expect(boxes).toHaveLength(2);
    for (const box of boxes) expect(box).toBeChecked();
    expect(within(pine).getByLabelText('Chosen tickets total')).toHaveTextContent('$129.90');
    expect(pine).toHaveTextContent('$10.00 paid on site');

    await user.click(within(pine).getByRole('checkbox', { name: /Jo Barber/ }));
    expect(within(pine).getByLabelText('Chosen tickets total')).toHaveTextContent('$86.60');
    expect(pine).toHaveTextContent('1 of 2 tickets');

    await user.click(within(pine).getByRole('button', { name: 'Add a discount or a note' }));
    await user.click(within(pine).getByRole('radio', { name: 'Percent' }));
    await user.type(within(pine).getByRole('textbox', { name: 'Discount (%)' }), '10');
    await user.type(within(pine).getByRole('textbox', { name: 'Note on the invoice' }), 'Thank you for March.');
    await user.click(within(pine).getByRole('button', { name: 'Make the draft invoice' }));

    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/invoices/inv-9'));
    expect(server.callsTo('POST', '/api/invoices')[0]?.body).toEqual({
      ticketIds: ['t-1'],
      discountBp: 1000,
      notes: 'Thank you for March.',
    });
  });

  it('refuses a discount it cannot read, and a card with no ticket chosen', async () => {
    const server = mockApi({ 'GET /api/invoices/ready': { status: 200, body: readyGroups() } });
    const { user } = renderNew();
    const ana = await screen.findByRole('region', { name: 'Ana Groomer' });

    await user.click(within(ana).getByRole('button', { name: 'Add a discount or a note' }));
    await user.click(within(ana).getByRole('radio', { name: 'Amount' }));
    await user.type(within(ana).getByRole('textbox', { name: 'Discount (USD)' }), '12.505');
    await user.click(within(ana).getByRole('button', { name: 'Make the draft invoice' }));
    expect(await within(ana).findByText(/The discount must be an amount like 42.50/)).toBeInTheDocument();

    await user.click(within(ana).getByRole('checkbox', { name: /Ana Groomer/ }));
    expect(within(ana).getByRole('button', { name: 'Make the draft invoice' })).toBeDisabled();
    expect(ana).toHaveTextContent('Choose at least one ticket.');
    expect(server.callsTo('POST', '/api/invoices')).toHaveLength(0);
  });

  it('shows the server’s reason when it refuses the draft, and stays on the page', async () => {
    mockApi({
      'GET /api/invoices/ready': { status: 200, body: readyGroups() },
      'POST /api/invoices': {
        status: 409,
        body: { statusCode: 409, message: 'Ticket of Feb 27 is already on invoice KR-2026-0003.' },
      },
    });
    const { user } = renderNew();
    const pine = await screen.findByRole('region', { name: 'Pine Street Salon (demo)' });
    await user.click(within(pine).getByRole('button', { name: 'Make the draft invoice' }));
    expect(await screen.findByText('Ticket of Feb 27 is already on invoice KR-2026-0003.')).toBeInTheDocument();
    expect(screen.getByTestId('location')).toHaveTextContent('/invoices/new');
  });

  it('says when no ticket is waiting for an invoice', async () => {
    mockApi({ 'GET /api/invoices/ready': { status: 200, body: [] } });
    renderNew();
    expect(await screen.findByText('No tickets are waiting for an invoice.')).toBeInTheDocument();
  });
});
