import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { InvoicePage } from '../types';
import { myInvoiceKeys } from './keys';

// The server scopes the list to the signed-in client (their own, or their shop's when they manage it).
export function getMyInvoices(page: number, pageSize: number, signal?: AbortSignal): Promise<InvoicePage> {
  return api.get<InvoicePage>('/invoices', { query: { page, pageSize }, signal });
}

export function getMyInvoicesQueryOptions(page: number, pageSize: number) {
  return queryOptions({
    queryKey: myInvoiceKeys.list(page, pageSize),
    queryFn: ({ signal }) => getMyInvoices(page, pageSize, signal),
    placeholderData: keepPreviousData,
  });
}

export function useMyInvoices(page: number, pageSize: number) {
  return useQuery(getMyInvoicesQueryOptions(page, pageSize));
}
