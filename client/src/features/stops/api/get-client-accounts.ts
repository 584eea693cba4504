import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Page } from '../types';
import type { StaffMember } from './get-staff';

// Under the users key, so an invitation on the Team page shows up in the picker.
export const clientAccountsQueryKey = ['users', 'client-accounts'] as const;

/** Client accounts that may be made a stop's shop manager, by name; search narrows them on the server. */
export async function getClientAccounts(q: string, signal?: AbortSignal): Promise<StaffMember[]> {
  const page = await api.get<Page<StaffMember>>('/users', {
    query: { pageSize: 50, sort: 'name', roles: 'client', ...(q ? { q } : {}) },
    signal,
  });
  return page.items.filter((user) => user.status !== 'deactivated');
}

export function getClientAccountsQueryOptions(q: string) {
  return queryOptions({
    queryKey: [...clientAccountsQueryKey, q],
    queryFn: ({ signal }) => getClientAccounts(q, signal),
    staleTime: 60_000,
  });
}

export function useClientAccounts(q: string) {
  return useQuery({ ...getClientAccountsQueryOptions(q), placeholderData: (previous) => previous });
}
