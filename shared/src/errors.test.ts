import { describe, expect, it } from 'vitest';
import { RULE_ERROR_CODES, RuleError, isRuleError, shown } from './errors.js';
import { LIMITS, TAX_RATE_MAX_BP, TAX_RATE_MIN_BP } from './limits.js';

describe('RuleError', () => {
  it('carries a code, a message for a person and the field', () => {
    const error = new RuleError('invalid-length', 'Shear length must be between 3 and 12 inches; got 2.', 'lengthIn');
    expect(error).toBeInstanceOf(Error);
    expect(isRuleError(error)).toBe(true);
    expect(isRuleError(new Error('other'))).toBe(false);
    expect([error.code, error.field, error.name]).toEqual(['invalid-length', 'lengthIn', 'RuleError']);
    expect(new Set(RULE_ERROR_CODES).size).toBe(RULE_ERROR_CODES.length);
  });

  it('quotes untrusted values readably', () => {
    expect(shown('hollow')).toBe('hollow');
    expect(shown(6.1)).toBe('6.1');
    expect(shown(undefined)).toBe('undefined');
    expect(shown(null)).toBe('null');
    expect(shown({ kind: 'wax' })).toBe('{"kind":"wax"}');
    expect(shown(() => 1)).toBe('function');
    const loop: Record<string, unknown> = {};
    loop.self = loop;
    expect(shown(loop)).toBe('object');
  });
});

describe('limits', () => {
  it('gathers the same numbers in one object', () => {
    expect(LIMITS.taxRateMinBp).toBe(TAX_RATE_MIN_BP);
    expect(LIMITS.taxRateMaxBp).toBe(TAX_RATE_MAX_BP);
    expect(LIMITS.priceMaxCents).toBeLessThan(LIMITS.moneyMaxCents);
  });
});
