import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Page, ShearListParams, ShearSummary } from '../types';

export const shearsQueryKey = ['shears'] as const;

export function getShears(params: ShearListParams, signal?: AbortSignal): Promise<Page<ShearSummary>> {
  return api.get<Page<ShearSummary>>('/shears', { query: { ...params }, signal });
}

export function getShearsQueryOptions(params: ShearListParams = {}) {
  return queryOptions({
    queryKey: [...shearsQueryKey, 'list', params],
    queryFn: ({ signal }) => getShears(params, signal),
    // Keeps the current page on screen while the next one loads.
    placeholderData: keepPreviousData,
  });
}

export function useShears(params: ShearListParams = {}, options: { enabled?: boolean } = {}) {
  return useQuery({ ...getShearsQueryOptions(params), enabled: options.enabled ?? true });
}
