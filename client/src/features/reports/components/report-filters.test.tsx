import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { catchDownloads } from '@/testing/downloads';
import { mockApi } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { StopsReportRoute } from '../routes/stops-report';
import { staffPage, stopsReport } from '../testing/fixtures';

function renderStops(route: string) {
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

const iso = (date: Date) =>
  `${date.getFullYear()}-${String(date.getMonth() + 1).padStart(2, '0')}-${String(date.getDate()).padStart(2, '0')}`;

function location(): URLSearchParams {
  return new URLSearchParams(screen.getByTestId('location').textContent?.split('?')[1] ?? '');
}

describe('the reports filter bar', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('owner');
  });

  it('asks for the last 12 calendar months when the link has no dates', async () => {
    const server = mockApi({
      'GET /api/reports/stops': { status: 200, body: stopsReport() },
      'GET /api/users': { status: 200, body: staffPage() },
    });
    renderStops('/reports');
    await screen.findByRole('table', { name: 'Revenue per stop' });

    const today = new Date();
    // The first day of the month eleven months back, by the calendar (Date rolls the year over).
    const from = iso(new Date(today.getFullYear(), today.getMonth() - 11, 1));
    const [call] = server.callsTo('GET', '/api/reports/stops');
    expect(call?.search.get('from')).toBe(from);
    expect(call?.search.get('to')).toBe(iso(today));
    expect(call?.search.has('sharpenerId')).toBe(false);
    expect(screen.getByRole('radio', { name: 'Last 12 months' })).toBeChecked();
  });

  it('writes a chosen period and sharpener into the URL and asks the server for them', async () => {
    const server = mockApi({
      'GET /api/reports/stops': { status: 200, body: stopsReport() },
      'GET /api/users': { status: 200, body: staffPage() },
    });
    const { user } = renderStops('/reports?from=2025-03-01&to=2025-03-31');
    await screen.findByRole('table', { name: 'Revenue per stop' });
    expect(server.calls.at(-1)?.search.get('from')).toBe('2025-03-01');
    // A range of our own matches no named period.
    expect(screen.getByRole('radio', { name: 'Last year' })).not.toBeChecked();

    await user.click(screen.getByRole('radio', { name: 'Last year' }));
    const lastYear = new Date().getFullYear() - 1;
    await waitFor(() => expect(location().get('from')).toBe(`${lastYear}-01-01`));
    expect(location().get('to')).toBe(`${lastYear}-12-31`);
    await waitFor(() => expect(server.calls.at(-1)?.search.get('from')).toBe(`${lastYear}-01-01`));
    expect(server.calls.at(-1)?.search.get('to')).toBe(`${lastYear}-12-31`);

    await user.click(screen.getByRole('combobox', { name: 'Sharpener' }));
    await user.click(await screen.findByRole('option', { name: 'Sasha Hone' }));
    await waitFor(() => expect(location().get('sharpener')).toBe('u-sharpener'));
    const stopsCall = server.callsTo('GET', '/api/reports/stops').at(-1);
    expect(stopsCall?.search.get('sharpenerId')).toBe('u-sharpener');
    expect(stopsCall?.search.get('from')).toBe(`${lastYear}-01-01`);
    expect(screen.getByText(/Sasha Hone's work/)).toBeInTheDocument();

    // The other reports are a click away with the same filters.
    const driveCost = screen.getByRole('link', { name: 'Drive cost' });
    const href = new URL(driveCost.getAttribute('href')!, 'http://keenroute.test');
    expect(href.pathname).toBe('/reports/drive-cost');
    expect(href.searchParams.get('from')).toBe(`${lastYear}-01-01`);
    expect(href.searchParams.get('sharpener')).toBe('u-sharpener');
  });

  it('keeps the filters of a shared link, and the CSV asks for the same figures with the sign-in', async () => {
    const downloads = catchDownloads();
    const server = mockApi({
      'GET /api/reports/stops': { status: 200, body: stopsReport() },
      'GET /api/reports/stops/csv': { status: 200, body: 'stop,city,visits' },
      'GET /api/users': { status: 200, body: staffPage() },
    });
    const { user } = renderStops('/reports?from=2024-07-01&to=2025-06-30&sharpener=u-sharpener');
    await screen.findByRole('table', { name: 'Revenue per stop' });
    const [first] = server.callsTo('GET', '/api/reports/stops');
    expect(first?.search.get('from')).toBe('2024-07-01');
    expect(first?.search.get('to')).toBe('2025-06-30');
    expect(first?.search.get('sharpenerId')).toBe('u-sharpener');
    expect(screen.getByText(/^Jul 1, 2024 to Jun 30, 2025/)).toBeInTheDocument();
    await waitFor(() => expect(screen.getByRole('combobox', { name: 'Sharpener' })).toHaveValue('Sasha Hone'));

    const section = screen.getByRole('region', { name: 'Every stop' });
    await user.click(within(section).getByRole('button', { name: 'Download CSV: Revenue per stop' }));
    await waitFor(() => expect(downloads.names).toEqual(['keenroute-stops-2024-07-01-2025-06-30.csv']));
    const [csv] = server.callsTo('GET', '/api/reports/stops/csv');
    expect(csv?.headers.get('Authorization')).toBe('Bearer token-owner');
    expect(csv?.search.get('from')).toBe('2024-07-01');
    expect(csv?.search.get('to')).toBe('2025-06-30');
    expect(csv?.search.get('sharpenerId')).toBe('u-sharpener');
    expect(await downloads.blobs[0]!.text()).toContain('stop,city,visits');
  });
});
