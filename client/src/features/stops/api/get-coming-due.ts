import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ComingDueParams, Page, StopSummary } from '../types';
import { stopsQueryKey } from './get-stops';

export function getComingDue(params: ComingDueParams, signal?: AbortSignal): Promise<Page<StopSummary>> {
  const { sharpener, ...rest } = params;
  return api.get<Page<StopSummary>>('/stops/coming-due', { query: { ...rest, sharpenerId: sharpener }, signal });
}

export function getComingDueQueryOptions(params: ComingDueParams) {
  return queryOptions({
    queryKey: [...stopsQueryKey, 'coming-due', params],
    queryFn: ({ signal }) => getComingDue(params, signal),
    placeholderData: keepPreviousData,
  });
}

export function useComingDue(params: ComingDueParams) {
  return useQuery(getComingDueQueryOptions(params));
}
