import { useQuery } from '@tanstack/react-query';
import type { ReceivablesGroup, ReceivablesReport, ReportParams } from '../types';
import { reportQueryOptions } from './get-report';

/** GET /api/reports/receivables: what is owed as of `to`, by age, per bill-to party or per stop. */
export function getReceivablesReportQueryOptions(params: ReportParams, groupBy: ReceivablesGroup) {
  return reportQueryOptions<ReceivablesReport>('receivables', params, { groupBy });
}

export function useReceivablesReport(params: ReportParams, groupBy: ReceivablesGroup) {
  return useQuery(getReceivablesReportQueryOptions(params, groupBy));
}
