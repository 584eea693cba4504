import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CreditNoteInput, Invoice, RecordPaymentInput, UpdateDraftInput } from '../types';
import { invoiceKeys, invoicePath } from './keys';

/** Every change to one invoice, as the server takes it; each answers the whole invoice as it is now. */
export type InvoiceChange =
  | { kind: 'update'; input: UpdateDraftInput }
  | { kind: 'issue' }
  | { kind: 'send'; to?: string }
  | { kind: 'payment'; input: RecordPaymentInput }
  | { kind: 'credit-note'; input: CreditNoteInput }
  | { kind: 'void'; reason: string };

export function changeInvoice(id: string, change: InvoiceChange): Promise<Invoice> {
  const path = invoicePath(id);
  switch (change.kind) {
    case 'update':
      return api.patch<Invoice>(path, change.input);
    case 'issue':
      return api.post<Invoice>(`${path}/issue`);
    case 'send':
      return api.post<Invoice>(`${path}/send`, change.to ? { to: change.to } : {});
    case 'payment':
      return api.post<Invoice>(`${path}/payments`, change.input);
    case 'credit-note':
      return api.post<Invoice>(`${path}/credit-notes`, change.input);
    case 'void':
      return api.post<Invoice>(`${path}/void`, { reason: change.reason });
    default: {
      const unknown: never = change;
      throw new Error(`Unknown invoice change ${JSON.stringify(unknown)}`);
    }
  }
}

export function useChangeInvoice(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: InvoiceChange) => changeInvoice(id, change),
    onSuccess: (invoice) => {
      queryClient.setQueryData(invoiceKeys.detail(id), invoice);
      // The list, the send log and (after a void) the tickets ready to invoice all follow.
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: invoiceKeys.lists }),
        queryClient.invalidateQueries({ queryKey: invoiceKeys.mails(id) }),
        queryClient.invalidateQueries({ queryKey: invoiceKeys.ready }),
        queryClient.invalidateQueries({ queryKey: ['tickets'] }),
      ]);
    },
    // A failed send still wrote a log row: show it.
    onError: () => queryClient.invalidateQueries({ queryKey: invoiceKeys.mails(id) }),
  });
}
