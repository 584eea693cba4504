import { describe, expect, it } from 'vitest';
import { formatBookingDay, formatCutoff, formatMinutes, formatWindow, summarizeItems } from './format';

describe('booking wording', () => {
  it('names the weekday of a calendar day without a time zone moving it', () => {
    expect(formatBookingDay('2025-03-04')).toBe('Tuesday, Mar 4');
    expect(formatBookingDay('soon')).toBe('soon');
  });

  it('shows the arrival window and the cutoff in 24-hour time', () => {
    expect(formatWindow({ from: 540, to: 600 })).toBe('09:00–10:00');
    expect(formatCutoff({ date: '2025-03-03', minute: 1080 })).toBe('18:00 on Monday, Mar 3');
  });

  it('sums the pairs and names each row in trade words', () => {
    expect(
      summarizeItems([
        { toolKind: 'straight', edgeType: 'convex', count: 2 },
        { toolKind: 'thinning', edgeType: 'beveled', count: 1 },
      ]),
    ).toBe('3 pairs: 2 × convex straight shear, 1 × beveled thinning shear');
    expect(summarizeItems([{ toolKind: 'chunker', edgeType: 'serrated', count: 1 }])).toBe(
      '1 pair: 1 × serrated chunker',
    );
  });

  it('writes bench minutes in hours past the hour', () => {
    expect(formatMinutes(45)).toBe('45 min');
    expect(formatMinutes(90)).toBe('1 h 30 min');
    expect(formatMinutes(120)).toBe('2 h');
  });
});
