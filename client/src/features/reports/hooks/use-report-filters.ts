import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { todayIso } from '@/features/stops/format';
import { isCalendarDay, periodRange, type DayRange } from '../periods';
import type { ReportParams } from '../types';

export interface ReportFilters {
  /** What the reports are asked for: the dates always, the sharpener when one is chosen. */
  params: ReportParams;
  today: string;
  setRange: (range: DayRange) => void;
  setSharpener: (sharpenerId: string | null) => void;
}

/**
 * The reports' dates and sharpener live in the URL (?from=&to=&sharpener=), so a reload or a shared link shows the same
 * figures. Without dates, the last 12 months; a malformed date in a link falls back to them too.
 */
export function useReportFilters(): ReportFilters {
  const [searchParams, setSearchParams] = useSearchParams();
  const today = todayIso();

  const params = useMemo<ReportParams>(() => {
    const from = searchParams.get('from');
    const to = searchParams.get('to');
    const range = isCalendarDay(from) && isCalendarDay(to) ? { from, to } : periodRange('last-12-months', today);
    const sharpenerId = searchParams.get('sharpener') ?? '';
    return sharpenerId ? { ...range, sharpenerId } : range;
  }, [searchParams, today]);

  const setRange = useCallback(
    (range: DayRange) =>
      setSearchParams((previous) => {
        const next = new URLSearchParams(previous);
        next.set('from', range.from);
        next.set('to', range.to);
        return next;
      }),
    [setSearchParams],
  );

  const setSharpener = useCallback(
    (sharpenerId: string | null) =>
      setSearchParams((previous) => {
        const next = new URLSearchParams(previous);
        if (sharpenerId) next.set('sharpener', sharpenerId);
        else next.delete('sharpener');
        return next;
      }),
    [setSearchParams],
  );

  return { params, today, setRange, setSharpener };
}

/** The filters as a query string, for links between the reports that keep them. */
export function filtersSearch(searchParams: URLSearchParams): string {
  const kept = new URLSearchParams();
  for (const key of ['from', 'to', 'sharpener']) {
    const value = searchParams.get(key);
    if (value) kept.set(key, value);
  }
  const search = kept.toString();
  return search ? `?${search}` : '';
}
