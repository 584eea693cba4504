import { longerCadence, pairWithNeighbour, suggestionsFor, tripCharge } from './drive-cost';

// A stop worked out by hand: 10 visits, $1,200 of work, 600 bench minutes and 400 drive minutes over the range.
const stop = { cadenceWeeks: 4, visits: 10, revenueCents: 120_000, benchMinutes: 600, driveMinutes: 400 };

describe('drive-cost suggestions', () => {
  it('halves the visits a year: 13 → 6.5 visits, 40 min each, so 260 drive minutes a year fewer', () => {
    // Revenue and bench stay, drive halves: 120000 * 60 / (600 + 200) = 9000 cents an hour.
    expect(longerCadence(stop)).toEqual({
      kind: 'longer-cadence',
      cadenceWeeks: 4,
      newCadenceWeeks: 8,
      driveMinutesSavedPerYear: 260,
      perRouteHourCents: 9000,
    });
    expect(longerCadence({ ...stop, cadenceWeeks: 30 })).toBeNull();
  });

  it('pairs with a neighbour 6 minutes away: 34 minutes a visit fewer', () => {
    const neighbour = { stopId: 'n', name: 'Next Door Salon', distanceKm: 3.2, driveMinutes: 6 };
    // 120000 * 60 / (600 + 10 * 6) = 10909.09 → 10909.
    expect(pairWithNeighbour(stop, neighbour)).toEqual({
      kind: 'pair-with-neighbour',
      neighbourStopId: 'n',
      neighbourName: 'Next Door Salon',
      distanceKm: 3.2,
      driveMinutesSavedPerVisit: 34,
      perRouteHourCents: 10909,
    });
    expect(pairWithNeighbour(stop, { ...neighbour, driveMinutes: 45 })).toBeNull();
    expect(pairWithNeighbour(stop, null)).toBeNull();
  });

  it('asks a trip charge in whole dollars that reaches the median', () => {
    // Now 7200 an hour over 1000 minutes; the median 9000 needs 150000, so $300 more over 10 visits: $30 a visit.
    expect(tripCharge(stop, 9000)).toEqual({ kind: 'trip-charge', tripChargeCents: 3000, perRouteHourCents: 9000 });
    // $30.01 short a visit rounds up to $31.
    expect(tripCharge(stop, 9000.6)).toMatchObject({ tripChargeCents: 3100 });
    expect(tripCharge(stop, 7000)).toBeNull();
  });

  it('puts the change that helps most first', () => {
    const kinds = suggestionsFor(stop, { stopId: 'n', name: 'N', distanceKm: 1, driveMinutes: 2 }, 9500).map(
      (s) => s.kind,
    );
    expect(kinds).toEqual(['pair-with-neighbour', 'trip-charge', 'longer-cadence']);
  });
});
