import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { convexDetail, shearConvex } from '@/features/shears/testing/fixtures';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { miraDetail, pageOf, stopRiverside } from '../testing/fixtures';
import { CustomerDetailRoute } from './customer-detail';

function renderCustomer(id = 'c-mira') {
  return renderWithProviders(
    <Routes>
      <Route path="/customers/:customerId" element={<CustomerDetailRoute />} />
    </Routes>,
    { route: `/customers/${id}` },
  );
}

const customerRoutes = {
  'GET /api/customers/c-mira': { status: 200, body: miraDetail },
  'GET /api/shears': pageOf([shearConvex]),
};

describe('the customer page', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('office');
    URL.createObjectURL = vi.fn(() => 'blob:keenroute-labels');
    URL.revokeObjectURL = vi.fn();
  });
  afterEach(() => {
    vi.restoreAllMocks();
  });

  it('shows the details, the stop with its move history and the customer’s shears', async () => {
    const server = mockApi(customerRoutes);
    renderCustomer();
    expect(await screen.findByRole('heading', { level: 1, name: 'Mira Stylist' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'mira@demo.keenroute.test' })).toHaveAttribute(
      'href',
      'mailto:mira@demo.keenroute.test',
    );
    expect(screen.getByText('Prefers mornings.')).toBeInTheDocument();
    const history = screen.getByLabelText('Stop history');
    expect(history).toHaveTextContent('Paws & Tails Grooming');
    expect(history).toHaveTextContent('Mar 1, 2024 to Jan 15, 2025');
    expect(history).toHaveTextContent('Since Jan 15, 2025');

    const shears = screen.getByRole('region', { name: /shears/i });
    expect(await within(shears).findByRole('link', { name: 'Open KR-000123' })).toHaveAttribute(
      'href',
      '/shears/sh-123',
    );
    expect(server.callsTo('GET', '/api/shears')[0]?.search.get('customerId')).toBe('c-mira');
  });

  it('registers a shear for this customer without asking whose it is', async () => {
    const server = mockApi({ ...customerRoutes, 'POST /api/shears': { status: 201, body: convexDetail } });
    const { user } = renderCustomer();
    await user.click(await screen.findByRole('button', { name: 'Add shear' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'Register a shear' }));
    expect(dialog.queryByRole('combobox', { name: /customer/i })).not.toBeInTheDocument();
    await user.type(dialog.getByRole('textbox', { name: /length/i }), '6.5');
    await user.click(dialog.getByRole('combobox', { name: /edge type/i }));
    await user.click(await screen.findByRole('option', { name: 'Convex' }));
    await user.click(dialog.getByRole('combobox', { name: /tool kind/i }));
    await user.click(await screen.findByRole('option', { name: 'Straight shear' }));
    await user.click(dialog.getByRole('button', { name: 'Register shear' }));
    expect(await dialog.findByLabelText('New tag code')).toHaveTextContent('KR-000123');
    expect(server.callsTo('POST', '/api/shears')[0]?.body).toMatchObject({ customerId: 'c-mira' });
  });

  it('prints the tag labels of all the customer’s shears', async () => {
    const open = vi.spyOn(window, 'open').mockReturnValue(window);
    const server = mockApi({ ...customerRoutes, 'GET /api/shears/labels.pdf': { status: 200, body: 'pdf' } });
    const { user } = renderCustomer();
    await user.click(await screen.findByRole('button', { name: 'Print tag labels' }));
    await waitFor(() => expect(open).toHaveBeenCalledWith('blob:keenroute-labels', '_blank'));
    expect(server.callsTo('GET', '/api/shears/labels.pdf')[0]?.search.get('customerId')).toBe('c-mira');
  });

  it('edits the customer from the page', async () => {
    mockApi({ ...customerRoutes, 'GET /api/stops': pageOf([stopRiverside]) });
    const { user } = renderCustomer();
    await user.click(await screen.findByRole('button', { name: 'Edit' }));
    const dialog = await screen.findByRole('dialog', { name: 'Edit Mira Stylist' });
    expect(within(dialog).getByRole('textbox', { name: /e-mail/i })).toHaveValue('mira@demo.keenroute.test');
  });

  it('shows a client their own page, read-only', async () => {
    signInAs('client');
    mockApi(customerRoutes);
    renderCustomer();
    expect(await screen.findByRole('heading', { level: 1, name: 'Mira Stylist' })).toBeInTheDocument();
    await screen.findByRole('link', { name: 'Open KR-000123' });
    for (const name of ['Edit', 'Add shear', 'Print tag labels']) {
      expect(screen.queryByRole('button', { name })).not.toBeInTheDocument();
    }
    expect(screen.queryByRole('link', { name: 'Riverside Cuts' })).not.toBeInTheDocument();
  });

  it('says when the customer is not there or not visible', async () => {
    mockApi({ 'GET /api/customers/c-gone': { status: 404, body: { statusCode: 404, message: 'Not found.' } } });
    renderCustomer('c-gone');
    expect(await screen.findByText('This customer was not found')).toBeInTheDocument();
  });
});
