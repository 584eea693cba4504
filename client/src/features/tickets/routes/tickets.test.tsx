import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { ticketSummary } from '../testing/fixtures';
import { TicketsRoute } from './tickets';

const rows = [ticketSummary()];

describe('the tickets list', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('sharpener');
  });

  it('lists tickets linking to each, and filters by day and status through the query', async () => {
    const server = mockApi({ 'GET /api/tickets': { status: 200, body: { items: rows, total: 1 } } });
    const { user } = renderWithProviders(
      <Routes>
        <Route path="/tickets" element={<TicketsRoute />} />
      </Routes>,
      { route: '/tickets?day=2025-03-03' },
    );
    const list = await screen.findByRole('list', { name: 'Tickets' });
    expect(within(list).getByRole('link', { name: 'Mira Stylist' })).toHaveAttribute('href', '/tickets/t-1');
    expect(list).toHaveTextContent('Maple Street Salon · Visit · Mar 3, 2025');
    expect(list).toHaveTextContent('$86.60');
    expect(server.calls[0]?.search.get('day')).toBe('2025-03-03');

    await user.click(screen.getByRole('combobox', { name: 'Status' }));
    await user.click(await screen.findByRole('option', { name: 'Finished' }));
    await waitFor(() => expect(server.calls.at(-1)?.search.get('status')).toBe('finished'));
    expect(server.calls.at(-1)?.search.get('day')).toBe('2025-03-03');
  });
});
