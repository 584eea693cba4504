import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { InvoiceListParams, InvoicePage } from '../types';
import { invoiceKeys } from './keys';

export function getInvoices(params: InvoiceListParams, signal?: AbortSignal): Promise<InvoicePage> {
  return api.get<InvoicePage>('/invoices', { query: { ...params }, signal });
}

export function getInvoicesQueryOptions(params: InvoiceListParams = {}) {
  return queryOptions({
    queryKey: invoiceKeys.list(params),
    queryFn: ({ signal }) => getInvoices(params, signal),
    // The next page or filter shows over the last one instead of a blank list.
    placeholderData: keepPreviousData,
  });
}

export function useInvoices(params: InvoiceListParams = {}) {
  return useQuery(getInvoicesQueryOptions(params));
}
