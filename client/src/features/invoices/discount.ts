import { BASIS_POINTS_PER_WHOLE, isRuleError, parseMoney } from '@keenroute/shared';
import { money } from './labels';
import type { DiscountInput } from './types';

export type DiscountMode = 'none' | 'percent' | 'amount';

export interface DiscountFields {
  mode: DiscountMode;
  /** "10" or "7.5" for a share, "12.50" for an amount, as typed. */
  value: string;
}

/**
 * Reads the discount fields as the API takes them: a share in basis points or an amount in cents. Errors are the
 * words shown under the field. The invoice's lines total, when known, caps an amount (the server checks it too).
 */
export function readDiscount(
  fields: DiscountFields,
  currency: string,
  linesCents?: number,
): { input: DiscountInput } | { error: string } {
  if (fields.mode === 'none') return { input: {} };
  const text = fields.value.trim();
  if (fields.mode === 'percent') {
    if (!/^\d+(\.\d{1,2})?$/.test(text)) return { error: 'Write the discount as a share like 10 or 7.5.' };
    const discountBp = Math.round(Number(text) * 100);
    if (discountBp <= 0) return { error: 'A discount must be more than 0%.' };
    if (discountBp > BASIS_POINTS_PER_WHOLE) return { error: 'A discount cannot be more than 100%.' };
    return { input: { discountBp } };
  }
  let discountCents: number;
  try {
    discountCents = parseMoney(text, currency, 'The discount');
  } catch (error) {
    if (isRuleError(error)) return { error: error.message };
    throw error;
  }
  if (discountCents <= 0) return { error: 'A discount must be more than zero.' };
  if (linesCents !== undefined && discountCents > linesCents) {
    return { error: `That is more than the lines come to (${money(linesCents, currency)}).` };
  }
  return { input: { discountCents } };
}

/** The fields that show an invoice's discount as it is now. */
export function discountFieldsOf(
  invoice: { discountBp: number; discountCents: number },
  digits: number,
): DiscountFields {
  if (invoice.discountBp > 0) return { mode: 'percent', value: String(invoice.discountBp / 100) };
  if (invoice.discountCents > 0) {
    return { mode: 'amount', value: (invoice.discountCents / 10 ** digits).toFixed(digits) };
  }
  return { mode: 'none', value: '' };
}
