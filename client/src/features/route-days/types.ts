import type { SheetBooking } from '@/features/bookings/components/stop-bookings';
import type { Weekday } from '@keenroute/shared';

export interface Ref {
  id: string;
  name: string;
}

/** A time of day, in minutes after midnight in the business's time zone. */
export type Minutes = number;

export type StopProblem = 'after-closing' | 'closed-that-day' | 'day-too-long';

export type UnplannedReason =
  | 'window-closed'
  | 'day-too-long'
  | 'capacity'
  | 'lock-impossible'
  | 'no-coordinates'
  | 'closed-all-week'
  | 'taken-off';

export interface Place {
  label: string;
  latitude: number;
  longitude: number;
}

export interface RouteDayStop {
  stopId: string;
  position: number;
  name: string;
  street: string;
  city: string;
  latitude: number;
  longitude: number;
  arrival: Minutes;
  /** When bench work starts: the arrival, or the opening time if the stop opens later. */
  start: Minutes;
  leave: Minutes;
  /** The window told to the stop. */
  arrivalWindow: { from: Minutes; to: Minutes };
  benchMinutes: number;
  driveMinutesBefore: number;
  kmBefore: number;
  locked: boolean;
  positionLocked: boolean;
  /** Set after a hand move breaks a rule. */
  problem: StopProblem | null;
  nextDueOn: string | null;
  daysOverdue: number;
}

export interface RouteDay {
  id: string;
  day: string;
  weekday: Weekday;
  sharpener: Ref;
  /** The base: where the day starts and ends. */
  start: Place;
  shiftStart: Minutes;
  latestFinish: Minutes;
  /** afterStops = how many stops come before the break. */
  lunch: { start: Minutes; afterStops: number; minutes: number } | null;
  departure: Minutes | null;
  finish: Minutes | null;
  distanceKm: number;
  driveMinutes: number;
  benchMinutes: number;
  version: number;
  stops: RouteDayStop[];
}

export interface UnplannedStop {
  stopId: string;
  name: string;
  city: string;
  reason: UnplannedReason;
  /** A sentence for people, from the server. */
  reasonText: string;
}

export interface Week {
  weekStart: string;
  weekEnd: string;
  /** Today in the business's time zone. */
  today: string;
  sharpeners: Ref[];
  /** Sorted by day, then sharpener name. */
  days: RouteDay[];
  unplanned: UnplannedStop[];
  plannedAt: string | null;
  solveMs: number | null;
}

export interface PlanWeekInput {
  week: string;
  sharpenerIds?: string[];
}

/** The body of POST /api/route-days/:id/stops; position is 0-based in the day's new order. */
export interface PlaceStopInput {
  stopId: string;
  position: number;
  version?: number;
}

export interface ChangedDays {
  days: RouteDay[];
}

export interface SheetCustomer {
  id: string;
  name: string;
  phone: string | null;
  email: string | null;
  shearCount: number;
}

export interface SheetStop {
  position: number;
  stopId: string;
  name: string;
  street: string;
  city: string;
  postalCode: string;
  phone: string | null;
  email: string | null;
  accessParking: string;
  accessDoor: string;
  accessBestTime: string;
  arrival: Minutes;
  leave: Minutes;
  arrivalWindow: { from: Minutes; to: Minutes };
  benchMinutes: number;
  expectedPairs: number;
  customers: SheetCustomer[];
  bookings: SheetBooking[];
}

export interface DayTotals {
  stops: number;
  distanceKm: number;
  driveMinutes: number;
  benchMinutes: number;
  departure: Minutes | null;
  finish: Minutes | null;
}

export interface DaySheet {
  routeDay: RouteDay;
  stops: SheetStop[];
  totals: DayTotals;
  cautions: string[];
}

export interface PlanningSettings {
  baseLabel: string;
  baseLatitude: number;
  baseLongitude: number;
  workWeekdays: Weekday[];
  shiftStart: Minutes;
  latestFinish: Minutes;
  lunchEarliest: Minutes;
  lunchLatest: Minutes;
  lunchMinutes: number;
  /** Road distance over straight-line distance, 1.0 to 2.0. */
  circuity: number;
  averageSpeedKmh: number;
  noticeDays: number;
  solveSeconds: number;
}

export interface CalendarFeed {
  url: string;
}
