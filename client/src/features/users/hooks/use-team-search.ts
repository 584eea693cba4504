import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { PAGE_SIZES, TEAM_SORTS, type TeamListParams, type TeamSort } from '../types';

const DEFAULTS: TeamListParams = { page: 1, pageSize: 25, q: '', sort: 'name', order: 'asc' };

function positiveInt(value: string | null, fallback: number): number {
  const parsed = Number(value);
  return Number.isInteger(parsed) && parsed >= 1 ? parsed : fallback;
}

export function parseTeamSearch(search: URLSearchParams): TeamListParams {
  const sort = search.get('sort');
  const pageSize = positiveInt(search.get('pageSize'), DEFAULTS.pageSize);
  return {
    page: positiveInt(search.get('page'), DEFAULTS.page),
    pageSize: (PAGE_SIZES as readonly number[]).includes(pageSize) ? pageSize : DEFAULTS.pageSize,
    q: search.get('q')?.trim() ?? '',
    sort: TEAM_SORTS.includes(sort as TeamSort) ? (sort as TeamSort) : DEFAULTS.sort,
    order: search.get('order') === 'desc' ? 'desc' : 'asc',
  };
}

/** The Team list's page, search and sort live in the URL, so a link or a reload shows the same list. */
export function useTeamSearch() {
  const [searchParams, setSearchParams] = useSearchParams();
  const params = useMemo(() => parseTeamSearch(searchParams), [searchParams]);

  const update = useCallback(
    (changes: Partial<TeamListParams>) => {
      setSearchParams(
        (previous) => {
          const next = new URLSearchParams(previous);
          for (const [key, value] of Object.entries(changes) as [keyof TeamListParams, string | number][]) {
            if (value === DEFAULTS[key] || value === '') next.delete(key);
            else next.set(key, String(value));
          }
          return next;
        },
        { replace: 'q' in changes },
      );
    },
    [setSearchParams],
  );

  const sortBy = useCallback(
    (sort: TeamSort) => {
      const order = params.sort === sort ? (params.order === 'asc' ? 'desc' : 'asc') : 'asc';
      update({ sort, order, page: 1 });
    },
    [params.sort, params.order, update],
  );

  return { params, update, sortBy };
}
