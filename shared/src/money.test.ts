import { dinero, halfUp, multiply, toSnapshot, transformScale } from 'dinero.js';
import { USD } from 'dinero.js/currencies';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { TAX_RATE_MAX_BP } from './limits.js';
import {
  applyBasisPoints,
  assertCents,
  currencyDigits,
  formatBasisPoints,
  formatMoney,
  isCents,
  parseMoney,
  sumCents,
  taxCents,
  validateCurrency,
  validateTaxRateBp,
} from './money.js';

function dineroBasisPoints(cents: number, basisPoints: number): number {
  const product = multiply(dinero({ amount: cents, currency: USD }), { amount: basisPoints, scale: 4 });
  return toSnapshot(transformScale(product, 2, halfUp)).amount;
}

describe('cents', () => {
  it('accepts whole cents only, inside the bounds', () => {
    expect(isCents(4200)).toBe(true);
    expect(isCents(42.5)).toBe(false);
    expect(isCents('4200')).toBe(false);
    expect(assertCents(0)).toBe(0);
    expect(() => assertCents(-1, 'base')).toThrow('base must be between 0 and 1000000000 cents; got -1.');
    expect(() => assertCents(12.5, 'base')).toThrow('base must be a whole number of cents; got 12.5.');
    expect(assertCents(-5, 'change', { min: -10 })).toBe(-5);
    expect(() => assertCents(11, 'tip', { max: 10 })).toThrow('between 0 and 10');
    expect(sumCents([4200, 500, 1500])).toBe(6200);
    expect(sumCents([])).toBe(0);
  });
});

describe('basis points and tax, half-up to the cent', () => {
  it('rounds halves up, worked by hand', () => {
    expect(taxCents(13_800, 825)).toBe(1139); // 1138.5 → 1139
    expect(taxCents(10_000, 825)).toBe(825);
    expect(taxCents(1, 2500)).toBe(0); // 0.25 → 0
    expect(taxCents(2, 2500)).toBe(1); // 0.5 → 1
    expect(applyBasisPoints(15_010, 500)).toBe(751); // 750.5 → 751
    expect(applyBasisPoints(15_009, 500)).toBe(750); // 750.45 → 750
    expect(applyBasisPoints(-3, 5000)).toBe(-1); // -1.5 → -1, towards +∞
    expect(taxCents(0, 825)).toBe(0);
  });

  it('refuses tax rates outside the range and amounts that are not cents', () => {
    expect(() => taxCents(100, 3001)).toThrow('Tax rate must be whole basis points from 0 to 3000');
    expect(() => validateTaxRateBp(8.25)).toThrow('825 means 8.25 %');
    expect(validateTaxRateBp(0)).toBe(0);
    expect(() => taxCents(-100, 825)).toThrow('taxable amount must be between');
    expect(() => applyBasisPoints(100, 10_001)).toThrow('whole basis points up to 10000');
  });

  it('agrees with dinero.js halfUp on any amount and rate', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1_000_000_000 }), fc.integer({ min: 0, max: 10_000 }), (cents, bp) => {
        expect(applyBasisPoints(cents, bp)).toBe(dineroBasisPoints(cents, bp));
      }),
    );
  });

  it('stays within half a cent of the exact product', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 1_000_000_000 }),
        fc.integer({ min: 0, max: TAX_RATE_MAX_BP }),
        (cents, bp) => {
          expect(Math.abs(taxCents(cents, bp) - (cents * bp) / 10_000)).toBeLessThanOrEqual(0.5);
        },
      ),
    );
  });
});

describe('money for display and forms', () => {
  it('formats cents in the currency and locale', () => {
    expect(formatMoney(4250)).toBe('$42.50');
    expect(formatMoney(123_456, 'USD', 'en-US')).toBe('$1,234.56');
    expect(formatMoney(-500)).toBe('-$5.00');
    expect(formatMoney(4250, 'EUR', 'de-DE')).toBe('42,50\u00a0€');
    expect(formatMoney(4250, 'JPY', 'en-US')).toBe('¥4,250');
    expect(currencyDigits('JPY')).toBe(0);
    expect(() => formatMoney(42.5)).toThrow('whole number of cents');
    expect(() => formatMoney(100, 'usd')).toThrow('three-letter ISO 4217 code');
    expect(validateCurrency('CAD')).toBe('CAD');
  });

  it('reads a form amount as cents', () => {
    expect(parseMoney('42')).toBe(4200);
    expect(parseMoney('42.5')).toBe(4250);
    expect(parseMoney(' 42.05 ')).toBe(4205);
    expect(parseMoney('42.')).toBe(4200);
    expect(parseMoney('4250', 'JPY')).toBe(4250);
    expect(() => parseMoney('42.505')).toThrow('amount must be an amount like 42.50; got "42.505".');
    expect(() => parseMoney('42.5', 'JPY', 'price')).toThrow('price must be an amount like 42; got "42.5".');
    expect(() => parseMoney('-3')).toThrow();
    expect(() => parseMoney('99999999999')).toThrow('between 0 and 1000000000');
  });

  it('formats basis points as a percentage', () => {
    expect(formatBasisPoints(825)).toBe('8.25%');
    expect(formatBasisPoints(500)).toBe('5%');
  });
});
