import { useQuery } from '@tanstack/react-query';
import type { MonthsReport, ReportParams } from '../types';
import { reportQueryOptions } from './get-report';

/**
 * GET /api/reports/months: the trend by month, every month of the range. With a stop, that stop's revenue only (and
 * no invoiced or collected figures, which belong to whoever pays).
 */
export function getMonthsReportQueryOptions(params: ReportParams, stopId?: string) {
  return reportQueryOptions<MonthsReport>('months', params, stopId ? { stopId } : {});
}

export function useMonthsReport(
  params: ReportParams,
  { stopId, enabled = true }: { stopId?: string; enabled?: boolean } = {},
) {
  return useQuery({ ...getMonthsReportQueryOptions(params, stopId), enabled });
}
