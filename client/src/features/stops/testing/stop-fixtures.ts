import type { GeocodeOutcome, SavedStop, StopDetail, StopSummary } from '../types';

// Invented demo places for the tests.
export const summary = (overrides: Partial<StopSummary> = {}): StopSummary => ({
  id: 's-maple',
  name: 'Maple Street Salon',
  kind: 'salon',
  street: '12 Maple Street',
  city: 'Riverton',
  region: 'OR',
  postalCode: '97000',
  country: 'US',
  latitude: 45.5,
  longitude: -122.6,
  geocodeStatus: 'found',
  phone: null,
  email: null,
  cadenceWeeks: 8,
  billingMode: 'customer',
  assignedSharpener: { id: 'u-sharpener', name: 'Sasha Hone' },
  active: true,
  lastVisitOn: '2025-01-06',
  nextDueOn: '2025-03-03',
  daysOverdue: 12,
  customerCount: 4,
  ...overrides,
});

export const detail = (overrides: Partial<StopDetail> = {}): StopDetail => ({
  ...summary(),
  openingHours: { mon: [{ opens: '09:00', closes: '17:00' }], sat: [{ opens: '10:00', closes: '14:00' }] },
  closedDates: ['2025-12-25'],
  preferredWeekdays: ['mon'],
  taxRateBp: 825,
  accessParking: 'Behind the bakery',
  accessDoor: 'Side door, ring twice',
  accessBestTime: 'Before 11',
  manager: null,
  createdAt: '2025-01-01T09:00:00.000Z',
  updatedAt: '2025-01-01T09:00:00.000Z',
  ...overrides,
});

export const saved = (geocoding: Partial<GeocodeOutcome>, overrides: Partial<StopDetail> = {}): SavedStop => ({
  ...detail(overrides),
  geocoding: { status: 'found', message: null, candidates: [], ...geocoding },
});

export const staffList = {
  status: 200,
  body: {
    items: [
      { id: 'u-owner', name: 'Rowan Owner', email: 'owner@demo.keenroute.test', role: 'owner', status: 'active' },
      { id: 'u-office', name: 'Oakley Office', email: 'office@demo.keenroute.test', role: 'office', status: 'active' },
      {
        id: 'u-sharpener',
        name: 'Sasha Hone',
        email: 'sharpener@demo.keenroute.test',
        role: 'sharpener',
        status: 'active',
      },
    ],
    total: 3,
  },
};
