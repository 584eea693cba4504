import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { beforeEach, describe, expect, it } from 'vitest';
import { summary } from '@/features/stops/testing/stop-fixtures';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { signInAs } from '@/testing/session';
import { emptyDay, paws, routeDay, settings, stop, week } from '../testing/fixtures';
import type { Week } from '../types';
import { WeekPlanRoute } from './week-plan';

const comingDue = {
  status: 200,
  body: {
    items: [
      summary({ id: 's-maple', name: 'Maple Street Salon', daysOverdue: 1 }),
      summary({ id: 's-cuts', name: 'Riverside Cuts', daysOverdue: -2 }),
    ],
    total: 2,
  },
};

function renderWeek(route = '/week?week=2025-03-05') {
  return renderWithProviders(
    <Routes>
      <Route path="/week" element={<WeekPlanRoute />} />
    </Routes>,
    { route },
  );
}

const card = (name: string) => screen.findByRole('region', { name });

// Generous: the whole suite runs these in parallel on two cores.
describe('the week plan', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('office');
  });

  it('shows each route day with its stops in order, totals, problems, the unplanned stops and what is coming due', async () => {
    const server = mockApi({
      'GET /api/route-days': { status: 200, body: week() },
      'GET /api/stops/coming-due': comingDue,
      'GET /api/route-days/settings': { status: 200, body: settings() },
    });
    renderWeek();

    const monday = await card('Monday, Mar 3 with Sasha Hone');
    expect(server.callsTo('GET', '/api/route-days')[0]?.search.get('week')).toBe('2025-03-03');
    const stops = within(within(monday).getByRole('list', { name: /^Stops on/ })).getAllByRole('listitem');
    expect(stops.map((item) => item.getAttribute('aria-label'))).toEqual([
      '1. Maple Street Salon',
      '2. Paws and Polish',
    ]);
    expect(stops[0]).toHaveTextContent('08:20–09:40 · 1 h 10 min bench');
    expect(stops[0]).toHaveTextContent('Riverton');
    expect(stops[1]).toHaveTextContent('Arrives after closing');
    expect(stops[0]).not.toHaveTextContent('Arrives after closing');

    const totals = within(monday).getByRole('group', { name: 'Day totals' });
    expect(totals).toHaveTextContent('2 stops');
    expect(totals).toHaveTextContent('24.6 km');
    expect(totals).toHaveTextContent('55 min drive');
    expect(totals).toHaveTextContent('1 h 55 min bench');
    expect(totals).toHaveTextContent('08:00 → 11:25');
    expect(totals).toHaveTextContent('Lunch 12:00, 30 min');
    expect(within(monday).getByRole('link', { name: /^Day sheet for/ })).toHaveAttribute(
      'href',
      '/route-days/rd-mon-sasha/sheet',
    );

    expect(await card('Monday, Mar 3 with Rowan Owner')).toHaveTextContent('Oak Barbers');
    expect(await card('Tuesday, Mar 4 with Sasha Hone')).toHaveTextContent('No stops yet');

    const unplanned = screen.getByRole('list', { name: 'Stops not planned' });
    expect(unplanned).toHaveTextContent('Riverside Cuts');
    expect(unplanned).toHaveTextContent('No opening fits');
    expect(unplanned).toHaveTextContent('open only on Sundays, and no one works then');

    const due = await screen.findByRole('list', { name: 'Stops coming due' });
    const [maple, cuts] = within(due).getAllByRole('listitem');
    expect(maple).toHaveTextContent('1 day overdue');
    expect(maple).toHaveTextContent('Mon');
    expect(cuts).toHaveTextContent('due in 2 days');
    expect(cuts).not.toHaveTextContent('Mon');
    expect(server.callsTo('GET', '/api/stops/coming-due')[0]?.search.get('week')).toBe('2025-03-03');
  });

  it('shows the map of a day with the base and numbered stops', async () => {
    mockApi({
      'GET /api/route-days': { status: 200, body: week() },
      'GET /api/stops/coming-due': comingDue,
      'GET /api/route-days/settings': { status: 200, body: settings() },
    });
    const { user } = renderWeek();
    const monday = await card('Monday, Mar 3 with Sasha Hone');
    await user.click(within(monday).getByRole('button', { name: 'Show the map' }));
    const map = await within(monday).findByRole('img', { name: 'Map of Monday, Mar 3 with Sasha Hone: 2 stops' });
    const titles = [...map.querySelectorAll('g > title')].map((title) => title.textContent);
    expect(titles).toEqual(['Base: Workshop, 4 Anvil Lane', '1. Maple Street Salon', '2. Paws and Polish']);
    expect(map.querySelector('polyline')?.getAttribute('points')?.split(' ')).toHaveLength(4);
    expect(within(map).getByTestId('scale-label').textContent).toMatch(/^\d+ (km|m)$/);
  });

  it('plans the week with a progress indicator, then shows the result and what it did', async () => {
    let answer: (week: Week) => void = () => {};
    const planned = week({
      days: [routeDay(), emptyDay({ stops: [stop({ stopId: 's-cuts', name: 'Riverside Cuts' })] })],
      unplanned: [],
    });
    const server = mockApi({
      'GET /api/route-days': { status: 200, body: week() },
      'GET /api/stops/coming-due': comingDue,
      'GET /api/route-days/settings': { status: 200, body: settings() },
      'POST /api/route-days/plan': () =>
        new Promise((resolve) => {
          answer = (body) => resolve({ status: 200, body });
        }),
    });
    const { user } = renderWeek();
    await card('Monday, Mar 3 with Sasha Hone');

    await user.click(screen.getByRole('button', { name: 'Plan the week' }));
    const progress = (await screen.findByText(/^Planning the week… \d+ s$/)).closest('[role="status"]');
    if (!(progress instanceof HTMLElement)) throw new Error('The progress is not a status');
    expect(within(progress).getByRole('progressbar', { name: 'Planning progress' })).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/route-days/plan')[0]?.body).toEqual({ week: '2025-03-03' });

    answer(planned);
    expect(await screen.findByText('Week planned')).toBeInTheDocument();
    expect(screen.getByText('3 stops on 2 route days; nothing left unplanned.')).toBeInTheDocument();
    expect(await card('Tuesday, Mar 4 with Sasha Hone')).toHaveTextContent('Riverside Cuts');
    expect(screen.queryByText(/Planning the week…/)).not.toBeInTheDocument();
    expect(screen.getByText('Every stop due this week is on a day.')).toBeInTheDocument();
    // The answer is the new week: it is not read again.
    expect(server.callsTo('GET', '/api/route-days')).toHaveLength(1);
  });

  it('locks and unlocks a stop through its routes', async () => {
    const lockedMonday = routeDay({ stops: [stop({ locked: true }), paws], version: 4 });
    const server = mockApi({
      'GET /api/route-days': { status: 200, body: week() },
      'GET /api/stops/coming-due': comingDue,
      'GET /api/route-days/settings': { status: 200, body: settings() },
      'POST /api/route-days/rd-mon-sasha/stops/s-maple/lock': { status: 200, body: lockedMonday },
      'POST /api/route-days/rd-mon-sasha/stops/s-maple/unlock': { status: 200, body: routeDay({ version: 5 }) },
    });
    const { user } = renderWeek();
    const monday = await card('Monday, Mar 3 with Sasha Hone');

    await user.click(within(monday).getByRole('button', { name: 'Lock Maple Street Salon to this day' }));
    const unlock = await within(monday).findByRole('button', {
      name: 'Unlock Maple Street Salon (locked to this day)',
    });
    expect(unlock).toHaveAttribute('aria-pressed', 'true');
    expect(server.callsTo('POST', '/api/route-days/rd-mon-sasha/stops/s-maple/lock')[0]?.body).toEqual({
      keepPosition: false,
    });

    await user.click(unlock);
    expect(
      await within(monday).findByRole('button', { name: 'Lock Maple Street Salon to this day' }),
    ).toBeInTheDocument();
    expect(server.callsTo('POST', '/api/route-days/rd-mon-sasha/stops/s-maple/unlock')).toHaveLength(1);
  });

  it('moves a stop to another day with Move to…, sending the place and the day’s version', async () => {
    const server = mockApi({
      'GET /api/route-days': { status: 200, body: week() },
      'GET /api/stops/coming-due': comingDue,
      'GET /api/route-days/settings': { status: 200, body: settings() },
      'POST /api/route-days/rd-tue-sasha/stops': {
        status: 200,
        body: {
          days: [
            routeDay({ stops: [stop()], version: 4 }),
            emptyDay({ stops: [{ ...paws, position: 0, locked: true, positionLocked: true }], version: 2 }),
          ],
        },
      },
    });
    const { user } = renderWeek();
    const monday = await card('Monday, Mar 3 with Sasha Hone');

    await user.click(within(monday).getByRole('button', { name: 'More for Paws and Polish' }));
    await user.click(await screen.findByRole('menuitem', { name: 'Move to…' }));
    const dialog = await screen.findByRole('dialog', { name: 'Move Paws and Polish' });
    await user.click(within(dialog).getByRole('combobox', { name: 'Day' }));
    await user.click(await screen.findByRole('option', { name: 'Tuesday, Mar 4 · Sasha Hone (0 stops)' }));
    expect(within(dialog).getByRole('textbox', { name: 'Place in the day' })).toHaveValue('1');
    await user.click(within(dialog).getByRole('button', { name: 'Move here' }));

    const tuesday = await card('Tuesday, Mar 4 with Sasha Hone');
    await waitFor(() => expect(tuesday).toHaveTextContent('Paws and Polish'));
    expect(server.callsTo('POST', '/api/route-days/rd-tue-sasha/stops')[0]?.body).toEqual({
      stopId: 's-paws',
      position: 0,
      version: 1,
    });
    expect(within(tuesday).getByRole('button', { name: /^Unlock Paws and Polish/ })).toBeInTheDocument();
    expect(monday).not.toHaveTextContent('Paws and Polish');
  });

  it('puts a refused move back and shows the server’s message', async () => {
    mockApi({
      'GET /api/route-days': { status: 200, body: week() },
      'GET /api/stops/coming-due': comingDue,
      'GET /api/route-days/settings': { status: 200, body: settings() },
      'POST /api/route-days/rd-mon-sasha/stops': {
        status: 422,
        body: { statusCode: 422, code: 'stop-closed', message: 'Riverside Cuts is closed on Mondays.' },
      },
    });
    const { user } = renderWeek();
    await card('Monday, Mar 3 with Sasha Hone');

    await user.click(screen.getByRole('button', { name: 'Place Riverside Cuts on a day' }));
    const dialog = await screen.findByRole('dialog', { name: 'Move Riverside Cuts' });
    // A stop from the unplanned list goes last on the first day unless told otherwise.
    expect(within(dialog).getByRole('textbox', { name: 'Place in the day' })).toHaveValue('3');
    await user.click(within(dialog).getByRole('button', { name: 'Move here' }));

    expect(await screen.findByText('Riverside Cuts is closed on Mondays.')).toBeInTheDocument();
    const monday = await card('Monday, Mar 3 with Sasha Hone');
    await waitFor(() => expect(monday).not.toHaveTextContent('Riverside Cuts'));
    expect(screen.getByRole('list', { name: 'Stops not planned' })).toHaveTextContent('Riverside Cuts');
  });

  it('checks the place typed in Move to…', async () => {
    const server = mockApi({
      'GET /api/route-days': { status: 200, body: week() },
      'GET /api/stops/coming-due': comingDue,
      'GET /api/route-days/settings': { status: 200, body: settings() },
    });
    const { user } = renderWeek();
    const monday = await card('Monday, Mar 3 with Sasha Hone');
    await user.click(within(monday).getByRole('button', { name: 'More for Maple Street Salon' }));
    await user.click(await screen.findByRole('menuitem', { name: 'Move to…' }));
    const dialog = await screen.findByRole('dialog', { name: 'Move Maple Street Salon' });
    const place = within(dialog).getByRole('textbox', { name: 'Place in the day' });
    await user.clear(place);
    await user.type(place, '5');
    expect(within(dialog).getByText('Choose a place from 1 to 2.')).toBeInTheDocument();
    expect(within(dialog).getByRole('button', { name: 'Move here' })).toBeDisabled();
    expect(server.callsTo('POST', '/api/route-days/rd-mon-sasha/stops')).toHaveLength(0);
  });
});

describe('My week for a sharpener', { timeout: 30_000 }, () => {
  beforeEach(() => {
    signInAs('sharpener');
  });

  it('shows their days without planning, and their calendar feed, which they can renew', async () => {
    const own = week({ sharpeners: [{ id: 'u-sharpener', name: 'Sasha Hone' }], days: [routeDay()], unplanned: [] });
    const server = mockApi({
      'GET /api/route-days': { status: 200, body: own },
      'GET /api/stops/coming-due': comingDue,
      'GET /api/route-days/calendar-feed': { status: 200, body: { url: 'http://keenroute.test/api/calendar/old.ics' } },
      'POST /api/route-days/calendar-feed/renew': {
        status: 200,
        body: { url: 'http://keenroute.test/api/calendar/new.ics' },
      },
    });
    const { user } = renderWeek('/week');

    expect(await screen.findByRole('heading', { name: 'My week', level: 1 })).toBeInTheDocument();
    expect(await card('Monday, Mar 3 with Sasha Hone')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Plan the week' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Planning settings' })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Drag Maple Street Salon' })).toBeInTheDocument();
    expect(server.callsTo('GET', '/api/route-days/settings')).toHaveLength(0);

    const address = await screen.findByRole('textbox', { name: 'Calendar address' });
    expect(address).toHaveValue('http://keenroute.test/api/calendar/old.ics');
    expect(screen.getByRole('button', { name: 'Copy the address' })).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Make a new address' }));
    const confirm = await screen.findByRole('dialog', { name: 'Make a new calendar address?' });
    expect(server.callsTo('POST', '/api/route-days/calendar-feed/renew')).toHaveLength(0);
    await user.click(within(confirm).getByRole('button', { name: 'Make a new address' }));
    await waitFor(() => expect(address).toHaveValue('http://keenroute.test/api/calendar/new.ics'));
    expect(server.callsTo('POST', '/api/route-days/calendar-feed/renew')).toHaveLength(1);
  });
});
