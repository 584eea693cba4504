import { weekStart } from '@keenroute/shared';
import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { LocationProbe, renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { todayIso } from '../format';
import { staffList, summary } from '../testing/stop-fixtures';
import { ComingDueRoute } from './coming-due';

const due = [
  summary(),
  summary({
    id: 's-paws',
    name: 'Paws and Polish',
    kind: 'grooming-shop',
    nextDueOn: '2025-03-18',
    lastVisitOn: null,
    daysOverdue: -3,
    cadenceWeeks: 5,
  }),
];

function renderComingDue(route = '/coming-due') {
  return renderWithProviders(
    <Routes>
      <Route
        path="/coming-due"
        element={
          <>
            <ComingDueRoute />
            <LocationProbe />
          </>
        }
      />
    </Routes>,
    { route },
  );
}

// Generous: the whole suite runs these in parallel on two cores.
describe('the Coming due page', { timeout: 20_000 }, () => {
  beforeEach(() => {
    signInAs('office');
  });

  it('shows days overdue and days to go, with last visit and cadence, linking to each stop', async () => {
    const server = mockApi({
      'GET /api/stops/coming-due': { status: 200, body: { items: due, total: 2 } },
      'GET /api/users': staffList,
    });
    renderComingDue();

    const list = await screen.findByRole('list', { name: 'Stops coming due' });
    const [maple, paws] = within(list).getAllByRole('listitem');
    expect(maple).toHaveTextContent('12 days overdue');
    expect(maple).toHaveTextContent('Last visit Jan 6, 2025');
    expect(maple).toHaveTextContent('every 8 weeks');
    expect(paws).toHaveTextContent('due in 3 days');
    expect(paws).toHaveTextContent('Last visit never');
    expect(within(list).getByRole('link', { name: 'Maple Street Salon' })).toHaveAttribute('href', '/stops/s-maple');
    expect(screen.getByText(/feeds the week planner/)).toBeInTheDocument();
    expect(screen.getByRole('combobox', { name: 'Sharpener' })).toBeInTheDocument();
    expect(server.callsTo('GET', '/api/stops/coming-due')[0]?.search.get('week')).toBe(weekStart(todayIso()));
  });

  it('moves a week on and back, keeping the week in the URL', async () => {
    const server = mockApi({
      'GET /api/stops/coming-due': { status: 200, body: { items: due, total: 2 } },
      'GET /api/users': staffList,
    });
    const { user } = renderComingDue('/coming-due?week=2025-03-12');
    await screen.findByText('Maple Street Salon');
    expect(server.callsTo('GET', '/api/stops/coming-due')[0]?.search.get('week')).toBe('2025-03-10');

    await user.click(screen.getByRole('button', { name: 'Next week' }));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('week=2025-03-17'));
    await waitFor(() =>
      expect(server.callsTo('GET', '/api/stops/coming-due').at(-1)?.search.get('week')).toBe('2025-03-17'),
    );
    await user.click(screen.getByRole('button', { name: 'This week' }));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent(/^\/coming-due$/));
  });

  it('says when nothing is due that week', async () => {
    mockApi({
      'GET /api/stops/coming-due': { status: 200, body: { items: [], total: 0 } },
      'GET /api/users': staffList,
    });
    renderComingDue('/coming-due?week=2025-03-10');
    expect(await screen.findByText('Nothing is due by Mar 16, 2025.')).toBeInTheDocument();
  });

  it('gives a sharpener their own list without the sharpener filter', async () => {
    signInAs('sharpener');
    const server = mockApi({ 'GET /api/stops/coming-due': { status: 200, body: { items: due, total: 2 } } });
    renderComingDue();
    await screen.findByText('Maple Street Salon');
    expect(screen.queryByRole('combobox', { name: 'Sharpener' })).not.toBeInTheDocument();
    expect(server.callsTo('GET', '/api/users')).toHaveLength(0);
  });

  it('says when the list cannot be loaded and can try again', async () => {
    let attempts = 0;
    mockApi({
      'GET /api/users': staffList,
      'GET /api/stops/coming-due': () => {
        attempts += 1;
        return attempts === 1
          ? { status: 503, body: { statusCode: 503, message: 'Try again shortly.' } }
          : { status: 200, body: { items: due, total: 2 } };
      },
    });
    const { user } = renderComingDue();
    expect(await screen.findByText('Coming due could not be loaded')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByText('Maple Street Salon')).toBeInTheDocument();
  });
});
