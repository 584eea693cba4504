import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { InvoiceMail } from '../types';
import { invoiceKeys, invoicePath } from './keys';

/** The send log: the invoice, its reminders and receipts, newest first (owner and office only). */
export function getInvoiceMails(id: string, signal?: AbortSignal): Promise<InvoiceMail[]> {
  return api.get<InvoiceMail[]>(`${invoicePath(id)}/mails`, { signal });
}

/** While a mail waits in the server's queue, the log is read again every few seconds until it went or failed. */
const QUEUED_POLL_MS = 3000;

export function getInvoiceMailsQueryOptions(id: string) {
  return queryOptions({
    queryKey: invoiceKeys.mails(id),
    queryFn: ({ signal }) => getInvoiceMails(id, signal),
    refetchInterval: (query) => (query.state.data?.some((mail) => mail.status === 'queued') ? QUEUED_POLL_MS : false),
  });
}

export function useInvoiceMails(id: string, options: { enabled?: boolean } = {}) {
  return useQuery({ ...getInvoiceMailsQueryOptions(id), enabled: options.enabled ?? true });
}
