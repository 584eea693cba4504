import { describe, expect, it } from 'vitest';
import { sumsOf, totalCell } from './totals';

describe('the totals row the page adds up itself', () => {
  it('adds the columns that add up, keeps one decimal without float dust, and leaves the others out', () => {
    const rows = [
      { visits: 2, driveMinutes: 10.1, revenueCents: 81000, perVisitCents: 40500 },
      { visits: 3, driveMinutes: 20.2, revenueCents: 30000, perVisitCents: 10000 },
    ];
    // 10.1 + 20.2 is 30.299999999999997 in floating point.
    expect(sumsOf(rows, ['visits', 'driveMinutes', 'revenueCents'])).toEqual({
      visits: 5,
      driveMinutes: 30.3,
      revenueCents: 111000,
    });
  });

  it('gives no sum where a row has no figure (one stop has no invoices of its own)', () => {
    expect(sumsOf([{ invoicedCents: 500 }, { invoicedCents: null }], ['invoicedCents'])).toEqual({
      invoicedCents: null,
    });
    expect(totalCell(undefined, String)).toBeNull();
    expect(totalCell(0, String)).toBe('0');
  });
});
