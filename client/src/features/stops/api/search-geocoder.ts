import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { GeocodeSearchResult } from '../types';

export const geocodingQueryKey = ['geocoding'] as const;

export function searchGeocoder(q: string, signal?: AbortSignal): Promise<GeocodeSearchResult> {
  return api.get<GeocodeSearchResult>('/geocoding/search', { query: { q }, signal });
}

export function getGeocoderSearchQueryOptions(q: string) {
  return queryOptions({
    queryKey: [...geocodingQueryKey, q],
    queryFn: ({ signal }) => searchGeocoder(q, signal),
    // An address's candidates do not move while the form is open.
    staleTime: 10 * 60_000,
  });
}

/** Asks only once the person presses "Find on map" (an empty address asks nothing). */
export function useGeocoderSearch(q: string) {
  return useQuery({ ...getGeocoderSearchQueryOptions(q), enabled: q.trim().length > 0 });
}
