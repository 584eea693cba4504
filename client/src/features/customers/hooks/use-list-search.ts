import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';

type UrlValue = string | number;

export function positiveInt(value: string | null, fallback: number): number {
  const parsed = Number(value);
  return Number.isInteger(parsed) && parsed >= 1 ? parsed : fallback;
}

export function oneOf<T extends string>(list: readonly T[], value: string | null, fallback: T): T {
  return list.includes(value as T) ? (value as T) : fallback;
}

/**
 * A list's page, search, filters and sort live in the URL, so a link or a reload shows the same list. Values equal to
 * their default stay out of the URL.
 */
export function useListSearch<P extends { [K in keyof P]: UrlValue }>(
  parse: (search: URLSearchParams) => P,
  defaults: P,
) {
  const [searchParams, setSearchParams] = useSearchParams();
  const params = useMemo(() => parse(searchParams), [parse, searchParams]);

  const update = useCallback(
    (changes: Partial<P>) => {
      setSearchParams(
        (previous) => {
          const next = new URLSearchParams(previous);
          for (const key of Object.keys(changes) as (keyof P & string)[]) {
            const value = changes[key];
            if (value === undefined || value === defaults[key] || value === '') next.delete(key);
            else next.set(key, String(value));
          }
          return next;
        },
        // Typing a search should not leave one history entry per letter.
        { replace: 'q' in changes },
      );
    },
    [setSearchParams, defaults],
  );

  return { params, update };
}

/** Clicking the sorted column turns the order around; another column starts ascending, at page 1. */
export function nextSort<S extends string>(current: { sort: S; order: 'asc' | 'desc' }, sort: S) {
  const order: 'asc' | 'desc' = current.sort === sort ? (current.order === 'asc' ? 'desc' : 'asc') : 'asc';
  return { sort, order, page: 1 };
}
