import { useMutation } from '@tanstack/react-query';
import { saveFile } from '@/features/imports/save-file';
import { api } from '@/lib/api-client';
import type { ReportName, ReportParams } from '../types';
import { reportCsvPath, reportQuery, type ReportExtra } from './keys';

export interface ReportCsvRequest {
  name: ReportName;
  params: ReportParams;
  extra?: ReportExtra;
}

export function getReportCsv({ name, params, extra }: ReportCsvRequest): Promise<Blob> {
  return api.blob(reportCsvPath(name), { query: reportQuery(params, extra) });
}

/**
 * The name the server gives the file, for when it lands in Downloads: keenroute-stops-2025-01-01-2025-12-31.csv, or
 * keenroute-cadence-by-sharpener-… where the page has two tables.
 */
export function reportCsvFileName({ name, params, extra }: ReportCsvRequest): string {
  const table = extra?.groupBy ? `-by-${extra.groupBy}` : '';
  return `keenroute-${name}${table}-${params.from}-${params.to}.csv`;
}

/** The CSV needs the auth header, so it is fetched as a blob and handed to the browser to save. */
export function useReportCsv() {
  return useMutation({
    mutationFn: async (request: ReportCsvRequest) => {
      saveFile(await getReportCsv(request), reportCsvFileName(request));
    },
  });
}
