import { addDays as refAddDays, differenceInCalendarDays, format, parseISO, startOfISOWeek } from 'date-fns';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addDays, daysBetween, daysOverdue, nextDueDate, weekStart } from './coming-due.js';
import { weekdayOf, WEEKDAYS } from './weekdays.js';

// Reference: date-fns (a general-purpose date library from the npm registry) computes the same calendar answers.
const isoDates = fc
  .date({ min: new Date(Date.UTC(1990, 0, 1)), max: new Date(Date.UTC(2090, 11, 31)), noInvalidDate: true })
  .map((date) => date.toISOString().slice(0, 10));

describe('calendar arithmetic, checked against date-fns', () => {
  it('adds days across months, leap days and years', () => {
    fc.assert(
      fc.property(isoDates, fc.integer({ min: -800, max: 800 }), (date, days) => {
        expect(addDays(date, days)).toBe(format(refAddDays(parseISO(date), days), 'yyyy-MM-dd'));
      }),
    );
  });

  it('counts whole days between dates', () => {
    fc.assert(
      fc.property(isoDates, isoDates, (a, b) => {
        expect(daysBetween(a, b)).toBe(differenceInCalendarDays(parseISO(b), parseISO(a)));
      }),
    );
  });

  it('finds the Monday of the ISO week (ISO 8601 weeks start on Monday)', () => {
    fc.assert(
      fc.property(isoDates, (date) => {
        expect(weekStart(date)).toBe(format(startOfISOWeek(parseISO(date)), 'yyyy-MM-dd'));
      }),
    );
  });

  it('names the ISO weekday', () => {
    fc.assert(
      fc.property(isoDates, (date) => {
        // date-fns: 'i' is the ISO day of the week, 1 = Monday ... 7 = Sunday.
        expect(weekdayOf(date)).toBe(WEEKDAYS[Number(format(parseISO(date), 'i')) - 1]);
      }),
    );
  });

  it('knows fixed dates: 2024-02-29 was a Thursday, 2026-12-02 a Wednesday (any calendar)', () => {
    expect(weekdayOf('2024-02-29')).toBe('thu');
    expect(weekdayOf('2026-12-02')).toBe('wed');
    expect(weekStart('2026-12-06')).toBe('2026-11-30');
    expect(addDays('2024-02-28', 1)).toBe('2024-02-29');
    expect(addDays('2023-02-28', 1)).toBe('2023-03-01');
  });
});

describe('next due date', () => {
  it('falls one cadence after the last worked visit', () => {
    expect(nextDueDate('2026-10-05', 8, '2026-12-02')).toBe('2026-11-30');
    expect(daysOverdue('2026-11-30', '2026-12-02')).toBe(2);
  });

  it('is today for a stop never visited', () => {
    expect(nextDueDate(null, 6, '2026-12-02')).toBe('2026-12-02');
    expect(daysOverdue('2026-12-02', '2026-12-02')).toBe(0);
  });

  it('counts days still to go as negative overdue', () => {
    expect(daysOverdue('2026-12-09', '2026-12-02')).toBe(-7);
  });
});
