import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export type LabelSelection = { ids: string[] } | { customerId: string } | { stopId: string };

function labelQuery(selection: LabelSelection): Record<string, string> {
  if ('ids' in selection) return { ids: selection.ids.join(',') };
  if ('customerId' in selection) return { customerId: selection.customerId };
  return { stopId: selection.stopId };
}

export function getLabelsPdf(selection: LabelSelection): Promise<Blob> {
  return api.blob('/shears/labels.pdf', { query: labelQuery(selection) });
}

/** Opens the PDF in a new tab to print; where the browser blocks that, it downloads instead. */
export function showPdf(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const opened = window.open(url, '_blank');
  if (!opened) {
    const link = document.createElement('a');
    link.href = url;
    link.download = fileName;
    document.body.append(link);
    link.click();
    link.remove();
  }
  // The new tab has read it by then; the object URL would otherwise live as long as this page.
  window.setTimeout(() => URL.revokeObjectURL(url), 60_000);
}

export function usePrintLabels() {
  return useMutation({
    mutationFn: async ({ selection, fileName }: { selection: LabelSelection; fileName: string }) => {
      showPdf(await getLabelsPdf(selection), fileName);
    },
  });
}
