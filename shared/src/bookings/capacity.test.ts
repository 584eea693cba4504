import { describe, expect, it } from 'vitest';
import { benchMinutes } from '../bench-time.js';
import { bookableMinutes, bookedBenchMinutes } from './capacity.js';

describe('booked bench minutes', () => {
  it('adds the pairs without the stop setup (beveled 10, convex 18, thinning 12; common practice)', () => {
    const items = [
      { edgeType: 'beveled', toolKind: 'straight', count: 2 },
      { edgeType: 'convex', toolKind: 'curved', count: 1 },
      { edgeType: 'convex', toolKind: 'thinning', count: 3 },
    ] as const;
    expect(bookedBenchMinutes(items)).toBe(2 * 10 + 18 + 3 * 12);
    expect(bookedBenchMinutes(items)).toBe(benchMinutes(items) - 10);
  });

  it('refuses a count outside 1 to 50, and more than 60 pairs in all', () => {
    expect(() => bookedBenchMinutes([{ edgeType: 'beveled', toolKind: 'straight', count: 0 }])).toThrow(/1 to 50/);
    expect(() => bookedBenchMinutes([{ edgeType: 'beveled', toolKind: 'straight', count: 51 }])).toThrow(/1 to 50/);
    expect(() => bookedBenchMinutes([{ edgeType: 'beveled', toolKind: 'straight', count: 1.5 }])).toThrow(/1 to 50/);
    const many = [
      { edgeType: 'beveled', toolKind: 'straight', count: 40 },
      { edgeType: 'convex', toolKind: 'straight', count: 21 },
    ] as const;
    expect(() => bookedBenchMinutes(many)).toThrow(/at most 60 pairs; got 61/);
  });
});

describe('bookable minutes of a route day', () => {
  const day = { shiftStart: 480, latestFinish: 1080, lunchMinutes: 30, driveMinutes: 95, stopCount: 4 };

  it('is the working day less the break, the driving and 10 minutes of setup per stop', () => {
    expect(bookableMinutes(day)).toBe(600 - 30 - 95 - 40);
    expect(bookableMinutes({ ...day, setupPerStop: 15 })).toBe(600 - 30 - 95 - 60);
  });

  it('never goes below zero', () => {
    expect(bookableMinutes({ ...day, driveMinutes: 700 })).toBe(0);
  });
});
