import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isRuleError } from '../errors.js';
import { PAYMENT_TERMS_MAX_DAYS, dueDate } from './due-date.js';

const DAY_MS = 86_400_000;

describe('dueDate', () => {
  it('adds calendar days across month ends, year ends and leap days', () => {
    expect(dueDate('2026-12-02', 14)).toBe('2026-12-16');
    expect(dueDate('2026-12-20', 14)).toBe('2027-01-03');
    expect(dueDate('2026-01-31', 1)).toBe('2026-02-01');
    expect(dueDate('2026-01-31', 30)).toBe('2026-03-02'); // February 2026 has 28 days
    expect(dueDate('2026-04-30', 1)).toBe('2026-05-01');
    expect(dueDate('2028-02-28', 1)).toBe('2028-02-29'); // 2028 is a leap year
    expect(dueDate('2028-02-29', 1)).toBe('2028-03-01');
    expect(dueDate('2027-02-28', 1)).toBe('2027-03-01');
    expect(dueDate('2028-02-29', 365)).toBe('2029-02-28');
    expect(dueDate('2026-01-31', 0)).toBe('2026-01-31');
  });

  it('is always exactly termsDays × 24 h after the issue date in UTC, whatever the date', () => {
    const dayArb = fc
      .integer({ min: Date.UTC(2000, 0, 1) / DAY_MS, max: Date.UTC(2099, 11, 31) / DAY_MS })
      .map((days) => new Date(days * DAY_MS).toISOString().slice(0, 10));
    fc.assert(
      fc.property(dayArb, fc.integer({ min: 0, max: PAYMENT_TERMS_MAX_DAYS }), (issue, terms) => {
        const due = dueDate(issue, terms);
        expect(due).toMatch(/^\d{4}-\d{2}-\d{2}$/);
        expect((Date.parse(due) - Date.parse(issue)) / DAY_MS).toBe(terms);
      }),
    );
  });

  it('refuses a date that is not one, and terms out of range', () => {
    for (const bad of ['2026-02-30', '2027-02-29', '2026-13-01', '2026-00-10', '02/12/2026', ' 2026-12-02', '']) {
      expect(() => dueDate(bad, 1), bad).toThrow(/YYYY-MM-DD/);
    }
    expect(() => dueDate(undefined as never, 1)).toThrow(/YYYY-MM-DD/);
    for (const bad of [-1, 1.5, PAYMENT_TERMS_MAX_DAYS + 1, Number.NaN, '14' as never]) {
      expect(() => dueDate('2026-12-02', bad), String(bad)).toThrow(/Payment terms/);
    }
    try {
      dueDate('2026-12-02', -1);
    } catch (error) {
      expect(isRuleError(error) && [error.code, error.field]).toEqual(['invalid-invoice', 'termsDays']);
    }
  });
});
