import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { RateHistory } from '../types';
import { ratesQueryKey } from './get-rates';

export function getRateHistory(signal?: AbortSignal): Promise<RateHistory> {
  return api.get<RateHistory>('/rates/history', { signal });
}

export function getRateHistoryQueryOptions() {
  return queryOptions({
    queryKey: [...ratesQueryKey, 'history'],
    queryFn: ({ signal }) => getRateHistory(signal),
  });
}

export function useRateHistory({ enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...getRateHistoryQueryOptions(), enabled });
}
