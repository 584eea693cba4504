import { act, screen } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { session } from '@/lib/session';
import { mockApi, type MockReply } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { PaymentConfirmation } from '../components/payment-confirmation';
import { rememberPaidBefore } from '../paid-before';
import { TOKEN, statusPoll } from '../testing/fixtures';
import type { PaymentStatusPoll } from '../types';
import { PayDoneRoute } from './pay-done';

const STATUS_PATH = `/api/public/invoices/${TOKEN}/status`;
const WAITING = 'Thank you — confirming your payment';
const PAID = 'Paid. A receipt is on its way.';

/** Answers the polls in turn; the last answer repeats. */
function statusApi(answers: (PaymentStatusPoll | MockReply)[]) {
  let next = 0;
  return mockApi({
    [`GET ${STATUS_PATH}`]: () => {
      const answer = answers[Math.min(next, answers.length - 1)]!;
      next += 1;
      return 'status' in answer && typeof answer.status === 'number' ? answer : { status: 200, body: answer };
    },
  });
}

// Query results reach the screen through a zero-delay timer; with fake timers it needs a nudge.
const advance = (ms: number) => act(() => vi.advanceTimersByTimeAsync(ms));

function renderDone(ui = <PayDoneRoute />) {
  return renderWithProviders(
    <Routes>
      <Route path="/pay/:token/done" element={ui} />
    </Routes>,
    { route: `/pay/${TOKEN}/done?session_id=cs_test_1` },
  );
}

describe('the page the checkout returns to', () => {
  beforeEach(() => {
    session.end('never-signed-in');
    window.sessionStorage.clear();
  });

  afterEach(() => {
    vi.useRealTimers();
  });

  it('polls the status every 2 s and says paid only once the server does', async () => {
    vi.useFakeTimers();
    const server = statusApi([
      statusPoll(),
      statusPoll(),
      statusPoll({ status: 'paid', balanceCents: 0, paidCents: 4676 }),
    ]);
    renderDone();
    await advance(10);
    expect(screen.getByText(WAITING)).toBeInTheDocument();
    expect(server.callsTo('GET', STATUS_PATH)).toHaveLength(1);

    await advance(1989);
    expect(server.callsTo('GET', STATUS_PATH)).toHaveLength(1);
    await advance(1);
    expect(server.callsTo('GET', STATUS_PATH)).toHaveLength(2);
    expect(screen.getByText(WAITING)).toBeInTheDocument();
    expect(screen.queryByText(PAID)).not.toBeInTheDocument();

    await advance(2000);
    expect(server.callsTo('GET', STATUS_PATH)).toHaveLength(3);
    await advance(10);
    expect(screen.getByText(PAID)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'See the invoice' })).toHaveAttribute('href', `/pay/${TOKEN}`);

    // Paid is final: no more polls.
    await advance(10_000);
    expect(server.callsTo('GET', STATUS_PATH)).toHaveLength(3);
  });

  it('gives up after about a minute (30 polls) without claiming anything, and can check again', async () => {
    vi.useFakeTimers();
    const server = statusApi([statusPoll()]);
    renderDone();
    await advance(58_000);
    expect(server.callsTo('GET', STATUS_PATH)).toHaveLength(30);
    await advance(10);
    expect(screen.getByText('Not confirmed yet')).toBeInTheDocument();
    expect(screen.getByText(/you do not need to pay again/)).toBeInTheDocument();
    expect(screen.queryByText(PAID)).not.toBeInTheDocument();
    await advance(20_000);
    expect(server.callsTo('GET', STATUS_PATH)).toHaveLength(30);

    await act(async () => {
      screen.getByRole('button', { name: 'Check again' }).click();
      await vi.advanceTimersByTimeAsync(0);
    });
    expect(server.callsTo('GET', STATUS_PATH)).toHaveLength(31);
    expect(screen.getByText(WAITING)).toBeInTheDocument();
  });

  it('counts a part-payment only when more is paid than before the checkout', async () => {
    rememberPaidBefore(TOKEN, 1000);
    const server = statusApi([
      statusPoll({ status: 'part-paid', paidCents: 1000, balanceCents: 3676 }),
      statusPoll({ status: 'part-paid', paidCents: 3000, balanceCents: 1676 }),
    ]);
    renderDone(<PaymentConfirmation token={TOKEN} everyMs={20} maxPolls={10} />);
    expect(await screen.findByText('Payment received. A receipt is on its way.')).toBeInTheDocument();
    expect(screen.getByText(/part of the invoice is still owed/)).toBeInTheDocument();
    expect(server.callsTo('GET', STATUS_PATH)).toHaveLength(2);
  });

  it('does not take an older part-payment for this one when nothing was noted before the checkout', async () => {
    const server = statusApi([statusPoll({ status: 'part-paid', paidCents: 1000, balanceCents: 3676 })]);
    renderDone(<PaymentConfirmation token={TOKEN} everyMs={10} maxPolls={3} />);
    expect(await screen.findByText('Not confirmed yet')).toBeInTheDocument();
    expect(server.callsTo('GET', STATUS_PATH)).toHaveLength(3);
    expect(screen.queryByText(/receipt is on its way/)).not.toBeInTheDocument();
  });

  it('keeps waiting through a failed poll and shows the failure once it gives up', async () => {
    const down: MockReply = { status: 503, body: { statusCode: 503, message: 'Back in a minute.' } };
    const server = statusApi([down]);
    renderDone(<PaymentConfirmation token={TOKEN} everyMs={10} maxPolls={3} />);
    expect(screen.getByText(WAITING)).toBeInTheDocument();
    expect(await screen.findByText(/Last check: Back in a minute\./)).toBeInTheDocument();
    expect(server.callsTo('GET', STATUS_PATH)).toHaveLength(3);
  });

  it('says a void invoice is void', async () => {
    statusApi([statusPoll({ status: 'void' })]);
    renderDone(<PaymentConfirmation token={TOKEN} everyMs={10} maxPolls={3} />);
    expect(await screen.findByText('This invoice is void')).toBeInTheDocument();
  });

  it('says a bad link is not valid and stops asking', async () => {
    const server = statusApi([{ status: 404, body: { statusCode: 404, message: 'Invoice not found.' } }]);
    renderDone(<PaymentConfirmation token={TOKEN} everyMs={10} maxPolls={5} />);
    expect(await screen.findByText('This pay link is not valid')).toBeInTheDocument();
    await new Promise((resolve) => setTimeout(resolve, 80));
    expect(server.callsTo('GET', STATUS_PATH)).toHaveLength(1);
  });
});
