import { describe, expect, it } from 'vitest';
import { distance, duration, parseTimeOfDay, timeOfDay, timeRange } from './format';

describe('route day wording', () => {
  it.each([
    [0, '0 min'],
    [45, '45 min'],
    [60, '1 h'],
    [125, '2 h 05 min'],
  ])('says %s minutes as %s', (minutes, text) => {
    expect(duration(minutes)).toBe(text);
  });

  it('writes times of day as 24-hour HH:MM, and a dash for none', () => {
    expect(timeOfDay(9 * 60 + 5)).toBe('09:05');
    expect(timeOfDay(null)).toBe('–');
    expect(timeRange(9 * 60, 10 * 60)).toBe('09:00–10:00');
  });

  it('reads HH:MM back into minutes and refuses anything else', () => {
    expect(parseTimeOfDay('08:30')).toBe(510);
    expect(parseTimeOfDay(' 23:59 ')).toBe(1439);
    for (const text of ['8:30', '24:00', '08:60', '0830', '8.30', '']) expect(parseTimeOfDay(text)).toBeNull();
  });

  it('rounds distances to a tenth under 100 km', () => {
    expect(distance(24.64)).toBe('24.6 km');
    expect(distance(3)).toBe('3.0 km');
    expect(distance(123.4)).toBe('123 km');
  });
});
