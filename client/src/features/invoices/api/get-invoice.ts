import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Invoice } from '../types';
import { invoiceKeys, invoicePath } from './keys';

export function getInvoice(id: string, signal?: AbortSignal): Promise<Invoice> {
  return api.get<Invoice>(invoicePath(id), { signal });
}

export function getInvoiceQueryOptions(id: string) {
  return queryOptions({
    queryKey: invoiceKeys.detail(id),
    queryFn: ({ signal }) => getInvoice(id, signal),
    // The page says "not found" itself.
    meta: { handlesError: (error) => error.status === 404 },
  });
}

export function useInvoice(id: string) {
  return useQuery(getInvoiceQueryOptions(id));
}
