import { BusinessClock } from './business-time';

describe('BusinessClock (times of the working day in the business time zone)', () => {
  const sut = new BusinessClock('America/Chicago');

  it('reads 9:00 in Chicago as 15:00 UTC in winter (CST, UTC-6) and 14:00 UTC in summer (CDT, UTC-5)', () => {
    expect(sut.at('2025-01-15', 9 * 60).toISOString()).toBe('2025-01-15T15:00:00.000Z');
    expect(sut.at('2025-07-01', 9 * 60).toISOString()).toBe('2025-07-01T14:00:00.000Z');
  });

  it('uses the day’s own offset on the days the clocks change (2025-03-09 and 2025-11-02 in the US)', () => {
    expect(sut.at('2025-03-09', 8 * 60 + 30).toISOString()).toBe('2025-03-09T13:30:00.000Z');
    expect(sut.at('2025-11-02', 17 * 60 + 45).toISOString()).toBe('2025-11-02T23:45:00.000Z');
  });

  it('works east of Greenwich too', () => {
    expect(new BusinessClock('Europe/Berlin').at('2025-06-10', 12 * 60).toISOString()).toBe('2025-06-10T10:00:00.000Z');
  });
});
