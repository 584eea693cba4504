import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { PublicStopSummary } from '../types';
import { bookingKeys } from './keys';
import { publicRequest } from './public-request';

/** Fewer letters than this match too many stops to be of use. */
export const MIN_SEARCH_LENGTH = 2;

export function searchPublicStops(q: string, signal?: AbortSignal): Promise<{ items: PublicStopSummary[] }> {
  return publicRequest('/public/stops', { query: { q }, signal });
}

export function searchPublicStopsQueryOptions(q: string) {
  return queryOptions({
    queryKey: bookingKeys.publicStops(q),
    queryFn: ({ signal }) => searchPublicStops(q, signal),
    enabled: q.length >= MIN_SEARCH_LENGTH,
    placeholderData: keepPreviousData,
  });
}

export function usePublicStopSearch(q: string) {
  return useQuery(searchPublicStopsQueryOptions(q));
}
