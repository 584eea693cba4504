import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { invoiceKeys, invoicePath } from './keys';

/** Only a draft can go; its tickets go back to the ones ready to invoice. A sent invoice is voided instead. */
export function deleteDraft(id: string): Promise<void> {
  return api.delete(invoicePath(id));
}

export function useDeleteDraft(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => deleteDraft(id),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: invoiceKeys.detail(id) });
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: invoiceKeys.lists }),
        queryClient.invalidateQueries({ queryKey: invoiceKeys.ready }),
        queryClient.invalidateQueries({ queryKey: ['tickets'] }),
      ]);
    },
  });
}
