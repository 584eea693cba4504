import { screen, waitFor } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { TeamRoute } from '@/features/users/routes/team';
import { SignInRoute } from '@/features/auth/routes/sign-in';
import { session } from '@/lib/session';
import { mockApi } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { RequireAuth } from './require-auth';
import { RequireRole } from './require-role';

function renderGuarded(route: string) {
  return renderWithProviders(
    <Routes>
      <Route
        path="/sign-in"
        element={
          <>
            <SignInRoute />
            <LocationProbe />
          </>
        }
      />
      <Route element={<RequireAuth />}>
        <Route element={<RequireRole roles={['owner', 'office']} />}>
          <Route path="/team" element={<TeamRoute />} />
        </Route>
      </Route>
    </Routes>,
    { route },
  );
}

describe('the guarded pages', () => {
  beforeEach(() => {
    session.end('never-signed-in');
  });

  it('send a signed-out visitor to sign in', async () => {
    renderGuarded('/team?q=sam');
    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(screen.getByTestId('location')).toHaveTextContent('/sign-in?redirectTo=%2Fteam%3Fq%3Dsam');
    expect(screen.queryByText(/your session ended/i)).not.toBeInTheDocument();
  });

  it('send the person to sign in when the session cannot be renewed, keeping where they were', async () => {
    signInAs('owner');
    const server = mockApi({
      'GET /api/users': { status: 401, body: { statusCode: 401, message: 'Unauthorized' } },
      'POST /api/auth/refresh': { status: 401, body: { statusCode: 401, message: 'Unauthorized' } },
    });
    renderGuarded('/team?q=sam');

    expect(await screen.findByText(/your session ended/i)).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(screen.getByTestId('location')).toHaveTextContent('/sign-in?redirectTo=%2Fteam%3Fq%3Dsam');
    expect(server.callsTo('POST', '/api/auth/refresh')).toHaveLength(1);
    expect(session.getState()).toEqual({ status: 'signed-out', reason: 'expired' });
  });

  it('tell a role the page is not theirs', async () => {
    signInAs('sharpener');
    const server = mockApi({});
    renderGuarded('/team');
    expect(await screen.findByRole('heading', { name: 'Not part of your role' })).toBeInTheDocument();
    await waitFor(() => expect(server.calls).toHaveLength(0));
  });
});
