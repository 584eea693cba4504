import { useMutation } from '@tanstack/react-query';
import { saveFile } from '@/features/imports/save-file';
import { api } from '@/lib/api-client';
import { pdfFileName } from '../labels';
import type { InvoiceSummary } from '../types';
import { invoicePath } from './keys';

export function getInvoicePdf(id: string): Promise<Blob> {
  return api.blob(`${invoicePath(id)}/pdf`);
}

/** The PDF needs the auth header, so it comes as a blob and is saved under the invoice's number. */
export function useDownloadInvoicePdf() {
  return useMutation({
    mutationFn: async (invoice: Pick<InvoiceSummary, 'id' | 'number'>) => {
      saveFile(await getInvoicePdf(invoice.id), pdfFileName(invoice));
    },
  });
}
