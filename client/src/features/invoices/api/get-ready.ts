import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ReadyGroup } from '../types';
import { invoiceKeys } from './keys';

/** Finished tickets left for an invoice and on none yet, grouped by who pays (the stop or the customer). */
export function getReadyGroups(signal?: AbortSignal): Promise<ReadyGroup[]> {
  return api.get<ReadyGroup[]>('/invoices/ready', { signal });
}

export function getReadyGroupsQueryOptions() {
  return queryOptions({ queryKey: invoiceKeys.ready, queryFn: ({ signal }) => getReadyGroups(signal) });
}

export function useReadyGroups() {
  return useQuery(getReadyGroupsQueryOptions());
}
