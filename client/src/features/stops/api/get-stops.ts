import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Page, StopListParams, StopSummary } from '../types';

export const stopsQueryKey = ['stops'] as const;

export function getStops(params: StopListParams, signal?: AbortSignal): Promise<Page<StopSummary>> {
  const { sharpener, active, ...rest } = params;
  return api.get<Page<StopSummary>>('/stops', {
    query: { ...rest, sharpenerId: sharpener, active: active === 'all' ? undefined : active },
    signal,
  });
}

export function getStopsQueryOptions(params: StopListParams) {
  return queryOptions({
    queryKey: [...stopsQueryKey, 'list', params],
    queryFn: ({ signal }) => getStops(params, signal),
    // Keeps the current page on screen while the next one loads.
    placeholderData: keepPreviousData,
  });
}

export function useStops(params: StopListParams) {
  return useQuery(getStopsQueryOptions(params));
}
