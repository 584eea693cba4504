import { minutesOfDay, weekdayOf, type OpeningHours, type Weekday } from '@keenroute/shared';
import type { TimeWindow } from '../solver/types';

/** What a stop's calendar says about one date, for planning. */
export interface StopCalendar {
  openingHours: OpeningHours;
  closedDates: readonly string[];
  preferredWeekdays: readonly Weekday[];
}

/**
 * The windows in which bench work may start at a stop on a date: each opening window shortened by the bench minutes,
 * so the work ends before closing. Empty when the stop is shut that day or no window is long enough.
 */
export function benchWindows(stop: StopCalendar, date: string, benchMinutes: number): TimeWindow[] {
  if (stop.closedDates.includes(date)) return [];
  const windows: TimeWindow[] = [];
  for (const window of stop.openingHours[weekdayOf(date)] ?? []) {
    const open = minutesOfDay(window.opens);
    const closes = minutesOfDay(window.closes);
    if (open === undefined || closes === undefined) continue;
    if (closes - benchMinutes >= open) windows.push({ open, close: closes - benchMinutes });
  }
  return windows;
}

/** Whether the stop is open at all on the date, whatever the bench minutes. */
export function isOpenOn(stop: StopCalendar, date: string): boolean {
  return !stop.closedDates.includes(date) && (stop.openingHours[weekdayOf(date)] ?? []).length > 0;
}

/**
 * The dates of the week a stop may go on: its preferred weekdays when any of them is open that week, else every open
 * work day. Preferred weekdays are a wish, not a rule, so a week without one open still gets a visit.
 */
export function candidateDates(stop: StopCalendar, workDates: readonly string[]): string[] {
  const open = workDates.filter((date) => isOpenOn(stop, date));
  const preferred = open.filter((date) => stop.preferredWeekdays.includes(weekdayOf(date)));
  return preferred.length > 0 ? preferred : open;
}
