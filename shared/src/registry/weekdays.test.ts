import { describe, expect, it } from 'vitest';
import { isRuleError, type RuleError } from '../errors.js';
import { isWeekday, minutesOfDay, validateOpeningHours } from './weekdays.js';

function errorOf(run: () => unknown): RuleError {
  try {
    run();
  } catch (error) {
    if (isRuleError(error)) return error;
    throw error;
  }
  throw new Error('expected a RuleError');
}

describe('opening hours', () => {
  it('reads 24-hour times (ISO 8601 hh:mm)', () => {
    expect(minutesOfDay('00:00')).toBe(0);
    expect(minutesOfDay('09:30')).toBe(570);
    expect(minutesOfDay('23:59')).toBe(1439);
    expect(minutesOfDay('24:00')).toBeUndefined();
    expect(minutesOfDay('9:30')).toBeUndefined();
    expect(minutesOfDay('12:60')).toBeUndefined();
  });

  it('keeps a split day with a lunch close and drops days with no windows', () => {
    const hours = validateOpeningHours({
      tue: [
        { opens: '09:00', closes: '12:30' },
        { opens: '13:30', closes: '18:00' },
      ],
      sun: [],
    });
    expect(hours).toEqual({
      tue: [
        { opens: '09:00', closes: '12:30' },
        { opens: '13:30', closes: '18:00' },
      ],
    });
  });

  it('refuses unknown weekdays, bad times, backwards and overlapping windows, naming the field', () => {
    expect(errorOf(() => validateOpeningHours({ funday: [] })).message).toMatch(/not a weekday/);
    expect(errorOf(() => validateOpeningHours({ mon: [{ opens: '9', closes: '17:00' }] })).field).toBe(
      'openingHours.mon[0]',
    );
    expect(errorOf(() => validateOpeningHours({ mon: [{ opens: '17:00', closes: '09:00' }] })).message).toMatch(
      /close after it opens/,
    );
    const overlap = errorOf(() =>
      validateOpeningHours({
        fri: [
          { opens: '09:00', closes: '13:00' },
          { opens: '12:00', closes: '18:00' },
        ],
      }),
    );
    expect(overlap.field).toBe('openingHours.fri[1]');
    expect(errorOf(() => validateOpeningHours([])).code).toBe('invalid-hours');
    expect(errorOf(() => validateOpeningHours({ mon: 'all day' })).field).toBe('openingHours.mon');
    expect(errorOf(() => validateOpeningHours({ mon: [null] })).field).toBe('openingHours.mon[0]');
  });

  it('knows the weekdays', () => {
    expect(isWeekday('mon')).toBe(true);
    expect(isWeekday('Monday')).toBe(false);
  });
});
