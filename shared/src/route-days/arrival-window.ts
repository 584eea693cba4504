import { RuleError } from '../errors.js';

/** Minutes in a day; times of day are whole minutes after midnight, 0 to 1439. */
export const MINUTES_PER_DAY = 24 * 60;

/**
 * How wide the arrival window given to a stop is, and its step. Keenroute's own default (common practice is to promise
 * an hour-long window on a quarter hour): the window opens at the planned arrival rounded down to the quarter hour.
 */
export const ARRIVAL_WINDOW_MINUTES = 60;
export const ARRIVAL_WINDOW_STEP = 15;

export interface ArrivalWindow {
  from: number;
  to: number;
}

function checkTime(minute: number, field: string): number {
  if (!Number.isInteger(minute) || minute < 0 || minute >= MINUTES_PER_DAY) {
    throw new RuleError(
      'invalid-time',
      `${field} must be whole minutes after midnight (0-1439); got ${minute}.`,
      field,
    );
  }
  return minute;
}

/** The window told to a stop for a planned arrival: from the quarter hour at or before it, one hour long. */
export function arrivalWindow(arrival: number): ArrivalWindow {
  checkTime(arrival, 'arrival');
  const from = arrival - (arrival % ARRIVAL_WINDOW_STEP);
  return { from, to: Math.min(from + ARRIVAL_WINDOW_MINUTES, MINUTES_PER_DAY - 1) };
}

/** "HH:MM", 24-hour, for a time of day in minutes. */
export function formatTimeOfDay(minute: number): string {
  checkTime(minute, 'minute');
  return `${String(Math.floor(minute / 60)).padStart(2, '0')}:${String(minute % 60).padStart(2, '0')}`;
}
