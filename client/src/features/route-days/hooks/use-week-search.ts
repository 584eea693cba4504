import { weekStart } from '@keenroute/shared';
import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { todayIso } from '@/features/stops/format';

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

/** The Monday of the week a "YYYY-MM-DD" names, or this week's for anything else. */
export function mondayOf(text: string | null, thisWeek: string): string {
  return text && ISO_DATE.test(text) && !Number.isNaN(Date.parse(text)) ? weekStart(text) : thisWeek;
}

/** The week shown lives in the URL (?week=), so a link or a reload keeps it; this week stays out of it. */
export function useWeekSearch() {
  const [searchParams, setSearchParams] = useSearchParams();
  const thisWeek = weekStart(todayIso());
  const week = useMemo(() => mondayOf(searchParams.get('week'), thisWeek), [searchParams, thisWeek]);
  const setWeek = useCallback(
    (monday: string) =>
      setSearchParams((previous) => {
        const next = new URLSearchParams(previous);
        if (monday === thisWeek) next.delete('week');
        else next.set('week', monday);
        return next;
      }),
    [setSearchParams, thisWeek],
  );
  return { week, setWeek, thisWeek };
}
