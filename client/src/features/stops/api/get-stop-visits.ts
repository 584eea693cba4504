import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Page, StopVisit } from '../types';
import { stopQueryKey } from './get-stop';

export function getStopVisits(stopId: string, signal?: AbortSignal): Promise<Page<StopVisit>> {
  return api.get<Page<StopVisit>>(`/stops/${encodeURIComponent(stopId)}/visits`, { signal });
}

export function getStopVisitsQueryOptions(stopId: string) {
  return queryOptions({
    queryKey: [...stopQueryKey(stopId), 'visits'],
    queryFn: ({ signal }) => getStopVisits(stopId, signal),
  });
}

export function useStopVisits(stopId: string) {
  return useQuery(getStopVisitsQueryOptions(stopId));
}
