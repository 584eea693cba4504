import { useQuery } from '@tanstack/react-query';
import type { RouteDaysReport, ReportParams } from '../types';
import { reportQueryOptions } from './get-report';

/** GET /api/reports/route-days: revenue per route day, latest first. */
export function getRouteDaysReportQueryOptions(params: ReportParams) {
  return reportQueryOptions<RouteDaysReport>('route-days', params);
}

export function useRouteDaysReport(params: ReportParams) {
  return useQuery(getRouteDaysReportQueryOptions(params));
}
