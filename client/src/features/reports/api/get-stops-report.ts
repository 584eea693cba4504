import { useQuery } from '@tanstack/react-query';
import type { StopsReport, ReportParams } from '../types';
import { reportQueryOptions } from './get-report';

/** GET /api/reports/stops: revenue per stop, most first, with totals. */
export function getStopsReportQueryOptions(params: ReportParams) {
  return reportQueryOptions<StopsReport>('stops', params);
}

export function useStopsReport(params: ReportParams) {
  return useQuery(getStopsReportQueryOptions(params));
}
