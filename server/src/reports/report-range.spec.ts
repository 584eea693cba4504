import { monthStart, reportRange } from './report-range';

describe('reportRange', () => {
  it('defaults to the twelve calendar months up to today', () => {
    expect(reportRange({}, '2026-12-03')).toEqual({
      from: '2026-01-01',
      to: '2026-12-03',
      sharpenerId: null,
      routeTo: '2026-12-03',
    });
    expect(reportRange({ to: '2026-03-31' }, '2026-12-03').from).toBe('2025-04-01');
  });

  it('stops route time at today when the range runs ahead', () => {
    expect(reportRange({ from: '2026-12-01', to: '2026-12-31' }, '2026-12-03').routeTo).toBe('2026-12-03');
  });

  it('refuses a backwards or over-long range', () => {
    expect(() => reportRange({ from: '2026-02-01', to: '2026-01-01' }, '2026-12-03')).toThrow(/after it ends/);
    expect(() => reportRange({ from: '2019-01-01', to: '2026-01-01' }, '2026-12-03')).toThrow(/at most 6 years/);
  });

  it('counts months back across years', () => {
    expect(monthStart('2026-01-15', 1)).toBe('2025-12-01');
    expect(monthStart('2026-01-15', 13)).toBe('2024-12-01');
  });
});
