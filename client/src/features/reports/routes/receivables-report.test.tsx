import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { RANGE, receivablesByCustomer, receivablesByStop } from '../testing/fixtures';
import { rowCells } from '../testing/table';
import { ReceivablesReportRoute } from './receivables-report';

function renderReceivables(search = `from=${RANGE.from}&to=${RANGE.to}`) {
  return renderWithProviders(
    <Routes>
      <Route
        path="/reports/receivables"
        element={
          <>
            <ReceivablesReportRoute />
            <LocationProbe />
          </>
        }
      />
    </Routes>,
    { route: `/reports/receivables?${search}` },
  );
}

describe('what is owed', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('owner');
  });

  it('ages what each bill-to party owes, totals it, and switches to per stop', async () => {
    const server = mockApi({
      'GET /api/reports/receivables': (request) => ({
        status: 200,
        body: request.search.get('groupBy') === 'stop' ? receivablesByStop() : receivablesByCustomer(),
      }),
    });
    const { user } = renderReceivables();

    const table = await screen.findByRole('table', { name: 'What is owed' });
    expect(server.calls.at(-1)?.search.get('groupBy')).toBe('customer');
    expect(server.calls.at(-1)?.search.get('to')).toBe(RANGE.to);
    expect(screen.getByText(/^As of Dec 31, 2025\./)).toBeInTheDocument();
    expect(within(table).getAllByRole('columnheader')[0]).toHaveTextContent('Who pays');
    // Pine pays as a whole: 97.42 + 120.00 + 45.00 = 262.42.
    const pine = within(table).getByText('Pine Street Salon (demo)').closest('tr')!;
    expect(rowCells(pine)).toEqual([
      'Pine Street Salon (demo)',
      '$262.42',
      '3',
      '$97.42',
      '$120.00',
      '$0.00',
      '$45.00',
      '$0.00',
    ]);
    // Mira is billed herself; the stop she works at is said under her name.
    const mira = within(table).getByText('Mira Stylist (demo)').closest('tr')!;
    expect(mira).toHaveTextContent('Birch Lane Barbers (demo)');
    expect(rowCells(mira)[1]).toBe('$62.30');
    const totals = within(within(table).getAllByRole('rowgroup')[2]!).getByRole('row');
    // 262.42 + 62.30 = 324.72.
    expect(rowCells(totals)).toEqual(['Everyone', '$324.72', '4', '$97.42', '$120.00', '$0.00', '$45.00', '$62.30']);
    // What is owed is for the whole business: no sharpener to choose.
    expect(screen.queryByRole('combobox', { name: 'Sharpener' })).not.toBeInTheDocument();

    await user.click(screen.getByText('Per stop'));
    await waitFor(() => expect(server.calls.at(-1)?.search.get('groupBy')).toBe('stop'));
    expect(screen.getByTestId('location')).toHaveTextContent('groupBy=stop');
    await waitFor(() => expect(within(table).getAllByRole('columnheader')[0]).toHaveTextContent('Stop'));
    const birch = within(table).getByText('Birch Lane Barbers (demo)').closest('tr')!;
    expect(rowCells(birch)).toEqual([
      'Birch Lane Barbers (demo)',
      '$62.30',
      '1',
      '$0.00',
      '$0.00',
      '$0.00',
      '$0.00',
      '$62.30',
    ]);
    expect(within(table).queryByText('Mira Stylist (demo)')).not.toBeInTheDocument();
  });

  it('opens grouped per stop from a shared link, and says when nothing is owed', async () => {
    const server = mockApi({
      'GET /api/reports/receivables': {
        status: 200,
        body: { ...receivablesByStop(), rows: [], totals: undefined },
      },
    });
    renderReceivables(`from=${RANGE.from}&to=${RANGE.to}&groupBy=stop`);
    expect(await screen.findByText('Nothing was owed on Dec 31, 2025.')).toBeInTheDocument();
    expect(server.calls[0]?.search.get('groupBy')).toBe('stop');
  });
});
