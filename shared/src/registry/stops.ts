import { RuleError, shown } from '../errors.js';

/** Kinds of places a route visits. */
export const STOP_KINDS = ['salon', 'barbershop', 'grooming-shop', 'school', 'clinic', 'other'] as const;
export type StopKind = (typeof STOP_KINDS)[number];

export const STOP_KIND_LABELS: Readonly<Record<StopKind, string>> = {
  salon: 'salon',
  barbershop: 'barbershop',
  'grooming-shop': 'grooming shop',
  school: 'school',
  clinic: 'clinic',
  other: 'other',
};

/** Who an invoice goes to: each customer pays for their own shears, or the stop pays for everyone's. */
export const BILLING_MODES = ['customer', 'stop'] as const;
export type BillingMode = (typeof BILLING_MODES)[number];

/** Cadence limits in weeks. */
export const CADENCE_WEEKS_MIN = 1;
export const CADENCE_WEEKS_MAX = 52;

/**
 * Starting cadence for a new stop of each kind, in weeks. Salons 6 to 10 weeks and grooming shops 4 to 6 (coated dog
 * hair dulls an edge faster): common practice, no published source; the rest are our own middle-of-the-road choices.
 */
export const DEFAULT_CADENCE_WEEKS: Readonly<Record<StopKind, number>> = {
  salon: 8,
  barbershop: 6,
  'grooming-shop': 5,
  school: 6,
  clinic: 8,
  other: 8,
};

export const isStopKind = (value: unknown): value is StopKind =>
  typeof value === 'string' && (STOP_KINDS as readonly string[]).includes(value);

export const isBillingMode = (value: unknown): value is BillingMode =>
  typeof value === 'string' && (BILLING_MODES as readonly string[]).includes(value);

export function validateCadence(value: unknown, field = 'cadenceWeeks'): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < CADENCE_WEEKS_MIN || value > CADENCE_WEEKS_MAX) {
    throw new RuleError(
      'invalid-cadence',
      `Cadence is a whole number of weeks from ${CADENCE_WEEKS_MIN} to ${CADENCE_WEEKS_MAX}; got ${shown(value)}.`,
      field,
    );
  }
  return value;
}
