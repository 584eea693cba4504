import { screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { businessProfile } from '../testing/fixtures';
import { BusinessProfileRoute } from './business-profile';

describe('the business profile', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('owner');
    URL.createObjectURL = vi.fn(() => 'blob:keenroute-logo');
    URL.revokeObjectURL = vi.fn();
  });
  afterEach(() => {
    vi.restoreAllMocks();
  });

  it('saves only the fields the API takes, with the reminder days in order', async () => {
    const server = mockApi({
      'GET /api/business-profile': { status: 200, body: businessProfile() },
      'PUT /api/business-profile': (request) => ({
        status: 200,
        body: { ...businessProfile(), ...(request.body as object) },
      }),
    });
    const { user } = renderWithProviders(<BusinessProfileRoute />);
    const name = await screen.findByRole('textbox', { name: 'Business name' });
    expect(name).toHaveValue('Keen Edge Mobile Sharpening (demo)');
    expect(screen.getByText(/depends on the jurisdiction: check local tax rules/)).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Add a reminder' }));
    const fourth = screen.getByRole('textbox', { name: 'Reminder 4, days after the due date' });
    expect(fourth).toHaveValue('59 d');
    await user.clear(fourth);
    await user.type(fourth, '21');
    await user.click(screen.getByRole('button', { name: 'Save the business profile' }));
    expect(await screen.findByText('Each reminder day can be there only once.')).toBeInTheDocument();
    expect(server.callsTo('PUT', '/api/business-profile')).toHaveLength(0);

    await user.clear(fourth);
    await user.type(fourth, '3');
    await user.clear(screen.getByRole('textbox', { name: 'Tax ID' }));
    await user.type(screen.getByRole('textbox', { name: 'Tax ID' }), ' 12-3456789 ');
    await user.click(screen.getByRole('button', { name: 'Save the business profile' }));

    await waitFor(() => expect(server.callsTo('PUT', '/api/business-profile')).toHaveLength(1));
    const fields: Partial<ReturnType<typeof businessProfile>> = businessProfile();
    delete fields.logoUrl;
    expect(server.callsTo('PUT', '/api/business-profile')[0]?.body).toEqual({
      ...fields,
      taxId: '12-3456789',
      reminderDays: [3, 7, 21, 45],
    });
    expect(await screen.findByText('Business profile saved')).toBeInTheDocument();
  });

  it('puts the server’s field messages on the fields', async () => {
    mockApi({
      'GET /api/business-profile': { status: 200, body: businessProfile() },
      'PUT /api/business-profile': {
        status: 400,
        body: {
          statusCode: 400,
          message: 'Some fields need attention.',
          fields: { paymentTermsDays: ['Payment terms are 0 to 120 days.'] },
        },
      },
    });
    const { user } = renderWithProviders(<BusinessProfileRoute />);
    await user.click(await screen.findByRole('button', { name: 'Save the business profile' }));
    expect(await screen.findByText('Payment terms are 0 to 120 days.')).toBeInTheDocument();
    expect(screen.queryByText('That did not work')).not.toBeInTheDocument();
  });

  it('shows the logo fetched with the token, uploads a new one and says why the server refused one', async () => {
    let refuse = true;
    const server = mockApi({
      'GET /api/business-profile': { status: 200, body: businessProfile({ logoUrl: '/api/business-profile/logo' }) },
      'GET /api/business-profile/logo': { status: 200, body: 'png bytes' },
      'POST /api/business-profile/logo': () =>
        refuse
          ? { status: 400, body: { statusCode: 400, message: 'That file is not an image Keenroute can read.' } }
          : { status: 201, body: businessProfile({ logoUrl: '/api/business-profile/logo' }) },
    });
    const { user, container } = renderWithProviders(<BusinessProfileRoute />);
    const logo = await screen.findByRole('img', { name: 'The logo on the invoices' });
    expect(logo).toHaveAttribute('src', 'blob:keenroute-logo');
    expect(server.callsTo('GET', '/api/business-profile/logo')[0]?.headers.get('Authorization')).toBe(
      'Bearer token-owner',
    );

    const input = container.ownerDocument.querySelector<HTMLInputElement>('input[type="file"]');
    if (!input) throw new Error('The upload box has no file input');
    await user.upload(input, new File(['not a png'], 'logo.png', { type: 'image/png' }));
    const alert = (await screen.findByText('The logo was not saved')).closest('[role="alert"]');
    expect(alert).toHaveTextContent('That file is not an image Keenroute can read.');

    refuse = false;
    await user.upload(input, new File(['png'], 'logo.png', { type: 'image/png' }));
    expect(await screen.findByText('Logo saved')).toBeInTheDocument();
    const uploads = server.callsTo('POST', '/api/business-profile/logo');
    expect(uploads).toHaveLength(2);
    // Multipart: the browser sets the Content-Type with its boundary.
    expect(uploads[1]?.headers.has('Content-Type')).toBe(false);
  });

  it('refuses a file too large before sending it', async () => {
    const server = mockApi({ 'GET /api/business-profile': { status: 200, body: businessProfile() } });
    const { user, container } = renderWithProviders(<BusinessProfileRoute />);
    await screen.findByText('No logo yet: the invoices show the business name instead.');
    const input = container.ownerDocument.querySelector<HTMLInputElement>('input[type="file"]');
    if (!input) throw new Error('The upload box has no file input');
    const big = new File(['x'], 'huge.png', { type: 'image/png' });
    Object.defineProperty(big, 'size', { value: 3 * 1024 * 1024 });
    await user.upload(input, big);
    const alert = (await screen.findByText('The logo was not saved')).closest('[role="alert"]');
    expect(within(alert as HTMLElement).getByText(/larger than 2 MB/)).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/business-profile/logo')).toHaveLength(0);
  });
});
