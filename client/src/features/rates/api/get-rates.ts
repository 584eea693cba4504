import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { RateCardVersion } from '../types';

export const ratesQueryKey = ['rates'] as const;

export function getRates(signal?: AbortSignal): Promise<RateCardVersion> {
  return api.get<RateCardVersion>('/rates', { signal });
}

export function getRatesQueryOptions() {
  return queryOptions({
    queryKey: [...ratesQueryKey, 'current'],
    queryFn: ({ signal }) => getRates(signal),
  });
}

export function useRates() {
  return useQuery(getRatesQueryOptions());
}
