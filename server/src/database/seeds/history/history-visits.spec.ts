import { addDays, daysBetween, weekdayOf } from '@keenroute/shared';
import { DemoRandom } from '../demo-random';
import { DEMO_HISTORY_SCALE } from './history-options';
import type { HistoryStop } from './history-source';
import { VisitPlanner } from './history-visits';

const weekdays = { start: '2024-01-01', end: '2025-12-31', workWeekdays: ['mon', 'tue', 'wed', 'thu', 'fri'] as const };
const open = { opens: '09:00', closes: '17:00' };

function stop(id: string, over: Partial<HistoryStop> = {}): HistoryStop {
  return {
    id,
    name: id,
    street: '1 Test Row',
    city: 'Larkhaven',
    region: '',
    postalCode: '',
    country: 'US',
    email: null,
    latitude: 44.8,
    longitude: -92.4,
    openingHours: { mon: [open], tue: [open], wed: [open], thu: [open], fri: [open], sat: [open] },
    cadenceWeeks: 6,
    billingMode: 'customer',
    taxRateBp: 0,
    assignedSharpenerId: 'tomas',
    createdOn: '2023-01-01',
    ...over,
  };
}

describe('VisitPlanner (the history’s stop visits)', () => {
  it('goes back from the first recorded visit at the cadence, give or take, some visits late, on open work days', () => {
    const sut = new VisitPlanner(new DemoRandom(7), DEMO_HISTORY_SCALE, weekdays, ['tomas', 'dana'], new Map());
    const visits = sut.plan([stop('a')], [{ stopId: 'a', day: '2025-12-02', sharpenerId: 'tomas' }]);
    const days = visits.map((visit) => visit.day);
    expect(days.at(-1)).toBe('2025-12-02');
    expect(visits.at(-1)!.recorded).toBe(true);
    expect(days[0]! >= weekdays.start && days[0]! < addDays(weekdays.start, 6 * 7 + 32)).toBe(true);
    const beyond = days.slice(1).map((day, i) => daysBetween(days[i]!, day) - 42);
    expect(beyond.length).toBeGreaterThan(12);
    expect(beyond.every((days) => days >= -7 && days <= 32)).toBe(true);
    expect(beyond.some((days) => days > 7)).toBe(true);
    expect(days.every((day) => !['sat', 'sun'].includes(weekdayOf(day)))).toBe(true);
    // Mostly the stop's own sharpener.
    expect(visits.filter((visit) => visit.sharpenerId === 'tomas').length).toBeGreaterThan(visits.length / 2);
  });

  it('puts stops due in the same days on one day of the same sharpener, while the day has room', () => {
    const sut = new VisitPlanner(
      new DemoRandom(3),
      { ...DEMO_HISTORY_SCALE, lateVisitChance: 0 },
      weekdays,
      ['tomas'],
      new Map([
        ['a', 60],
        ['b', 60],
      ]),
    );
    const visits = sut.plan(
      [stop('a'), stop('b')],
      [
        { stopId: 'a', day: '2025-12-02', sharpenerId: 'tomas' },
        { stopId: 'b', day: '2025-12-04', sharpenerId: 'tomas' },
      ],
    );
    const older = visits.filter((visit) => !visit.recorded);
    const sharedDays = new Set(older.filter((v) => v.stopId === 'a').map((v) => v.day));
    const together = older.filter((v) => v.stopId === 'b' && sharedDays.has(v.day)).length;
    expect(together).toBeGreaterThan(older.length / 4);
  });

  it('leaves a stop without recorded visits alone unless the scale says to give it a past', () => {
    const none = new VisitPlanner(new DemoRandom(1), DEMO_HISTORY_SCALE, weekdays, ['tomas'], new Map());
    expect(none.plan([stop('a')], [])).toEqual([]);
    const some = new VisitPlanner(
      new DemoRandom(1),
      { ...DEMO_HISTORY_SCALE, visitUnvisitedStops: true },
      weekdays,
      ['tomas'],
      new Map(),
    );
    const visits = some.plan([stop('a')], []);
    expect(visits.length).toBeGreaterThan(12);
    expect(daysBetween(visits.at(-1)!.day, weekdays.end)).toBeLessThan(42);
  });
});
