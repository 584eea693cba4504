import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Page, Ref } from '../types';

/** What a stop picker needs of a stop; the full StopSummary has more. */
export interface StopOption extends Ref {
  city: string;
}

// Keys start with 'stops' so a stop saved anywhere refreshes the pickers too.
export function useStopOptions(q: string) {
  return useQuery({
    queryKey: ['stops', 'options', q],
    queryFn: ({ signal }) => api.get<Page<StopOption>>('/stops', { query: { q, pageSize: 20, sort: 'name' }, signal }),
    placeholderData: keepPreviousData,
    staleTime: 60_000,
  });
}

/** The name of one stop, for a picker preset to a stop that its first page may not hold. */
export function useStopName(id: string | null | undefined, enabled: boolean) {
  return useQuery({
    queryKey: ['stops', 'name-of', id],
    queryFn: ({ signal }) => api.get<StopOption>(`/stops/${encodeURIComponent(id ?? '')}`, { signal }),
    enabled: Boolean(id) && enabled,
    select: (stop): StopOption => ({ id: stop.id, name: stop.name, city: stop.city }),
  });
}
