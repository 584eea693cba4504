import { useMutation } from '@tanstack/react-query';
import { saveFile } from '@/features/imports/save-file';
import { api } from '@/lib/api-client';

export type CsvExportKind = 'invoices' | 'payments';

export interface CsvExportRange {
  from: string;
  to: string;
}

export function getCsvExport(kind: CsvExportKind, range: CsvExportRange): Promise<Blob> {
  return api.blob(`/${kind}/export.csv`, { query: { from: range.from, to: range.to } });
}

export function csvFileName(kind: CsvExportKind, range: CsvExportRange): string {
  return `keenroute-${kind}-${range.from}-to-${range.to}.csv`;
}

/** For the books: the invoices or the payments of a period as a spreadsheet file. */
export function useCsvExport() {
  return useMutation({
    mutationFn: async ({ kind, range }: { kind: CsvExportKind; range: CsvExportRange }) => {
      saveFile(await getCsvExport(kind, range), csvFileName(kind, range));
    },
  });
}
