import { screen } from '@testing-library/react';
import { beforeEach, describe, expect, it } from 'vitest';
import { pageOf } from '@/features/customers/testing/fixtures';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { shearConvex, shearThinner } from '../testing/fixtures';
import { MyShearsRoute } from './my-shears';

describe('My shears', () => {
  beforeEach(() => {
    signInAs('client');
  });

  it('shows each of the client’s shears as a card linking to its page', async () => {
    mockApi({ 'GET /api/shears': pageOf([shearConvex, shearThinner]) });
    renderWithProviders(<MyShearsRoute />, { route: '/my-shears' });
    const card = await screen.findByRole('link', { name: 'KR-000123: convex straight shear, 6.5 in, left-handed' });
    expect(card).toHaveAttribute('href', '/shears/sh-123');
    expect(card).toHaveTextContent('In service');
    expect(card).toHaveTextContent('Last serviced Feb 10, 2025');
    const other = screen.getByRole('link', { name: /^KR-000045/ });
    expect(other).toHaveTextContent('Not serviced yet');
    expect(other).toHaveTextContent('Retired');
  });

  it('explains that shears appear once the sharpener registers them', async () => {
    mockApi({ 'GET /api/shears': pageOf([]) });
    renderWithProviders(<MyShearsRoute />, { route: '/my-shears' });
    expect(await screen.findByText('No shears here yet')).toBeInTheDocument();
    expect(screen.getByText(/appear here once your sharpener registers them/)).toBeInTheDocument();
  });

  it('shows loading, then says when the shears cannot be loaded', async () => {
    mockApi({ 'GET /api/shears': { status: 503, body: { statusCode: 503, message: 'Back in a minute.' } } });
    renderWithProviders(<MyShearsRoute />, { route: '/my-shears' });
    expect(screen.getByRole('status', { name: 'Loading your shears' })).toBeInTheDocument();
    expect(await screen.findByText('Your shears could not be loaded')).toBeInTheDocument();
    expect(screen.getAllByText('Back in a minute.').length).toBeGreaterThan(0);
  });
});
