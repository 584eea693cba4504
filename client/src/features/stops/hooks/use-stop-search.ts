import { isStopKind } from '@keenroute/shared';
import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import {
  ACTIVE_FILTERS,
  PAGE_SIZES,
  STOP_SORTS,
  type ActiveFilter,
  type StopListParams,
  type StopSort,
} from '../types';

export const STOP_LIST_DEFAULTS: StopListParams = {
  page: 1,
  pageSize: 25,
  q: '',
  kind: '',
  sharpener: '',
  active: 'true',
  sort: 'name',
  order: 'asc',
};

function positiveInt(value: string | null, fallback: number): number {
  const parsed = Number(value);
  return Number.isInteger(parsed) && parsed >= 1 ? parsed : fallback;
}

export function parseStopSearch(search: URLSearchParams): StopListParams {
  const sort = search.get('sort');
  const kind = search.get('kind');
  const active = search.get('active');
  const pageSize = positiveInt(search.get('pageSize'), STOP_LIST_DEFAULTS.pageSize);
  return {
    page: positiveInt(search.get('page'), STOP_LIST_DEFAULTS.page),
    pageSize: (PAGE_SIZES as readonly number[]).includes(pageSize) ? pageSize : STOP_LIST_DEFAULTS.pageSize,
    q: search.get('q')?.trim() ?? '',
    kind: isStopKind(kind) ? kind : '',
    sharpener: search.get('sharpener')?.trim() ?? '',
    active: ACTIVE_FILTERS.includes(active as ActiveFilter) ? (active as ActiveFilter) : STOP_LIST_DEFAULTS.active,
    sort: STOP_SORTS.includes(sort as StopSort) ? (sort as StopSort) : STOP_LIST_DEFAULTS.sort,
    order: search.get('order') === 'desc' ? 'desc' : 'asc',
  };
}

/** The stops list's search, filters, sort and page live in the URL, so a link or a reload shows the same list. */
export function useStopSearch() {
  const [searchParams, setSearchParams] = useSearchParams();
  const params = useMemo(() => parseStopSearch(searchParams), [searchParams]);

  const update = useCallback(
    (changes: Partial<StopListParams>) => {
      setSearchParams(
        (previous) => {
          const next = new URLSearchParams(previous);
          for (const [key, value] of Object.entries(changes) as [keyof StopListParams, string | number][]) {
            if (value === STOP_LIST_DEFAULTS[key] || value === '') next.delete(key);
            else next.set(key, String(value));
          }
          return next;
        },
        // Typing a search should not fill the history with one entry per letter.
        { replace: 'q' in changes },
      );
    },
    [setSearchParams],
  );

  const sortBy = useCallback(
    (sort: StopSort) => {
      const order = params.sort === sort ? (params.order === 'asc' ? 'desc' : 'asc') : 'asc';
      update({ sort, order, page: 1 });
    },
    [params.sort, params.order, update],
  );

  const filtered = params.q !== '' || params.kind !== '' || params.sharpener !== '' || params.active !== 'true';

  return { params, update, sortBy, filtered };
}
