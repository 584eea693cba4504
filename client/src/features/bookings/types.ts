import type { EdgeType, ToolKind } from '@keenroute/shared';

/** Minutes after midnight, as the rules package counts a time of day. */
export interface TimeWindow {
  from: number;
  to: number;
}

/** When changes close: a calendar day and a minute of that day, in the business's time zone. */
export interface Cutoff {
  date: string;
  minute: number;
}

/** A route day a stop is on, as the public booking page sees it. */
export interface PublicDay {
  routeDayId: string;
  day: string;
  arrivalWindow: TimeWindow;
  bookableMinutesLeft: number;
  cutoff: Cutoff;
  open: boolean;
}

export interface PublicStopSummary {
  id: string;
  name: string;
  city: string;
  nextDays: PublicDay[];
}

export interface PublicStop extends PublicStopSummary {
  street: string;
  mailIn: { address: string };
}

/** Shears of one tool kind and edge type, and how many pairs. */
export interface BookingItem {
  toolKind: ToolKind;
  edgeType: EdgeType;
  count: number;
}

export interface QuoteInput {
  stopId: string;
  items: BookingItem[];
}

export interface Quote {
  estimateCents: number;
  currency: string;
  benchMinutes: number;
  lines: { label: string; cents: number }[];
  taxNote: string;
}

export const BOOKING_STATUSES = ['booked', 'checked-in', 'cancelled'] as const;
export type BookingStatus = (typeof BOOKING_STATUSES)[number];

/** A booking as its private link shows it. */
export interface PublicBooking {
  id: string;
  status: BookingStatus;
  stop: { id: string; name: string; city: string };
  day: string | null;
  arrivalWindow: TimeWindow | null;
  mailIn: boolean;
  name: string;
  email: string;
  phone: string;
  notes: string | null;
  items: BookingItem[];
  estimateCents: number;
  benchMinutes: number;
  cutoff: Cutoff | null;
  changeable: boolean;
  /** Not in the contract's DTO; when absent, the route day is found by its date among the stop's days. */
  routeDayId?: string | null;
}

export interface CreateBookingInput {
  stopId: string;
  routeDayId: string | null;
  mailIn: boolean;
  name: string;
  email: string;
  phone: string;
  notes?: string;
  consent: true;
  items: BookingItem[];
  /** The honeypot: people leave it empty, form-filling robots do not. */
  website: string;
  idempotencyKey: string;
}

export interface CreatedBooking {
  booking: PublicBooking;
  manageUrl?: string;
}

export interface BookingChanges {
  items?: BookingItem[];
  notes?: string;
  phone?: string;
  routeDayId?: string;
}

/** A booking in the staff list: who, where, when and what, with the bench time it takes. */
export interface StaffBooking {
  id: string;
  status: BookingStatus;
  stop: { id: string; name: string; city?: string };
  routeDayId: string | null;
  day: string | null;
  mailIn: boolean;
  name: string;
  email: string;
  phone: string;
  notes: string | null;
  items: BookingItem[];
  benchMinutes: number;
  estimateCents?: number;
}

export interface StaffBookingFilters {
  day: string;
  status: BookingStatus | '';
  stopId: string;
}
