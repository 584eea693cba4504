import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, type MockRequest } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { line, thinnerLine, ticket } from '../testing/fixtures';
import type { LineChanges, Ticket } from '../types';
import { TicketRoute } from './ticket';

function renderTicket() {
  return renderWithProviders(
    <Routes>
      <Route path="/tickets/:ticketId" element={<TicketRoute />} />
    </Routes>,
    { route: '/tickets/t-1' },
  );
}

/** Answers a line PATCH with the ticket as the server would have it after the change. */
function patchedTicket(current: Ticket, request: MockRequest): Ticket {
  const lineId = request.path.split('/').pop();
  const changes = request.body as LineChanges;
  return { ...current, lines: current.lines.map((l) => (l.id === lineId ? { ...l, ...changes } : l)) };
}

describe('the ticket page', { timeout: 60_000 }, () => {
  beforeEach(() => {
    signInAs('sharpener');
  });

  it('adds a shear by its typed tag code, read as the rules package reads it', async () => {
    const added = line({ id: 'l-3', shear: { ...line().shear, id: 'sh-7', tagCode: 'KR-000007' } });
    const server = mockApi({
      'GET /api/tickets/t-1': { status: 200, body: ticket({ lines: [] }) },
      'POST /api/tickets/t-1/lines': { status: 200, body: ticket({ lines: [added] }) },
    });
    const { user } = renderTicket();
    const field = await screen.findByRole('textbox', { name: 'Tag code' });

    await user.type(field, 'not a tag');
    await user.click(screen.getByRole('button', { name: 'Add' }));
    expect(await screen.findByText(/A tag code looks like KR-000123/)).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/tickets/t-1/lines')).toHaveLength(0);

    await user.clear(field);
    await user.type(field, 'kr 7{Enter}');
    await waitFor(() =>
      expect(server.callsTo('POST', '/api/tickets/t-1/lines')[0]?.body).toEqual({ tagCode: 'KR-000007' }),
    );
    const lines = await screen.findByRole('list', { name: 'Shears on this ticket' });
    expect(within(lines).getByText('KR-000007')).toBeInTheDocument();
    expect(field).toHaveValue('');
  });

  it('shows the server’s refusal of an unknown tag beside the field', async () => {
    mockApi({
      'GET /api/tickets/t-1': { status: 200, body: ticket() },
      'POST /api/tickets/t-1/lines': {
        status: 404,
        body: { statusCode: 404, message: 'No shear has the tag KR-000999.' },
      },
    });
    const { user } = renderTicket();
    await user.type(await screen.findByRole('textbox', { name: 'Tag code' }), '999{Enter}');
    expect(await screen.findByText('No shear has the tag KR-000999.')).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'Tag code' })).toHaveValue('KR-000999');
  });

  it('registers a new shear for the customer as it adds its line, and tells its tag code', async () => {
    const added = line({ id: 'l-9', shear: { ...line().shear, id: 'sh-new', tagCode: 'KR-000200' } });
    const server = mockApi({
      'GET /api/tickets/t-1': { status: 200, body: ticket({ lines: [] }) },
      'POST /api/tickets/t-1/lines': { status: 201, body: ticket({ lines: [added] }) },
    });
    const { user } = renderTicket();
    await user.click(await screen.findByRole('button', { name: 'New shear (no tag yet)' }));
    const dialog = await screen.findByRole('dialog', { name: 'New shear' });
    await user.click(within(dialog).getByRole('button', { name: 'Save and add' }));
    expect(await within(dialog).findByText('Choose the edge type.')).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/tickets/t-1/lines')).toHaveLength(0);

    await user.type(within(dialog).getByRole('textbox', { name: 'Make' }), 'Demo Forge');
    await user.type(within(dialog).getByRole('textbox', { name: /Length/ }), '6.5');
    await user.click(within(dialog).getByRole('combobox', { name: /edge type/i }));
    await user.click(await screen.findByRole('option', { name: 'Convex' }));
    await user.click(within(dialog).getByRole('combobox', { name: /tool kind/i }));
    await user.click(await screen.findByRole('option', { name: 'Straight shear' }));
    await user.click(within(dialog).getByRole('button', { name: 'Save and add' }));

    await waitFor(() =>
      expect(server.callsTo('POST', '/api/tickets/t-1/lines')[0]?.body).toEqual({
        newShear: {
          make: 'Demo Forge',
          lengthIn: 6.5,
          edgeType: 'convex',
          toolKind: 'straight',
          handedness: 'right',
          use: 'hair',
        },
      }),
    );
    expect(await screen.findByText('Registered KR-000200')).toBeInTheDocument();
  });

  it('sends a before photo from the camera with its stage', async () => {
    URL.createObjectURL = vi.fn(() => 'blob:keenroute-photo');
    URL.revokeObjectURL = vi.fn();
    const withPhoto = ticket({
      lines: [line({ photos: [{ id: 'p-1', stage: 'before', url: '/api/shears/sh-123/photos/p-1' }] })],
    });
    const server = mockApi({
      'GET /api/tickets/t-1': { status: 200, body: ticket({ lines: [line()] }) },
      'POST /api/tickets/t-1/lines/l-1/photos': { status: 201, body: withPhoto },
      'GET /api/shears/sh-123/photos/p-1/thumbnail': { status: 200, body: 'thumbnail bytes' },
    });
    const append = vi.spyOn(FormData.prototype, 'append');
    const { user, container } = renderTicket();
    await screen.findByRole('button', { name: 'Before photo' });
    const inputs = container.ownerDocument.querySelectorAll<HTMLInputElement>('input[type="file"]');
    expect(inputs).toHaveLength(2);
    await user.upload(inputs[0] as HTMLInputElement, new File(['jpeg bytes'], 'tip.jpg', { type: 'image/jpeg' }));
    expect(await screen.findByRole('img', { name: 'Before of the shear' })).toBeInTheDocument();
    const [call] = server.callsTo('POST', '/api/tickets/t-1/lines/l-1/photos');
    // Multipart: the browser sets the boundary itself.
    expect(call?.headers.has('Content-Type')).toBe(false);
    expect(append).toHaveBeenCalledWith('stage', 'before');
    expect(append).toHaveBeenCalledWith('photo', expect.objectContaining({ name: 'tip.jpg' }));
    append.mockRestore();
  });

  it('says what is still to add from the booking', async () => {
    mockApi({
      'GET /api/tickets/t-1': {
        status: 200,
        body: ticket({ kind: 'drop-off', expected: [{ edgeType: 'convex', toolKind: 'straight', count: 2 }] }),
      },
    });
    renderTicket();
    expect(await screen.findByText('Still to add: 2 × convex straight shear')).toBeInTheDocument();
  });

  it('saves a bench status change with PATCH and says Saving… then Saved', async () => {
    let current = ticket();
    let release: () => void = () => {};
    const server = mockApi({
      'GET /api/tickets/t-1': { status: 200, body: current },
      'PATCH /api/tickets/t-1/lines/l-1': async (request) => {
        await new Promise<void>((resolve) => (release = resolve));
        current = patchedTicket(current, request);
        return { status: 200, body: current };
      },
    });
    const { user } = renderTicket();
    const control = await screen.findByRole('radiogroup', { name: 'Bench status of KR-000123' });
    await user.click(within(control).getByRole('radio', { name: 'On the bench' }));

    expect(await screen.findByText('Saving…')).toBeInTheDocument();
    // The tap shows at once, before the server answers.
    expect(within(control).getByRole('radio', { name: 'On the bench' })).toBeChecked();
    release();
    expect(await screen.findByText('Saved')).toBeInTheDocument();
    expect(server.callsTo('PATCH', '/api/tickets/t-1/lines/l-1')[0]?.body).toEqual({ benchStatus: 'on-the-bench' });
  });

  it('says Not saved with the server’s message, and Retry sends the change again', async () => {
    let current = ticket();
    let fail = true;
    const server = mockApi({
      'GET /api/tickets/t-1': { status: 200, body: current },
      'PATCH /api/tickets/t-1/lines/l-2': (request) => {
        if (fail) return { status: 503, body: { statusCode: 503, message: 'The database is busy.' } };
        current = patchedTicket(current, request);
        return { status: 200, body: current };
      },
    });
    const { user } = renderTicket();
    const control = await screen.findByRole('radiogroup', { name: 'Bench status of KR-000045' });
    await user.click(within(control).getByRole('radio', { name: 'Ready' }));
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Not saved: The database is busy.');
    // The failed tap does not stay on screen as if it were saved.
    expect(within(control).getByRole('radio', { name: 'Waiting' })).toBeChecked();

    fail = false;
    await user.click(within(alert).getByRole('button', { name: 'Retry' }));
    expect(await screen.findByText('Saved')).toBeInTheDocument();
    const calls = server.callsTo('PATCH', '/api/tickets/t-1/lines/l-2');
    expect(calls).toHaveLength(2);
    expect(calls[1]?.body).toEqual({ benchStatus: 'ready' });
    expect(within(control).getByRole('radio', { name: 'Ready' })).toBeChecked();
  });

  it('keeps Finish disabled, saying why, until every shear is ready; Mark all ready gets there', async () => {
    let current = ticket({ lines: [line({ benchStatus: 'on-the-bench' }), thinnerLine] });
    const server = mockApi({
      'GET /api/tickets/t-1': { status: 200, body: current },
      'PATCH /api/tickets/t-1/lines/l-1': (request) => {
        current = patchedTicket(current, request);
        return { status: 200, body: current };
      },
      'PATCH /api/tickets/t-1/lines/l-2': (request) => {
        current = patchedTicket(current, request);
        return { status: 200, body: current };
      },
      'POST /api/tickets/t-1/finish': () => ({
        status: 200,
        body: { ...current, status: 'finished', finishedAt: '2025-03-03T10:00:00Z' },
      }),
    });
    const { user } = renderTicket();
    const finish = await screen.findByRole('button', { name: 'Finish ticket' });
    expect(finish).toBeDisabled();
    expect(screen.getByText('2 shears are not ready yet.')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Mark all ready' }));
    await waitFor(() => expect(screen.getByRole('button', { name: 'Finish ticket' })).toBeEnabled());
    expect(server.callsTo('PATCH', '/api/tickets/t-1/lines/l-1')[0]?.body).toEqual({ benchStatus: 'ready' });
    expect(server.callsTo('PATCH', '/api/tickets/t-1/lines/l-2')[0]?.body).toEqual({ benchStatus: 'ready' });

    await user.click(screen.getByRole('button', { name: 'Finish ticket' }));
    expect(await screen.findByRole('button', { name: 'Hand back' })).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/tickets/t-1/finish')).toHaveLength(1);
  });

  it('toggles an add-on by sending the line’s whole list', async () => {
    const server = mockApi({
      'GET /api/tickets/t-1': { status: 200, body: ticket({ lines: [line({ addOns: ['blade-polish'] })] }) },
      'PATCH /api/tickets/t-1/lines/l-1': (request) => ({ status: 200, body: patchedTicket(ticket(), request) }),
    });
    const { user } = renderTicket();
    await user.click(await screen.findByRole('button', { name: 'Add-ons: blade polish' }));
    await user.click(await screen.findByRole('switch', { name: 'Inside-edge hone' }));
    await waitFor(() =>
      expect(server.callsTo('PATCH', '/api/tickets/t-1/lines/l-1')[0]?.body).toEqual({
        addOns: ['inside-edge-hone', 'blade-polish'],
      }),
    );
  });

  it('shows the cautions in short on every line and the recipe on demand', async () => {
    mockApi({ 'GET /api/tickets/t-1': { status: 200, body: ticket({ lines: [line()] }) } });
    const { user } = renderTicket();
    expect(await screen.findByLabelText('Cautions')).toHaveTextContent(/Dust mask.*heat.*Fingers clear.*maker/);
    await user.click(screen.getByRole('button', { name: /Edge recipe/ }));
    expect(await screen.findByRole('list', { name: 'Steps, coarse to fine' })).toHaveTextContent('80 µm');
  });

  it('hides the price override from a sharpener', async () => {
    mockApi({
      'GET /api/tickets/t-1': {
        status: 200,
        body: ticket({ lines: [line({ overrideCents: 3000, effectiveCents: 3000, overrideReason: 'Regular' })] }),
      },
    });
    renderTicket();
    expect(await screen.findByLabelText('Price of KR-000123')).toHaveTextContent('$30.00');
    expect(screen.getByText(/changed: Regular/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Change price' })).not.toBeInTheDocument();
  });

  it('lets the office override a price with a reason', async () => {
    signInAs('office');
    const server = mockApi({
      'GET /api/tickets/t-1': { status: 200, body: ticket({ lines: [line()] }) },
      'POST /api/tickets/t-1/lines/l-1/override': {
        status: 200,
        body: ticket({
          lines: [line({ overrideCents: 3500, effectiveCents: 3500, overrideReason: 'Loyal customer' })],
        }),
      },
    });
    const { user } = renderTicket();
    await user.click(await screen.findByRole('button', { name: 'Change price' }));
    const dialog = await screen.findByRole('dialog');
    const amount = within(dialog).getByRole('textbox', { name: 'New price' });
    await user.clear(amount);
    await user.type(amount, '35');
    await user.click(within(dialog).getByRole('button', { name: 'Save price' }));
    expect(await within(dialog).findByText('Say why the price changes, for the record.')).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/tickets/t-1/lines/l-1/override')).toHaveLength(0);

    await user.type(within(dialog).getByRole('textbox', { name: 'Reason' }), 'Loyal customer');
    await user.click(within(dialog).getByRole('button', { name: 'Save price' }));
    await waitFor(() =>
      expect(server.callsTo('POST', '/api/tickets/t-1/lines/l-1/override')[0]?.body).toEqual({
        cents: 3500,
        reason: 'Loyal customer',
      }),
    );
    expect(await screen.findByText(/changed: Loyal customer/)).toBeInTheDocument();
  });
});
