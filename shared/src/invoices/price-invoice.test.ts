import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isRuleError } from '../errors.js';
import { MONEY_MAX_CENTS } from '../limits.js';
import { priceInvoice, spreadCents, type InvoiceLineInput } from './price-invoice.js';

const taxed = (amountCents: number, taxRateBp = 825): InvoiceLineInput => ({ amountCents, taxable: true, taxRateBp });

describe('priceInvoice', () => {
  it('takes tax once on the invoice, half-up to the cent (worked example)', () => {
    // 3 lines at 8.25 %: 42.00 + 18.00 + 7.35 = 67.35; 67.35 × 0.0825 = 5.556375 → 5.56 (half-up on the invoice,
    // PRODUCT.md "rounding half-up to the cent on each invoice's tax"). Per line it would be 3.47 + 1.49 + 0.61 = 5.57.
    const price = priceInvoice([taxed(4200), taxed(1800), taxed(735)], null);
    expect(price).toMatchObject({ linesCents: 6735, discountCents: 0, subtotalCents: 6735, taxCents: 556 });
    expect(price.totalCents).toBe(7291);
    expect(price.taxGroups).toEqual([{ taxRateBp: 825, taxableCents: 6735, taxCents: 556 }]);
    expect(price.summary).toEqual(['tax 8.25% on $67.35 = $5.56']);
  });

  it('rounds an exact half cent up: 10.00 at 0.05 % is 0.005 → 0.01', () => {
    expect(priceInvoice([taxed(1000, 5)], null).taxCents).toBe(1);
  });

  it('takes a share discount before tax (worked example)', () => {
    // 10 % off 120.00 = 12.00; 108.00 × 7 % = 7.56; total 115.56.
    const price = priceInvoice([taxed(12000, 700)], { discountBp: 1000 });
    expect(price).toMatchObject({ discountCents: 1200, subtotalCents: 10800, taxCents: 756, totalCents: 11556 });
    expect(price.summary[0]).toBe('10% off $120.00 = −$12.00');
  });

  it('spreads an amount discount over the tax groups and the untaxed lines in proportion, exact to the cent', () => {
    // Weights 60.00 (5 %), 30.00 (8 %), 10.00 untaxed; 10.00 off → 6.00, 3.00, 1.00.
    const price = priceInvoice(
      [taxed(6000, 500), taxed(3000, 800), { amountCents: 1000, taxable: false, taxRateBp: 0 }],
      { discountCents: 1000 },
    );
    expect(price.taxGroups).toEqual([
      { taxRateBp: 500, taxableCents: 5400, taxCents: 270 },
      { taxRateBp: 800, taxableCents: 2700, taxCents: 216 },
    ]);
    expect(price.totalCents).toBe(9000 + 270 + 216);
    expect(price.summary).toContain('not taxed: $9.00');
  });

  it('spreads an amount discount over two tax groups by largest remainder (worked example)', () => {
    // 100.00 at 5 % and 50.00 at 8 %, 10.00 off. Exact shares 6.666… and 3.333…; rounded down 6.66 + 3.33 = 9.99, the
    // cent left goes to the larger remainder (0.67 > 0.33 of a cent): 6.67 and 3.33.
    // Tax: 93.33 × 5 % = 4.6665 → 4.67; 46.67 × 8 % = 3.7336 → 3.73. Total 140.00 + 8.40 = 148.40.
    const price = priceInvoice([taxed(10000, 500), taxed(5000, 800)], { discountCents: 1000 });
    expect(price.taxGroups).toEqual([
      { taxRateBp: 500, taxableCents: 9333, taxCents: 467 },
      { taxRateBp: 800, taxableCents: 4667, taxCents: 373 },
    ]);
    expect(price).toMatchObject({ discountCents: 1000, subtotalCents: 14000, taxCents: 840, totalCents: 14840 });
    expect(price.summary).toEqual([
      'discount on $150.00 = −$10.00',
      'tax 5% on $93.33 = $4.67',
      'tax 8% on $46.67 = $3.73',
    ]);
  });

  it('spreads a share discount over two tax groups by largest remainder (worked example)', () => {
    // 19.99 at 6 % and 10.00 at 8.25 % = 29.99; 10 % of it is 2.999 → 3.00 (half-up). Exact shares 1.99966… and
    // 1.00033…; rounded down 1.99 + 1.00, the cent left to the larger remainder: 2.00 and 1.00.
    // Tax: 17.99 × 6 % = 1.0794 → 1.08; 9.00 × 8.25 % = 0.7425 → 0.74. Total 26.99 + 1.82 = 28.81.
    const price = priceInvoice([taxed(1999, 600), taxed(1000, 825)], { discountBp: 1000 });
    expect(price.taxGroups).toEqual([
      { taxRateBp: 600, taxableCents: 1799, taxCents: 108 },
      { taxRateBp: 825, taxableCents: 900, taxCents: 74 },
    ]);
    expect(price).toMatchObject({ discountCents: 300, subtotalCents: 2699, taxCents: 182, totalCents: 2881 });
  });

  it('groups lines by rate, lowest rate first, whatever order they come in', () => {
    const price = priceInvoice([taxed(1000, 825), taxed(500, 0), taxed(2000, 825)], null);
    expect(price.taxGroups.map((group) => [group.taxRateBp, group.taxableCents])).toEqual([
      [0, 500],
      [825, 3000],
    ]);
  });

  it('reads an empty discount field as no discount, and prices in the currency given', () => {
    expect(priceInvoice([taxed(1000)], { discountBp: undefined, discountCents: 250 }).discountCents).toBe(250);
    expect(priceInvoice([taxed(1000)], { discountBp: null } as never).discountCents).toBe(0);
    expect(priceInvoice([taxed(1000)], { discountBp: 0 }).summary).toEqual(['tax 8.25% on $10.00 = $0.83']);
    expect(priceInvoice([taxed(1000)], null, 'EUR').summary).toEqual(['tax 8.25% on €10.00 = €0.83']);
  });

  it('counts a ticket discount line (negative) in its group', () => {
    const price = priceInvoice([taxed(5000), taxed(-500)], null);
    expect(price.taxGroups[0]).toEqual({ taxRateBp: 825, taxableCents: 4500, taxCents: 371 });
  });

  it('refuses what cannot be an invoice, naming the field', () => {
    const refused = (run: () => unknown) => {
      try {
        run();
      } catch (error) {
        return isRuleError(error) ? error.field : 'not a rule error';
      }
      return 'accepted';
    };
    expect(refused(() => priceInvoice([], null))).toBe('lines');
    expect(refused(() => priceInvoice([taxed(100)], { discountCents: 101 }))).toBe('discountCents');
    expect(refused(() => priceInvoice([taxed(100)], { discountBp: 10001 }))).toBe('discountBp');
    expect(refused(() => priceInvoice([taxed(100)], { discountBp: 1, discountCents: 1 }))).toBe('discount');
    expect(refused(() => priceInvoice([taxed(1.5)], null))).toBe('lines[0].amountCents');
    expect(refused(() => priceInvoice([taxed(100, -1)], null))).toBe('lines[0].taxRateBp');
    expect(refused(() => priceInvoice([{ amountCents: 1, taxable: 'yes' } as never], null))).toBe('lines[0].taxable');
    expect(refused(() => priceInvoice([taxed(100), taxed(-200)], null))).toBe('lines');
    expect(refused(() => priceInvoice([taxed(100)], { discountCents: -1 }))).toBe('discountCents');
    expect(refused(() => priceInvoice([taxed(100)], { discountBp: -1 }))).toBe('discountBp');
    expect(refused(() => priceInvoice([taxed(100)], { discountBp: 12.5 }))).toBe('discountBp');
    expect(refused(() => priceInvoice([taxed(100)], null, 'usd'))).toBe('currency');
    expect(refused(() => priceInvoice(null as never, null))).toBe('lines');
    expect(
      refused(() =>
        priceInvoice(
          Array.from({ length: 1001 }, () => taxed(1)),
          null,
        ),
      ),
    ).toBe('lines');
    expect(refused(() => priceInvoice([null as never], null))).toBe('lines[0].amountCents');
    expect(refused(() => priceInvoice([taxed(MONEY_MAX_CENTS), taxed(1)], null))).toBe('lines');
  });

  it('refuses a tax group that adds up to less than zero even when the invoice as a whole does not', () => {
    // A discount line at 8.25 % with no 8.25 % lines to take off from would make negative tax.
    expect(() => priceInvoice([taxed(5000, 500), taxed(-200, 825)], null)).toThrow(
      'The lines taxed at 8.25% add up to less than zero (-$2.00)',
    );
    expect(() => priceInvoice([taxed(5000), { amountCents: -1, taxable: false, taxRateBp: 0 }], null)).toThrow(
      /not taxed add up to less than zero/,
    );
  });
});

describe('spreadCents', () => {
  it('is the largest remainder (Hamilton) split: floor or ceiling of each exact quota, summing to the total', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 1_000_000 }),
        fc.array(fc.integer({ min: 0, max: 100_000 }), { minLength: 1, maxLength: 6 }),
        (total, weights) => {
          const whole = weights.reduce((a, b) => a + b, 0);
          const shares = spreadCents(total, weights);
          if (whole === 0) {
            expect(shares.every((share) => share === 0)).toBe(true);
            return;
          }
          expect(shares.reduce((a, b) => a + b, 0)).toBe(total);
          const quota = weights.map((weight) => (total * weight) / whole);
          shares.forEach((share, i) => expect([Math.floor(quota[i]!), Math.ceil(quota[i]!)]).toContain(share));
          // Every share rounded up had a remainder at least as large as every share rounded down.
          const remainder = (i: number) => quota[i]! - Math.floor(quota[i]!);
          const up = shares.flatMap((share, i) => (share > Math.floor(quota[i]!) ? [remainder(i)] : []));
          const down = shares.flatMap((share, i) =>
            share === Math.floor(quota[i]!) && remainder(i) > 0 ? [remainder(i)] : [],
          );
          if (up.length > 0 && down.length > 0) expect(Math.min(...up)).toBeGreaterThanOrEqual(Math.max(...down));
        },
      ),
    );
  });

  it('splits 1.00 over three equal weights as 34, 33, 33 (ties to the earlier weight)', () => {
    expect(spreadCents(100, [1, 1, 1])).toEqual([34, 33, 33]);
  });

  it('stays exact when total × weight passes 2^53', () => {
    // Quotas 999 999 996.000000003 and 2.999999997: floors 999 999 996 + 2, the cent left to the second.
    expect(spreadCents(999_999_999, [999_999_997, 3])).toEqual([999_999_996, 3]);
  });

  it('gives nothing to spread over weights of zero, and refuses negative or fractional input', () => {
    expect(spreadCents(500, [0, 0])).toEqual([0, 0]);
    expect(() => spreadCents(-1, [1])).toThrow(/zero or more/);
    expect(() => spreadCents(1, [1, -1])).toThrow(/zero or more/);
    expect(() => spreadCents(1.5, [1])).toThrow(/zero or more/);
  });
});
