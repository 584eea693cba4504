import { useQuery } from '@tanstack/react-query';
import type { SharpenersReport, ReportParams } from '../types';
import { reportQueryOptions } from './get-report';

/** GET /api/reports/sharpeners: revenue per sharpener. */
export function getSharpenersReportQueryOptions(params: ReportParams) {
  return reportQueryOptions<SharpenersReport>('sharpeners', params);
}

export function useSharpenersReport(params: ReportParams) {
  return useQuery(getSharpenersReportQueryOptions(params));
}
