import { useQuery } from '@tanstack/react-query';
import type { CadenceReport, ReportParams } from '../types';
import { reportQueryOptions } from './get-report';

/** GET /api/reports/cadence: visits on time and late, per stop and per sharpener. */
export function getCadenceReportQueryOptions(params: ReportParams) {
  return reportQueryOptions<CadenceReport>('cadence', params);
}

export function useCadenceReport(params: ReportParams) {
  return useQuery(getCadenceReportQueryOptions(params));
}
