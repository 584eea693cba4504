import { useMutation } from '@tanstack/react-query';
import { showPdf } from '@/features/shears/api/print-labels';
import { api } from '@/lib/api-client';
import { myInvoicePath } from './keys';

// A link cannot send the sign-in token, so the PDF is fetched with it and shown from memory.
export function getInvoicePdf(id: string): Promise<Blob> {
  return api.blob(`${myInvoicePath(id)}/pdf`);
}

export function useOpenInvoicePdf() {
  return useMutation({
    mutationFn: async ({ id, number }: { id: string; number: string | null }) => {
      showPdf(await getInvoicePdf(id), `${number ?? 'invoice'}.pdf`);
    },
  });
}
