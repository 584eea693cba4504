import { routeDay } from '@/features/route-days/testing/fixtures';
import type { DaySheet } from '@/features/route-days/types';
import type { Ticket, TicketLine, TicketSummary, VisitStop } from '../types';

// Invented demo people, places and shears, as all Keenroute demo data is.
export const line = (overrides: Partial<TicketLine> = {}): TicketLine => ({
  id: 'l-1',
  shear: {
    id: 'sh-123',
    tagCode: 'KR-000123',
    make: 'Demo Forge',
    model: 'Cobalt 65',
    lengthIn: 6.5,
    edgeType: 'convex',
    toolKind: 'straight',
    handedness: 'right',
  },
  addOns: [],
  priceCents: 4200,
  overrideCents: null,
  overrideReason: null,
  effectiveCents: 4200,
  benchStatus: 'waiting',
  notes: null,
  recipe: null,
  photos: [],
  ...overrides,
});

export const thinnerLine = line({
  id: 'l-2',
  shear: {
    id: 'sh-45',
    tagCode: 'KR-000045',
    make: null,
    model: null,
    lengthIn: 7,
    edgeType: 'beveled',
    toolKind: 'thinning',
    handedness: 'left',
  },
  priceCents: 3800,
  effectiveCents: 3800,
});

export const ticket = (overrides: Partial<Ticket> = {}): Ticket => ({
  id: 't-1',
  kind: 'visit',
  status: 'open',
  customer: { id: 'c-mira', name: 'Mira Stylist', phone: '555-0101', email: 'mira@demo.keenroute.test' },
  stop: { id: 's-maple', name: 'Maple Street Salon' },
  routeDayId: 'rd-mon',
  lines: [line(), thinnerLine],
  expected: [],
  price: {
    currency: 'USD',
    subtotalCents: 8000,
    taxCents: 660,
    totalCents: 8660,
    summary: ['Trip charge $0.00'],
    taxNote: 'Tax rules vary; check with a local tax adviser (demo note).',
  },
  payments: [],
  settlement: 'unpaid',
  notes: null,
  createdAt: '2025-03-03T09:00:00Z',
  finishedAt: null,
  handedBackAt: null,
  ...overrides,
});

export const visitStop = (overrides: Partial<VisitStop> = {}): VisitStop => ({
  position: 0,
  stopId: 's-maple',
  name: 'Maple Street Salon',
  street: '12 Maple Street',
  city: 'Riverton',
  postalCode: '97001',
  phone: null,
  email: null,
  accessParking: 'Behind the bakery',
  accessDoor: 'Side door, ring twice',
  accessBestTime: '',
  arrival: 8 * 60 + 20,
  leave: 9 * 60 + 40,
  arrivalWindow: { from: 8 * 60 + 15, to: 9 * 60 + 15 },
  benchMinutes: 70,
  expectedPairs: 4,
  customers: [
    { id: 'c-mira', name: 'Mira Stylist', phone: '555-0101', email: null, shearCount: 2 },
    { id: 'c-teo', name: 'Teo Groomer', phone: null, email: null, shearCount: 1 },
  ],
  bookings: [],
  ...overrides,
});

export const sheet = (stop: VisitStop = visitStop()): DaySheet => ({
  routeDay: routeDay({ id: 'rd-mon' }),
  stops: [stop],
  totals: { stops: 1, distanceKm: 10, driveMinutes: 20, benchMinutes: 70, departure: 480, finish: 600 },
  cautions: [],
});

export const ticketSummary = (overrides: Partial<TicketSummary> = {}): TicketSummary => ({
  id: 't-1',
  kind: 'visit',
  status: 'open',
  customer: { id: 'c-mira', name: 'Mira Stylist' },
  stop: { id: 's-maple', name: 'Maple Street Salon' },
  routeDayId: 'rd-mon',
  visitDay: '2025-03-03',
  lineCount: 2,
  totalCents: 8660,
  settlement: 'unpaid',
  createdAt: '2025-03-03T09:00:00Z',
  ...overrides,
});
