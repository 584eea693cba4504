import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { mockApi, type MockRequest } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import type { TeamMember } from '../types';
import { TeamRoute } from './team';

const members: TeamMember[] = [
  {
    id: 'u-owner',
    email: 'owner@demo.keenroute.test',
    name: 'Rowan Owner',
    role: 'owner',
    status: 'active',
    createdAt: '2025-01-06T09:00:00.000Z',
    lastSignInAt: '2025-03-01T08:30:00.000Z',
  },
  {
    id: 'u-sam',
    email: 'sam@demo.keenroute.test',
    name: 'Sam Bevel',
    role: 'sharpener',
    status: 'invited',
    createdAt: '2025-02-10T09:00:00.000Z',
    lastSignInAt: null,
  },
];

function renderTeam(route = '/team') {
  return renderWithProviders(
    <Routes>
      <Route
        path="/team"
        element={
          <>
            <TeamRoute />
            <LocationProbe />
          </>
        }
      />
    </Routes>,
    { route },
  );
}

const listOf = (items: TeamMember[], total = items.length) => ({ status: 200, body: { items, total } });

describe('the Team page', () => {
  beforeEach(() => {
    signInAs('owner');
  });

  it('asks the server for the page, search and sort that are in the URL', async () => {
    const server = mockApi({ 'GET /api/users': listOf(members, 60) });
    renderTeam('/team?page=2&q=sam&sort=email&order=desc');

    expect(await screen.findByText('Sam Bevel')).toBeInTheDocument();
    const search = server.callsTo('GET', '/api/users')[0]?.search;
    expect(Object.fromEntries(search ?? [])).toEqual({
      page: '2',
      pageSize: '25',
      q: 'sam',
      sort: 'email',
      order: 'desc',
    });
    expect(screen.getByRole('searchbox', { name: 'Search the team' })).toHaveValue('sam');
    expect(screen.getByText('26–50 of 60')).toBeInTheDocument();
  });

  it('keeps a new sort in the URL and starts again at page 1', async () => {
    const server = mockApi({ 'GET /api/users': listOf(members, 60) });
    const { user } = renderTeam('/team?page=3');
    await screen.findByText('Sam Bevel');

    await user.click(screen.getByRole('button', { name: /e-mail/i }));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/team?sort=email'));
    await user.click(screen.getByRole('button', { name: /e-mail/i }));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/team?sort=email&order=desc'));
    const last = server.callsTo('GET', '/api/users').at(-1);
    expect(last?.search.get('order')).toBe('desc');
    expect(last?.search.get('page')).toBe('1');
  });

  it('says when no one matches the search', async () => {
    mockApi({ 'GET /api/users': listOf([]) });
    renderTeam('/team?q=nobody');
    expect(await screen.findByText('No one matches “nobody”.')).toBeInTheDocument();
  });

  it('says when the list cannot be loaded and can try again', async () => {
    let attempts = 0;
    mockApi({
      'GET /api/users': () => {
        attempts += 1;
        return attempts === 1
          ? { status: 500, body: { statusCode: 500, message: 'Database is resting.', requestId: 'r9' } }
          : listOf(members);
      },
    });
    const { user } = renderTeam();
    expect(await screen.findByText('The team could not be loaded')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByText('Sam Bevel')).toBeInTheDocument();
  });

  it('offers no actions on your own row', async () => {
    mockApi({ 'GET /api/users': listOf(members) });
    renderTeam();
    await screen.findByText('Sam Bevel');
    expect(screen.queryByRole('button', { name: 'Actions for Rowan Owner' })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Actions for Sam Bevel' })).toBeInTheDocument();
  });

  it('lets an office manager act on everyone but owners', async () => {
    signInAs('office');
    mockApi({ 'GET /api/users': listOf(members) });
    renderTeam();
    await screen.findByText('Sam Bevel');
    expect(screen.queryByRole('button', { name: 'Actions for Rowan Owner' })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Actions for Sam Bevel' })).toBeInTheDocument();
  });

  it('deactivates after a confirmation and reloads the list', async () => {
    const server = mockApi({
      'GET /api/users': listOf(members),
      'PATCH /api/users/u-sam': (request: MockRequest) => ({
        status: 200,
        body: { ...members[1], status: (request.body as { active: boolean }).active ? 'active' : 'deactivated' },
      }),
    });
    const { user } = renderTeam();
    await user.click(await screen.findByRole('button', { name: 'Actions for Sam Bevel' }));
    await user.click(await screen.findByRole('menuitem', { name: 'Deactivate' }));
    const dialog = await screen.findByRole('dialog', { name: 'Deactivate Sam Bevel?' });
    await user.click(within(dialog).getByRole('button', { name: 'Deactivate' }));

    await waitFor(() => expect(server.callsTo('GET', '/api/users')).toHaveLength(2));
    expect(server.callsTo('PATCH', '/api/users/u-sam')[0]?.body).toEqual({ active: false });
  });

  it('resends an invitation to someone still invited', async () => {
    const server = mockApi({
      'GET /api/users': listOf(members),
      'POST /api/users/u-sam/invitations': { status: 202 },
    });
    const { user } = renderTeam();
    await user.click(await screen.findByRole('button', { name: 'Actions for Sam Bevel' }));
    await user.click(await screen.findByRole('menuitem', { name: 'Resend invitation' }));
    expect(await screen.findByText(/a new link is on its way to sam@demo\.keenroute\.test/i)).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/users/u-sam/invitations')).toHaveLength(1);
  });

  it('shows a refusal from the server as a notification with its message', async () => {
    mockApi({
      'GET /api/users': listOf(members),
      'PATCH /api/users/u-sam': { status: 403, body: { statusCode: 403, message: 'Only an owner may do that.' } },
    });
    const { user } = renderTeam();
    await user.click(await screen.findByRole('button', { name: 'Actions for Sam Bevel' }));
    await user.click(await screen.findByRole('menuitem', { name: 'Change role' }));
    const dialog = await screen.findByRole('dialog', { name: "Change Sam Bevel's role" });
    await user.click(within(dialog).getByRole('combobox', { name: 'Role' }));
    await user.click(await screen.findByRole('option', { name: 'Office' }));
    await user.click(within(dialog).getByRole('button', { name: 'Save role' }));
    expect(await screen.findByText('Only an owner may do that.')).toBeInTheDocument();
    expect(screen.getByText('Not allowed')).toBeInTheDocument();
  });
});
