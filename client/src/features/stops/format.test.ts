import { describe, expect, it } from 'vitest';
import { cadenceWording, dueLevel, dueWording, formatAddress, formatDay, todayIso } from './format';

describe('due wording', () => {
  it('counts days overdue and days to go', () => {
    expect(dueWording(12)).toBe('12 days overdue');
    expect(dueWording(1)).toBe('1 day overdue');
    expect(dueWording(0)).toBe('due today');
    expect(dueWording(-1)).toBe('due in 1 day');
    expect(dueWording(-3)).toBe('due in 3 days');
  });

  it('is overdue after the due day and soon in the week before it', () => {
    expect(dueLevel(1)).toBe('overdue');
    expect(dueLevel(0)).toBe('soon');
    expect(dueLevel(-7)).toBe('soon');
    expect(dueLevel(-8)).toBe('later');
  });
});

describe('stop formatting', () => {
  it('reads a calendar date without a time zone moving it', () => {
    expect(formatDay('2025-03-01')).toBe('Mar 1, 2025');
    expect(formatDay('not a date')).toBe('not a date');
  });

  it('takes today from the device clock as a calendar date', () => {
    expect(todayIso(new Date(2025, 0, 5, 23, 30))).toBe('2025-01-05');
  });

  it('leaves out the parts of an address that are empty', () => {
    expect(formatAddress({ street: '1 Elm St', city: 'Riverton', region: '', postalCode: '' })).toBe(
      '1 Elm St, Riverton',
    );
    expect(formatAddress({ street: '1 Elm St', city: 'Riverton', region: 'OR', postalCode: '97000' })).toBe(
      '1 Elm St, Riverton, OR 97000',
    );
  });

  it('words the cadence', () => {
    expect(cadenceWording(1)).toBe('every week');
    expect(cadenceWording(6)).toBe('every 6 weeks');
  });
});
