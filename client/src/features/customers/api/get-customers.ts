import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CustomerListParams, CustomerSummary, Page } from '../types';

export const customersQueryKey = ['customers'] as const;

export function getCustomers(params: CustomerListParams, signal?: AbortSignal): Promise<Page<CustomerSummary>> {
  return api.get<Page<CustomerSummary>>('/customers', { query: { ...params }, signal });
}

export function getCustomersQueryOptions(params: CustomerListParams = {}) {
  return queryOptions({
    queryKey: [...customersQueryKey, 'list', params],
    queryFn: ({ signal }) => getCustomers(params, signal),
    // Keeps the current page on screen while the next one loads.
    placeholderData: keepPreviousData,
  });
}

export function useCustomers(params: CustomerListParams = {}, options: { enabled?: boolean } = {}) {
  return useQuery({ ...getCustomersQueryOptions(params), enabled: options.enabled ?? true });
}
