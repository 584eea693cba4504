/** Every reason a trade rule can refuse its input; the server maps each code to an HTTP status. */
export const RULE_ERROR_CODES = [
  'invalid-edge-type',
  'invalid-tool-kind',
  'invalid-handedness',
  'invalid-use',
  'invalid-length',
  'invalid-money',
  'invalid-currency',
  'invalid-tax-rate',
  'invalid-count',
  'invalid-grade',
  'invalid-size',
  'invalid-recipe',
  'invalid-bench-minutes',
  'invalid-rate-card',
  'invalid-ticket',
  'invalid-invoice',
  'invalid-date',
  'invalid-cadence',
  'invalid-hours',
  'invalid-time',
] as const;
export type RuleErrorCode = (typeof RULE_ERROR_CODES)[number];

/** A trade rule refused its input; `message` is written for the person who typed it. */
export class RuleError extends Error {
  override readonly name = 'RuleError';

  constructor(
    readonly code: RuleErrorCode,
    message: string,
    /** Which input was wrong, as a path a form can point at (e.g. `lines[2].shear.lengthIn`). */
    readonly field?: string,
  ) {
    super(message);
  }
}

/** An untrusted value as a message may quote it. */
export function shown(value: unknown): string {
  if (typeof value === 'string') return value;
  if (typeof value === 'number' || typeof value === 'boolean' || typeof value === 'bigint') return String(value);
  if (value === undefined || value === null) return String(value);
  try {
    return JSON.stringify(value) ?? typeof value;
  } catch {
    return typeof value;
  }
}

export function isRuleError(value: unknown): value is RuleError {
  return value instanceof RuleError;
}
