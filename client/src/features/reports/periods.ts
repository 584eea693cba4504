import { addDays } from '@keenroute/shared';

/** The named periods the filter bar offers; the dates themselves are worked out from today. */
export const REPORT_PERIODS = ['this-month', 'last-month', 'last-12-months', 'this-year', 'last-year'] as const;
export type ReportPeriod = (typeof REPORT_PERIODS)[number];

export const PERIOD_LABELS: Readonly<Record<ReportPeriod, string>> = {
  'this-month': 'This month',
  'last-month': 'Last month',
  'last-12-months': 'Last 12 months',
  'this-year': 'This year',
  'last-year': 'Last year',
};

export interface DayRange {
  from: string;
  to: string;
}

/** The first day of the month `monthsBack` months before the day's month: "2026-12-03", 11 → "2026-01-01". */
export function monthStart(day: string, monthsBack = 0): string {
  const [year, month] = day.split('-').map(Number) as [number, number];
  const index = year * 12 + (month - 1) - monthsBack;
  return `${String(Math.floor(index / 12)).padStart(4, '0')}-${String((index % 12) + 1).padStart(2, '0')}-01`;
}

/** A period's first and last day; periods still running end today. */
export function periodRange(period: ReportPeriod, today: string): DayRange {
  const year = Number(today.slice(0, 4));
  switch (period) {
    case 'this-month':
      return { from: monthStart(today), to: today };
    case 'last-month':
      return { from: monthStart(today, 1), to: addDays(monthStart(today), -1) };
    case 'last-12-months':
      // The twelve calendar months up to today, as the server's default range is.
      return { from: monthStart(today, 11), to: today };
    case 'this-year':
      return { from: `${year}-01-01`, to: today };
    case 'last-year':
      return { from: `${year - 1}-01-01`, to: `${year - 1}-12-31` };
  }
}

/** Which named period a range is, if any, so the filter bar can show it chosen. */
export function periodOf(range: DayRange, today: string): ReportPeriod | null {
  return (
    REPORT_PERIODS.find((period) => {
      const candidate = periodRange(period, today);
      return candidate.from === range.from && candidate.to === range.to;
    }) ?? null
  );
}

/** A real calendar day "YYYY-MM-DD" (not 2025-02-30). */
export function isCalendarDay(value: string | null): value is string {
  if (!value || !/^\d{4}-\d{2}-\d{2}$/.test(value)) return false;
  const date = new Date(`${value}T00:00:00Z`);
  return !Number.isNaN(date.getTime()) && date.toISOString().slice(0, 10) === value;
}
