import { screen, waitFor } from '@testing-library/react';
import { PASSWORD_MIN_LENGTH } from '@keenroute/shared';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { session } from '@/lib/session';
import { mockApi } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { PEOPLE } from '@/testing/session';
import { SetPasswordRoute } from './set-password';

const invited = { purpose: 'invite', email: 'sasha@demo.keenroute.test', name: 'Sasha Hone' };

function renderSetPassword(route: string) {
  return renderWithProviders(
    <Routes>
      <Route path="/set-password" element={<SetPasswordRoute />} />
      <Route path="*" element={<LocationProbe />} />
    </Routes>,
    { route },
  );
}

describe('the set-password page', () => {
  beforeEach(() => {
    session.end('never-signed-in');
  });

  it('shows whose password is being set, then signs them in and goes home', async () => {
    const server = mockApi({
      'GET /api/auth/tokens/abc123': { status: 200, body: invited },
      'POST /api/auth/password': { status: 200, body: { accessToken: 'token-sasha', user: PEOPLE.sharpener } },
    });
    const { user } = renderSetPassword('/set-password?token=abc123');

    expect(await screen.findByRole('heading', { name: 'Welcome to Keenroute' })).toBeInTheDocument();
    expect(screen.getByText('Sasha Hone')).toBeInTheDocument();
    expect(screen.getByText(/sasha@demo\.keenroute\.test/)).toBeInTheDocument();

    await user.type(screen.getByLabelText(/^new password/i), 'blue hone steady');
    await user.type(screen.getByLabelText(/same password again/i), 'blue hone steady');
    await user.click(screen.getByRole('button', { name: /set password and sign in/i }));

    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent(/^\/$/));
    expect(server.callsTo('POST', '/api/auth/password')[0]?.body).toEqual({
      token: 'abc123',
      password: 'blue hone steady',
    });
    expect(session.getState()).toEqual({ status: 'signed-in', user: PEOPLE.sharpener });
  });

  it('asks for the shared minimum length and a matching confirmation', async () => {
    const server = mockApi({ 'GET /api/auth/tokens/abc123': { status: 200, body: invited } });
    const { user } = renderSetPassword('/set-password?token=abc123');
    await screen.findByRole('heading', { name: 'Welcome to Keenroute' });

    await user.type(screen.getByLabelText(/^new password/i), 'x'.repeat(PASSWORD_MIN_LENGTH - 1));
    await user.type(screen.getByLabelText(/same password again/i), 'something else');
    await user.click(screen.getByRole('button', { name: /set password and sign in/i }));

    expect(await screen.findByText(`Use at least ${PASSWORD_MIN_LENGTH} characters.`)).toBeInTheDocument();
    expect(screen.getByText('The two passwords do not match.')).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/auth/password')).toHaveLength(0);
  });

  it('shows the server refusing a common password on the field', async () => {
    mockApi({
      'GET /api/auth/tokens/abc123': { status: 200, body: { ...invited, purpose: 'reset' } },
      'POST /api/auth/password': {
        status: 400,
        body: { statusCode: 400, message: 'Check the fields.', fields: { password: ['That password is too common.'] } },
      },
    });
    const { user } = renderSetPassword('/set-password?token=abc123');
    expect(await screen.findByRole('heading', { name: 'Choose a new password' })).toBeInTheDocument();
    await user.type(screen.getByLabelText(/^new password/i), 'password1234');
    await user.type(screen.getByLabelText(/same password again/i), 'password1234');
    await user.click(screen.getByRole('button', { name: /set password and sign in/i }));
    expect(await screen.findByText('That password is too common.')).toBeInTheDocument();
    expect(session.getState().status).toBe('signed-out');
  });

  it('says a used or expired link no longer works and offers a new one', async () => {
    mockApi({
      'GET /api/auth/tokens/used-token': { status: 404, body: { statusCode: 404, message: 'Not found' } },
    });
    renderSetPassword('/set-password?token=used-token');
    expect(
      await screen.findByText(/this link has expired or was already used; ask for a new one/i),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: /ask for a new link/i })).toHaveAttribute('href', '/forgot-password');
  });

  it('treats a link without a token as expired, without asking the server', async () => {
    const server = mockApi({});
    renderSetPassword('/set-password');
    expect(await screen.findByText(/this link has expired or was already used/i)).toBeInTheDocument();
    expect(server.calls).toHaveLength(0);
  });
});
