import { currencyDigits, DEFAULT_CURRENCY } from '@keenroute/shared';
import Papa from 'papaparse';

export type CsvCell = string | number | null;

/** 4830 → "48.30", -1200 → "-12.00" (no decimals for a currency without a minor unit); integer arithmetic only. */
export function decimalAmount(cents: number, currency = DEFAULT_CURRENCY): string {
  const digits = currencyDigits(currency);
  const sign = cents < 0 ? '-' : '';
  const whole = Math.abs(cents);
  if (digits === 0) return `${sign}${whole}`;
  const unit = 10 ** digits;
  return `${sign}${Math.floor(whole / unit)}.${String(whole % unit).padStart(digits, '0')}`;
}

/**
 * A cell a spreadsheet would read as a formula: one starting with = + - @, a tab or a carriage return, the characters
 * OWASP lists under "CSV Injection" (https://owasp.org/www-community/attacks/CSV_Injection; also CWE-1236). papaparse's
 * escapeFormulae puts a ' before such a cell and quotes it. A plain number like -12.00 is not a formula and stays as it
 * is, so an amount column still adds up in the sheet. No g flag: papaparse calls test() once per cell.
 */
export const FORMULA_START = /^(?!-?\d+(?:\.\d+)?$)[=+\-@\t\r]/;

/** RFC 4180 CSV: a header row, CRLF line ends, quotes where needed, formula cells neutralised. */
export function toCsv(fields: readonly string[], rows: readonly CsvCell[][]): string {
  const body = Papa.unparse(
    { fields: [...fields], data: rows.map((row) => [...row]) },
    {
      newline: '\r\n',
      escapeFormulae: FORMULA_START,
    },
  );
  return `${body}\r\n`;
}
