import { arrivalWindow, formatTimeOfDay } from '@keenroute/shared';
import ical, { ICalCalendarMethod } from 'ical-generator';
import { vtimezone } from './vtimezone';

export interface CalendarStop {
  stopId: string;
  name: string;
  street: string;
  city: string;
  arrival: number;
  leave: number;
  accessParking: string;
  accessDoor: string;
  accessBestTime: string;
}

export interface CalendarRouteDay {
  id: string;
  /** "YYYY-MM-DD". */
  day: string;
  departure: number | null;
  finish: number | null;
  distanceKm: number;
  /** Bumped on every change: the events' SEQUENCE, so calendar apps take the newer copy (RFC 5545 3.8.7.4). */
  version: number;
  stops: CalendarStop[];
}

export interface RouteDayCalendarInput {
  sharpenerName: string;
  timeZone: string;
  /** The VTIMEZONE must cover every event: the feed's first and last day, with a day's margin. */
  from: Date;
  to: Date;
  days: CalendarRouteDay[];
}

const UID_DOMAIN = 'keenroute';

/** Stable across re-plans of the same day: the stop keeps its event even when its row is written again. */
export const stopEventUid = (routeDayId: string, stopId: string) => `${routeDayId}.${stopId}@${UID_DOMAIN}`;
export const dayEventUid = (routeDayId: string) => `${routeDayId}@${UID_DOMAIN}`;

/**
 * ical-generator writes a date given with a time zone as that Date's local fields under the TZID: so the Date is
 * built from the business's wall-clock time in this process's own zone, never shifted through UTC.
 */
function wallClock(day: string, minute: number): Date {
  const [year, month, date] = day.split('-').map(Number) as [number, number, number];
  return new Date(year, month - 1, date, 0, minute);
}

function stopDescription(stop: CalendarStop): string {
  const window = arrivalWindow(stop.arrival);
  const lines = [`Arrival window told to the stop: ${formatTimeOfDay(window.from)}–${formatTimeOfDay(window.to)}`];
  if (stop.accessParking) lines.push(`Parking: ${stop.accessParking}`);
  if (stop.accessDoor) lines.push(`Door: ${stop.accessDoor}`);
  if (stop.accessBestTime) lines.push(`Best time: ${stop.accessBestTime}`);
  return lines.join('\n');
}

const plural = (count: number, word: string) => `${count} ${word}${count === 1 ? '' : 's'}`;

/** A sharpener's route days as an RFC 5545 calendar: an event per stop, and one per day from departure to finish. */
export function routeDayCalendar(input: RouteDayCalendarInput): string {
  const calendar = ical({
    name: `Keenroute route days – ${input.sharpenerName}`,
    description: 'Planned stops from Keenroute. Times are estimates and change when the day is re-planned.',
    prodId: { company: 'Keenroute', product: 'route-days', language: 'EN' },
    method: ICalCalendarMethod.PUBLISH,
    timezone: { name: input.timeZone, generator: (tz) => vtimezone(tz, input.from, input.to) },
  });
  for (const day of input.days) {
    if (day.departure !== null && day.finish !== null) {
      calendar.createEvent({
        id: dayEventUid(day.id),
        sequence: day.version,
        start: wallClock(day.day, day.departure),
        end: wallClock(day.day, day.finish),
        timezone: input.timeZone,
        summary: `Route day: ${plural(day.stops.length, 'stop')}, ${Math.round(day.distanceKm)} km`,
        description: day.stops.map((stop, i) => `${i + 1}. ${formatTimeOfDay(stop.arrival)} ${stop.name}`).join('\n'),
      });
    }
    for (const stop of day.stops) {
      calendar.createEvent({
        id: stopEventUid(day.id, stop.stopId),
        sequence: day.version,
        start: wallClock(day.day, stop.arrival),
        end: wallClock(day.day, stop.leave),
        timezone: input.timeZone,
        summary: stop.name,
        location: [stop.street, stop.city].filter(Boolean).join(', '),
        description: stopDescription(stop),
      });
    }
  }
  return calendar.toString();
}
