import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { catchDownloads } from '@/testing/downloads';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { RANGE, cadenceReport, staffPage } from '../testing/fixtures';
import { rowCells } from '../testing/table';
import { CadenceReportRoute } from './cadence-report';

function renderCadence() {
  return renderWithProviders(
    <Routes>
      <Route path="/reports/cadence" element={<CadenceReportRoute />} />
    </Routes>,
    { route: `/reports/cadence?from=${RANGE.from}&to=${RANGE.to}` },
  );
}

describe('cadence kept', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('owner');
  });

  it('shows on time and late per sharpener and per stop, and each table downloads as its own CSV', async () => {
    const downloads = catchDownloads();
    const server = mockApi({
      'GET /api/reports/cadence': { status: 200, body: cadenceReport() },
      'GET /api/reports/cadence/csv': { status: 200, body: 'Sharpener,Visits,On time,Late' },
      'GET /api/users': { status: 200, body: staffPage() },
    });
    const { user } = renderCadence();

    const perSharpener = await screen.findByRole('table', { name: 'On time per sharpener' });
    // 9 on time of the 11 visits that had a visit before them: 82 %.
    const sasha = within(perSharpener).getByText('Sasha Hone').closest('tr')!;
    expect(rowCells(sasha).slice(1, 4)).toEqual(['12', '9', '2']);
    expect(rowCells(sasha)[4]).toBe('82%');
    const perStop = screen.getByRole('table', { name: 'On time per stop' });
    const harbour = within(perStop).getByText('Harbour Groom Co. (demo)').closest('tr')!;
    expect(rowCells(harbour)).toEqual([
      'Harbour Groom Co. (demo)',
      'Sasha Hone',
      '4 wk',
      '12',
      '9',
      '2',
      '30.4 d',
      '12 days',
    ]);

    await user.click(screen.getByRole('button', { name: 'Download CSV: On time per sharpener' }));
    await waitFor(() =>
      expect(downloads.names).toEqual([`keenroute-cadence-by-sharpener-${RANGE.from}-${RANGE.to}.csv`]),
    );
    expect(server.callsTo('GET', '/api/reports/cadence/csv')[0]?.search.get('groupBy')).toBe('sharpener');

    await user.click(screen.getByRole('button', { name: 'Download CSV: On time per stop' }));
    await waitFor(() => expect(downloads.names).toHaveLength(2));
    expect(downloads.names[1]).toBe(`keenroute-cadence-${RANGE.from}-${RANGE.to}.csv`);
    expect(server.callsTo('GET', '/api/reports/cadence/csv')[1]?.search.has('groupBy')).toBe(false);
  });
});
