import { screen, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { RANGE, driveCostReport, staffPage } from '../testing/fixtures';
import { DriveCostReportRoute } from './drive-cost-report';

function renderDriveCost() {
  return renderWithProviders(
    <Routes>
      <Route path="/reports/drive-cost" element={<DriveCostReportRoute />} />
    </Routes>,
    { route: `/reports/drive-cost?from=${RANGE.from}&to=${RANGE.to}` },
  );
}

describe('the stops that pay least for the drive', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('office');
  });

  it("writes out each stop's suggestions with their figures, best first", async () => {
    mockApi({
      'GET /api/reports/drive-cost': { status: 200, body: driveCostReport() },
      'GET /api/users': { status: 200, body: staffPage() },
    });
    renderDriveCost();

    const harbour = await screen.findByRole('article', { name: 'Harbour Groom Co. (demo)' });
    expect(within(harbour).getByText('$28.57 per route hour')).toBeInTheDocument();
    // 420 of its 1260 route minutes are driving: 7:00 of 21:00.
    expect(within(harbour).getByText('21:00')).toBeInTheDocument();
    expect(within(harbour).getByText('7:00')).toBeInTheDocument();
    const ideas = within(within(harbour).getByRole('list', { name: 'What would help Harbour Groom Co. (demo)' }))
      .getAllByRole('listitem')
      .map((item) => item.textContent);
    expect(ideas).toEqual([
      'A trip charge of $17.00 a visit: revenue per route hour becomes $38.29.',
      // 364 minutes a year is about 6 hours.
      'Every 8 weeks instead of 4: saves about 6 h of driving a year; revenue per route hour becomes $34.29.',
      'Work it on the same route day as Pine Street Salon (demo), 2.3 km away: saves about 15 min of driving a visit; ' +
        'revenue per route hour becomes $33.37.',
    ]);

    const birch = screen.getByRole('article', { name: 'Birch Lane Barbers (demo)' });
    expect(
      within(birch).getByText('No change worked out here would raise its revenue per route hour.'),
    ).toBeInTheDocument();
    expect(screen.getByText('$58.20')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Harbour Groom Co. (demo)' })).toHaveAttribute('href', '/stops/s-harbour');
  });

  it('says when no stop had two visits in the range', async () => {
    mockApi({
      'GET /api/reports/drive-cost': {
        status: 200,
        body: driveCostReport({ rows: [], medianPerRouteHourCents: null }),
      },
      'GET /api/users': { status: 200, body: staffPage() },
    });
    renderDriveCost();
    expect(await screen.findByText('No stop had two visits or more in these dates.')).toBeInTheDocument();
  });
});
