import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { line, ticket } from '../testing/fixtures';
import type { PaymentInput, Ticket } from '../types';
import { TicketRoute } from './ticket';

const handedBack = ticket({
  status: 'handed-back',
  lines: [line({ benchStatus: 'handed-back' })],
  finishedAt: '2025-03-03T10:00:00Z',
  handedBackAt: '2025-03-03T10:05:00Z',
});

function renderTicket() {
  return renderWithProviders(
    <Routes>
      <Route path="/tickets/:ticketId" element={<TicketRoute />} />
    </Routes>,
    { route: '/tickets/t-1' },
  );
}

function withPayment(current: Ticket, input: PaymentInput): Ticket {
  const payments = [
    ...current.payments,
    { id: `p-${current.payments.length + 1}`, reference: null, recordedAt: '2025-03-03T10:06:00Z', ...input },
  ];
  const paid = payments.reduce((sum, payment) => sum + payment.amountCents, 0);
  return { ...current, payments, settlement: paid >= current.price.totalCents ? 'paid-on-site' : 'unpaid' };
}

describe('taking payment on a ticket', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('sharpener');
  });

  it('hands the shears back, then offers payment with what is due prefilled', async () => {
    const server = mockApi({
      'GET /api/tickets/t-1': {
        status: 200,
        body: ticket({ status: 'finished', lines: [line({ benchStatus: 'ready' })] }),
      },
      'POST /api/tickets/t-1/hand-back': { status: 200, body: handedBack },
    });
    const { user } = renderTicket();
    expect(screen.queryByRole('region', { name: 'Take payment' })).not.toBeInTheDocument();
    await user.click(await screen.findByRole('button', { name: 'Hand back' }));
    const form = await screen.findByRole('region', { name: 'Take payment' });
    expect(within(form).getByRole('textbox', { name: 'Amount' })).toHaveValue('86.60');
    expect(server.callsTo('POST', '/api/tickets/t-1/hand-back')).toHaveLength(1);
  });

  it('refuses a cheque without its number and an amount of zero, then records the payment', async () => {
    let current = handedBack;
    const server = mockApi({
      'GET /api/tickets/t-1': { status: 200, body: current },
      'POST /api/tickets/t-1/payments': (request) => {
        current = withPayment(current, request.body as PaymentInput);
        return { status: 200, body: current };
      },
    });
    const { user } = renderTicket();
    const form = await screen.findByRole('region', { name: 'Take payment' });
    await user.click(within(form).getByRole('radio', { name: 'Cheque' }));
    const amount = within(form).getByRole('textbox', { name: 'Amount' });
    await user.clear(amount);
    await user.type(amount, '0');
    await user.click(within(form).getByRole('button', { name: 'Record payment' }));
    expect(await within(form).findByText('Write down the cheque number.')).toBeInTheDocument();
    expect(within(form).getByText('The amount must be more than zero.')).toBeInTheDocument();

    await user.clear(amount);
    await user.type(amount, '100');
    await user.click(within(form).getByRole('button', { name: 'Record payment' }));
    expect(await within(form).findByText('That is more than is due ($86.60).')).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/tickets/t-1/payments')).toHaveLength(0);

    // A part payment: the rest stays due and the form offers it next.
    await user.clear(amount);
    await user.type(amount, '50');
    await user.type(within(form).getByRole('textbox', { name: 'Cheque number' }), '1042');
    await user.click(within(form).getByRole('button', { name: 'Record payment' }));
    await waitFor(() =>
      expect(server.callsTo('POST', '/api/tickets/t-1/payments')[0]?.body).toEqual({
        method: 'cheque',
        amountCents: 5000,
        reference: '1042',
      }),
    );
    const next = await screen.findByRole('region', { name: 'Take payment' });
    await waitFor(() => expect(within(next).getByRole('textbox', { name: 'Amount' })).toHaveValue('36.60'));

    await user.click(within(next).getByRole('button', { name: 'Record payment' }));
    await waitFor(() =>
      expect(server.callsTo('POST', '/api/tickets/t-1/payments')[1]?.body).toEqual({
        method: 'cash',
        amountCents: 3660,
      }),
    );
    const done = await screen.findByRole('region', { name: 'Done' });
    expect(done).toHaveTextContent('Paid on site');
    expect(within(done).getByRole('link', { name: 'Back to Maple Street Salon' })).toHaveAttribute(
      'href',
      '/route-days/rd-mon/stops/s-maple',
    );
    expect(within(done).getByRole('link', { name: 'The day sheet' })).toHaveAttribute(
      'href',
      '/route-days/rd-mon/sheet',
    );
  });

  it('records a card payment with the terminal reference', async () => {
    const server = mockApi({
      'GET /api/tickets/t-1': { status: 200, body: handedBack },
      'POST /api/tickets/t-1/payments': (request) => ({
        status: 200,
        body: withPayment(handedBack, request.body as PaymentInput),
      }),
    });
    const { user } = renderTicket();
    const form = await screen.findByRole('region', { name: 'Take payment' });
    await user.click(within(form).getByRole('radio', { name: 'Card on the terminal' }));
    await user.type(within(form).getByRole('textbox', { name: 'Terminal reference' }), 'AUTH-77');
    await user.click(within(form).getByRole('button', { name: 'Record payment' }));
    await waitFor(() =>
      expect(server.callsTo('POST', '/api/tickets/t-1/payments')[0]?.body).toEqual({
        method: 'card-terminal',
        amountCents: 8660,
        reference: 'AUTH-77',
      }),
    );
  });

  it('leaves the ticket for an invoice and says it is done', async () => {
    const server = mockApi({
      'GET /api/tickets/t-1': { status: 200, body: handedBack },
      'POST /api/tickets/t-1/settle': { status: 200, body: { ...handedBack, settlement: 'to-invoice' } },
    });
    const { user } = renderTicket();
    await user.click(await screen.findByRole('button', { name: 'Leave it for an invoice' }));
    const done = await screen.findByRole('region', { name: 'Done' });
    expect(done).toHaveTextContent('Left for an invoice: $86.60 to invoice.');
    expect(server.callsTo('POST', '/api/tickets/t-1/settle')[0]?.body).toEqual({ settlement: 'to-invoice' });
    expect(screen.queryByRole('region', { name: 'Take payment' })).not.toBeInTheDocument();
  });
});
