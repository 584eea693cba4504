import { describe, expect, it } from 'vitest';
import { suggestionWords } from './suggestions';

describe('a drive-cost suggestion in words', () => {
  it('says a longer cadence with the driving saved a year, in hours as a planner rounds them', () => {
    // 364 minutes is 6.07 hours: about 6 h.
    expect(
      suggestionWords({
        kind: 'longer-cadence',
        cadenceWeeks: 4,
        newCadenceWeeks: 8,
        driveMinutesSavedPerYear: 364,
        perRouteHourCents: 5210,
      }),
    ).toBe('Every 8 weeks instead of 4: saves about 6 h of driving a year; revenue per route hour becomes $52.10.');
    // 330 minutes is 5.5 hours; 750 is 12.5, rounded to 13 once past ten hours; 40 stays in minutes.
    const saved = (minutes: number) =>
      suggestionWords({
        kind: 'longer-cadence',
        cadenceWeeks: 6,
        newCadenceWeeks: 12,
        driveMinutesSavedPerYear: minutes,
        perRouteHourCents: 4000,
      });
    expect(saved(330)).toContain('saves about 5.5 h of driving a year');
    expect(saved(750)).toContain('saves about 13 h of driving a year');
    expect(saved(40)).toContain('saves about 40 min of driving a year');
  });

  it('names the neighbour, its distance to a tenth of a km and the minutes saved each visit', () => {
    expect(
      suggestionWords({
        kind: 'pair-with-neighbour',
        neighbourStopId: 's-pine',
        neighbourName: 'Pine Street Salon (demo)',
        distanceKm: 2.34,
        driveMinutesSavedPerVisit: 14.5,
        perRouteHourCents: 3337,
      }),
    ).toBe(
      'Work it on the same route day as Pine Street Salon (demo), 2.3 km away: saves about 15 min of driving a visit; ' +
        'revenue per route hour becomes $33.37.',
    );
  });

  it('gives the trip charge per visit in money', () => {
    expect(suggestionWords({ kind: 'trip-charge', tripChargeCents: 1700, perRouteHourCents: 3829 })).toBe(
      'A trip charge of $17.00 a visit: revenue per route hour becomes $38.29.',
    );
  });
});
