import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { HomeRoute } from './home';

describe('the home page', () => {
  it('greets a sharpener, names the role and shows the cautions of the bench', () => {
    signInAs('sharpener');
    renderWithProviders(<HomeRoute />);
    expect(screen.getByRole('heading', { level: 1 })).toHaveTextContent(/^Good (morning|afternoon|evening), Sasha$/);
    expect(screen.getByText('Sharpener')).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'At the bench' })).toBeInTheDocument();
    expect(screen.getByText(/too hot to touch means lighter pressure and slower work/)).toBeInTheDocument();
    expect(screen.getByText(/equipment maker's instructions/)).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: /team/i })).not.toBeInTheDocument();
  });

  it('shows a client no bench cautions and no staff pages', () => {
    signInAs('client');
    renderWithProviders(<HomeRoute />);
    expect(screen.queryByRole('heading', { name: 'At the bench' })).not.toBeInTheDocument();
    expect(screen.getByRole('link', { name: /^My shears/ })).toHaveAttribute('href', '/my-shears');
    expect(screen.getByText(/Book a drop-off/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: /^My invoices/ })).toHaveAttribute('href', '/my-invoices');
    // Every page PRODUCT.md plans for a client exists, so nothing is listed as on the way.
    expect(screen.queryByRole('heading', { name: 'On the way' })).not.toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Change your password' })).toHaveAttribute(
      'href',
      '/forgot-password?email=client%40demo.keenroute.test',
    );
  });

  it('links an owner to the pages they have now', () => {
    signInAs('owner');
    renderWithProviders(<HomeRoute />);
    expect(screen.getByRole('link', { name: /^Team/ })).toHaveAttribute('href', '/team');
    expect(screen.getByRole('link', { name: /^Outbox/ })).toHaveAttribute('href', '/dev/outbox');
    expect(screen.getByRole('link', { name: /^Invoices/ })).toHaveAttribute('href', '/invoices');
    expect(screen.getByRole('link', { name: /^Business profile/ })).toHaveAttribute('href', '/settings/business');
    expect(screen.getByRole('link', { name: /^Reports/ })).toHaveAttribute('href', '/reports');
    // Stop earnings was the last page PRODUCT.md plans for an owner; nothing is on the way now.
    expect(screen.queryByRole('heading', { name: 'On the way' })).not.toBeInTheDocument();
  });

  it('links the office to the reports too, and lists nothing as on the way', () => {
    signInAs('office');
    renderWithProviders(<HomeRoute />);
    expect(screen.getByRole('link', { name: /^Reports/ })).toHaveAttribute('href', '/reports');
    expect(screen.queryByRole('heading', { name: 'On the way' })).not.toBeInTheDocument();
  });
});
