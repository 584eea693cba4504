import { RuleError, shown } from './errors.js';
import { MONEY_MAX_CENTS, TAX_RATE_MAX_BP, TAX_RATE_MIN_BP } from './limits.js';

/** Money is always an integer count of the currency's minor unit ("cents"), never a float of dollars. */
export type Cents = number;

/** One basis point is 1/100 of a per cent; 10 000 bp is the whole. */
export const BASIS_POINTS_PER_WHOLE = 10_000;

export const DEFAULT_CURRENCY = 'USD';
export const DEFAULT_LOCALE = 'en-US';

export function isCents(value: unknown): value is Cents {
  return Number.isSafeInteger(value) && Math.abs(value as number) <= MONEY_MAX_CENTS;
}

/** Returns the amount if it is whole cents within [min, max]; otherwise a RuleError naming the field. */
export function assertCents(value: unknown, field = 'amount', bounds: { min?: number; max?: number } = {}): Cents {
  const min = bounds.min ?? 0;
  const max = bounds.max ?? MONEY_MAX_CENTS;
  if (!Number.isSafeInteger(value)) {
    throw new RuleError('invalid-money', `${field} must be a whole number of cents; got ${String(value)}.`, field);
  }
  if ((value as number) < min || (value as number) > max) {
    throw new RuleError(
      'invalid-money',
      `${field} must be between ${min} and ${max} cents; got ${shown(value)}.`,
      field,
    );
  }
  return value as number;
}

export function sumCents(amounts: readonly Cents[]): Cents {
  return amounts.reduce((total, amount) => total + amount, 0);
}

/** `cents × bp / 10 000` rounded to the cent, halves rounded up (towards +∞), in exact integer arithmetic. */
export function applyBasisPoints(cents: Cents, basisPoints: number): Cents {
  assertCents(cents, 'amount', { min: -MONEY_MAX_CENTS });
  if (!Number.isSafeInteger(basisPoints) || Math.abs(basisPoints) > BASIS_POINTS_PER_WHOLE) {
    throw new RuleError('invalid-money', `A rate must be whole basis points up to 10000; got ${basisPoints}.`);
  }
  return Math.floor((cents * basisPoints + BASIS_POINTS_PER_WHOLE / 2) / BASIS_POINTS_PER_WHOLE);
}

export function validateTaxRateBp(value: unknown, field = 'taxRateBp'): number {
  if (!Number.isSafeInteger(value) || (value as number) < TAX_RATE_MIN_BP || (value as number) > TAX_RATE_MAX_BP) {
    throw new RuleError(
      'invalid-tax-rate',
      `Tax rate must be whole basis points from ${TAX_RATE_MIN_BP} to ${TAX_RATE_MAX_BP} (825 means 8.25 %); got ${String(value)}.`,
      field,
    );
  }
  return value as number;
}

/** Tax on a taxable total, rounded half-up to the cent. */
export function taxCents(taxableCents: Cents, taxRateBp: number): Cents {
  assertCents(taxableCents, 'taxable amount');
  return applyBasisPoints(taxableCents, validateTaxRateBp(taxRateBp));
}

export function validateCurrency(value: unknown, field = 'currency'): string {
  if (typeof value !== 'string' || !/^[A-Z]{3}$/.test(value)) {
    throw new RuleError(
      'invalid-currency',
      `Currency must be a three-letter ISO 4217 code like USD; got ${String(value)}.`,
      field,
    );
  }
  return value;
}

const formatters = new Map<string, Intl.NumberFormat>();

function currencyFormatter(currency: string, locale: string): Intl.NumberFormat {
  const key = `${locale}|${currency}`;
  let formatter = formatters.get(key);
  if (!formatter) {
    formatter = new Intl.NumberFormat(locale, { style: 'currency', currency: validateCurrency(currency) });
    formatters.set(key, formatter);
  }
  return formatter;
}

const digitsByCurrency = new Map<string, number>();

/** How many decimals the currency's minor unit has (2 for USD, 0 for JPY), as Intl knows it; kept per currency
 * because resolvedOptions() allocates on every call and invoices ask for it per line. */
export function currencyDigits(currency: string): number {
  let digits = digitsByCurrency.get(currency);
  if (digits === undefined) {
    digits = currencyFormatter(currency, DEFAULT_LOCALE).resolvedOptions().maximumFractionDigits ?? 2;
    digitsByCurrency.set(currency, digits);
  }
  return digits;
}

/** 4250 → "$42.50"; for display only, never for arithmetic. */
export function formatMoney(cents: Cents, currency = DEFAULT_CURRENCY, locale = DEFAULT_LOCALE): string {
  assertCents(cents, 'amount', { min: -MONEY_MAX_CENTS });
  const formatter = currencyFormatter(currency, locale);
  return formatter.format(cents / 10 ** currencyDigits(currency));
}

/** Reads "42", "42.5" or "42.50" (a form field, in major units) as cents; more decimals than the currency has is an error. */
export function parseMoney(text: string, currency = DEFAULT_CURRENCY, field = 'amount'): Cents {
  const digits = currencyDigits(currency);
  const match = /^\s*(\d+)(?:\.(\d*))?\s*$/.exec(text);
  const fraction = match?.[2] ?? '';
  if (!match || fraction.length > digits) {
    const example = digits > 0 ? `42.${'5'.padEnd(digits, '0')}` : '42';
    throw new RuleError('invalid-money', `${field} must be an amount like ${example}; got "${text}".`, field);
  }
  const cents = Number(match[1]) * 10 ** digits + Number(fraction.padEnd(digits, '0') || '0');
  return assertCents(cents, field);
}

const percentFormatters = new Map<string, Intl.NumberFormat>();

/** 825 → "8.25%". */
export function formatBasisPoints(basisPoints: number, locale = DEFAULT_LOCALE): string {
  let formatter = percentFormatters.get(locale);
  if (!formatter) {
    formatter = new Intl.NumberFormat(locale, { style: 'percent', maximumFractionDigits: 2 });
    percentFormatters.set(locale, formatter);
  }
  return formatter.format(basisPoints / BASIS_POINTS_PER_WHOLE);
}
