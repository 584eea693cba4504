import { describe, expect, it } from 'vitest';
import { RuleError, isRuleError } from './errors.js';
import { LENGTH_MAX_IN, LENGTH_MIN_IN, LENGTH_STEP_IN, LIMITS } from './limits.js';
import {
  EDGE_TYPES,
  TOOL_KINDS,
  describeShear,
  isEdgeType,
  isHandedness,
  isShearUse,
  isToolKind,
  isToothed,
  isValidLength,
  validateLength,
  validateShear,
} from './shears.js';

function errorOf(run: () => unknown): RuleError {
  try {
    run();
  } catch (error) {
    if (isRuleError(error)) return error;
    throw error;
  }
  throw new Error('expected a RuleError');
}

describe('shear lengths', () => {
  it('takes quarter-inch steps from 3 to 12 inches', () => {
    expect([LENGTH_MIN_IN, LENGTH_MAX_IN, LENGTH_STEP_IN]).toEqual([3, 12, 0.25]);
    expect(LIMITS.lengthMinIn).toBe(3);
    for (const length of [3, 5.25, 6.5, 7.75, 12]) expect(validateLength(length)).toBe(length);
    expect(isValidLength(6.75)).toBe(true);
    expect(isValidLength(6.3)).toBe(false);
    expect(isValidLength('6')).toBe(false);
  });

  it('explains a length outside the range or off the quarter inch', () => {
    const tooShort = errorOf(() => validateLength(2.75));
    expect(tooShort.code).toBe('invalid-length');
    expect(tooShort.message).toBe('Shear length must be between 3 and 12 inches; got 2.75.');
    expect(tooShort.field).toBe('lengthIn');
    expect(errorOf(() => validateLength(12.25)).message).toContain('between 3 and 12');
    expect(errorOf(() => validateLength(6.1)).message).toContain('quarter inches');
    expect(errorOf(() => validateLength(Number.NaN)).message).toBe('Shear length must be a number of inches.');
    expect(errorOf(() => validateLength('6.5')).code).toBe('invalid-length');
  });
});

describe('validateShear', () => {
  const good = { edgeType: 'convex', toolKind: 'straight', lengthIn: 6.5, handedness: 'left' };

  it('returns a clean copy without unknown fields', () => {
    expect(validateShear({ ...good, colour: 'red' })).toEqual(good);
    expect(validateShear({ ...good, use: 'grooming' })).toEqual({ ...good, use: 'grooming' });
  });

  it('names the wrong field in a person-readable message', () => {
    expect(errorOf(() => validateShear(null)).code).toBe('invalid-ticket');
    const edge = errorOf(() => validateShear({ ...good, edgeType: 'hollow' }));
    expect(edge.code).toBe('invalid-edge-type');
    expect(edge.field).toBe('shear.edgeType');
    expect(edge.message).toBe('Edge type must be one of beveled, convex, semi-convex, serrated; got hollow.');
    expect(errorOf(() => validateShear({ ...good, toolKind: 'razor' })).code).toBe('invalid-tool-kind');
    expect(errorOf(() => validateShear({ ...good, lengthIn: 13 })).field).toBe('shear.lengthIn');
    expect(errorOf(() => validateShear({ ...good, handedness: 'both' })).code).toBe('invalid-handedness');
    expect(errorOf(() => validateShear({ ...good, use: 'wool' })).code).toBe('invalid-use');
    const nested = errorOf(() => validateShear({ ...good, lengthIn: 2 }, 'lines[3].shear'));
    expect(nested.field).toBe('lines[3].shear.lengthIn');
    expect(nested.name).toBe('RuleError');
    expect(nested).toBeInstanceOf(Error);
  });

  it('knows the trade terms and the toothed kinds', () => {
    expect(EDGE_TYPES.every(isEdgeType)).toBe(true);
    expect(TOOL_KINDS.every(isToolKind)).toBe(true);
    expect(isEdgeType('hollow')).toBe(false);
    expect(isHandedness('left')).toBe(true);
    expect(isShearUse('grooming')).toBe(true);
    expect(TOOL_KINDS.filter(isToothed)).toEqual(['thinning', 'blending', 'chunker']);
  });

  it('describes a shear in words', () => {
    expect(describeShear({ edgeType: 'convex', toolKind: 'straight', lengthIn: 6.5, handedness: 'left' })).toBe(
      'convex straight shear, 6.5 in, left-handed',
    );
    expect(
      describeShear({ edgeType: 'beveled', toolKind: 'chunker', lengthIn: 7, handedness: 'right', use: 'grooming' }),
    ).toBe('beveled chunker, 7 in, grooming');
  });
});
