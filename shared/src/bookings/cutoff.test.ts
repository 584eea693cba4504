import { describe, expect, it } from 'vitest';
import { RuleError } from '../errors.js';
import { DEFAULT_BOOKING_CUTOFF, bookingCutoff, isBeforeCutoff } from './cutoff.js';

describe('booking cutoff', () => {
  it('defaults to the evening before: 18:00 the previous day', () => {
    expect(DEFAULT_BOOKING_CUTOFF).toEqual({ daysBefore: 1, hour: 18 });
    expect(bookingCutoff('2026-03-02')).toEqual({ date: '2026-03-01', minute: 1080 });
  });

  it('counts calendar days across month and year ends', () => {
    expect(bookingCutoff('2026-03-01', { daysBefore: 2, hour: 9 })).toEqual({ date: '2026-02-27', minute: 540 });
    expect(bookingCutoff('2027-01-01', { daysBefore: 1, hour: 0 })).toEqual({ date: '2026-12-31', minute: 0 });
    expect(bookingCutoff('2026-06-10', { daysBefore: 0, hour: 7 })).toEqual({ date: '2026-06-10', minute: 420 });
  });

  it('refuses a setting out of range', () => {
    expect(() => bookingCutoff('2026-03-02', { daysBefore: -1, hour: 18 })).toThrow(RuleError);
    expect(() => bookingCutoff('2026-03-02', { daysBefore: 1, hour: 24 })).toThrow(/0 to 23/);
    expect(() => bookingCutoff('2026-03-02', { daysBefore: 15, hour: 18 })).toThrow(/0 to 14/);
  });

  it('is open strictly before the cutoff minute, closed from it on', () => {
    const cutoff = { date: '2026-03-01', minute: 1080 };
    expect(isBeforeCutoff('2026-02-28', 1439, cutoff)).toBe(true);
    expect(isBeforeCutoff('2026-03-01', 1079, cutoff)).toBe(true);
    expect(isBeforeCutoff('2026-03-01', 1080, cutoff)).toBe(false);
    expect(isBeforeCutoff('2026-03-02', 0, cutoff)).toBe(false);
  });
});
