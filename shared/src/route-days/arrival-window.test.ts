import { describe, expect, it } from 'vitest';
import { RuleError } from '../errors.js';
import { arrivalWindow, formatTimeOfDay } from './arrival-window.js';

describe('arrivalWindow', () => {
  it('opens at the quarter hour at or before the arrival and lasts an hour', () => {
    expect(arrivalWindow(9 * 60 + 7)).toEqual({ from: 9 * 60, to: 10 * 60 });
    expect(arrivalWindow(9 * 60 + 45)).toEqual({ from: 9 * 60 + 45, to: 10 * 60 + 45 });
    expect(arrivalWindow(14 * 60 + 59)).toEqual({ from: 14 * 60 + 45, to: 15 * 60 + 45 });
  });

  it('never runs past the end of the day', () => {
    expect(arrivalWindow(23 * 60 + 30)).toEqual({ from: 23 * 60 + 30, to: 23 * 60 + 59 });
  });

  it('refuses a time that is not a minute of the day', () => {
    expect(() => arrivalWindow(-1)).toThrow(RuleError);
    expect(() => arrivalWindow(1440)).toThrow(RuleError);
    expect(() => arrivalWindow(10.5)).toThrow(RuleError);
  });
});

describe('formatTimeOfDay', () => {
  it('writes 24-hour HH:MM', () => {
    expect(formatTimeOfDay(0)).toBe('00:00');
    expect(formatTimeOfDay(8 * 60 + 5)).toBe('08:05');
    expect(formatTimeOfDay(1439)).toBe('23:59');
  });
});
