import { weekStart } from '@keenroute/shared';
import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { todayIso } from '../format';
import type { ComingDueParams } from '../types';

const PAGE_SIZE = 50;
const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

export function parseComingDueSearch(search: URLSearchParams, thisWeek: string): ComingDueParams {
  const week = search.get('week');
  const page = Number(search.get('page'));
  return {
    // Any day names its week; the list always works from the Monday.
    week: week && ISO_DATE.test(week) && !Number.isNaN(Date.parse(week)) ? weekStart(week) : thisWeek,
    sharpener: search.get('sharpener')?.trim() ?? '',
    page: Number.isInteger(page) && page >= 1 ? page : 1,
    pageSize: PAGE_SIZE,
  };
}

/** The chosen week and sharpener live in the URL; this week is the default and stays out of it. */
export function useComingDueSearch() {
  const [searchParams, setSearchParams] = useSearchParams();
  const thisWeek = weekStart(todayIso());
  const params = useMemo(() => parseComingDueSearch(searchParams, thisWeek), [searchParams, thisWeek]);

  const update = useCallback(
    (changes: Partial<Pick<ComingDueParams, 'week' | 'sharpener' | 'page'>>) => {
      setSearchParams((previous) => {
        const next = new URLSearchParams(previous);
        const defaults = { week: thisWeek, sharpener: '', page: 1 };
        for (const [key, value] of Object.entries(changes) as [keyof typeof defaults, string | number][]) {
          if (value === defaults[key] || value === '') next.delete(key);
          else next.set(key, String(value));
        }
        return next;
      });
    },
    [setSearchParams, thisWeek],
  );

  return { params, update, thisWeek };
}
