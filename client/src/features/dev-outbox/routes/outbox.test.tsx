import { screen } from '@testing-library/react';
import { beforeEach, describe, expect, it } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { OutboxRoute } from './outbox';

const message = (id: string, subject: string, date: string) => ({
  id,
  from: 'Keenroute <no-reply@keenroute.test>',
  to: ['sam@demo.keenroute.test'],
  subject,
  date,
  text: `Hello. Open http://127.0.0.1:3000/set-password?token=${id} to continue.`,
  html: '',
});

describe('the outbox page', () => {
  beforeEach(() => {
    signInAs('owner');
  });

  it('lists the caught e-mails newest first, with their links clickable', async () => {
    mockApi({
      'GET /api/dev/outbox': {
        status: 200,
        body: {
          items: [
            message('older', 'You are invited to Keenroute', '2025-03-01T09:00:00.000Z'),
            message('newer', 'Choose a new Keenroute password', '2025-03-02T09:00:00.000Z'),
          ],
          total: 2,
        },
      },
    });
    renderWithProviders(<OutboxRoute />);
    const headings = await screen.findAllByRole('heading', { level: 2 });
    expect(headings.map((heading) => heading.textContent)).toEqual([
      'Choose a new Keenroute password',
      'You are invited to Keenroute',
    ]);
    expect(screen.getAllByRole('link').map((link) => link.getAttribute('href'))).toEqual([
      'http://127.0.0.1:3000/set-password?token=newer',
      'http://127.0.0.1:3000/set-password?token=older',
    ]);
  });

  it('says when the mail catcher is not running instead of raising an error', async () => {
    mockApi({ 'GET /api/dev/outbox': { status: 404, body: { statusCode: 404, message: 'Not Found' } } });
    renderWithProviders(<OutboxRoute />);
    expect(await screen.findByText('The mail catcher is not running')).toBeInTheDocument();
    expect(screen.queryByText('Not Found')).not.toBeInTheDocument();
  });
});
