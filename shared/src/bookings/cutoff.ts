import { RuleError } from '../errors.js';
import { addDays } from '../registry/coming-due.js';

/** When changes to a day's bookings close: so many days before, at this hour, in the business's time zone. */
export interface BookingCutoffSetting {
  daysBefore: number;
  /** 0-23. */
  hour: number;
}

/** A calendar date and a time of day (minutes after midnight) in the business's time zone. */
export interface BookingCutoff {
  date: string;
  minute: number;
}

/** "The evening before": Keenroute's own default, so the sharpener can pack the day the night before. */
export const DEFAULT_BOOKING_CUTOFF: BookingCutoffSetting = { daysBefore: 1, hour: 18 };
export const BOOKING_CUTOFF_DAYS_MAX = 14;

/** When bookings for the route day on `day` stop being taken, changed or cancelled. */
export function bookingCutoff(day: string, setting: BookingCutoffSetting = DEFAULT_BOOKING_CUTOFF): BookingCutoff {
  const { daysBefore, hour } = setting;
  if (!Number.isInteger(daysBefore) || daysBefore < 0 || daysBefore > BOOKING_CUTOFF_DAYS_MAX) {
    throw new RuleError(
      'invalid-time',
      `The booking cutoff is 0 to ${BOOKING_CUTOFF_DAYS_MAX} days before; got ${daysBefore}.`,
      'daysBefore',
    );
  }
  if (!Number.isInteger(hour) || hour < 0 || hour > 23) {
    throw new RuleError('invalid-time', `The booking cutoff hour is 0 to 23; got ${hour}.`, 'hour');
  }
  return { date: addDays(day, -daysBefore), minute: hour * 60 };
}

/** True while `now` (a date and minute in the business's time zone) is strictly before the cutoff. */
export function isBeforeCutoff(nowDate: string, nowMinute: number, cutoff: BookingCutoff): boolean {
  return nowDate < cutoff.date || (nowDate === cutoff.date && nowMinute < cutoff.minute);
}
