import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { InvoiceDetail } from '../types';
import { myInvoiceKeys, myInvoicePath } from './keys';

export function getMyInvoice(id: string, signal?: AbortSignal): Promise<InvoiceDetail> {
  return api.get<InvoiceDetail>(myInvoicePath(id), { signal });
}

export function getMyInvoiceQueryOptions(id: string) {
  return queryOptions({
    queryKey: myInvoiceKeys.detail(id),
    queryFn: ({ signal }) => getMyInvoice(id, signal),
  });
}

export function useMyInvoice(id: string, options: { enabled?: boolean } = {}) {
  return useQuery({ ...getMyInvoiceQueryOptions(id), enabled: options.enabled ?? true });
}
