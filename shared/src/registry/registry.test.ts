import { describe, expect, it } from 'vitest';
import { isRuleError } from '../errors.js';
import { isShearStatus } from './shear-status.js';
import {
  BILLING_MODES,
  DEFAULT_CADENCE_WEEKS,
  isBillingMode,
  isStopKind,
  STOP_KINDS,
  validateCadence,
} from './stops.js';
import { formatTagCode, isTagCode, normalizeTagCode } from './tag-codes.js';

describe('tag codes', () => {
  it('are KR- and a six-digit serial, growing past six digits instead of wrapping', () => {
    expect(formatTagCode(1)).toBe('KR-000001');
    expect(formatTagCode(123)).toBe('KR-000123');
    expect(formatTagCode(999_999)).toBe('KR-999999');
    expect(formatTagCode(1_000_000)).toBe('KR-1000000');
    expect(() => formatTagCode(0)).toThrow(RangeError);
    expect(() => formatTagCode(1.5)).toThrow(RangeError);
  });

  it('are read the way people type them', () => {
    for (const typed of ['KR-000123', 'kr-000123', 'kr 123', 'KR123', '000123', ' 123 ']) {
      expect(normalizeTagCode(typed)).toBe('KR-000123');
    }
    expect(normalizeTagCode('KR-0')).toBeUndefined();
    expect(normalizeTagCode('convex')).toBeUndefined();
    expect(normalizeTagCode('')).toBeUndefined();
  });

  it('are recognised', () => {
    expect(isTagCode('KR-000123')).toBe(true);
    expect(isTagCode('KR-12')).toBe(false);
    expect(isTagCode(123)).toBe(false);
  });
});

describe('stops', () => {
  it('start salons at 6-10 weeks and grooming shops at 4-6 (common practice, no published source)', () => {
    expect(DEFAULT_CADENCE_WEEKS.salon).toBeGreaterThanOrEqual(6);
    expect(DEFAULT_CADENCE_WEEKS.salon).toBeLessThanOrEqual(10);
    expect(DEFAULT_CADENCE_WEEKS['grooming-shop']).toBeGreaterThanOrEqual(4);
    expect(DEFAULT_CADENCE_WEEKS['grooming-shop']).toBeLessThanOrEqual(6);
    for (const kind of STOP_KINDS) expect(validateCadence(DEFAULT_CADENCE_WEEKS[kind])).toBeGreaterThan(0);
  });

  it('refuse a cadence outside 1 to 52 whole weeks', () => {
    for (const bad of [0, 53, 2.5, '6', null]) {
      try {
        validateCadence(bad);
        throw new Error('accepted');
      } catch (error) {
        expect(isRuleError(error) && error.code === 'invalid-cadence' && error.field === 'cadenceWeeks').toBe(true);
      }
    }
  });

  it('know their kinds, billing modes and shear statuses', () => {
    expect(STOP_KINDS.every(isStopKind)).toBe(true);
    expect(isStopKind('spa')).toBe(false);
    expect(BILLING_MODES.every(isBillingMode)).toBe(true);
    expect(isBillingMode('monthly')).toBe(false);
    expect(isShearStatus('lost')).toBe(true);
    expect(isShearStatus('broken')).toBe(false);
  });
});
