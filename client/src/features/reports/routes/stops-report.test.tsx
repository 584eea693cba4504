import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { RANGE, monthsReport, staffPage, stopsReport } from '../testing/fixtures';
import { rowCells } from '../testing/table';
import { StopsReportRoute } from './stops-report';

const RANGE_SEARCH = `from=${RANGE.from}&to=${RANGE.to}`;

function renderStops(route = `/reports?${RANGE_SEARCH}`) {
  return renderWithProviders(
    <Routes>
      <Route
        path="/reports"
        element={
          <>
            <StopsReportRoute />
            <LocationProbe />
          </>
        }
      />
    </Routes>,
    { route },
  );
}

/** The stop names of the table's body rows, top to bottom. */
function stopOrder(table: HTMLElement): string[] {
  const body = within(table).getAllByRole('rowgroup')[1]!;
  return within(body)
    .getAllByRole('row')
    .map((row) => within(row).getAllByRole('cell')[0]!.querySelector('button')!.textContent ?? '');
}

describe('revenue per stop', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('owner');
  });

  it('shows every column of a stop in money and hours, dashes where nothing divides, and the totals row', async () => {
    mockApi({
      'GET /api/reports/stops': { status: 200, body: stopsReport() },
      'GET /api/users': { status: 200, body: staffPage() },
    });
    renderStops();

    const table = await screen.findByRole('table', { name: 'Revenue per stop' });
    const headers = within(table)
      .getAllByRole('columnheader')
      .map((th) => th.textContent);
    expect(headers).toEqual([
      'Stop',
      'Cadence',
      'Visits',
      'Shears',
      'Revenue',
      'Bench time',
      'Drive',
      'Route time',
      'Km',
      'Per visit',
      'Per bench hour',
      'Per route hour',
      'Per km',
      'Shears per visit',
    ]);

    const pine = within(table).getByRole('button', { name: 'Pine Street Salon (demo)' }).closest('tr')!;
    // 243000 cents; 720 bench minutes = 12:00; 180.5 drive → 181 min = 3:01; 900.5 route → 901 min = 15:01.
    expect(rowCells(pine)).toEqual([
      'Pine Street Salon (demo)Larkhaven',
      '8 wk',
      '6',
      '54',
      '$2,430.00',
      '12:00',
      '3:01',
      '15:01',
      '150.2',
      '$405.00',
      '$202.50',
      '$161.91',
      '$16.18',
      '9.0',
    ]);

    const quay = within(table).getByRole('button', { name: 'Quay Street Grooming School (demo)' }).closest('tr')!;
    expect(rowCells(quay).slice(9)).toEqual(['—', '—', '—', '—', '—']);

    const footer = within(table).getAllByRole('rowgroup')[2]!;
    const totals = within(footer).getByRole('row');
    // 6+12+3 visits; 2430+1980+510 dollars; 1710 bench min = 28:30; 695.7 drive → 696 = 11:36; 2405.7 → 2406 = 40:06.
    expect(rowCells(totals)).toEqual([
      'All stops',
      '',
      '21',
      '126',
      '$4,920.00',
      '28:30',
      '11:36',
      '40:06',
      '549.2',
      '$234.29',
      '$172.63',
      '$122.71',
      '$8.96',
      '6.0',
    ]);
  });

  it('sorts by a column, largest first, then the other way, with the stops that have no figure last', async () => {
    const server = mockApi({
      'GET /api/reports/stops': { status: 200, body: stopsReport() },
      'GET /api/users': { status: 200, body: staffPage() },
    });
    const { user } = renderStops();
    const table = await screen.findByRole('table', { name: 'Revenue per stop' });
    // The server's order: most revenue first.
    expect(stopOrder(table)).toEqual([
      'Pine Street Salon (demo)',
      'Harbour Groom Co. (demo)',
      'Birch Lane Barbers (demo)',
      'Quay Street Grooming School (demo)',
    ]);

    const perRouteHour = within(table).getByRole('button', { name: 'Per route hour' });
    await user.click(perRouteHour);
    // 161.91 > 124.80 > 94.29, and no figure last.
    expect(stopOrder(table)).toEqual([
      'Pine Street Salon (demo)',
      'Birch Lane Barbers (demo)',
      'Harbour Groom Co. (demo)',
      'Quay Street Grooming School (demo)',
    ]);
    expect(perRouteHour.closest('th')).toHaveAttribute('aria-sort', 'descending');

    await user.click(perRouteHour);
    expect(stopOrder(table)).toEqual([
      'Harbour Groom Co. (demo)',
      'Birch Lane Barbers (demo)',
      'Pine Street Salon (demo)',
      'Quay Street Grooming School (demo)',
    ]);
    expect(perRouteHour.closest('th')).toHaveAttribute('aria-sort', 'ascending');

    await user.click(within(table).getByRole('button', { name: 'Stop' }));
    expect(stopOrder(table)).toEqual([
      'Birch Lane Barbers (demo)',
      'Harbour Groom Co. (demo)',
      'Pine Street Salon (demo)',
      'Quay Street Grooming School (demo)',
    ]);
    // Sorting is on the page: the report was asked for once.
    expect(server.callsTo('GET', '/api/reports/stops')).toHaveLength(1);
  });

  it("opens a stop's monthly trend from its name, asking for that stop's months in the same dates", async () => {
    const server = mockApi({
      'GET /api/reports/stops': { status: 200, body: stopsReport() },
      'GET /api/reports/months': { status: 200, body: monthsReport() },
      'GET /api/users': { status: 200, body: staffPage() },
    });
    const { user } = renderStops();
    const table = await screen.findByRole('table', { name: 'Revenue per stop' });
    await user.click(within(table).getByRole('button', { name: 'Pine Street Salon (demo)' }));

    const drawer = await screen.findByRole('dialog', { name: 'Pine Street Salon (demo): revenue by month' });
    const months = await within(drawer).findByRole('table', { name: 'Pine Street Salon (demo) by month' });
    const [call] = server.callsTo('GET', '/api/reports/months');
    expect(call?.search.get('stopId')).toBe('s-pine');
    expect(call?.search.get('from')).toBe(RANGE.from);
    expect(call?.search.get('to')).toBe(RANGE.to);
    const november = within(months).getByText('Nov 2025').closest('tr')!;
    expect(rowCells(november)).toEqual(['Nov 2025', '2', '18', '$810.00', '$405.00']);
    expect(within(drawer).getByRole('link', { name: 'Open the stop' })).toHaveAttribute('href', '/stops/s-pine');
    expect(screen.getByTestId('location')).toHaveTextContent('stop=s-pine');

    await user.click(within(drawer).getByRole('button', { name: 'Close the trend' }));
    await waitFor(() => expect(screen.getByTestId('location')).not.toHaveTextContent('stop='));
  });

  it('says so when no stop was visited', async () => {
    mockApi({
      'GET /api/reports/stops': { status: 200, body: stopsReport({ rows: [], totals: undefined }) },
      'GET /api/users': { status: 200, body: staffPage() },
    });
    renderStops();
    expect(await screen.findByText('No stop was visited in these dates.')).toBeInTheDocument();
    expect(screen.queryByRole('table')).not.toBeInTheDocument();
  });

  it('shows the server’s message when the report cannot be made', async () => {
    mockApi({
      'GET /api/reports/stops': {
        status: 400,
        body: { statusCode: 400, message: 'A report covers at most 6 years; shorten the range.' },
      },
      'GET /api/users': { status: 200, body: staffPage() },
    });
    renderStops('/reports?from=2015-01-01&to=2025-12-31');
    expect(await screen.findByText('The revenue per stop could not be loaded')).toBeInTheDocument();
    expect(screen.getByText('A report covers at most 6 years; shorten the range.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});
