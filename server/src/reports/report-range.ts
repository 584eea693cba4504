import { addDays } from '@keenroute/shared';
import { DomainError } from '../common/errors/domain-error';
import type { ReportQueryDto } from './dto/report-query.dto';

/** Longest range a report answers for: the big dataset's three years and then some, without letting one ask for 500. */
export const MAX_RANGE_YEARS = 6;

export interface ReportRange {
  from: string;
  to: string;
  sharpenerId: string | null;
  /** The last day whose route days count: a planned day still ahead has drive time but no work yet. */
  routeTo: string;
}

/** The first day of the month `months` before the date's month: "2026-12-03", 11 → "2026-01-01". */
export function monthStart(day: string, monthsBack = 0): string {
  const [year, month] = day.split('-').map(Number) as [number, number];
  const index = year * 12 + (month - 1) - monthsBack;
  return `${String(Math.floor(index / 12)).padStart(4, '0')}-${String((index % 12) + 1).padStart(2, '0')}-01`;
}

/** The range a query asks for, with the defaults filled in: the twelve calendar months up to today. */
export function reportRange(query: ReportQueryDto, today: string): ReportRange {
  const to = query.to ?? today;
  const from = query.from ?? monthStart(to, 11);
  if (from > to) {
    throw new DomainError('invalid_input', `The range starts (${from}) after it ends (${to}).`, {
      from: ['from must be on or before to.'],
    });
  }
  if (addDays(from, MAX_RANGE_YEARS * 366) < to) {
    throw new DomainError('invalid_input', `A report covers at most ${MAX_RANGE_YEARS} years; shorten the range.`, {
      from: [`from must be within ${MAX_RANGE_YEARS} years of to.`],
    });
  }
  return { from, to, sharpenerId: query.sharpenerId ?? null, routeTo: to < today ? to : today };
}
