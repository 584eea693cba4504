import type { PublicBooking, PublicDay, PublicStop, Quote, StaffBooking } from '../types';

// Invented demo data.
export function publicDay(overrides: Partial<PublicDay> = {}): PublicDay {
  return {
    routeDayId: 'rd-0304',
    day: '2025-03-04',
    arrivalWindow: { from: 540, to: 600 },
    bookableMinutesLeft: 180,
    cutoff: { date: '2025-03-03', minute: 1080 },
    open: true,
    ...overrides,
  };
}

export const OPEN_DAY = publicDay();
export const FULL_DAY = publicDay({
  routeDayId: 'rd-0401',
  day: '2025-04-01',
  arrivalWindow: { from: 600, to: 660 },
  bookableMinutesLeft: 0,
  cutoff: { date: '2025-03-31', minute: 1080 },
  open: false,
});
export const LATER_DAY = publicDay({
  routeDayId: 'rd-0429',
  day: '2025-04-29',
  arrivalWindow: { from: 555, to: 615 },
  bookableMinutesLeft: 240,
  cutoff: { date: '2025-04-28', minute: 1080 },
});

export function publicStop(overrides: Partial<PublicStop> = {}): PublicStop {
  return {
    id: 's-maple',
    name: 'Maple Street Salon',
    street: '12 Maple Street',
    city: 'Riverton',
    nextDays: [OPEN_DAY, FULL_DAY],
    mailIn: { address: 'Keenroute Workshop, 4 Bench Lane, Riverton OR 97000' },
    ...overrides,
  };
}

export function quote(overrides: Partial<Quote> = {}): Quote {
  return {
    estimateCents: 7000,
    currency: 'USD',
    benchMinutes: 30,
    lines: [{ label: '2 × convex straight shear', cents: 7000 }],
    taxNote: 'Before sales tax, added at the stop’s rate.',
    ...overrides,
  };
}

export function publicBooking(overrides: Partial<PublicBooking> = {}): PublicBooking {
  return {
    id: 'b-1',
    status: 'booked',
    stop: { id: 's-maple', name: 'Maple Street Salon', city: 'Riverton' },
    day: OPEN_DAY.day,
    arrivalWindow: OPEN_DAY.arrivalWindow,
    mailIn: false,
    name: 'Jordan Clipper',
    email: 'jordan@paws.test',
    phone: '541 555 0134',
    notes: 'The curved pair was dropped.',
    items: [
      { toolKind: 'straight', edgeType: 'convex', count: 2 },
      { toolKind: 'curved', edgeType: 'beveled', count: 1 },
    ],
    estimateCents: 10500,
    benchMinutes: 45,
    cutoff: OPEN_DAY.cutoff,
    changeable: true,
    ...overrides,
  };
}

export function staffBooking(overrides: Partial<StaffBooking> = {}): StaffBooking {
  return {
    id: 'b-1',
    status: 'booked',
    stop: { id: 's-maple', name: 'Maple Street Salon', city: 'Riverton' },
    routeDayId: 'rd-0304',
    day: '2025-03-04',
    mailIn: false,
    name: 'Jordan Clipper',
    email: 'jordan@paws.test',
    phone: '541 555 0134',
    notes: null,
    items: [{ toolKind: 'straight', edgeType: 'convex', count: 2 }],
    benchMinutes: 30,
    ...overrides,
  };
}
