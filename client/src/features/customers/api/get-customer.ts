import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CustomerDetail } from '../types';
import { customersQueryKey } from './get-customers';

export function getCustomer(id: string, signal?: AbortSignal): Promise<CustomerDetail> {
  return api.get<CustomerDetail>(`/customers/${encodeURIComponent(id)}`, { signal });
}

export function getCustomerQueryOptions(id: string) {
  return queryOptions({
    queryKey: [...customersQueryKey, 'detail', id],
    queryFn: ({ signal }) => getCustomer(id, signal),
  });
}

export function useCustomer(id: string) {
  // The page shows "not found" itself, so the global notice stays quiet about a 404.
  return useQuery({ ...getCustomerQueryOptions(id), meta: { handlesError: (error) => error.status === 404 } });
}
