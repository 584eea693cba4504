import { currencyDigits, isRuleError, parseMoney } from '@keenroute/shared';

/** Cents as the amount field shows them: 4830 → "48.30". */
export function centsToField(cents: number, currency: string): string {
  const digits = currencyDigits(currency);
  return (cents / 10 ** digits).toFixed(digits);
}

/** Reads an amount field as cents between one cent and `maxCents`, or says what is wrong in words. */
export function readAmount(
  text: string,
  currency: string,
  maxCents: number,
  tooMuch: string,
): { cents: number } | { error: string } {
  let cents: number;
  try {
    cents = parseMoney(text, currency, 'The amount');
  } catch (error) {
    if (isRuleError(error)) return { error: error.message };
    throw error;
  }
  if (cents <= 0) return { error: 'The amount must be more than zero.' };
  if (cents > maxCents) return { error: tooMuch };
  return { cents };
}
