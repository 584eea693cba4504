import { within, screen } from '@testing-library/react';
import { ROLES, type Role } from '@keenroute/shared';
import { Route, Routes } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { session } from '@/lib/session';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { PEOPLE, signInAs } from '@/testing/session';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { AppLayout } from './app-layout';

// PRODUCT.md's plan, limited to the pages that exist now.
const REGISTRY = ['Coming due', 'Stops', 'Customers', 'Shears', 'Drop-offs'];
const EXPECTED_NAV: Record<Role, string[]> = {
  owner: [
    'Home',
    'Week plan',
    'Tickets',
    ...REGISTRY,
    'Invoices',
    'Reports',
    'Import',
    'Edge recipes',
    'Team',
    'Rates',
    'Business profile',
    'Audit log',
    'Outbox',
  ],
  office: [
    'Home',
    'Week plan',
    'Tickets',
    ...REGISTRY,
    'Invoices',
    'Reports',
    'Import',
    'Edge recipes',
    'Team',
    'Rates',
    'Business profile',
  ],
  sharpener: ['Home', 'Today', 'My week', 'Tickets', ...REGISTRY, 'Edge recipes'],
  client: ['Home', 'My shears', 'Book a drop-off', 'My invoices'],
};

function renderShell() {
  return renderWithProviders(
    <Routes>
      <Route element={<RequireAuth />}>
        <Route element={<AppLayout />}>
          <Route index element={<p>home page</p>} />
        </Route>
      </Route>
      <Route path="/sign-in" element={<p>sign-in page</p>} />
    </Routes>,
  );
}

describe('the app shell', () => {
  it.each(ROLES)('shows the %s only their pages', (role) => {
    signInAs(role);
    renderShell();
    const nav = screen.getByRole('navigation', { name: 'Main' });
    const labels = within(nav)
      .getAllByRole('link')
      .map((link) => link.textContent?.replace(/E-mails caught locally/, '').trim());
    expect(labels).toEqual(EXPECTED_NAV[role]);
  });

  it('shows who is signed in, in which role', () => {
    signInAs('office');
    renderShell();
    const header = within(screen.getByTestId('signed-in-as'));
    expect(header.getByText(PEOPLE.office.name)).toBeInTheDocument();
    expect(header.getByText('Office')).toBeInTheDocument();
  });

  it('signs out through the API, ends the session and shows sign-in', async () => {
    signInAs('owner');
    const server = mockApi({ 'POST /api/auth/logout': { status: 204 } });
    const { user } = renderShell();
    await user.click(screen.getByRole('button', { name: 'Sign out' }));
    expect(server.callsTo('POST', '/api/auth/logout')).toHaveLength(1);
    expect(session.getState()).toEqual({ status: 'signed-out', reason: 'signed-out' });
    expect(await screen.findByText('sign-in page')).toBeInTheDocument();
  });
});
