import type { DaySheet, PlanningSettings, RouteDay, RouteDayStop, UnplannedStop, Week } from '../types';

// Invented demo places and people for the tests, around a made-up city at 45.5° N.
export const SASHA = { id: 'u-sharpener', name: 'Sasha Hone' };
export const ROWAN = { id: 'u-owner', name: 'Rowan Owner' };

export const BASE = { label: 'Workshop, 4 Anvil Lane', latitude: 45.51, longitude: -122.66 };

export const stop = (overrides: Partial<RouteDayStop> = {}): RouteDayStop => ({
  stopId: 's-maple',
  position: 0,
  name: 'Maple Street Salon',
  street: '12 Maple Street',
  city: 'Riverton',
  latitude: 45.52,
  longitude: -122.68,
  arrival: 8 * 60 + 20,
  start: 8 * 60 + 30,
  leave: 9 * 60 + 40,
  arrivalWindow: { from: 8 * 60 + 15, to: 9 * 60 + 15 },
  benchMinutes: 70,
  driveMinutesBefore: 20,
  kmBefore: 6.2,
  locked: false,
  positionLocked: false,
  problem: null,
  nextDueOn: '2025-03-03',
  daysOverdue: 1,
  ...overrides,
});

export const paws = stop({
  stopId: 's-paws',
  position: 1,
  name: 'Paws and Polish',
  street: '3 Kennel Road',
  city: 'Brookfield',
  latitude: 45.49,
  longitude: -122.61,
  arrival: 10 * 60 + 5,
  start: 10 * 60 + 5,
  leave: 10 * 60 + 50,
  arrivalWindow: { from: 10 * 60, to: 11 * 60 },
  benchMinutes: 45,
  problem: 'after-closing',
});

export const routeDay = (overrides: Partial<RouteDay> = {}): RouteDay => ({
  id: 'rd-mon-sasha',
  day: '2025-03-03',
  weekday: 'mon',
  sharpener: SASHA,
  start: BASE,
  shiftStart: 8 * 60,
  latestFinish: 17 * 60,
  lunch: { start: 12 * 60, afterStops: 2, minutes: 30 },
  departure: 8 * 60,
  finish: 11 * 60 + 25,
  distanceKm: 24.6,
  driveMinutes: 55,
  benchMinutes: 115,
  version: 3,
  stops: [stop(), paws],
  ...overrides,
});

export const emptyDay = (overrides: Partial<RouteDay> = {}): RouteDay =>
  routeDay({
    id: 'rd-tue-sasha',
    day: '2025-03-04',
    weekday: 'tue',
    departure: null,
    finish: null,
    distanceKm: 0,
    driveMinutes: 0,
    benchMinutes: 0,
    lunch: null,
    version: 1,
    stops: [],
    ...overrides,
  });

export const unplannedCuts: UnplannedStop = {
  stopId: 's-cuts',
  name: 'Riverside Cuts',
  city: 'Riverton',
  reason: 'window-closed',
  reasonText: 'Riverside Cuts is open only on Sundays, and no one works then.',
};

export const week = (overrides: Partial<Week> = {}): Week => ({
  weekStart: '2025-03-03',
  weekEnd: '2025-03-09',
  today: '2025-03-03',
  sharpeners: [ROWAN, SASHA],
  days: [
    routeDay(),
    routeDay({
      id: 'rd-mon-rowan',
      sharpener: ROWAN,
      stops: [stop({ stopId: 's-oak', name: 'Oak Barbers', city: 'Hillside', latitude: 45.55, longitude: -122.64 })],
      distanceKm: 12,
      driveMinutes: 25,
      benchMinutes: 70,
      finish: 10 * 60,
      version: 7,
    }),
    emptyDay(),
  ],
  unplanned: [unplannedCuts],
  plannedAt: '2025-03-01T09:00:00.000Z',
  solveMs: 2300,
  ...overrides,
});

export const settings = (overrides: Partial<PlanningSettings> = {}): PlanningSettings => ({
  baseLabel: BASE.label,
  baseLatitude: BASE.latitude,
  baseLongitude: BASE.longitude,
  workWeekdays: ['mon', 'tue', 'wed', 'thu', 'fri'],
  shiftStart: 8 * 60,
  latestFinish: 17 * 60,
  lunchEarliest: 11 * 60 + 30,
  lunchLatest: 13 * 60 + 30,
  lunchMinutes: 30,
  circuity: 1.3,
  averageSpeedKmh: 40,
  noticeDays: 2,
  solveSeconds: 3,
  ...overrides,
});

export const sheet = (overrides: Partial<DaySheet> = {}): DaySheet => ({
  routeDay: routeDay(),
  stops: [
    {
      position: 0,
      stopId: 's-maple',
      name: 'Maple Street Salon',
      street: '12 Maple Street',
      city: 'Riverton',
      postalCode: '97000',
      phone: '+1 555 0100',
      email: 'desk@maple.demo.keenroute.test',
      accessParking: 'Behind the bakery',
      accessDoor: 'Side door, ring twice',
      accessBestTime: 'Before 11',
      arrival: 8 * 60 + 20,
      leave: 9 * 60 + 40,
      arrivalWindow: { from: 8 * 60 + 15, to: 9 * 60 + 15 },
      benchMinutes: 70,
      expectedPairs: 5,
      customers: [
        { id: 'c-ada', name: 'Ada Clipper', phone: '+1 555 0111', email: null, shearCount: 3 },
        { id: 'c-bo', name: 'Bo Trimmer', phone: null, email: 'bo@demo.keenroute.test', shearCount: 2 },
      ],
      bookings: [
        {
          id: 'b-cy',
          name: 'Cy Groomer',
          phone: '+1 555 0122',
          email: 'cy@demo.keenroute.test',
          notes: 'Left in the blue case',
          status: 'booked',
          items: [{ toolKind: 'straight', edgeType: 'convex', count: 2 }],
          benchMinutes: 36,
        },
      ],
    },
    {
      position: 1,
      stopId: 's-paws',
      name: 'Paws and Polish',
      street: '3 Kennel Road',
      city: 'Brookfield',
      postalCode: '97001',
      phone: null,
      email: null,
      accessParking: '',
      accessDoor: '',
      accessBestTime: '',
      arrival: 10 * 60 + 5,
      leave: 10 * 60 + 50,
      arrivalWindow: { from: 10 * 60, to: 11 * 60 },
      benchMinutes: 45,
      expectedPairs: 3,
      customers: [],
      bookings: [],
    },
  ],
  totals: { stops: 2, distanceKm: 24.6, driveMinutes: 55, benchMinutes: 115, departure: 8 * 60, finish: 11 * 60 + 25 },
  cautions: ['Wear a dust mask or use extraction at the grinder.', "Follow the equipment maker's instructions."],
  ...overrides,
});
