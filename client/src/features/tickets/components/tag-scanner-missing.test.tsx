import { screen, waitFor } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { TicketRoute } from '../routes/ticket';
import { line, ticket } from '../testing/fixtures';

// The camera package fails to load (offline, an old browser): its dynamic import throws.
vi.mock('qr-scanner', () => {
  throw new Error('The scanner chunk could not be fetched');
});

describe('when the scanner cannot load', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('sharpener');
  });

  it('says so and the typed tag code still adds the shear', async () => {
    const server = mockApi({
      'GET /api/tickets/t-1': { status: 200, body: ticket({ lines: [] }) },
      'POST /api/tickets/t-1/lines': { status: 200, body: ticket({ lines: [line()] }) },
    });
    const { user } = renderTicket();
    await user.click(await screen.findByRole('button', { name: 'Scan' }));
    expect(await screen.findByText('The scanner could not load')).toBeInTheDocument();

    await user.type(screen.getByRole('textbox', { name: 'Tag code' }), '123{Enter}');
    await waitFor(() =>
      expect(server.callsTo('POST', '/api/tickets/t-1/lines')[0]?.body).toEqual({ tagCode: 'KR-000123' }),
    );
  });
});

function renderTicket() {
  return renderWithProviders(
    <Routes>
      <Route path="/tickets/:ticketId" element={<TicketRoute />} />
    </Routes>,
    { route: '/tickets/t-1' },
  );
}
