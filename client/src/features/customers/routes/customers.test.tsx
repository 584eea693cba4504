import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { customerMira, customerTeo, pageOf, stopPaws, stopRiverside } from '../testing/fixtures';
import { CustomersRoute } from './customers';

const SLOW = { timeout: 5000 };

function renderCustomers(route = '/customers') {
  return renderWithProviders(
    <Routes>
      <Route
        path="/customers"
        element={
          <>
            <CustomersRoute />
            <LocationProbe />
          </>
        }
      />
      <Route path="/customers/:customerId" element={<LocationProbe />} />
    </Routes>,
    { route },
  );
}

const stops = pageOf([stopRiverside, stopPaws]);

describe('the Customers page', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('office');
  });

  it('asks for the search, stop, activity, sort and page that are in the URL', async () => {
    const server = mockApi({ 'GET /api/customers': pageOf([customerMira], 40), 'GET /api/stops': stops });
    renderCustomers('/customers?q=mira&stopId=s-riverside&active=all&sort=stop&order=desc&page=2');

    expect(await screen.findByRole('link', { name: 'Mira Stylist' })).toHaveAttribute('href', '/customers/c-mira');
    expect(Object.fromEntries(server.callsTo('GET', '/api/customers')[0]?.search ?? [])).toEqual({
      q: 'mira',
      stopId: 's-riverside',
      sort: 'stop',
      order: 'desc',
      page: '2',
      pageSize: '25',
    });
    expect(screen.getByRole('searchbox', { name: 'Search customers' })).toHaveValue('mira');
    await waitFor(() => expect(screen.getByRole('combobox', { name: 'Stop' })).toHaveValue('Riverside Cuts'));
    expect(screen.getByText('26–40 of 40')).toBeInTheDocument();
  });

  it('lists active customers by default, with their stop, shear count and badges', async () => {
    const server = mockApi({ 'GET /api/customers': pageOf([customerMira, customerTeo]), 'GET /api/stops': stops });
    renderCustomers();
    const row = (await screen.findByRole('link', { name: 'Mira Stylist' })).closest('tr');
    expect(row).toHaveTextContent('mira@demo.keenroute.test');
    expect(row).toHaveTextContent('Riverside Cuts');
    expect(row).toHaveTextContent('3');
    expect(row).toHaveTextContent('Signs in');
    expect(row).toHaveTextContent('Visit notices');
    expect(server.callsTo('GET', '/api/customers')[0]?.search.get('active')).toBe('true');
  });

  it('keeps the typed search in the URL, back at page 1', async () => {
    const server = mockApi({
      'GET /api/customers': (request) =>
        request.search.get('q') === 'teo' ? pageOf([customerTeo]) : pageOf([customerMira, customerTeo]),
      'GET /api/stops': stops,
    });
    const { user } = renderCustomers('/customers?page=3');
    await screen.findByText('Mira Stylist');
    await user.type(screen.getByRole('searchbox', { name: 'Search customers' }), 'teo');
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/customers?q=teo'), SLOW);
    await waitFor(() => expect(screen.queryByText('Mira Stylist')).not.toBeInTheDocument(), SLOW);
    expect(server.callsTo('GET', '/api/customers').at(-1)?.search.get('page')).toBe('1');

    await user.click(screen.getByRole('radio', { name: 'Inactive' }));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/customers?q=teo&active=false'));
  });

  it('says when no one matches and clears the search', async () => {
    mockApi({
      'GET /api/customers': (request) => (request.search.get('q') ? pageOf([]) : pageOf([customerTeo])),
      'GET /api/stops': stops,
    });
    const { user } = renderCustomers('/customers?q=nobody');
    expect(await screen.findByText('No customer matches “nobody”.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Clear the search and filters' }));
    expect(await screen.findByText('Teo Groomer')).toBeInTheDocument();
  });

  it('shows loading, then a failure it can retry', async () => {
    let attempts = 0;
    mockApi({
      'GET /api/customers': () => {
        attempts += 1;
        return attempts === 1
          ? { status: 500, body: { statusCode: 500, message: 'Database is resting.', requestId: 'r2' } }
          : pageOf([customerMira]);
      },
      'GET /api/stops': stops,
    });
    const { user } = renderCustomers();
    expect(screen.getByRole('status', { name: 'Loading customers' })).toBeInTheDocument();
    expect(await screen.findByText('The customers could not be loaded')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByText('Mira Stylist')).toBeInTheDocument();
  });

  it('lets the office add a customer, then opens their page', async () => {
    mockApi({
      'GET /api/customers': pageOf([]),
      'GET /api/stops': stops,
      'POST /api/customers': { status: 201, body: { ...customerMira, id: 'c-new' } },
    });
    const { user } = renderCustomers();
    expect(await screen.findByText('No customers yet.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Add customer' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'Add a customer' }));
    await user.type(dialog.getByRole('textbox', { name: /name/i }), 'Nia');
    await user.click(dialog.getByRole('button', { name: 'Add customer' }));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/customers/c-new'));
  });

  it('offers a sharpener no way to add customers', async () => {
    signInAs('sharpener');
    mockApi({ 'GET /api/customers': pageOf([customerMira]), 'GET /api/stops': stops });
    renderCustomers();
    await screen.findByText('Mira Stylist');
    expect(screen.queryByRole('button', { name: 'Add customer' })).not.toBeInTheDocument();
  });
});
