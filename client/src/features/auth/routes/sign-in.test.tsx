import { screen, waitFor } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { session } from '@/lib/session';
import { mockApi } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { PEOPLE } from '@/testing/session';
import { SignInRoute } from './sign-in';

function renderSignIn(route = '/sign-in') {
  return renderWithProviders(
    <Routes>
      <Route path="/sign-in" element={<SignInRoute />} />
      <Route path="*" element={<LocationProbe />} />
    </Routes>,
    { route },
  );
}

describe('the sign-in page', () => {
  beforeEach(() => {
    session.end('never-signed-in');
  });

  it('puts the field errors of a 400 on the fields', async () => {
    mockApi({
      'POST /api/auth/login': {
        status: 400,
        body: {
          statusCode: 400,
          error: 'Bad Request',
          message: 'Some fields need attention.',
          fields: { email: ['Use the e-mail address you were invited with.'], password: ['password is too long'] },
          requestId: 'r1',
        },
      },
    });
    const { user } = renderSignIn();
    await user.type(screen.getByLabelText(/e-mail/i), 'owner@demo.keenroute.test');
    await user.type(screen.getByLabelText(/^password/i), 'keenroute-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Use the e-mail address you were invited with.')).toBeInTheDocument();
    expect(screen.getByText('password is too long')).toBeInTheDocument();
    expect(screen.getByLabelText(/e-mail/i)).toHaveAttribute('aria-invalid', 'true');
    expect(screen.queryByText('Some fields need attention.')).not.toBeInTheDocument();
  });

  it('says so when the e-mail or password is wrong', async () => {
    mockApi({
      'POST /api/auth/login': { status: 401, body: { statusCode: 401, message: 'Wrong e-mail or password.' } },
    });
    const { user } = renderSignIn();
    await user.type(screen.getByLabelText(/e-mail/i), 'owner@demo.keenroute.test');
    await user.type(screen.getByLabelText(/^password/i), 'not-the-password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Wrong e-mail or password.')).toBeInTheDocument();
    expect(session.getState().status).toBe('signed-out');
  });

  it('checks the form before asking the server', async () => {
    const server = mockApi({});
    const { user } = renderSignIn();
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText(/enter your e-mail address/i)).toBeInTheDocument();
    expect(screen.getByText('Enter your password.')).toBeInTheDocument();
    expect(server.calls).toHaveLength(0);
  });

  it('signs in and goes back where the person was going', async () => {
    const server = mockApi({
      'POST /api/auth/login': { status: 200, body: { accessToken: 'token-new', user: PEOPLE.office } },
    });
    const { user } = renderSignIn('/sign-in?redirectTo=%2Fteam%3Fpage%3D2');
    await user.type(screen.getByLabelText(/e-mail/i), '  office@demo.keenroute.test ');
    await user.type(screen.getByLabelText(/^password/i), 'keenroute-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/team?page=2'));
    expect(server.callsTo('POST', '/api/auth/login')[0]?.body).toEqual({
      email: 'office@demo.keenroute.test',
      password: 'keenroute-demo',
    });
    expect(session.getAccessToken()).toBe('token-new');
  });

  it('refuses to send anyone to another site afterwards', async () => {
    mockApi({ 'POST /api/auth/login': { status: 200, body: { accessToken: 't', user: PEOPLE.client } } });
    const { user } = renderSignIn('/sign-in?redirectTo=%2F%2Fevil.test%2Fphish');
    await user.type(screen.getByLabelText(/e-mail/i), 'client@demo.keenroute.test');
    await user.type(screen.getByLabelText(/^password/i), 'keenroute-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent(/^\/$/));
  });
});
