import { todayIn } from './business-today';

describe('todayIn', () => {
  it("reads the calendar date in the business's time zone, not the server's", () => {
    const instant = new Date('2026-03-02T03:30:00Z');
    expect(todayIn('America/Chicago', instant)).toBe('2026-03-01');
    expect(todayIn('Europe/Berlin', instant)).toBe('2026-03-02');
    expect(todayIn('Pacific/Kiritimati', new Date('2026-12-31T10:00:00Z'))).toBe('2027-01-01');
  });
});
