import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { convexDetail } from '../testing/fixtures';
import { ShearDetailRoute } from './shear-detail';

const SLOW = { timeout: 5000 };

function renderShear(id = 'sh-123') {
  return renderWithProviders(
    <Routes>
      <Route path="/shears/:shearId" element={<ShearDetailRoute />} />
    </Routes>,
    { route: `/shears/${id}` },
  );
}

const shearRoutes = {
  'GET /api/shears/sh-123': { status: 200, body: convexDetail },
  'GET /api/shears/sh-123/photos/p-1/thumbnail': { status: 200, body: 'thumbnail bytes' },
};

describe('the shear page', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('office');
    URL.createObjectURL = vi.fn(() => 'blob:keenroute-photo');
    URL.revokeObjectURL = vi.fn();
  });
  afterEach(() => {
    vi.restoreAllMocks();
  });

  it('shows the tag code, the shear in words, its customer, stop and history', async () => {
    mockApi(shearRoutes);
    renderShear();
    expect(await screen.findByRole('heading', { level: 1, name: 'KR-000123' })).toBeInTheDocument();
    // describeShear from the rules package.
    expect(screen.getByText('Convex straight shear, 6.5 in, left-handed')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Mira Stylist' })).toHaveAttribute('href', '/customers/c-mira');
    expect(screen.getByRole('link', { name: 'Riverside Cuts' })).toHaveAttribute('href', '/stops/s-riverside');
    const history = screen.getByRole('region', { name: 'Service history' });
    expect(history).toHaveTextContent('Sharpened on route at Riverside Cuts.');
    expect(history).toHaveTextContent('Serviced');
    expect(history).toHaveTextContent('Feb 10, 2025');
  });

  it('shows the edge recipe’s steps with the bench cautions', async () => {
    mockApi(shearRoutes);
    renderShear();
    const recipe = await screen.findByRole('region', { name: 'Edge recipe' });
    // A convex straight shear for hair: discs 80 to 9 µm, then the paste pad (the rules package's defaults).
    const steps = within(recipe).getByRole('list', { name: 'Steps, coarse to fine' });
    for (const grade of ['80 µm', '60 µm', '30 µm', '15 µm', '9 µm']) expect(steps).toHaveTextContent(grade);
    expect(steps).toHaveTextContent(/paste/i);
    expect(within(recipe).getByText('Cautions at the bench')).toBeInTheDocument();
    expect(recipe).toHaveTextContent(/dust mask or run dust extraction/i);
    expect(recipe).toHaveTextContent(/fold the burr off/i);
  });

  it('fetches thumbnails with the sign-in token and opens the full photo', async () => {
    const server = mockApi({
      ...shearRoutes,
      'GET /api/shears/sh-123/photos/p-1': { status: 200, body: 'full bytes' },
    });
    const { user } = renderShear();
    const thumb = await screen.findByRole('button', { name: /open the photo/i });
    await waitFor(() => expect(within(thumb).getByRole('presentation')).toHaveAttribute('src', 'blob:keenroute-photo'));
    const [call] = server.callsTo('GET', '/api/shears/sh-123/photos/p-1/thumbnail');
    expect(call?.headers.get('Authorization')).toBe('Bearer token-office');

    await user.click(thumb);
    const viewer = await screen.findByRole('dialog', { name: 'Photo of KR-000123' });
    expect(await within(viewer).findByRole('img', {}, SLOW)).toHaveAttribute('src', 'blob:keenroute-photo');
    expect(server.callsTo('GET', '/api/shears/sh-123/photos/p-1')).toHaveLength(1);
  });

  it('shows the server’s reason when it refuses an upload', async () => {
    const server = mockApi({
      ...shearRoutes,
      'POST /api/shears/sh-123/photos': {
        status: 400,
        body: { statusCode: 400, message: 'That file is not a JPEG, PNG or WebP image Keenroute can read.' },
      },
    });
    const { user, container } = renderShear();
    await screen.findByText('Add a photo');
    const input = container.ownerDocument.querySelector<HTMLInputElement>('input[type="file"]');
    if (!input) throw new Error('The upload box has no file input');
    await user.upload(input, new File(['not really a png'], 'tip.png', { type: 'image/png' }));

    const title = await screen.findByText('The photo was not added', {}, SLOW);
    const alert = title.closest('[role="alert"]');
    expect(alert).toHaveTextContent('That file is not a JPEG, PNG or WebP image Keenroute can read.');
    expect(server.callsTo('POST', '/api/shears/sh-123/photos')).toHaveLength(1);
    // Only the upload box says it; no notification repeats it.
    expect(screen.queryByText('That did not work')).not.toBeInTheDocument();
    expect(server.callsTo('POST', '/api/shears/sh-123/photos')[0]?.headers.has('Content-Type')).toBe(false);
  });

  it('refuses a file too large before sending it', async () => {
    const server = mockApi(shearRoutes);
    const { user, container } = renderShear();
    await screen.findByText('Add a photo');
    const input = container.ownerDocument.querySelector<HTMLInputElement>('input[type="file"]');
    if (!input) throw new Error('The upload box has no file input');
    const big = new File(['x'], 'huge.jpg', { type: 'image/jpeg' });
    Object.defineProperty(big, 'size', { value: 11 * 1024 * 1024 });
    await user.upload(input, big);
    expect(await screen.findByText(/larger than 10 MB/, {}, SLOW)).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/shears/sh-123/photos')).toHaveLength(0);
  });

  it('changes the status at once for the office', async () => {
    const server = mockApi({
      ...shearRoutes,
      'PATCH /api/shears/sh-123': { status: 200, body: { ...convexDetail, status: 'lost' } },
    });
    const { user } = renderShear();
    await user.click(await screen.findByRole('combobox', { name: 'Status' }));
    await user.click(await screen.findByRole('option', { name: 'Lost' }));
    await waitFor(() => expect(server.callsTo('PATCH', '/api/shears/sh-123')[0]?.body).toEqual({ status: 'lost' }));
    expect(await screen.findByText('KR-000123 is now lost.')).toBeInTheDocument();
  });

  it('prints the tag label as a PDF fetched with the token', async () => {
    const open = vi.spyOn(window, 'open').mockReturnValue(window);
    const server = mockApi({ ...shearRoutes, 'GET /api/shears/labels.pdf': { status: 200, body: 'pdf bytes' } });
    const { user } = renderShear();
    await user.click(await screen.findByRole('button', { name: 'Print tag label' }));
    await waitFor(() => expect(open).toHaveBeenCalledWith('blob:keenroute-photo', '_blank'));
    const [call] = server.callsTo('GET', '/api/shears/labels.pdf');
    expect(call?.search.get('ids')).toBe('sh-123');
    expect(call?.headers.get('Authorization')).toBe('Bearer token-office');
  });

  it('shows a client their shear without the bench recipe or the office’s controls', async () => {
    signInAs('client');
    mockApi(shearRoutes);
    renderShear();
    expect(await screen.findByRole('heading', { level: 1, name: 'KR-000123' })).toBeInTheDocument();
    expect(screen.queryByRole('region', { name: 'Edge recipe' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Edit' })).not.toBeInTheDocument();
    expect(screen.queryByText('Add a photo')).not.toBeInTheDocument();
    expect(screen.queryByRole('combobox', { name: 'Status' })).not.toBeInTheDocument();
    // Stop pages are for staff: the name shows without a link.
    expect(screen.queryByRole('link', { name: 'Riverside Cuts' })).not.toBeInTheDocument();
    expect(screen.getByText('Riverside Cuts')).toBeInTheDocument();
  });

  it('says so when the shear is not there or not visible', async () => {
    mockApi({ 'GET /api/shears/sh-404': { status: 404, body: { statusCode: 404, message: 'Shear not found.' } } });
    renderShear('sh-404');
    expect(await screen.findByText('This shear was not found')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Back to the shears' })).toHaveAttribute('href', '/shears');
    expect(screen.queryByText('Not found')).not.toBeInTheDocument();
  });
});
