import { describe, expect, it } from 'vitest';
import { discountFieldsOf, readDiscount } from './discount';

describe('reading the discount fields', () => {
  it('takes a share as basis points and an amount as cents', () => {
    expect(readDiscount({ mode: 'percent', value: '7.5' }, 'USD')).toEqual({ input: { discountBp: 750 } });
    expect(readDiscount({ mode: 'percent', value: '100' }, 'USD')).toEqual({ input: { discountBp: 10000 } });
    expect(readDiscount({ mode: 'amount', value: '12.50' }, 'USD')).toEqual({ input: { discountCents: 1250 } });
    expect(readDiscount({ mode: 'none', value: '12' }, 'USD')).toEqual({ input: {} });
  });

  it('refuses what the API would', () => {
    expect(readDiscount({ mode: 'percent', value: '100.01' }, 'USD')).toEqual({
      error: 'A discount cannot be more than 100%.',
    });
    expect(readDiscount({ mode: 'percent', value: '0' }, 'USD')).toEqual({ error: 'A discount must be more than 0%.' });
    expect(readDiscount({ mode: 'percent', value: '5.125' }, 'USD')).toHaveProperty('error');
    expect(readDiscount({ mode: 'amount', value: '80.01' }, 'USD', 8000)).toEqual({
      error: 'That is more than the lines come to ($80.00).',
    });
    expect(readDiscount({ mode: 'amount', value: '1.234' }, 'USD')).toHaveProperty('error');
  });

  it('shows the invoice’s discount as it is', () => {
    expect(discountFieldsOf({ discountBp: 1250, discountCents: 0 }, 2)).toEqual({ mode: 'percent', value: '12.5' });
    expect(discountFieldsOf({ discountBp: 0, discountCents: 500 }, 2)).toEqual({ mode: 'amount', value: '5.00' });
    expect(discountFieldsOf({ discountBp: 0, discountCents: 0 }, 2)).toEqual({ mode: 'none', value: '' });
  });
});
