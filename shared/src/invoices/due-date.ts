import { RuleError } from '../errors.js';

const ISO_DAY = /^(\d{4})-(\d{2})-(\d{2})$/;
export const PAYMENT_TERMS_MAX_DAYS = 365;

/** The due date: the issue date plus the payment terms in calendar days (YYYY-MM-DD in, YYYY-MM-DD out). */
export function dueDate(issueDate: string, termsDays: number): string {
  const match = ISO_DAY.exec(typeof issueDate === 'string' ? issueDate : '');
  const day = match ? new Date(Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3]))) : null;
  if (!day || day.toISOString().slice(0, 10) !== issueDate) {
    throw new RuleError('invalid-date', `A date is written YYYY-MM-DD, e.g. 2026-12-03; got ${String(issueDate)}.`);
  }
  if (!Number.isSafeInteger(termsDays) || termsDays < 0 || termsDays > PAYMENT_TERMS_MAX_DAYS) {
    throw new RuleError(
      'invalid-invoice',
      `Payment terms are whole days from 0 to ${PAYMENT_TERMS_MAX_DAYS}; got ${String(termsDays)}.`,
      'termsDays',
    );
  }
  day.setUTCDate(day.getUTCDate() + termsDays);
  return day.toISOString().slice(0, 10);
}
