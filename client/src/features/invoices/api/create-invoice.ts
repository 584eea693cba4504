import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CreateInvoiceInput, Invoice } from '../types';
import { invoiceKeys } from './keys';

export function createInvoice(input: CreateInvoiceInput): Promise<Invoice> {
  return api.post<Invoice>('/invoices', input);
}

/** A draft from the chosen tickets; they leave the "ready" list and the tickets show their invoice. */
export function useCreateInvoice() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvoice,
    onSuccess: (invoice) => {
      queryClient.setQueryData(invoiceKeys.detail(invoice.id), invoice);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: invoiceKeys.all }),
        queryClient.invalidateQueries({ queryKey: ['tickets'] }),
      ]);
    },
  });
}
