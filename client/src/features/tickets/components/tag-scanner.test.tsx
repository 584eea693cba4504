import { screen, waitFor } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { TicketRoute } from '../routes/ticket';
import { ticket } from '../testing/fixtures';

// Stands in for the camera package: the camera, its start, and the codes it reads.
const camera = vi.hoisted(() => ({
  hasCamera: true,
  startFails: false,
  decoded: null as string | null,
}));

vi.mock('qr-scanner', () => ({
  default: class FakeQrScanner {
    static hasCamera = () => Promise.resolve(camera.hasCamera);
    constructor(
      _video: HTMLVideoElement,
      private readonly onDecode: (result: { data: string }) => void,
    ) {}
    start() {
      if (camera.startFails) return Promise.reject(new Error('Camera not found.'));
      if (camera.decoded) {
        const data = camera.decoded;
        setTimeout(() => this.onDecode({ data }), 0);
      }
      return Promise.resolve();
    }
    stop() {}
    destroy() {}
  },
}));

function renderTicket() {
  return renderWithProviders(
    <Routes>
      <Route path="/tickets/:ticketId" element={<TicketRoute />} />
    </Routes>,
    { route: '/tickets/t-1' },
  );
}

describe('scanning a tag with the camera', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('sharpener');
    Object.assign(camera, { hasCamera: true, startFails: false, decoded: null });
  });

  it('says there is no camera and keeps the typed field', async () => {
    camera.hasCamera = false;
    mockApi({ 'GET /api/tickets/t-1': { status: 200, body: ticket() } });
    const { user } = renderTicket();
    await user.click(await screen.findByRole('button', { name: 'Scan' }));
    expect(await screen.findByText('No camera on this device')).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'Tag code' })).toBeEnabled();
  });

  it('says the camera did not start when it is refused or busy', async () => {
    camera.startFails = true;
    mockApi({ 'GET /api/tickets/t-1': { status: 200, body: ticket() } });
    const { user } = renderTicket();
    await user.click(await screen.findByRole('button', { name: 'Scan' }));
    expect(await screen.findByText('The camera did not start')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Close the scanner' }));
    expect(screen.queryByText('The camera did not start')).not.toBeInTheDocument();
  });

  it('adds the shear whose tag the camera reads', async () => {
    camera.decoded = 'KR-000045';
    const server = mockApi({
      'GET /api/tickets/t-1': { status: 200, body: ticket({ lines: [] }) },
      'POST /api/tickets/t-1/lines': { status: 200, body: ticket() },
    });
    const { user } = renderTicket();
    await user.click(await screen.findByRole('button', { name: 'Scan' }));
    await waitFor(() =>
      expect(server.callsTo('POST', '/api/tickets/t-1/lines')[0]?.body).toEqual({ tagCode: 'KR-000045' }),
    );
    expect(await screen.findByText('KR-000045')).toBeInTheDocument();
    expect(screen.queryByLabelText('Camera view')).not.toBeInTheDocument();
  });
});
