import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { SavedStop, StopDetail } from '../types';
import { stopsQueryKey } from './get-stops';

export function stopQueryKey(stopId: string) {
  return [...stopsQueryKey, 'detail', stopId] as const;
}

/** The stop's own query (not its visits): a save has just put the fresh copy there, so it needs no refetch. */
export function isDetailOf(queryKey: readonly unknown[], stopId: string): boolean {
  const own = stopQueryKey(stopId);
  return queryKey.length === own.length && own.every((part, index) => queryKey[index] === part);
}

/** The stop as GET /api/stops/:id answers it, from a save's answer (which adds what the geocoder said). */
export function detailOfSaved(saved: SavedStop): StopDetail {
  const detail: Partial<SavedStop> = { ...saved };
  delete detail.geocoding;
  return detail as StopDetail;
}

export function getStop(stopId: string, signal?: AbortSignal): Promise<StopDetail> {
  return api.get<StopDetail>(`/stops/${encodeURIComponent(stopId)}`, { signal });
}

export function getStopQueryOptions(stopId: string) {
  return queryOptions({
    queryKey: stopQueryKey(stopId),
    queryFn: ({ signal }) => getStop(stopId, signal),
    // The page shows a missing stop itself.
    meta: { handlesError: (error) => error.status === 404 },
  });
}

export function useStop(stopId: string) {
  return useQuery(getStopQueryOptions(stopId));
}
