import { isRuleError } from '@keenroute/shared';
import { isEmail } from 'class-validator';
import { BIDI_CONTROL_MESSAGE, hasBidiControl } from '../../common/validation/unsafe-input';
import type { CsvRecord } from '../import-kinds';

/** One problem in one row; the column is null when it concerns the whole row. */
export interface CellProblem {
  column: string | null;
  message: string;
}

/** What reading one row gave: a clean draft when every cell was good, and the problems found. */
export interface RowRead<Draft> {
  draft: Draft | null;
  problems: CellProblem[];
}

const TRUE_WORDS = new Set(['yes', 'true', '1']);
const FALSE_WORDS = new Set(['no', 'false', '0', '']);

// A file names the same few hundred e-mails thousands of times; the validator's check is the costliest per cell.
const checkedEmails = new Map<string, boolean>();
function looksLikeEmail(value: string): boolean {
  let known = checkedEmails.get(value);
  if (known === undefined) {
    if (checkedEmails.size >= 10_000) checkedEmails.clear();
    known = isEmail(value);
    checkedEmails.set(value, known);
  }
  return known;
}

/** "Grooming shop" and "grooming_shop" read as "grooming-shop": spreadsheets rarely keep the exact spelling. */
export const asCode = (text: string): string =>
  text
    .trim()
    .toLowerCase()
    .replace(/[\s_]+/g, '-');

/** Reads one CSV row cell by cell, collecting every problem instead of stopping at the first. */
export class RowReader {
  readonly problems: CellProblem[] = [];

  constructor(private readonly record: CsvRecord) {}

  problem(column: string | null, message: string): void {
    this.problems.push({ column, message });
  }

  raw(column: string): string {
    return (this.record[column] ?? '').trim();
  }

  /** Text up to `max` characters; '' when empty unless required. */
  text(column: string, max: number, required = false): string {
    const value = this.raw(column);
    if (required && value === '') this.problem(column, `${column} is required.`);
    else if (value.length > max)
      this.problem(column, `${column} is at most ${max} characters; this one has ${value.length}.`);
    else if (hasBidiControl(value)) this.problem(column, BIDI_CONTROL_MESSAGE);
    return value;
  }

  /** Text up to `max` characters, or null when the cell is empty. */
  optionalText(column: string, max: number): string | null {
    const value = this.text(column, max);
    return value === '' ? null : value;
  }

  email(column: string, required = false): string | null {
    const value = this.text(column, 254, required);
    if (value === '') return null;
    if (!looksLikeEmail(value)) {
      this.problem(column, `"${value}" is not an e-mail address.`);
      return null;
    }
    return value.toLowerCase();
  }

  /** One of a list of codes; an empty cell gives the fallback (or a problem when there is none). */
  choice<T extends string>(column: string, list: readonly T[], fallback?: T): T | undefined {
    const value = asCode(this.raw(column));
    if (value === '') {
      if (fallback === undefined) this.problem(column, `${column} is required: one of ${list.join(', ')}.`);
      return fallback;
    }
    if ((list as readonly string[]).includes(value)) return value as T;
    this.problem(column, `${column} must be one of ${list.join(', ')}; got "${this.raw(column)}".`);
    return undefined;
  }

  /** A number, or null when the cell is empty; NaN (with a problem) when it is not one. */
  number(column: string): number | null {
    const value = this.raw(column);
    if (value === '') return null;
    const parsed = /^[-+]?(\d+\.?\d*|\.\d+)$/.test(value) ? Number(value) : Number.NaN;
    if (Number.isNaN(parsed)) this.problem(column, `${column} must be a number; got "${value}".`);
    return parsed;
  }

  /** yes/no, true/false or 1/0; empty means no. */
  flag(column: string): boolean {
    const value = this.raw(column).toLowerCase();
    if (TRUE_WORDS.has(value)) return true;
    if (!FALSE_WORDS.has(value)) this.problem(column, `${column} must be yes or no; got "${this.raw(column)}".`);
    return false;
  }

  /** Runs a rule from the shared package, turning its RuleError into a problem on the column. */
  rule<T>(column: string, check: () => T): T | undefined {
    try {
      return check();
    } catch (error) {
      if (!isRuleError(error)) throw error;
      this.problem(column, error.message);
      return undefined;
    }
  }

  /** The draft when no problem was found, so a row is either wholly good or reported. */
  result<Draft>(build: () => Draft): RowRead<Draft> {
    return { draft: this.problems.length === 0 ? build() : null, problems: this.problems };
  }
}
