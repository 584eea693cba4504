import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ShearDetail } from '../types';
import { shearsQueryKey } from './get-shears';

export function getShear(id: string, signal?: AbortSignal): Promise<ShearDetail> {
  return api.get<ShearDetail>(`/shears/${encodeURIComponent(id)}`, { signal });
}

export function getShearQueryOptions(id: string) {
  return queryOptions({
    queryKey: [...shearsQueryKey, 'detail', id],
    queryFn: ({ signal }) => getShear(id, signal),
  });
}

export function useShear(id: string) {
  // The page says "not found" itself, so the global notice stays quiet about a 404.
  return useQuery({ ...getShearQueryOptions(id), meta: { handlesError: (error) => error.status === 404 } });
}
