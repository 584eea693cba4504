import { RuleError } from '../errors.js';

/** ISO 8601 weekday order, Monday first. */
export const WEEKDAYS = ['mon', 'tue', 'wed', 'thu', 'fri', 'sat', 'sun'] as const;
export type Weekday = (typeof WEEKDAYS)[number];

export const WEEKDAY_LABELS: Readonly<Record<Weekday, string>> = {
  mon: 'Monday',
  tue: 'Tuesday',
  wed: 'Wednesday',
  thu: 'Thursday',
  fri: 'Friday',
  sat: 'Saturday',
  sun: 'Sunday',
};

export const isWeekday = (value: unknown): value is Weekday =>
  typeof value === 'string' && (WEEKDAYS as readonly string[]).includes(value);

/** One opening window in local time, 24-hour "HH:MM"; closes after opens, on the same day. */
export interface OpeningWindow {
  opens: string;
  closes: string;
}

/** Opening hours per weekday; a weekday left out or with no windows is closed. */
export type OpeningHours = Partial<Record<Weekday, OpeningWindow[]>>;

/** Most windows one weekday may have (a split day with a lunch close has two). */
export const WINDOWS_PER_DAY_MAX = 4;

const TIME = /^([01]\d|2[0-3]):([0-5]\d)$/;

/** Minutes after midnight for "HH:MM", or undefined when it is not a 24-hour time. */
export function minutesOfDay(time: string): number | undefined {
  const match = TIME.exec(time);
  return match ? Number(match[1]) * 60 + Number(match[2]) : undefined;
}

/** Checks untrusted opening hours: known weekdays, valid times, windows in order and not overlapping. */
export function validateOpeningHours(input: unknown, field = 'openingHours'): OpeningHours {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    throw new RuleError('invalid-hours', 'Opening hours are a list of windows per weekday.', field);
  }
  const hours: OpeningHours = {};
  for (const [day, windows] of Object.entries(input as Record<string, unknown>)) {
    if (!isWeekday(day)) {
      throw new RuleError('invalid-hours', `"${day}" is not a weekday; use ${WEEKDAYS.join(', ')}.`, field);
    }
    if (!Array.isArray(windows) || windows.length > WINDOWS_PER_DAY_MAX) {
      throw new RuleError(
        'invalid-hours',
        `${WEEKDAY_LABELS[day]} takes up to ${WINDOWS_PER_DAY_MAX} opening windows.`,
        `${field}.${day}`,
      );
    }
    let previousClose = -1;
    const clean: OpeningWindow[] = [];
    windows.forEach((window: unknown, index) => {
      const at = `${field}.${day}[${index}]`;
      const raw = (typeof window === 'object' && window !== null ? window : {}) as Record<string, unknown>;
      const opens = typeof raw.opens === 'string' ? minutesOfDay(raw.opens) : undefined;
      const closes = typeof raw.closes === 'string' ? minutesOfDay(raw.closes) : undefined;
      if (opens === undefined || closes === undefined) {
        throw new RuleError('invalid-hours', `${WEEKDAY_LABELS[day]}: times are 24-hour HH:MM, like 09:00.`, at);
      }
      if (closes <= opens) {
        throw new RuleError('invalid-hours', `${WEEKDAY_LABELS[day]}: a window must close after it opens.`, at);
      }
      if (opens < previousClose) {
        throw new RuleError(
          'invalid-hours',
          `${WEEKDAY_LABELS[day]}: windows must be in order and must not overlap.`,
          at,
        );
      }
      previousClose = closes;
      clean.push({ opens: raw.opens as string, closes: raw.closes as string });
    });
    if (clean.length > 0) hours[day] = clean;
  }
  return hours;
}

/** The ISO weekday of a calendar date "YYYY-MM-DD" (read as a date, not an instant, so no time zone moves it). */
export function weekdayOf(isoDate: string): Weekday {
  const [y, m, d] = isoDate.split('-').map(Number) as [number, number, number];
  const sundayFirst = new Date(Date.UTC(y, m - 1, d)).getUTCDay();
  return WEEKDAYS[(sundayFirst + 6) % 7]!;
}
